package com.crustplan.fuzz;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.List;
import java.util.Random;

/**
 * Seeded random values for the bad-input tests: any finite double, any int, and strings
 * of any character outside the surrogate, noncharacter and private-use blocks, each with
 * its edge values mixed in. The seed is printed in every case's name and failure message;
 * run with {@code -Dcrustplan.fuzz.seed=N} to repeat a run (or to try other values).
 */
final class FuzzValues {

	/**
	 * The run's seed: a fixed default (the date this generator was written) so a build
	 * repeats.
	 */
	static final long SEED = Long.getLong("crustplan.fuzz.seed", 20261202L);

	/**
	 * Values at the ends of the double range and around zero, where parsers and checks
	 * break.
	 */
	private static final double[] EDGE_DOUBLES = { 0.0, -0.0, 0.01, -0.01, 1.0, -1.0, Double.MAX_VALUE,
			-Double.MAX_VALUE, Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL };

	private static final int[] EDGE_INTS = { 0, 1, -1, 2, -2, Integer.MAX_VALUE, Integer.MIN_VALUE,
			Integer.MAX_VALUE - 1, Integer.MIN_VALUE + 1 };

	private static final char[] EDGE_CHARS = { '\u0000', ' ', 'A', '"', '\\', '\n', '\uFFFD' };

	private final Random random;

	/**
	 * One generator per test method, so adding cases to one method leaves the others'
	 * cases alone.
	 */
	FuzzValues(String method) {
		this.random = new Random(SEED ^ method.hashCode());
	}

	int below(int n) {
		return this.random.nextInt(n);
	}

	<T> T oneOf(List<T> values) {
		return values.get(below(values.size()));
	}

	/**
	 * Any finite double: edge values, two-decimal values of any magnitude, any bit
	 * pattern.
	 */
	double anyFiniteDouble() {
		int pick = below(20);
		if (pick < 3) {
			return EDGE_DOUBLES[below(EDGE_DOUBLES.length)];
		}
		if (pick < 12) {
			// log-uniform magnitude from 1 to 1e308, rounded to two decimals like a typed
			// number
			double magnitude = Math.pow(10, this.random.nextDouble() * 308);
			double value = new BigDecimal(magnitude).setScale(2, RoundingMode.HALF_UP).doubleValue();
			return this.random.nextBoolean() ? value : -value;
		}
		double d;
		do {
			d = Double.longBitsToDouble(this.random.nextLong());
		}
		while (!Double.isFinite(d));
		return d;
	}

	/** Any int: edge values, values of every bit length, uniform over the whole range. */
	int anyInt() {
		int pick = below(20);
		if (pick < 3) {
			return EDGE_INTS[below(EDGE_INTS.length)];
		}
		if (pick < 12) {
			int bits = 1 + below(31);
			int value = (int) (this.random.nextLong() >>> (64 - bits));
			return this.random.nextBoolean() ? value : -value;
		}
		return this.random.nextInt();
	}

	/** A string of 0 to maxLength characters, each from the whole set described above. */
	String anyString(int maxLength) {
		if (below(10) == 0) {
			return "";
		}
		int length = 1 + below(maxLength);
		StringBuilder s = new StringBuilder(length);
		for (int i = 0; i < length; i++) {
			s.append(anyChar());
		}
		return s.toString();
	}

	private char anyChar() {
		int pick = below(10);
		if (pick == 0) {
			return EDGE_CHARS[below(EDGE_CHARS.length)];
		}
		if (pick < 4) {
			return (char) (0x20 + below(0x7f - 0x20));
		}
		char c;
		do {
			c = (char) below(0x10000);
		}
		while (excluded(c));
		return c;
	}

	/**
	 * Surrogates, the noncharacters (U+FDD0 to U+FDEF, U+FFFE, U+FFFF) and the
	 * private-use block.
	 */
	private static boolean excluded(char c) {
		return Character.isSurrogate(c) || (c >= '\uFDD0' && c <= '\uFDEF') || c == '\uFFFE' || c == '\uFFFF'
				|| (c >= '\uE000' && c <= '\uF8FF');
	}

	/** A value as a case name shows it: control characters escaped, long values cut. */
	static String shown(String value) {
		StringBuilder s = new StringBuilder();
		int i = 0;
		for (; i < value.length() && i < 60; i++) {
			char c = value.charAt(i);
			s.append(Character.isISOControl(c) ? String.format("\\u%04x", (int) c) : String.valueOf(c));
		}
		return (i < value.length()) ? s + "… (" + value.length() + " chars)" : s.toString();
	}

}
