package com.crustplan.engine.browning;

import com.crustplan.engine.kinetics.ArrheniusRate;

import com.crustplan.engine.model.Parameter;

/**
 * Sucrose browns without amino groups by caramelisation, a slower pathway with a high
 * activation energy that matters above about 160 °C. First order towards the same extent
 * scale as Maillard browning, proportional to the sucrose share relative to a sweet
 * dough's.
 */
public final class Caramelisation {

	public static final Parameter ACTIVATION_ENERGY = Parameter.fromMemory("Ea,c",
			"activation energy of sucrose caramelisation", 130e3, "J/mol",
			"order 100–150 kJ/mol for sucrose colour formation (Quintas, Brandão & Silva 2007, J Food Eng; from memory)");

	/**
	 * k0 chosen so that k(180 °C) = 1.2e-3 s⁻¹: a dry, sucrose-rich (15 %) surface is
	 * visibly caramelised in about 5 min.
	 */
	public static final Parameter PRE_EXPONENTIAL = Parameter.calibrated("k0,c",
			"pre-exponential factor of caramelisation",
			1.2e-3 * Math.exp(130e3 / (ArrheniusRate.GAS_CONSTANT * 453.15)), "1/s",
			"set so a dry surface with 15 % sucrose visibly caramelises in about 5 min at 180 °C (common practice; PracticeClaimsTest)");

	public static final Parameter REFERENCE_SUCROSE_PCT = Parameter.commonPractice("S_ref",
			"sucrose share of the reference sweet dough", 15, "%",
			"typical sweet dough, e.g. enriched bun or biscuit (common practice)");

	public static final ArrheniusRate RATE = new ArrheniusRate(PRE_EXPONENTIAL, ACTIVATION_ENERGY);

	private Caramelisation() {
	}

	public static double sucroseFactor(double sucrosePct) {
		return Math.min(BrowningKinetics.REACTANT_FACTOR_CAP.value(), sucrosePct / REFERENCE_SUCROSE_PCT.value());
	}

}
