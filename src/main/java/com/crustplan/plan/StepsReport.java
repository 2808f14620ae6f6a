package com.crustplan.plan;

import java.util.List;

import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.message.Message;

/**
 * What a plan in steps adds to a report: the steps as run, the core target, a timeline of
 * checkpoints for the line, and which target came first.
 *
 * @param labels each step's name as the cook knows it (a setup's name, "Rest")
 * @param coreTargetC the plan's core target, °C (null: none)
 * @param targetOrder which target came first and by how much, or why one was missed
 * (null: one target only and it was reached)
 */
public record StepsReport(List<CookStep> steps, List<String> labels, StepsResult result, Double coreTargetC,
		List<Checkpoint> timeline, Message targetOrder) {

	public StepsReport {
		steps = List.copyOf(steps);
		labels = List.copyOf(labels);
		timeline = List.copyOf(timeline);
	}

	/** A moment the line acts on: the time from the start of the cook and what to do. */
	public record Checkpoint(double timeS, String kind, Message text) {
	}

	public List<CookStep.Record> records() {
		return result.steps();
	}

	/**
	 * Seconds from the start to the core target, or null when it was not reached (or
	 * there is none).
	 */
	public Double coreTargetReachedS() {
		return PlanReport.finite(result.coreReachedAtS());
	}

	/**
	 * "colour" or "core" when both targets were reached, the one reached first; null
	 * otherwise.
	 */
	public String firstTarget() {
		double lead = result.colourLeadOverCoreS();
		if (!Double.isFinite(lead)) {
			return null;
		}
		return lead <= 0 ? "colour" : "core";
	}

	/**
	 * How long before the other target the first one came, s (null unless both were
	 * reached).
	 */
	public Double firstTargetLeadS() {
		double lead = result.colourLeadOverCoreS();
		return Double.isFinite(lead) ? Math.abs(lead) : null;
	}

}
