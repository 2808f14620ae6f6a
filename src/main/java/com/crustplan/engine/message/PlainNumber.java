package com.crustplan.engine.message;

/**
 * A number without a unit (pH, L*, a browning extent), shown with {@code decimals}
 * decimals.
 */
public record PlainNumber(double value, int decimals) implements Argument {

	public static PlainNumber of(double value, int decimals) {
		return new PlainNumber(value, decimals);
	}

}
