package com.crustplan.engine.colour;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.awt.color.ColorSpace;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * CIE 1976 L*a*b* (D65) → sRGB (IEC 61966-2-1) against published reference pairs and
 * against the JDK's own colour management (java.awt.color, an ICC implementation that is
 * independent of our code).
 */
class LabToSrgbTest {

	@ParameterizedTest(name = "Lab({0}, {1}, {2}) → {3}")
	@CsvSource({
			// Neutral greys and white: L* 100 is the reference white, L* 50 is Y =
			// 0.1842, which the sRGB
			// curve encodes as 0.4663 → 119 = 0x77 (IEC 61966-2-1; CIE 15:2004).
			"100, 0, 0, #ffffff", "50, 0, 0, #777777", "0, 0, 0, #000000",
			// The sRGB primaries in L*a*b* (D65), as tabulated in colour-science
			// references (e.g. Lindbloom's
			// tables, computed from IEC 61966-2-1 and CIE 15:2004): red (53.2408,
			// 80.0925, 67.2032),
			// green (87.7347, −86.1827, 83.1793), blue (32.2970, 79.1875, −107.8602).
			"53.2408, 80.0925, 67.2032, #ff0000", "87.7347, -86.1827, 83.1793, #00ff00",
			"32.2970, 79.1875, -107.8602, #0000ff" })
	void shouldMatchPublishedReferencePairs(double l, double a, double b, String hex) {
		// Exact hex match: the reference values are given to 4 decimals, far finer than
		// one 8-bit step.
		assertEquals(hex, new Lab(l, a, b).hex());
	}

	@ParameterizedTest(name = "Lab({0}, {1}, {2}) against java.awt.color")
	@CsvSource({ "80, -0.5, 18", "62, 10, 32", "40, 22, 12", "64, 2, 28", "30, 14, 22", "20, 5, -5", "90, -10, 30",
			"75, 20, -10", "50, 0, 0" })
	void shouldMatchTheJdkColourManagement(double l, double a, double b) {
		// java.awt.color.ColorSpace.CS_sRGB converts from the ICC profile connection
		// space, which is CIE XYZ
		// relative to D50. So: Lab → XYZ(D65) by the CIE 1976 inverse (CIE 15:2004
		// §8.2.1), Bradford
		// chromatic adaptation D65 → D50 (the ICC's chosen transform; matrix from
		// Lindbloom's published
		// tables), then the JDK. Tolerance 0.5/255 per channel: the JDK works in float
		// with 16-bit profile
		// tables, and IEC 61966-2-1 rounds its matrix to 4 digits; seen differences are
		// below 0.1/255.
		float[] expected = ColorSpace.getInstance(ColorSpace.CS_sRGB).fromCIEXYZ(toD50(labToXyzD65(l, a, b)));
		Srgb actual = Srgb.fromLab(new Lab(l, a, b));
		double tol = 0.5 / 255;
		assertEquals(expected[0], actual.red(), tol, "red");
		assertEquals(expected[1], actual.green(), tol, "green");
		assertEquals(expected[2], actual.blue(), tol, "blue");
	}

	@Test
	void shouldComputeTheCie1976ColourDifference() {
		// CIE 15:2004, ΔE*ab = √(ΔL*² + Δa*² + Δb*²): a 3-4-12 triple gives exactly 13.
		assertEquals(13.0, new Lab(50, 0, 0).deltaE(new Lab(53, 4, 12)), 1e-12);
		assertEquals(13.0, new Lab(53, 4, 12).deltaE(new Lab(50, 0, 0)), 1e-12);
		assertEquals(0.0, new Lab(62, 10, 32).deltaE(new Lab(62, 10, 32)), 0);
	}

	@Test
	void shouldAgreeWithTheJdkOnTheReferenceWhite() {
		// The D50 white of the ICC connection space must come out as sRGB white (ICC.1;
		// the JDK's profile):
		// this guards the adaptation step the comparison above relies on. Tolerance 1e-4,
		// the JDK's float.
		float[] white = ColorSpace.getInstance(ColorSpace.CS_sRGB).fromCIEXYZ(toD50(labToXyzD65(100, 0, 0)));
		for (float c : white) {
			assertEquals(1.0, c, 1e-4);
		}
	}

	private static double[] labToXyzD65(double l, double a, double b) {
		// D65 white, 2° observer (CIE 15:2004): Xn 0.95047, Yn 1, Zn 1.08883
		double fy = (l + 16) / 116;
		return new double[] { 0.95047 * finv(fy + a / 500), finv(fy), 1.08883 * finv(fy - b / 200) };
	}

	private static double finv(double t) {
		double d = 6.0 / 29;
		return t > d ? t * t * t : 3 * d * d * (t - 4.0 / 29);
	}

	private static float[] toD50(double[] xyz) {
		// Bradford D65 → D50 (Lindbloom, "Chromatic adaptation", published matrix)
		double[][] m = { { 1.0478112, 0.0228866, -0.0501270 }, { 0.0295424, 0.9904844, -0.0170491 },
				{ -0.0092345, 0.0150436, 0.7521316 } };
		float[] out = new float[3];
		for (int i = 0; i < 3; i++) {
			out[i] = (float) (m[i][0] * xyz[0] + m[i][1] * xyz[1] + m[i][2] * xyz[2]);
		}
		return out;
	}

}
