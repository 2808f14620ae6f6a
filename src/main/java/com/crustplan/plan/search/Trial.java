package com.crustplan.plan.search;

import com.crustplan.engine.heat.HeatSetup;

/**
 * One setting tried: when the colour and the core target were reached (s, NaN where not
 * asked or not reached within the time asked), the moment both are ({@code doneS}), and
 * the food then: the portion's acrylamide (µg/kg as eaten), the core, the colour and its
 * stage. {@code inTime}: reached within the time asked; {@code underBenchmark}: at or
 * below the benchmark level then (true where none applies).
 */
public record Trial(HeatSetup setup, double colourS, double coreS, double doneS, double portionUgPerKg,
		double coreAtDoneC, String hexAtDone, String stageAtDone, boolean inTime, boolean underBenchmark) {

	public boolean satisfies(SearchGoal goal) {
		return inTime && (!goal.underBenchmark() || underBenchmark);
	}

	public boolean colourReached() {
		return Double.isFinite(colourS);
	}

	public boolean coreReached() {
		return Double.isFinite(coreS);
	}

	public double temperatureC() {
		return setup.temperatureC();
	}

}
