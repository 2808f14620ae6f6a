package com.crustplan.engine.cook;

/**
 * Numerical and reporting settings of a run. Defaults are justified by the grid and step
 * convergence table in the README (Performance section).
 */
public record CookSettings(int nodes, double timeStepS, double outputIntervalS, double horizonS,
		double runPastTargetFraction, boolean recordSeries) {

	public static final int DEFAULT_NODES = 31;

	public static final double DEFAULT_TIME_STEP_S = 0.5;

	public static final double DEFAULT_OUTPUT_INTERVAL_S = 5;

	public static final double DEFAULT_HORIZON_S = 3600;

	/**
	 * After the target, run on by this share of the time to target so charts show what
	 * overcooking does.
	 */
	public static final double DEFAULT_RUN_PAST_TARGET = 0.25;

	public static final double MAX_HORIZON_S = 6 * 3600;

	public CookSettings {
		if (nodes < 5 || nodes > 2000) {
			throw new IllegalArgumentException("nodes must be 5–2000");
		}
		if (!(timeStepS > 0 && timeStepS <= 10)) {
			throw new IllegalArgumentException("time step must be in (0, 10] s");
		}
		if (!(outputIntervalS > 0)) {
			throw new IllegalArgumentException("output interval must be positive");
		}
		if (!(horizonS > 0 && horizonS <= MAX_HORIZON_S)) {
			throw new IllegalArgumentException("horizon must be in (0, 6 h]");
		}
		if (!(runPastTargetFraction >= 0)) {
			throw new IllegalArgumentException("run-past fraction must be ≥ 0");
		}
	}

	public static CookSettings defaults() {
		return new CookSettings(DEFAULT_NODES, DEFAULT_TIME_STEP_S, DEFAULT_OUTPUT_INTERVAL_S, DEFAULT_HORIZON_S,
				DEFAULT_RUN_PAST_TARGET, true);
	}

	public CookSettings withNodes(int n) {
		return new CookSettings(n, timeStepS, outputIntervalS, horizonS, runPastTargetFraction, recordSeries);
	}

	public CookSettings withTimeStepS(double dt) {
		return new CookSettings(nodes, dt, outputIntervalS, horizonS, runPastTargetFraction, recordSeries);
	}

	public CookSettings withOutputIntervalS(double s) {
		return new CookSettings(nodes, timeStepS, s, horizonS, runPastTargetFraction, recordSeries);
	}

	public CookSettings withHorizonS(double s) {
		return new CookSettings(nodes, timeStepS, outputIntervalS, s, runPastTargetFraction, recordSeries);
	}

	public CookSettings withRunPastTargetFraction(double f) {
		return new CookSettings(nodes, timeStepS, outputIntervalS, horizonS, f, recordSeries);
	}

	/**
	 * Without series only the summary is kept: for maps and planners that run the engine
	 * many times.
	 */
	public CookSettings withRecordSeries(boolean record) {
		return new CookSettings(nodes, timeStepS, outputIntervalS, horizonS, runPastTargetFraction, record);
	}

}
