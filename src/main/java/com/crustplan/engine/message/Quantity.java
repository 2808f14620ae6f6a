package com.crustplan.engine.message;

/**
 * A physical quantity that is not a temperature, in the SI-based unit a kitchen reads it
 * in; {@code unit} is the unit's symbol ("W/m²K", "kW/m²", "%", "g", "µg/kg") and
 * {@code decimals} how many to show.
 */
public record Quantity(double value, String unit, int decimals) implements Argument {

	public static Quantity of(double value, String unit) {
		return new Quantity(value, unit, 0);
	}

	public static Quantity of(double value, String unit, int decimals) {
		return new Quantity(value, unit, decimals);
	}

}
