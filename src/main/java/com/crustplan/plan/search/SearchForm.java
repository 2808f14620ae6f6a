package com.crustplan.plan.search;

import com.crustplan.system.TemperatureUnit;

/**
 * The "find a setting" page: a saved surface, a saved setup as the equipment (its other
 * settings kept, its temperature varied), an optional range in the page's unit
 * ({@code temperatureUnit}), a target stage and/or core temperature, the time and whether
 * to stay under the benchmark. {@code steamPcts}: oven steam shares, comma-separated.
 */
public record SearchForm(Long surfaceId, Long setupId, Double fromT, Double toT, Double stepT, String steamPcts,
		String targetStage, Double coreTarget, Double withinMinutes, Boolean underBenchmark, String temperatureUnit) {

	/**
	 * Whether to search: a link that only picks the surface opens the form without
	 * errors.
	 */
	public boolean asked() {
		return setupId != null || withinMinutes != null;
	}

	public TemperatureUnit unit(TemperatureUnit page) {
		return temperatureUnit == null || temperatureUnit.isBlank() ? page : TemperatureUnit.fromCode(temperatureUnit);
	}

	public boolean benchmark() {
		return underBenchmark != null && underBenchmark;
	}

}
