package com.crustplan.engine.message;

/**
 * A temperature that a code or regulation states in both scales (FDA Food Code: 63 °C and
 * 145 °F), so a cook reads the code's own figure, never a rounded conversion.
 * {@code withFahrenheit}: in °C the °F figure follows in brackets, "63 °C (145 °F)"; in
 * °F only "145 °F" is shown.
 */
public record StatedTemperature(double celsius, double fahrenheit, boolean withFahrenheit) implements Argument {

	public static StatedTemperature of(double celsius, double fahrenheit) {
		return new StatedTemperature(celsius, fahrenheit, false);
	}

	public static StatedTemperature withFahrenheit(double celsius, double fahrenheit) {
		return new StatedTemperature(celsius, fahrenheit, true);
	}

}
