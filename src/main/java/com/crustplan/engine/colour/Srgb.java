package com.crustplan.engine.colour;

/**
 * An sRGB colour with components in [0, 1], converted from CIE L*a*b* by the CIE 1976
 * inverse to XYZ (D65 white) and the IEC 61966-2-1 matrix and transfer curve.
 * Out-of-gamut values are clipped.
 */
public record Srgb(double red, double green, double blue) {

	// D65 reference white, 2° observer, Y = 1 (CIE 15:2004, Table T.3 via IEC 61966-2-1).
	private static final double XN = 0.95047;

	private static final double YN = 1.0;

	private static final double ZN = 1.08883;

	// CIE 1976: ε = (6/29)³, κ-form inverse (CIE 15:2004, §8.2.1).
	private static final double DELTA = 6.0 / 29.0;

	public static Srgb fromLab(Lab lab) {
		double fy = (lab.lightness() + 16) / 116;
		double fx = fy + lab.a() / 500;
		double fz = fy - lab.b() / 200;
		double x = XN * finv(fx);
		double y = YN * finv(fy);
		double z = ZN * finv(fz);
		// XYZ → linear sRGB, IEC 61966-2-1:1999 eq. (7)
		double r = 3.2406 * x - 1.5372 * y - 0.4986 * z;
		double g = -0.9689 * x + 1.8758 * y + 0.0415 * z;
		double b = 0.0557 * x - 0.2040 * y + 1.0570 * z;
		return new Srgb(encode(r), encode(g), encode(b));
	}

	private static double finv(double t) {
		return t > DELTA ? t * t * t : 3 * DELTA * DELTA * (t - 4.0 / 29.0);
	}

	/** IEC 61966-2-1 transfer curve, clipped to [0, 1]. */
	private static double encode(double linear) {
		double c = Math.max(0, Math.min(1, linear));
		return c <= 0.0031308 ? 12.92 * c : 1.055 * Math.pow(c, 1 / 2.4) - 0.055;
	}

	public int red8() {
		return (int) Math.round(red * 255);
	}

	public int green8() {
		return (int) Math.round(green * 255);
	}

	public int blue8() {
		return (int) Math.round(blue * 255);
	}

	public String hex() {
		return String.format("#%02x%02x%02x", red8(), green8(), blue8());
	}

}
