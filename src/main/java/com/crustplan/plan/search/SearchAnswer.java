package com.crustplan.plan.search;

import java.util.List;

/**
 * What a search found: every setting tried (in the range's order), the one marked
 * ({@code bestIndex}, −1 when none satisfies the goal) and why it is marked; where none
 * does, why not and the nearest alternatives, each re-checked by running the model.
 * {@code verified} is the marked setting run again the way a plan is run.
 */
public record SearchAnswer(SearchGoal goal, List<Trial> trials, int bestIndex, String markedBy, Double benchmarkUgPerKg,
		Verified verified, List<String> why, List<Alternative> alternatives, List<String> notes) {

	public SearchAnswer {
		trials = List.copyOf(trials);
		why = List.copyOf(why);
		alternatives = List.copyOf(alternatives);
		notes = List.copyOf(notes);
	}

	/**
	 * "least-acrylamide" where acrylamide matters, "gentlest" (lowest setting) elsewhere.
	 */
	public static final String LEAST_ACRYLAMIDE = "least-acrylamide";

	public static final String GENTLEST = "gentlest";

	public boolean found() {
		return bestIndex >= 0;
	}

	public Trial best() {
		return found() ? trials.get(bestIndex) : null;
	}

	/**
	 * The marked setting's plan: time to the goal (s), core then (°C) and the portion's
	 * acrylamide (µg/kg, NaN where the plan gives none).
	 */
	public record Verified(double timeS, double coreC, double portionUgPerKg) {

		public boolean hasPortion() {
			return Double.isFinite(portionUgPerKg);
		}

	}

	/**
	 * A change that might make the goal reachable: {@code code} (thinner, drier, ph,
	 * acid, finish-in-oven), what to do, and what the model found with it: {@code works}
	 * with the best setting after the change ({@code best}), or why it still fails.
	 */
	public record Alternative(String code, String change, boolean works, Trial best, String outcome) {
	}

}
