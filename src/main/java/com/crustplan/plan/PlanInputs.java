package com.crustplan.plan;

import java.util.List;

import com.crustplan.engine.cook.Target;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.setup.SetupForm;
import com.crustplan.surface.SurfaceForm;

/**
 * The inputs of a saved plan, copied (temperatures in °C) so that editing or deleting the
 * surface or setup later never changes a plan the kitchen relies on. Stored as JSON in
 * {@code saved_plan}. A plan in steps has {@code steps} (and {@code setup} is its first
 * heated step's); plans saved before steps existed have none and read as one-setup plans.
 */
public record PlanInputs(SurfaceForm surface, SetupForm setup, String targetStage, Double targetLightness,
		double horizonMinutes, List<PlanStep> steps, Double coreTargetC, List<String> changes) {

	/**
	 * A plan without acrylamide changes applied ({@code changes}: the codes of
	 * {@link com.crustplan.engine.assessment.Mitigations#PLANNABLE} already applied to
	 * the surface, setup and target above; plans saved before changes existed have none).
	 */
	public PlanInputs(SurfaceForm surface, SetupForm setup, String targetStage, Double targetLightness,
			double horizonMinutes, List<PlanStep> steps, Double coreTargetC) {
		this(surface, setup, targetStage, targetLightness, horizonMinutes, steps, coreTargetC, null);
	}

	/** The applied change codes, never null. */
	public List<String> appliedChanges() {
		return changes == null ? List.of() : changes;
	}

	/** A one-setup plan. */
	public PlanInputs(SurfaceForm surface, SetupForm setup, String targetStage, Double targetLightness,
			double horizonMinutes) {
		this(surface, setup, targetStage, targetLightness, horizonMinutes, null, null);
	}

	public boolean stepped() {
		return steps != null && !steps.isEmpty();
	}

	/** The colour target, or null for a plan in steps aimed at the core alone. */
	public Target colourTarget() {
		boolean none = (targetStage == null || targetStage.isBlank()) && targetLightness == null;
		return stepped() && none ? null : target();
	}

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
