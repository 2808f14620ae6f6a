package com.crustplan.engine.layers;

/**
 * One backward-Euler step of 1D transient conduction on a {@link Grid}:
 * C_i·(T_i' − T_i)/Δt = Σ G·(T_j' − T_i') + q_face, with interface conductances G = 1/(d/2k_i + d/2k_j)
 * (series resistances of the two half-spacings) and each face's flux linearised as q = b − a·T'. Owns
 * its scratch arrays; one instance per run.
 */
public final class HeatConduction {

	private final Grid grid;

	private final double[] lower;

	private final double[] diag;

	private final double[] upper;

	private final double[] rhs;

	private final Tridiagonal solver;

	/** d/2 of each interface, fixed for the run. */
	private final double[] halfSpacing;

	public HeatConduction(Grid grid) {
		this.grid = grid;
		int n = grid.size();
		lower = new double[n];
		diag = new double[n];
		upper = new double[n];
		rhs = new double[n];
		solver = new Tridiagonal(n);
		halfSpacing = new double[n - 1];
		for (int i = 0; i < n - 1; i++) {
			halfSpacing[i] = 0.5 * grid.spacing(i);
		}
	}

	/**
	 * Advances {@code temperature} (K) in place.
	 * @param capacity heat capacity of each control volume per m² of face, J/(m²·K)
	 * @param conductivity W/(m·K) at each node
	 * @param face0Slope a₀ ≥ 0 in q₀ = b₀ − a₀·T₀', W/(m²·K)
	 * @param face0Source b₀, W/m²
	 */
	public void step(double[] temperature, double[] capacity, double[] conductivity, double dt, double face0Slope,
			double face0Source, double face1Slope, double face1Source) {
		int n = grid.size();
		for (int i = 0; i < n; i++) {
			lower[i] = 0;
			upper[i] = 0;
			double c = capacity[i] / dt;
			diag[i] = c;
			rhs[i] = c * temperature[i];
		}
		for (int i = 0; i < n - 1; i++) {
			// 1/(d/2k_i + d/2k_j) written with one division: k_i·k_j / ((d/2)(k_i + k_j))
			double ki = conductivity[i];
			double kj = conductivity[i + 1];
			double g = ki * kj / (halfSpacing[i] * (ki + kj));
			diag[i] += g;
			diag[i + 1] += g;
			upper[i] = -g;
			lower[i + 1] = -g;
		}
		diag[0] += face0Slope;
		rhs[0] += face0Source;
		diag[n - 1] += face1Slope;
		rhs[n - 1] += face1Source;
		solver.solve(lower, diag, upper, rhs, temperature);
	}

}
