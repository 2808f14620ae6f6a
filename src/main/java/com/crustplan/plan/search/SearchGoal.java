package com.crustplan.plan.search;

import com.crustplan.engine.cook.Target;

/**
 * What a search asks for: a colour, a core temperature or both, reached within
 * {@code withinMinutes}; optionally with the portion's acrylamide at or below the EU
 * benchmark level at that moment.
 */
public record SearchGoal(Target colour, Double coreC, double withinMinutes, boolean underBenchmark) {

	public double withinS() {
		return withinMinutes * 60;
	}

}
