package com.crustplan.engine.cook;

/**
 * Keeps what explains a cook that missed its target: the hottest the surface got and
 * whether it ever dried.
 */
final class SurfaceWatch implements StepListener {

	/** Below this a bare face still counts as wet for the explanation. */
	private static final double DRY_WATER_ACTIVITY = 0.95;

	private double maxSurfaceK;

	private boolean everDry;

	@Override
	public void init(CookState state, StepInterpolator step) {
		maxSurfaceK = state.surfaceK();
	}

	@Override
	public void handleStep(CookState state, StepInterpolator step) {
		maxSurfaceK = Math.max(maxSurfaceK, state.surfaceK());
		everDry |= state.standingWater(0) <= 0 && step.current().surfaceWaterActivity() < DRY_WATER_ACTIVITY;
	}

	double maxSurfaceK() {
		return maxSurfaceK;
	}

	boolean everDry() {
		return everDry;
	}

}
