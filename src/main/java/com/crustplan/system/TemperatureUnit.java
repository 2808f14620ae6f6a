package com.crustplan.system;

import java.util.Locale;

/**
 * The unit a cook reads temperatures in. Inside the app everything is °C; only the edges
 * convert.
 */
public enum TemperatureUnit {

	CELSIUS("C", "°C"), FAHRENHEIT("F", "°F");

	private final String code;

	private final String symbol;

	TemperatureUnit(String code, String symbol) {
		this.code = code;
		this.symbol = symbol;
	}

	/** Unknown or missing codes fall back to °C, the unit of the engine and the API. */
	public static TemperatureUnit fromCode(String code) {
		if (code != null && code.trim().toUpperCase(Locale.ROOT).equals("F")) {
			return FAHRENHEIT;
		}
		return CELSIUS;
	}

	public String code() {
		return code;
	}

	public String symbol() {
		return symbol;
	}

	public TemperatureUnit other() {
		return this == CELSIUS ? FAHRENHEIT : CELSIUS;
	}

	/**
	 * A Celsius temperature in this unit (°F = °C × 9/5 + 32, the definition of the
	 * Fahrenheit scale).
	 */
	public double fromCelsius(double c) {
		return this == CELSIUS ? c : c * 9 / 5 + 32;
	}

	public double toCelsius(double t) {
		return this == CELSIUS ? t : (t - 32) * 5 / 9;
	}

	public Double toCelsius(Double t) {
		return t == null ? null : toCelsius(t.doubleValue());
	}

	/**
	 * A temperature difference in this unit as a cook reads it: "40 °C" cooler on a °C
	 * page, "72 °F" on a °F page (a difference of 1 K is 1 °C, 1.8 °F; NIST SP 811 §B.9).
	 */
	public String formatDifference(double kelvin) {
		if (!Double.isFinite(kelvin)) {
			return "–";
		}
		return String.format(Locale.ROOT, "%.0f\u00a0%s", differenceFromCelsius(kelvin), symbol);
	}

	/** A temperature difference in this unit (1 °C of difference is 1.8 °F). */
	public double differenceFromCelsius(double dc) {
		return this == CELSIUS ? dc : dc * 9 / 5;
	}

	public String format(double c) {
		if (!Double.isFinite(c)) {
			return "–";
		}
		// a no-break space: the figure never parts from its unit at a line end
		return String.format(Locale.ROOT, "%.0f\u00a0%s", fromCelsius(c), symbol);
	}

}
