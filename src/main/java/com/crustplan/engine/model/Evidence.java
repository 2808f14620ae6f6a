package com.crustplan.engine.model;

/**
 * How firmly a parameter's value is backed; shown beside every parameter in the product.
 */
public enum Evidence {

	/** Read in the published source named beside the value. */
	PUBLISHED("published"),
	/** Quoted by a secondary source; the primary is named. */
	SECONDARY("quoted by a secondary source"),
	/** Computed from published formulas. */
	DERIVED("derived from published formulas"),
	/** Usual kitchen or engineering practice. */
	COMMON_PRACTICE("common practice"),
	/**
	 * Set so the model reproduces the claim or data named beside it (a kitchen-practice
	 * time, a measured series); a named test re-runs the claim.
	 */
	CALIBRATED("calibrated to the claim named"),
	/** Recalled, not checked against the source. */
	FROM_MEMORY("from memory"),
	/** A modelling choice of ours, to be refined by calibration. */
	ASSUMPTION("assumption");

	private final String label;

	Evidence(String label) {
		this.label = label;
	}

	public String label() {
		return label;
	}

}
