package com.crustplan.engine.cook;

import java.util.List;

/**
 * What a cook in several steps predicts: the whole run as a {@link CookResult} (its time
 * to target is the plan's colour target; NaN where it has none or missed it), each step's
 * record, and when the core target was reached.
 *
 * @param coreTargetC the plan's core target, °C (NaN: none)
 * @param coreReachedAtS when the centre first reached it, s (NaN: not reached)
 * @param surfaceExtentAtCore face 0's browning extent at that moment (NaN: not reached)
 */
public record StepsResult(CookResult cook, List<CookStep.Record> steps, double coreTargetC, double coreReachedAtS,
		double surfaceExtentAtCore) {

	public StepsResult {
		steps = List.copyOf(steps);
	}

	public boolean colourReached() {
		return Double.isFinite(cook.timeToTargetS());
	}

	public boolean coreReached() {
		return Double.isFinite(coreReachedAtS);
	}

	/**
	 * Colour reached minus core reached, s: negative when the crust got there first (NaN
	 * unless both did).
	 */
	public double colourLeadOverCoreS() {
		return cook.timeToTargetS() - coreReachedAtS;
	}

}
