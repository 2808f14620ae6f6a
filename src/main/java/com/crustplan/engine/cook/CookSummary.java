package com.crustplan.engine.cook;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;

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
		// below ≈ 130 °C even a dry surface browns an order of magnitude slower than at
		// 150 °C (Ea ≈ 64 kJ/mol)
		if (maxSurfaceK < 403.15) {
			return Outcome.TOO_COOL;
		}
		return Outcome.TOO_SLOW;
	}

	static Message explain(Outcome outcome, double maxSurfaceK, double extent, double timeS) {
		if (outcome == Outcome.REACHED) {
			return outcome.explanation();
		}
		return Message.of("outcome.explained", outcome.explanation(), Temperature.kelvin(maxSurfaceK),
				Quantity.of(extent * 100, "%", 0), new Duration(timeS, true));
	}

	static List<Message> surfaceAssumptions(Surface surface) {
		FoodCategory category = surface.category();
		List<Message> a = new ArrayList<>();
		Quantity size = Quantity.of(surface.thicknessMm(), "mm");
		a.add(switch (surface.shape()) {
			case SLAB -> Message.of("assumption.surface.slab", size);
			case STRIP -> Message.of("assumption.surface.strip", size);
			case CUBE -> Message.of("assumption.surface.cube", size);
			case BALL -> Message.of("assumption.surface.ball", size);
		});
		boolean added = surface.bicarbonateGPerKg() > 0 || surface.acidGPerKg() > 0;
		a.add(Message.of(added ? "assumption.surface.ph.after-additions" : "assumption.surface.ph",
				PlainNumber.of(surface.ph(), 2), Quantity.of(category.bufferCapacity().value(), "mmol/(pH·kg)")));
		a.add(Message.of("assumption.surface.category", Text.of(category.label())));
		if (surface.composition().sucrosePct() > 0) {
			a.add(Message.of("assumption.surface.sucrose"));
		}
		return a;
	}

}
