package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.system.Formats;
import com.crustplan.system.TemperatureUnit;

/**
 * What today's model says differently from the figures a plan was saved with: time to the
 * target, core at the target and the portion's acrylamide, old → new.
 */
final class PlanRerun {

	/**
	 * Below these a change is not worth a line: the timer's second, half a degree (a
	 * probe reads to about that), one µg/kg (the figures are shown as whole µg/kg).
	 * Assumption.
	 */
	static final double SECONDS = 1;

	static final double KELVIN = 0.5;

	static final double UG_PER_KG = 1;

	private PlanRerun() {
	}

	/** The differences in words, empty when today's run gives the saved figures. */
	static List<String> differences(SavedPlan plan, PlanReport now, TemperatureUnit units, Formats fmt) {
		List<String> out = new ArrayList<>();
		Double t0 = plan.isReached() ? plan.getTimeToTargetS() : null;
		Double t1 = now.reached() ? now.timeToTargetS() : null;
		if (changed(t0, t1, SECONDS)) {
			out.add("time to target " + (t0 == null ? "not reached" : Formats.duration(t0)) + " → "
					+ (t1 == null ? "not reached" : Formats.duration(t1)));
		}
		Double c0 = plan.getCoreAtTargetC();
		Double c1 = now.coreTemperatureAtTargetC();
		if (c0 != null && changed(c0, c1, KELVIN)) {
			out.add("core at target " + fmt.temp(c0, units) + " → " + fmt.temp(c1, units));
		}
		Double a0 = plan.getPortionAcrylamideUgPerKg();
		Double a1 = now.acrylamideMatters() ? now.acrylamide().portionUgPerKg() : null;
		if (a0 != null && changed(a0, a1, UG_PER_KG)) {
			out.add("acrylamide " + fmt.num(a0, 0) + " → " + (a1 == null ? "–" : fmt.num(a1, 0)) + " µg/kg");
		}
		return out;
	}

	private static boolean changed(Double a, Double b, double tolerance) {
		if (a == null || b == null) {
			return a != b;
		}
		return Math.abs(a - b) >= tolerance;
	}

}
