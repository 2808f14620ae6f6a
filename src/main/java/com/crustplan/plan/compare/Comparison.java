package com.crustplan.plan.compare;

import java.util.List;

import com.crustplan.plan.PlanReport;
import com.crustplan.plan.SavedPlan;

/**
 * Two to four saved plans side by side, in the order asked: the first is the one the
 * others are said against. A plan the model no longer accepts keeps its place with the
 * reason ({@code problem}) and no report.
 */
public record Comparison(List<Entry> entries, boolean acrylamideMatters) {

	public Comparison {
		entries = List.copyOf(entries);
	}

	/**
	 * One plan: its saved row, the plan as run today, its line colour and dash on the
	 * charts, and its difference from the first plan in words (null for the first).
	 */
	public record Entry(SavedPlan saved, PlanReport report, String problem, String colour, String dash,
			String difference) {

		public boolean ok() {
			return report != null;
		}

	}

}
