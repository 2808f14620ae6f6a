package com.crustplan.engine.water;

import com.crustplan.engine.model.Parameter;

/**
 * Guggenheim–Anderson–de Boer sorption isotherm, X = Xm·C·K·aw / ((1 − K·aw)(1 − K·aw +
 * C·K·aw)), with X in kg water per kg dry matter. Above the moisture at aw = 1 the water
 * is free (aw = 1).
 */
public record GabIsotherm(Parameter monolayer, Parameter c, Parameter k) {

	public double moisture(double waterActivity) {
		double xm = monolayer.value();
		double cc = c.value();
		double y = k.value() * waterActivity;
		return xm * cc * y / ((1 - y) * (1 - y + cc * y));
	}

	/** Moisture at aw = 1: more than this is free water. */
	public double freeWaterMoisture() {
		return moisture(1.0);
	}

	/**
	 * Water activity at moisture {@code x} (kg/kg dry basis), from the positive root of
	 * the GAB quadratic.
	 */
	public double waterActivity(double x) {
		if (x <= 0) {
			return 0;
		}
		double xm = monolayer.value();
		double cc = c.value();
		double a = x * (cc - 1);
		double b = xm * cc - x * (cc - 2);
		double kk = k.value();
		double aw;
		if (Math.abs(a) < 1e-12) {
			aw = x / (b * kk);
		}
		else {
			// x(C−1)y² + (Xm·C − x(C−2))y − x = 0 with y = K·aw; the root is written to
			// avoid cancellation, and with one division (the stepper's boiling-point
			// search waits on this)
			aw = 2 * x / ((b + Math.sqrt(b * b + 4 * a * x)) * kk);
		}
		return Math.min(1.0, aw);
	}

}
