package com.crustplan.engine.acrylamide;

/**
 * Share of a solute still held by a piece losing it by diffusion to a well-stirred bath
 * that holds none (Crank 1975, The Mathematics of Diffusion, 2nd ed., eq. 4.18 for the
 * plane sheet, eq. 5.23 for the long cylinder), against the Fourier number D·t/a² with a
 * the half-thickness or the radius.
 */
final class CrankSeries {

	/**
	 * First zeros of the Bessel function J₀ (Abramowitz &amp; Stegun 1964, Table 9.5).
	 */
	private static final double[] J0_ZEROS = { 2.404826, 5.520078, 8.653728, 11.791534, 14.930918, 18.071064, 21.211637,
			24.352472, 27.493479, 30.634606 };

	private CrankSeries() {
	}

	static double sheetRemaining(double fourier) {
		double sum = 0;
		for (int n = 0; n < 400; n++) {
			double m = 2 * n + 1;
			sum += 8 / (m * m * Math.PI * Math.PI) * Math.exp(-m * m * Math.PI * Math.PI * fourier / 4);
		}
		return sum;
	}

	static double cylinderRemaining(double fourier) {
		double sum = 0;
		for (int n = 1; n <= 400; n++) {
			double a = zero(n);
			sum += 4 / (a * a) * Math.exp(-a * a * fourier);
		}
		return sum;
	}

	/** n-th zero of J₀: the table, then McMahon's expansion (A&amp;S 9.5.12). */
	private static double zero(int n) {
		if (n <= J0_ZEROS.length) {
			return J0_ZEROS[n - 1];
		}
		double b = (n - 0.25) * Math.PI;
		return b + 1 / (8 * b) - 31 / (384 * Math.pow(b, 3)) + 3779 / (15360 * Math.pow(b, 5));
	}

}
