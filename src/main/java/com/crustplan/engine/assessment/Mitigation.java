package com.crustplan.engine.assessment;

import com.crustplan.engine.model.Evidence;

/**
 * One change a cook can make, computed by running the model again: portion acrylamide (µg/kg as eaten)
 * and cooking time before and after. {@code applicable} false with a reason where the change does not
 * apply or its run does not reach the target; an applicable change may carry a note in {@code reason}
 * (for example when the model finds no gain).
 * <p>
 * Changes of cooking ({@link Basis#SAME_COLOUR}) compare both cooks at the target colour. Changes of the
 * raw material ({@link Basis#SAME_TIME}: soaking, blanching, enzyme, acid, storage) compare both cooks
 * after the same cooking time, as the published reductions were measured; the minutes then say how much
 * longer (or shorter) the changed food takes to reach the same colour, and
 * {@code afterAtSameColourUgPerKg} what it holds if cooked on to that colour.
 */
public record Mitigation(String code, String title, String change, String source, Evidence evidence, boolean applicable,
		String reason, Basis basis, double beforeUgPerKg, double afterUgPerKg, double beforeMinutes, double afterMinutes,
		double afterAtSameColourUgPerKg) {

	public enum Basis {

		SAME_COLOUR("both cooked to the target colour"),
		SAME_TIME("both cooked for the same time; the changed food comes out lighter");

		private final String meaning;

		Basis(String meaning) {
			this.meaning = meaning;
		}

		public String meaning() {
			return meaning;
		}

	}

	/** After minus before, µg/kg (negative: less acrylamide). */
	public double effectUgPerKg() {
		return afterUgPerKg - beforeUgPerKg;
	}

	/** After minus before, minutes to the target colour (positive: a longer cook). */
	public double effectMinutes() {
		return afterMinutes - beforeMinutes;
	}

	/** Relative change of acrylamide, e.g. −0.3 for 30 % less. */
	public double relativeEffect() {
		return beforeUgPerKg > 0 ? afterUgPerKg / beforeUgPerKg - 1 : 0;
	}

	static Mitigation notApplicable(String code, String title, String change, String source, Evidence evidence, Basis basis,
			String reason) {
		return new Mitigation(code, title, change, source, evidence, false, reason, basis, Double.NaN, Double.NaN, Double.NaN,
				Double.NaN, Double.NaN);
	}

}
