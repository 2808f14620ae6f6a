package com.crustplan.engine.cook;

/**
 * The step just taken, from its start to its end: what listeners and event handlers see.
 * Values inside a step are interpolated linearly between its two moments (the stepper is
 * first order in time).
 */
public final class StepInterpolator {

	private Moment previous = new Moment();

	private Moment current = new Moment();

	private double stepS;

	/** Starts the record at the cook's initial state. */
	void start(CookState state, LayerReaction reaction, ActiveHeat heat) {
		current.fill(state, reaction, heat);
		previous.fill(state, reaction, heat);
		stepS = 0;
	}

	/** Moves on by a step of stepS that has brought the state to its new values. */
	void advance(CookState state, LayerReaction reaction, ActiveHeat heat, double stepS) {
		Moment swap = previous;
		previous = current;
		current = swap;
		current.fill(state, reaction, heat);
		this.stepS = stepS;
	}

	public Moment previous() {
		return previous;
	}

	public Moment current() {
		return current;
	}

	public double stepS() {
		return stepS;
	}

	/** The time at a fraction f of the step, s. */
	public double timeAt(double f) {
		return current.timeS - stepS + f * stepS;
	}

	/** Linear interpolation between a value at the step's start and at its end. */
	public static double between(double atStart, double atEnd, double f) {
		return atStart + f * (atEnd - atStart);
	}

}
