package com.crustplan.engine.water;

/**
 * Saturation pressure of water and its inverse, IAPWS-IF97 region 4 (IAPWS R7-97(2012),
 * eqs. 30 and 31), valid 273.15–647.096 K.
 */
public final class SaturationPressure {

	// Coefficients n1..n10, IAPWS R7-97(2012), Table 34.
	private static final double N1 = 0.11670521452767e4;

	private static final double N2 = -0.72421316598262e6;

	private static final double N3 = -0.17073846940092e2;

	private static final double N4 = 0.12020824702470e5;

	private static final double N5 = -0.32325550322333e7;

	private static final double N6 = 0.14915108613530e2;

	private static final double N7 = -0.48232657361591e4;

	private static final double N8 = 0.40511340542057e6;

	private static final double N9 = -0.23855557567849;

	private static final double N10 = 0.65017534844798e3;

	/** Triple point and critical point temperatures, K (IAPWS R7-97). */
	public static final double MIN_TEMPERATURE_K = 273.15;

	public static final double MAX_TEMPERATURE_K = 647.096;

	private SaturationPressure() {
	}

	/**
	 * Saturation pressure in Pa at temperature {@code temperatureK} (clamped to the valid
	 * range).
	 */
	public static double pascal(double temperatureK) {
		double t = Math.max(MIN_TEMPERATURE_K, Math.min(MAX_TEMPERATURE_K, temperatureK));
		double theta = t + N9 / (t - N10);
		double a = theta * theta + N1 * theta + N2;
		double b = N3 * theta * theta + N4 * theta + N5;
		double c = N6 * theta * theta + N7 * theta + N8;
		double x = 2 * c / (-b + Math.sqrt(b * b - 4 * a * c));
		double x2 = x * x;
		return x2 * x2 * 1e6;
	}

	/**
	 * Saturation temperature in K at pressure {@code pressurePa} (611.213 Pa … 22.064
	 * MPa).
	 */
	public static double saturationTemperatureK(double pressurePa) {
		double beta = Math.pow(pressurePa / 1e6, 0.25);
		double e = beta * beta + N3 * beta + N6;
		double f = N1 * beta * beta + N4 * beta + N7;
		double g = N2 * beta * beta + N5 * beta + N8;
		double d = 2 * g / (-f - Math.sqrt(f * f - 4 * e * g));
		return (N10 + d - Math.sqrt((N10 + d) * (N10 + d) - 4 * (N9 + N10 * d))) / 2;
	}

}
