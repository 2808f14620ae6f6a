package com.crustplan.engine.properties;

/**
 * Mixture properties of a food from its component mass fractions (Choi &amp; Okos 1986
 * mixing rules): cp = Σ xᵢ cpᵢ, 1/ρ = Σ xᵢ/ρᵢ, k = Σ vᵢ kᵢ with volume fractions vᵢ =
 * (xᵢ/ρᵢ)/Σ(xⱼ/ρⱼ). A gas phase (porosity) is mixed into k by the geometric-mean rule k =
 * k_matrix^(1−ε)·k_gas^ε, a standard porous-medium approximation (common practice).
 */
public final class ThermalProperties {

	/**
	 * Thermal conductivity of still air in pores: 0.0263 and 0.0300 W/(m·K) at 300 and
	 * 350 K (Incropera, Table A.4; values from memory), so 0.028 is air near 50 °C and
	 * about 10 % below air at 100 °C.
	 */
	public static final double AIR_CONDUCTIVITY = 0.028;

	private static final FoodComponent[] COMPONENTS = FoodComponent.values();

	private ThermalProperties() {
	}

	/** Volume of the solid–liquid matrix per kg of mixture, m³/kg. */
	public static double specificVolume(double[] massFractions, double temperatureC) {
		double v = 0;
		for (int i = 0; i < COMPONENTS.length; i++) {
			v += massFractions[i] / COMPONENTS[i].density(temperatureC);
		}
		return v;
	}

	public static double density(double[] massFractions, double temperatureC) {
		return 1 / specificVolume(massFractions, temperatureC);
	}

	/** J/(kg·K). */
	public static double specificHeat(double[] massFractions, double temperatureC) {
		double cp = 0;
		for (int i = 0; i < COMPONENTS.length; i++) {
			cp += massFractions[i] * COMPONENTS[i].specificHeat(temperatureC);
		}
		return cp;
	}

	/** Conductivity of the gas-free matrix, W/(m·K). */
	public static double conductivity(double[] massFractions, double temperatureC) {
		double v = specificVolume(massFractions, temperatureC);
		double k = 0;
		for (int i = 0; i < COMPONENTS.length; i++) {
			k += massFractions[i] / COMPONENTS[i].density(temperatureC) / v * COMPONENTS[i].conductivity(temperatureC);
		}
		return k;
	}

	/** Conductivity of a porous food whose gas fraction is {@code porosity}. */
	public static double conductivity(double[] massFractions, double temperatureC, double porosity,
			double gasConductivity) {
		double km = conductivity(massFractions, temperatureC);
		if (porosity <= 0) {
			return km;
		}
		return Math.pow(km, 1 - porosity) * Math.pow(gasConductivity, porosity);
	}

	/**
	 * Evaluates specific heat (J/(kg·K)), matrix conductivity (W/(m·K)) and specific
	 * volume (m³/kg) in one pass into {@code out[0..2]}: the stepper's per-node call,
	 * which allocates nothing.
	 */
	public static void evaluate(double[] massFractions, double temperatureC, double[] out) {
		double cp = 0;
		double v = 0;
		double kv = 0;
		// the components' own polynomials, clamped once (the stepper calls this for
		// every layer every step); a component that is absent adds nothing
		double t = Math.max(FoodComponent.MIN_VALID_C, Math.min(FoodComponent.MAX_VALID_C, temperatureC));
		for (int i = 0; i < COMPONENTS.length; i++) {
			double w = massFractions[i];
			if (w == 0) {
				continue;
			}
			FoodComponent c = COMPONENTS[i];
			double vi = w / (c.rho0 + t * (c.rho1 + t * c.rho2));
			cp += w * (1000 * (c.cp0 + t * (c.cp1 + t * c.cp2)));
			v += vi;
			kv += vi * (c.k0 + t * (c.k1 + t * c.k2));
		}
		out[0] = cp;
		out[1] = kv / v;
		out[2] = v;
	}

	/** Specific enthalpy relative to 0 °C, J/kg (mass-weighted component integrals). */
	public static double enthalpy(double[] massFractions, double temperatureC) {
		double h = 0;
		for (int i = 0; i < COMPONENTS.length; i++) {
			h += massFractions[i] * COMPONENTS[i].enthalpy(temperatureC);
		}
		return h;
	}

}
