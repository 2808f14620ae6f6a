package com.crustplan.plan;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Size;

/**
 * The plan picker: a saved surface, a saved setup, a target (a stage of the surface's category or an
 * L* value) and how long to simulate at most. {@code name} is only needed to save the plan.
 */
public record PlanForm(Long surfaceId, Long setupId, String targetStage,
		@DecimalMin(value = "0", message = "L* runs from 0 (black) to 100 (white)") @DecimalMax(value = "100", message = "L* runs from 0 (black) to 100 (white)") Double targetLightness,
		@DecimalMin(value = "1", message = "must be 1 to 360 minutes") @DecimalMax(value = "360", message = "must be 1 to 360 minutes") Double horizonMinutes,
		@Size(max = 120, message = "at most 120 characters") String name) {

	public boolean complete() {
		return surfaceId != null && setupId != null;
	}

	public double horizonOrDefault() {
		return horizonMinutes == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizonMinutes;
	}

	/** Target field errors from the engine land on the field the cook filled in. */
	public String targetField() {
		return targetStage != null && !targetStage.isBlank() ? "targetStage" : "targetLightness";
	}

}
