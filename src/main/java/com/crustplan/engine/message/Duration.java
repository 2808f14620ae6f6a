package com.crustplan.engine.message;

/** A length of time in seconds, shown whole in seconds or in minutes. */
public record Duration(double seconds, boolean inMinutes) implements Argument {

	public static Duration seconds(double s) {
		return new Duration(s, false);
	}

	public static Duration minutes(double min) {
		return new Duration(min * 60, true);
	}

}
