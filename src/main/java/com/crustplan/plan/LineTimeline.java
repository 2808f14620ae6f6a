package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.message.Message;

/**
 * The checkpoints a line cook works from, for any plan: a plan in steps has its own
 * timeline ({@link StepsReport#timeline()}); a one-setup plan gets the same kinds of line
 * (in, flips, out at the target) from its one run.
 */
public final class LineTimeline {

	private LineTimeline() {
	}

	/**
	 * @param colour the plan's colour target (words for the "out at" line), or null
	 */
	public static List<StepsReport.Checkpoint> of(PlanReport report, Target colour) {
		if (report.stepped()) {
			return report.steps().timeline();
		}
		CookResult result = report.result();
		List<StepsReport.Checkpoint> out = new ArrayList<>();
		out.add(new StepsReport.Checkpoint(0, "step", StepPlanner.into(report.setup())));
		double endS = result.reached() ? result.timeToTargetS() : result.simulatedS();
		StepPlanner.flips(report.setup().schedule(), 0, endS, out);
		if (result.reached()) {
			Message what = colour != null ? colour.describeInText(report.category()) : report.targetLabel();
			out.add(new StepsReport.Checkpoint(endS, "pull", Message.of("timeline.pull.colour", what)));
		}
		else {
			out.add(new StepsReport.Checkpoint(endS, "stop", Message.of("timeline.horizon")));
		}
		return out;
	}

	/**
	 * The core temperature when the food leaves the heat for good: at the target colour
	 * for one setup, at the end of the last step (after any rest) for a plan in steps,
	 * °C; null when the plan never gets there.
	 */
	public static Double coreAtPullC(PlanReport report) {
		if (!report.stepped()) {
			return report.reached() ? report.coreTemperatureAtTargetC() : null;
		}
		List<Sample> series = report.result().series();
		return series.isEmpty() ? null : PlanReport.finite(series.get(series.size() - 1).coreTemperatureC());
	}

}
