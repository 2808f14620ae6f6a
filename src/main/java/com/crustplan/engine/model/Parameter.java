package com.crustplan.engine.model;

import java.util.Objects;

/**
 * A model constant with its unit and where it comes from. Every number the engine uses is
 * one of these, so the model page and the contributor guide are generated from the values
 * the code runs on.
 */
public record Parameter(String symbol, String description, double value, String unit, String source,
		Evidence evidence) {

	public Parameter {
		Objects.requireNonNull(symbol, "symbol");
		Objects.requireNonNull(description, "description");
		Objects.requireNonNull(unit, "unit");
		Objects.requireNonNull(source, "source");
		Objects.requireNonNull(evidence, "evidence");
	}

	public static Parameter published(String symbol, String description, double value, String unit, String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.PUBLISHED);
	}

	public static Parameter secondary(String symbol, String description, double value, String unit, String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.SECONDARY);
	}

	public static Parameter fromMemory(String symbol, String description, double value, String unit, String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.FROM_MEMORY);
	}

	public static Parameter commonPractice(String symbol, String description, double value, String unit,
			String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.COMMON_PRACTICE);
	}

	public static Parameter assumption(String symbol, String description, double value, String unit, String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.ASSUMPTION);
	}

	public static Parameter derived(String symbol, String description, double value, String unit, String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.DERIVED);
	}

	/**
	 * Set so the model reproduces the claim named in the source (say how well the claim
	 * itself is known); a named test re-runs it.
	 */
	public static Parameter calibrated(String symbol, String description, double value, String unit, String source) {
		return new Parameter(symbol, description, value, unit, source, Evidence.CALIBRATED);
	}

	/** A copy with another value, for calibration and uncertainty runs. */
	public Parameter withValue(double newValue) {
		return new Parameter(symbol, description, newValue, unit, source, evidence);
	}

}
