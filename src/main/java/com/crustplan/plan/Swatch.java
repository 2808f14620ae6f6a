package com.crustplan.plan;

import java.util.Locale;

/**
 * The predicted surface colour at one time; {@code target} marks the swatch at the target
 * time.
 */
public record Swatch(double timeS, String hex, double lightness, boolean target) {

	/** For screen readers: the time as a kitchen timer shows it and the lightness. */
	public String description() {
		long s = Math.round(timeS);
		return String.format(Locale.ROOT, "Predicted colour at %d:%02d, L* %.0f%s", s / 60, s % 60, lightness,
				target ? " (target)" : "");
	}

}
