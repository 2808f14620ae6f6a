package com.crustplan.engine.message;

/**
 * A difference of temperature in kelvin (1 K = 1 °C of difference); shown whole, as K or
 * as °F of difference.
 */
public record TemperatureDifference(double kelvin) implements Argument {

	public static TemperatureDifference kelvin(double k) {
		return new TemperatureDifference(k);
	}

}
