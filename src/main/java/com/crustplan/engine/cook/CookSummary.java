package com.crustplan.engine.cook;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;

/** Why a cook ended as it did, and what the run assumed about the surface. */
final class CookSummary {

	private CookSummary() {
	}

	static Outcome outcome(boolean reached, boolean canBrown, double maxSurfaceK, boolean everDry) {
		if (reached) {
			return Outcome.REACHED;
		}
		if (!canBrown) {
			return Outcome.NO_REACTANTS;
		}
		if (!everDry || maxSurfaceK < 378.15) {
			return Outcome.WET_PLATEAU;
		}
		// below ≈ 130 °C even a dry surface browns an order of magnitude slower than at 150 °C (Ea ≈ 64 kJ/mol)
		if (maxSurfaceK < 403.15) {
			return Outcome.TOO_COOL;
		}
		return Outcome.TOO_SLOW;
	}

	static String explain(Outcome outcome, double maxSurfaceK, double extent, double timeS) {
		if (outcome == Outcome.REACHED) {
			return outcome.explanation();
		}
		return String.format("%s Highest surface temperature %.0f °C; browning extent %.2f after %.0f min.",
				outcome.explanation(), maxSurfaceK - 273.15, extent, timeS / 60);
	}

	static List<String> surfaceAssumptions(Surface surface) {
		FoodCategory category = surface.category();
		List<String> a = new ArrayList<>();
		a.add(String.format(
				"The whole %.0f mm thickness has the surface's composition; heat and water move only through the thickness (a slab).",
				surface.thicknessMm()));
		a.add(String.format("pH %.2f at the surface%s (buffer capacity %.0f mmol/(pH·kg)).", surface.ph(),
				surface.bicarbonateGPerKg() > 0 || surface.acidGPerKg() > 0 ? " after the additions" : "",
				category.bufferCapacity().value()));
		a.add("Browning kinetics, sorption isotherm and colour path of the category " + category.label() + ".");
		if (surface.composition().sucrosePct() > 0) {
			a.add("Sucrose browns only by caramelisation (it is not a reducing sugar); its inversion is not modelled.");
		}
		return a;
	}

}
