package com.crustplan.engine.properties;

import java.util.Locale;

/**
 * Major food components with the Choi &amp; Okos temperature polynomials for
 * conductivity, density and specific heat (T in °C, valid −40…150 °C).
 * <p>
 * Source: Choi, Y. &amp; Okos, M.R. (1986) "Effects of temperature and composition on the
 * thermal properties of foods", Food Engineering and Process Applications vol. 1,
 * Elsevier, 93–101; as reproduced in ASHRAE Handbook — Refrigeration, "Thermal Properties
 * of Foods", Table 1.
 */
public enum FoodComponent {

	// k [W/(m·K)] = a + bT + cT²; rho [kg/m³]; cp [kJ/(kg·K)]
	WATER(0.57109, 1.7625e-3, -6.7036e-6, 997.18, 3.1439e-3, -3.7574e-3, 4.1289, -9.0864e-5, 5.4731e-6),
	PROTEIN(0.17881, 1.1958e-3, -2.7178e-6, 1329.9, -0.5184, 0, 2.0082, 1.2089e-3, -1.3129e-6),
	FAT(0.18071, -2.7604e-4, -1.7749e-7, 925.59, -0.41757, 0, 1.9842, 1.4733e-3, -4.8008e-6),
	CARBOHYDRATE(0.20141, 1.3874e-3, -4.3312e-6, 1599.1, -0.31046, 0, 1.5488, 1.9625e-3, -5.9399e-6),
	FIBRE(0.18331, 1.2497e-3, -3.1683e-6, 1311.5, -0.36589, 0, 1.8459, 1.8306e-3, -4.6509e-6),
	ASH(0.32962, 1.4011e-3, -2.9069e-6, 2423.8, -0.28063, 0, 1.0926, 1.8896e-3, -3.6817e-6);

	/** Correlation validity range, Choi &amp; Okos (1986). */
	public static final double MIN_VALID_C = -40;

	public static final double MAX_VALID_C = 150;

	// package-private: ThermalProperties evaluates all components at one clamped
	// temperature
	final double k0, k1, k2, rho0, rho1, rho2, cp0, cp1, cp2;

	FoodComponent(double k0, double k1, double k2, double rho0, double rho1, double rho2, double cp0, double cp1,
			double cp2) {
		this.k0 = k0;
		this.k1 = k1;
		this.k2 = k2;
		this.rho0 = rho0;
		this.rho1 = rho1;
		this.rho2 = rho2;
		this.cp0 = cp0;
		this.cp1 = cp1;
		this.cp2 = cp2;
	}

	/**
	 * Clamped to the fit's range: beyond it the polynomials bend away from real
	 * behaviour.
	 */
	private static double clamp(double temperatureC) {
		return Math.max(MIN_VALID_C, Math.min(MAX_VALID_C, temperatureC));
	}

	public double conductivity(double temperatureC) {
		double t = clamp(temperatureC);
		return k0 + t * (k1 + t * k2);
	}

	public double density(double temperatureC) {
		double t = clamp(temperatureC);
		return rho0 + t * (rho1 + t * rho2);
	}

	/** Specific heat in J/(kg·K). */
	public double specificHeat(double temperatureC) {
		double t = clamp(temperatureC);
		return 1000 * (cp0 + t * (cp1 + t * cp2));
	}

	/**
	 * Specific enthalpy relative to 0 °C in J/kg: the exact integral of the cp polynomial
	 * (used by the energy ledger and its tests).
	 */
	public double enthalpy(double temperatureC) {
		double t = clamp(temperatureC);
		double h = 1000 * t * (cp0 + t * (cp1 / 2 + t * cp2 / 3));
		// beyond the fit's range continue with the end-point cp so enthalpy stays
		// monotone
		return h + (temperatureC - t) * specificHeat(t);
	}

	public String formulaText() {
		return "k = " + poly(k0, k1, k2) + ";  ρ = " + poly(rho0, rho1, rho2) + ";  cp = " + poly(cp0, cp1, cp2);
	}

	private static String poly(double a, double b, double c) {
		StringBuilder s = new StringBuilder(String.format(Locale.ROOT, "%.5g", a));
		if (b != 0) {
			s.append(b < 0 ? " − " : " + ").append(String.format(Locale.ROOT, "%.5g", Math.abs(b))).append("·T");
		}
		if (c != 0) {
			s.append(c < 0 ? " − " : " + ").append(String.format(Locale.ROOT, "%.5g", Math.abs(c))).append("·T²");
		}
		return s.toString();
	}

}
