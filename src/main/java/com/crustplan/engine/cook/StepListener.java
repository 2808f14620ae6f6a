package com.crustplan.engine.cook;

/**
 * Called by the cook at its start, after every step and at its end; all three do nothing
 * unless overridden.
 */
public interface StepListener {

	default void init(CookState state, StepInterpolator step) {
	}

	default void handleStep(CookState state, StepInterpolator step) {
	}

	default void finish(CookState state, StepInterpolator step) {
	}

	/**
	 * The next time the listener must see exactly (an output time): the cook lands a step
	 * on it.
	 */
	default double nextCheckpointS() {
		return Double.POSITIVE_INFINITY;
	}

}
