package com.crustplan.plan;

import com.crustplan.engine.cook.Target;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.setup.SetupForm;
import com.crustplan.surface.SurfaceForm;

/**
 * The inputs of a saved plan, copied (temperatures in °C) so that editing or deleting the surface
 * or setup later never changes a plan the kitchen relies on. Stored as JSON in {@code saved_plan}.
 */
public record PlanInputs(SurfaceForm surface, SetupForm setup, String targetStage, Double targetLightness,
		double horizonMinutes) {

	public static Target target(String stage, Double lightness) {
		boolean hasStage = stage != null && !stage.isBlank();
		if (hasStage && lightness != null) {
			throw new InvalidInputException("target", "give either a stage or a lightness (L*), not both");
		}
		if (!hasStage && lightness == null) {
			throw new InvalidInputException("target", "choose a stage or give a lightness (L*)");
		}
		return hasStage ? Target.stage(stage.trim()) : Target.lightness(lightness);
	}

	public Target target() {
		return target(targetStage, targetLightness);
	}

}
