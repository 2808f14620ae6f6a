package com.crustplan.engine.cook;

/**
 * What happens when a {@link CookEvent} fires: it returns the time at which the cook is
 * to stop.
 */
@FunctionalInterface
public interface EventHandler {

	/**
	 * @param step the step in which the event fired
	 * @param fraction where in the step it fired, 0–1
	 * @return the time to stop at, s ({@link Double#POSITIVE_INFINITY} to go on as
	 * before)
	 */
	double eventOccurred(StepInterpolator step, double fraction);

	/** Goes on as before. */
	EventHandler CONTINUE = (step, fraction) -> Double.POSITIVE_INFINITY;

	/** Stops at the end of the step in which the event fired. */
	EventHandler STOP = (step, fraction) -> step.current().timeS();

}
