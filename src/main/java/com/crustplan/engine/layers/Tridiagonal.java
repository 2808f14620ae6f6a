package com.crustplan.engine.layers;

/**
 * Thomas algorithm for a diagonally dominant tridiagonal system, with scratch arrays
 * owned by the instance so repeated solves allocate nothing. Not thread-safe: one per
 * simulation.
 */
public final class Tridiagonal {

	private final double[] cPrime;

	private final double[] dPrime;

	public Tridiagonal(int n) {
		cPrime = new double[n];
		dPrime = new double[n];
	}

	/**
	 * Solves lower[i]·x[i−1] + diag[i]·x[i] + upper[i]·x[i+1] = rhs[i] into {@code x}
	 * (lower[0] and upper[n−1] are ignored).
	 * <p>
	 * Eliminated from both ends towards the middle row at once (a twisted factorisation):
	 * the same arithmetic as the one-way sweep, but as two independent chains of n/2
	 * rows, which the processor overlaps; the solve waits on the chain of divides.
	 */
	public void solve(double[] lower, double[] diag, double[] upper, double[] rhs, double[] x) {
		int n = diag.length;
		if (n < 3) {
			solveOneWay(lower, diag, upper, rhs, x);
			return;
		}
		int k = (n - 1) / 2;
		int last = n - 1;
		// top rows 0..k−1: x[i] = dPrime[i] − cPrime[i]·x[i+1]; bottom rows k+1..n−1:
		// x[i] = dPrime[i] − cPrime[i]·x[i−1]
		double top = 1 / diag[0];
		cPrime[0] = upper[0] * top;
		dPrime[0] = rhs[0] * top;
		double bottom = 1 / diag[last];
		cPrime[last] = lower[last] * bottom;
		dPrime[last] = rhs[last] * bottom;
		for (int i = 1, j = last - 1; i < k; i++, j--) {
			top = 1 / (diag[i] - lower[i] * cPrime[i - 1]);
			cPrime[i] = upper[i] * top;
			dPrime[i] = (rhs[i] - lower[i] * dPrime[i - 1]) * top;
			bottom = 1 / (diag[j] - upper[j] * cPrime[j + 1]);
			cPrime[j] = lower[j] * bottom;
			dPrime[j] = (rhs[j] - upper[j] * dPrime[j + 1]) * bottom;
		}
		if (n % 2 == 0) {
			// one bottom row more than top rows
			int j = k + 1;
			bottom = 1 / (diag[j] - upper[j] * cPrime[j + 1]);
			cPrime[j] = lower[j] * bottom;
			dPrime[j] = (rhs[j] - upper[j] * dPrime[j + 1]) * bottom;
		}
		x[k] = (rhs[k] - lower[k] * dPrime[k - 1] - upper[k] * dPrime[k + 1])
				/ (diag[k] - lower[k] * cPrime[k - 1] - upper[k] * cPrime[k + 1]);
		for (int i = k - 1, j = k + 1; i >= 0; i--, j++) {
			x[i] = dPrime[i] - cPrime[i] * x[i + 1];
			x[j] = dPrime[j] - cPrime[j] * x[j - 1];
		}
		for (int j = 2 * k + 1; j < n; j++) {
			x[j] = dPrime[j] - cPrime[j] * x[j - 1];
		}
	}

	/** The one-way sweep (Thomas), for the smallest systems. */
	private void solveOneWay(double[] lower, double[] diag, double[] upper, double[] rhs, double[] x) {
		int n = diag.length;
		double inverse = 1 / diag[0];
		cPrime[0] = upper[0] * inverse;
		dPrime[0] = rhs[0] * inverse;
		for (int i = 1; i < n; i++) {
			inverse = 1 / (diag[i] - lower[i] * cPrime[i - 1]);
			cPrime[i] = i < n - 1 ? upper[i] * inverse : 0;
			dPrime[i] = (rhs[i] - lower[i] * dPrime[i - 1]) * inverse;
		}
		x[n - 1] = dPrime[n - 1];
		for (int i = n - 2; i >= 0; i--) {
			x[i] = dPrime[i] - cPrime[i] * x[i + 1];
		}
	}

}
