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
	 */
	public void solve(double[] lower, double[] diag, double[] upper, double[] rhs, double[] x) {
		int n = diag.length;
		cPrime[0] = upper[0] / diag[0];
		dPrime[0] = rhs[0] / diag[0];
		for (int i = 1; i < n; i++) {
			double m = diag[i] - lower[i] * cPrime[i - 1];
			cPrime[i] = i < n - 1 ? upper[i] / m : 0;
			dPrime[i] = (rhs[i] - lower[i] * dPrime[i - 1]) / m;
		}
		x[n - 1] = dPrime[n - 1];
		for (int i = n - 2; i >= 0; i--) {
			x[i] = dPrime[i] - cPrime[i] * x[i + 1];
		}
	}

}
