package com.crustplan.engine.browning;

import com.crustplan.engine.model.Parameter;

/**
 * How surface water activity scales the browning rate: a bell-shaped g(aw) =
 * (aw/a*)^p·((1 − aw)/(1 − a*))^q, peaked at a* and zero at aw = 1, normalised to 1 at
 * the water activity at which the category's kinetics were measured. Drier than that
 * reference the factor stays 1: the published crust fits were measured on dry crusts and
 * already hold whatever the dry side does, so they are not reduced twice.
 */
public final class WaterActivityFactor {

	public static final Parameter PEAK = Parameter.published("a*", "water activity of fastest Maillard browning", 0.8,
			"–", "Labuza et al. 1977 (maximum at intermediate aw); De Vleeschouwer et al. (≈ 0.8, asparagine–glucose)");

	public static final Parameter DRY_EXPONENT = Parameter.assumption("p", "dry-side exponent of the aw factor", 2.0,
			"–",
			"shape chosen so the rate at aw 0.4 is about 0.4 of the peak, as in Labuza's curves; to be calibrated");

	/** q follows from p so that the bell peaks exactly at a*: q = p(1 − a*)/a*. */
	public static double wetExponent() {
		return DRY_EXPONENT.value() * (1 - PEAK.value()) / PEAK.value();
	}

	private WaterActivityFactor() {
	}

	public static double bell(double aw) {
		if (aw >= 1) {
			return 0;
		}
		if (aw <= 0) {
			return 0;
		}
		double peak = PEAK.value();
		return Math.pow(aw / peak, DRY_EXPONENT.value()) * Math.pow((1 - aw) / (1 - peak), wetExponent());
	}

	/**
	 * Factor relative to the reference water activity (the measurement's); 1 on its dry
	 * side.
	 */
	public static double relative(double aw, double referenceAw) {
		if (aw <= referenceAw) {
			return 1;
		}
		return bell(aw) / bell(referenceAw);
	}

}
