package com.crustplan.plan;

import java.util.List;
import java.util.Objects;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Size;

import com.crustplan.system.TemperatureUnit;

/**
 * The plan picker: a saved surface, a saved setup, a target (a stage of the surface's
 * category or an L* value) and how long to simulate at most. {@code name} is only needed
 * to save the plan. A plan in steps gives {@code steps} instead of the one setup, and may
 * aim at a {@code coreTarget}; those temperatures are in {@code temperatureUnit} (the
 * page's unit when it was filled in).
 */
public record PlanForm(Long surfaceId, Long setupId, String targetStage,
		@DecimalMin(value = "0", message = "L* runs from 0 (black) to 100 (white)") @DecimalMax(value = "100",
				message = "L* runs from 0 (black) to 100 (white)") Double targetLightness,
		@DecimalMin(value = "1", message = "must be 1 to 360 minutes") @DecimalMax(value = "360",
				message = "must be 1 to 360 minutes") Double horizonMinutes,
		@Size(max = 120, message = "at most 120 characters") String name, List<StepForm> steps, Double coreTarget,
		String temperatureUnit, @Size(max = 6, message = "at most 6 changes") List<String> changes) {

	/** The acrylamide changes to apply, without blanks and repeats. */
	public List<String> appliedChanges() {
		return changes == null ? List.of()
				: changes.stream()
					.filter(Objects::nonNull)
					.map(String::trim)
					.filter(c -> !c.isEmpty())
					.distinct()
					.toList();
	}

	public boolean complete() {
		return surfaceId != null && (setupId != null || stepped());
	}

	/** The step rows that name a setup or a rest, in order. */
	public List<StepForm> filledSteps() {
		return steps == null ? List.of() : steps.stream().filter(Objects::nonNull).filter(s -> !s.blank()).toList();
	}

	public boolean stepped() {
		return !filledSteps().isEmpty();
	}

	public TemperatureUnit unit(TemperatureUnit page) {
		return temperatureUnit == null || temperatureUnit.isBlank() ? page : TemperatureUnit.fromCode(temperatureUnit);
	}

	/**
	 * The same form with its temperatures in {@code unit}, so the page shows them in the
	 * cook's unit.
	 */
	public PlanForm inUnit(TemperatureUnit page) {
		TemperatureUnit from = unit(page);
		List<StepForm> converted = filledSteps().stream()
			.map(s -> new StepForm(s.setup(), s.minutes(), s.stage(), convert(s.core(), from, page)))
			.toList();
		return new PlanForm(surfaceId, setupId, targetStage, targetLightness, horizonMinutes, name, converted,
				convert(coreTarget, from, page), page.code(), changes);
	}

	private static Double convert(Double t, TemperatureUnit from, TemperatureUnit to) {
		return t == null ? null : Math.round(to.fromCelsius(from.toCelsius(t)) * 10) / 10.0;
	}

	public double horizonOrDefault() {
		return horizonMinutes == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizonMinutes;
	}

	/** Target field errors from the engine land on the field the cook filled in. */
	public String targetField() {
		return targetStage != null && !targetStage.isBlank() ? "targetStage" : "targetLightness";
	}

}
