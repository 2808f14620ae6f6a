package com.crustplan.engine.colour;

/** A colour in CIE 1976 L*a*b* (D65 reference white). */
public record Lab(double lightness, double a, double b) {

	/** CIE 1976 colour difference ΔE*ab. */
	public double deltaE(Lab other) {
		double dl = lightness - other.lightness;
		double da = a - other.a;
		double db = b - other.b;
		return Math.sqrt(dl * dl + da * da + db * db);
	}

	/**
	 * Browning index BI = 100(x − 0.31)/0.17 with x = (a* + 1.75L*)/(5.645L* + a* −
	 * 3.012b*), as used in the food literature (Buera et al. 1986; Maskan 2001 — quoted
	 * by secondary sources).
	 */
	public double browningIndex() {
		double x = (a + 1.75 * lightness) / (5.645 * lightness + a - 3.012 * b);
		return 100 * (x - 0.31) / 0.17;
	}

	public Lab interpolate(Lab to, double fraction) {
		return new Lab(lightness + (to.lightness - lightness) * fraction, a + (to.a - a) * fraction,
				b + (to.b - b) * fraction);
	}

	public String hex() {
		return Srgb.fromLab(this).hex();
	}

}
