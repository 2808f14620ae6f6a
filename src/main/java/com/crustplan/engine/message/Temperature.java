package com.crustplan.engine.message;

/**
 * A temperature, held in °C (the unit of every engine input); shown whole, in the cook's
 * unit.
 */
public record Temperature(double celsius) implements Argument {

	public static Temperature celsius(double c) {
		return new Temperature(c);
	}

	public static Temperature kelvin(double k) {
		return new Temperature(k - 273.15);
	}

}
