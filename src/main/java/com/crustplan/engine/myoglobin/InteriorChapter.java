package com.crustplan.engine.myoglobin;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.model.Equation;
import com.crustplan.engine.model.ModelSection;
import com.crustplan.engine.model.Parameter;

/** The inside of meat, poultry and fish on the model page. */
public final class InteriorChapter {

	private InteriorChapter() {
	}

	public static ModelSection section() {
		List<Equation> eq = new ArrayList<>();
		for (PigmentKinetics k : PigmentKinetics.values()) {
			List<Parameter> p = new ArrayList<>(k.parameters());
			if (k == PigmentKinetics.MEAT) {
				p.add(PigmentKinetics.NEGLIGIBLE_PER_HOUR);
			}
			eq.add(new Equation("Pigment denaturation: " + k.name().toLowerCase().replace('_', ' '),
					"dN/dt = −f·k0·exp(−Ea/(R·T))·N per layer, N native share (1 raw)",
					"First order in every layer from its own temperature, stepped exactly over each time step; the hottest "
							+ "temperature of each layer is kept beside it.",
					p));
		}
		for (PigmentKinetics k : PigmentKinetics.values()) {
			eq.add(new Equation("Cut-face colour: " + k.name().toLowerCase(), "L*a*b*(1 − N): straight segments",
					k.colour().source(),
					k.colour().anchorParameters(k.name().toLowerCase() + " cut face", "share denatured")));
		}
		eq.add(new Equation("Cooked band and crust",
				"band = depth where 1 − N ≥ f_cooked, less the crust (aw ≤ aw,crust)",
				"Measured from each heated face to where the denatured share falls below the cooked look (linear between layers); "
						+ "the crust is the run of dried layers at the face, drawn in the face's browning colour.",
				List.of(PigmentKinetics.COOKED_LOOK, InteriorProfile.CRUST_WATER_ACTIVITY)));
		eq.add(new Equation("Centre in the trade's words", "max T_centre against the doneness bands",
				"Red meat: rare, medium-rare, medium, medium-well, well done by the hottest the centre got. Poultry and fish: "
						+ "against the FDA Food Code 2022, 3-401.11 (74 °C poultry, 63 °C whole cuts of fish), never \"rare\".",
				CentreDoneness.parameters()));
		return new ModelSection("Inside of meat, poultry and fish", eq, List.of(
				"Beef kinetics are for loss of myoglobin solubility in isothermal holds (Geileskey et al. 1998); the cut face's colour "
						+ "also depends on the pigment's redox state and pH, which are not modelled.",
				"Colour is no proof of doneness: meat can brown early or stay pink (King & Whyte 2006, J Food Sci 71:R31). Probe the centre.",
				"Carry-over after a one-step cook is not counted; a rest step counts it."));
	}

}
