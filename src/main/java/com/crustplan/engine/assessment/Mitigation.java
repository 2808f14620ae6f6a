package com.crustplan.engine.assessment;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.model.Evidence;

/**
 * One change a cook can make, computed by running the model again: portion acrylamide
 * (µg/kg as eaten) and cooking time before and after. {@code applicable} false with a
 * reason where the change does not apply or its run does not reach the target; an
 * applicable change may carry a note in {@code reason} (for example when the model finds
 * no gain), null where it has none. {@code source} is the citation.
 * <p>
 * Changes of cooking ({@link Basis#SAME_COLOUR}) compare both cooks at the target colour.
 * Changes of the raw material ({@link Basis#SAME_TIME}: soaking, blanching, enzyme, acid,
 * storage) compare both cooks after the same cooking time, as the published reductions
 * were measured; the minutes then say how much longer (or shorter) the changed food takes
 * to reach the same colour, and {@code afterAtSameColourUgPerKg} what it holds if cooked
 * on to that colour.
 */
public record Mitigation(String code, Message title, Message change, String source, Evidence evidence,
		boolean applicable, Message reason, Basis basis, double beforeUgPerKg, double afterUgPerKg,
		double beforeMinutes, double afterMinutes, double afterAtSameColourUgPerKg) {

	public enum Basis {

		SAME_COLOUR(Message.of("mitigation.basis.same-colour")), SAME_TIME(Message.of("mitigation.basis.same-time")),
		/**
		 * A practice to keep: "after" is what giving it up would give, cooked for the
		 * same time.
		 */
		AVOIDED(Message.of("mitigation.basis.avoided"));

		private final Message meaning;

		Basis(Message meaning) {
			this.meaning = meaning;
		}

		public Message meaning() {
			return meaning;
		}

	}

	/**
	 * Whether a plan can apply this change in one click: it applies, lowers acrylamide
	 * and is a change to make (not a practice to keep).
	 */
	public boolean plannable() {
		return applicable && basis != Basis.AVOIDED && effectUgPerKg() < 0 && Mitigations.PLANNABLE.contains(code);
	}

	/** Whether the changed food, cooked on, reaches the target colour at all. */
	public boolean afterReachesTarget() {
		return Double.isFinite(afterMinutes);
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

	static Mitigation notApplicable(String code, Message title, Message change, String source, Evidence evidence,
			Basis basis, Message reason) {
		return new Mitigation(code, title, change, source, evidence, false, reason, basis, Double.NaN, Double.NaN,
				Double.NaN, Double.NaN, Double.NaN);
	}

}
