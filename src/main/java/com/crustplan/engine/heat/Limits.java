package com.crustplan.engine.heat;

import com.crustplan.engine.input.InvalidInputException;

/** The range check every equipment input shares, worded the same way for each field. */
final class Limits {

	private Limits() {
	}

	static void within(String field, double v, double min, double max, String unit) {
		if (!Double.isFinite(v) || v < min || v > max) {
			throw new InvalidInputException(field, "must be from " + plain(min) + " to " + plain(max) + " " + unit);
		}
	}

	private static String plain(double v) {
		return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
	}

}
