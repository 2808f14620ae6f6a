package com.crustplan.engine.heat;

/**
 * Radiation view factors between parallel surfaces, from the closed forms in Incropera,
 * DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass Transfer, Table 13.2
 * (three-dimensional geometries).
 */
public final class ViewFactor {

	private ViewFactor() {
	}

	/**
	 * Coaxial parallel discs: the share of the radiation leaving disc i (radius
	 * {@code ri}) that reaches disc j (radius {@code rj}) a distance {@code l} away. With
	 * R_i = r_i/L, R_j = r_j/L and S = 1 + (1 + R_j²)/R_i²: F_ij = ½·{S − [S² −
	 * 4(r_j/r_i)²]^½}.
	 */
	public static double coaxialDiscs(double ri, double rj, double l) {
		if (!(ri > 0 && rj > 0 && l > 0)) {
			throw new IllegalArgumentException("radii and distance must be positive");
		}
		double bigRi = ri / l;
		double bigRj = rj / l;
		double s = 1 + (1 + bigRj * bigRj) / (bigRi * bigRi);
		double ratio = rj / ri;
		return 0.5 * (s - Math.sqrt(s * s - 4 * ratio * ratio));
	}

	/**
	 * Radius of the disc with the area of a w × d rectangle, m (an equal-area disc stands
	 * in for a panel).
	 */
	public static double equalAreaRadius(double widthM, double depthM) {
		return Math.sqrt(widthM * depthM / Math.PI);
	}

}
