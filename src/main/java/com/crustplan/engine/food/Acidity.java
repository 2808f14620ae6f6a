package com.crustplan.engine.food;

import com.crustplan.engine.model.Parameter;

/**
 * pH after additions: ΔpH = n / (β·m), with n the moles of base added (or of acid
 * protons, negative) per kg of food and β the category's buffer capacity.
 */
public final class Acidity {

	public static final Parameter BICARBONATE_MOLAR_MASS = Parameter.published("M(NaHCO₃)",
			"molar mass of sodium bicarbonate", 84.007, "g/mol", "IUPAC standard atomic weights");

	public static final Parameter CITRIC_ACID_MOLAR_MASS = Parameter.published("M(citric)",
			"molar mass of anhydrous citric acid", 192.12, "g/mol", "IUPAC standard atomic weights");

	/**
	 * Of citric acid's three protons (pKa 3.13, 4.76, 6.40), about two are given up
	 * between pH 4 and 6.
	 */
	public static final Parameter CITRIC_PROTONS = Parameter.derived("n(H⁺)",
			"protons released per citric acid in food pH range", 2, "–",
			"from pKa 3.13 / 4.76 / 6.40 (CRC Handbook of Chemistry and Physics, from memory)");

	public static final Parameter MAX_PH = Parameter.published("pH,max", "highest pH bicarbonate can bring", 8.3, "–",
			"pH of a sodium bicarbonate solution (CRC Handbook)");

	public static final Parameter MIN_PH = Parameter.commonPractice("pH,min", "lowest pH modelled after an acid dip",
			3.0, "–", "below this foods taste sour and the kinetics are extrapolated too far (common practice)");

	private Acidity() {
	}

	/**
	 * @param basePh pH of the untreated food
	 * @param bicarbonateGPerKg sodium bicarbonate added, g per kg of food
	 * @param acidGPerKg citric acid (or an acid of the same strength) added, g per kg of
	 * food
	 * @param bufferCapacityMmolPerPhKg β in mmol H⁺/(pH·kg)
	 */
	public static double adjustedPh(double basePh, double bicarbonateGPerKg, double acidGPerKg,
			double bufferCapacityMmolPerPhKg) {
		double baseMol = bicarbonateGPerKg / BICARBONATE_MOLAR_MASS.value();
		double acidMol = acidGPerKg / CITRIC_ACID_MOLAR_MASS.value() * CITRIC_PROTONS.value();
		double shift = (baseMol - acidMol) / (bufferCapacityMmolPerPhKg / 1000);
		double ph = basePh + shift;
		double upper = Math.max(basePh, MAX_PH.value());
		double lower = Math.min(basePh, MIN_PH.value());
		return Math.max(lower, Math.min(upper, ph));
	}

}
