package com.crustplan.model;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.browning.Caramelisation;
import com.crustplan.engine.browning.WaterActivityFactor;
import com.crustplan.engine.food.Acidity;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.model.Equation;
import com.crustplan.engine.model.ModelSection;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.MoistureDiffusivity;
import com.crustplan.engine.water.WaterVapour;

/**
 * The model as the engine implements it, read from the engine's own Parameter constants. The formulas
 * are those stated in the engine classes' documentation. When the engine's catalogue
 * ({@code ModelCatalogue.sections()}) is available it replaces this list; the page renders either.
 */
final class ModelSections {

	private ModelSections() {
	}

	static List<ModelSection> sections() {
		List<ModelSection> out = new ArrayList<>();
		out.add(new ModelSection("Heat into the surface", List.of(
				new Equation("Heat setups", "q = h·(T_heat − T_s) + ε·σ·(T_rad⁴ − T_s⁴) − J·h_fg",
						"Each face gets heat by contact, convection and radiation and loses it to evaporation. "
								+ "Contact and convection coefficients depend on the equipment.",
						HeatSetup.parameters()),
				new Equation("Evaporation", "J = h_m·(a_w·ρ_v,sat(T_s) − ρ_v,gas),  h/h_m = ρ·c_p·Le^(2/3)",
						"Water leaves the surface in proportion to its water activity; the mass-transfer "
								+ "coefficient follows from the heat-transfer one (Chilton–Colburn analogy).",
						List.of(WaterVapour.GAS_CONSTANT, WaterVapour.LATENT_HEAT_0C, WaterVapour.LATENT_HEAT_SLOPE))),
				List.of("One-dimensional slab: edges and uneven thickness are not modelled.",
						"Pan and oil temperatures are held constant: a cold load that drags the pan down is not modelled.")));
		out.add(new ModelSection("Water inside the food", List.of(
				new Equation("Moisture diffusion", "D = D_ref·exp(−E_a/R·(1/T − 1/T_ref))",
						"Water moves from the core to the drying surface by effective diffusion.",
						List.of(MoistureDiffusivity.REFERENCE, MoistureDiffusivity.ACTIVATION_ENERGY)),
				new Equation("Sorption isotherm (GAB)", "X = X_m·C·K·a_w / ((1 − K·a_w)(1 − K·a_w + C·K·a_w))",
						"Links the moisture at the surface to its water activity, per category.",
						isotherms())),
				List.of("Fat uptake and fat migration are not modelled.")));
		out.add(new ModelSection("Browning and colour", List.of(
				new Equation("Maillard browning", "dB/dt = k(T)·f_aw·f_pH·f_sugar·f_amino·(1 − B),  k = k0·exp(−E_a/(R·T))",
						"Browning extent B runs from 0 (raw) to 1; the rate constant is per category.",
						kinetics()),
				new Equation("Water activity factor", "g(a_w) = (a_w/a*)^p·((1 − a_w)/(1 − a*))^q",
						"Browning is fastest at intermediate water activity and stops on a wet surface.",
						List.of(WaterActivityFactor.PEAK, WaterActivityFactor.DRY_EXPONENT)),
				new Equation("pH and reactants", "f_pH = 10^(β·(pH − pH_ref))",
						"Browning speeds up with pH; additions of bicarbonate or acid shift the pH through the "
								+ "food's buffer capacity: ΔpH = n/(β·m).",
						List.of(BrowningKinetics.PH_SENSITIVITY, BrowningKinetics.REACTANT_FACTOR_CAP,
								Acidity.BICARBONATE_MOLAR_MASS, Acidity.CITRIC_ACID_MOLAR_MASS, Acidity.CITRIC_PROTONS,
								Acidity.MAX_PH, Acidity.MIN_PH)),
				new Equation("Caramelisation", "dB/dt += k_c(T)·(S/S_ref)·(1 − B)",
						"Sucrose browns without amino groups, slowly, above about 160 °C.",
						List.of(Caramelisation.PRE_EXPONENTIAL, Caramelisation.ACTIVATION_ENERGY,
								Caramelisation.REFERENCE_SUCROSE_PCT))),
				List.of("Colour follows a path through CIE L*a*b* anchors per category; real products vary.",
						"Kinetics of several categories are calibrated to common kitchen practice, not measured.")));
		out.add(new ModelSection("Food categories", List.of(
				new Equation("Buffer capacity and structure", "ΔpH = n / (β·m)",
						"Per-category buffer capacity and starting gas fraction.", categoryStructure())),
				List.of("Compositions are typical values, not a particular product: enter your own where known.")));
		return out;
	}

	private static List<Parameter> isotherms() {
		List<Parameter> p = new ArrayList<>();
		for (FoodCategory c : FoodCategory.values()) {
			for (Parameter x : List.of(c.isotherm().monolayer(), c.isotherm().c(), c.isotherm().k())) {
				p.add(labelled(x, c));
			}
		}
		return p;
	}

	private static List<Parameter> kinetics() {
		List<Parameter> p = new ArrayList<>();
		for (FoodCategory c : FoodCategory.values()) {
			BrowningKinetics k = c.browning();
			p.add(labelled(k.rate().preExponential(), c));
			p.add(labelled(k.rate().activationEnergy(), c));
			p.add(labelled(k.referenceWaterActivity(), c));
			p.add(labelled(k.referencePh(), c));
		}
		return p;
	}

	private static List<Parameter> categoryStructure() {
		List<Parameter> p = new ArrayList<>();
		for (FoodCategory c : FoodCategory.values()) {
			p.add(labelled(c.bufferCapacity(), c));
			p.add(labelled(c.initialPorosity(), c));
		}
		return p;
	}

	/** Shared constants appear once per category, so the description says which category. */
	private static Parameter labelled(Parameter x, FoodCategory c) {
		return new Parameter(x.symbol(), c.label() + ": " + x.description(), x.value(), x.unit(), x.source(),
				x.evidence());
	}

}
