package com.crustplan.engine.layers;

/**
 * One backward-Euler step of 1D moisture diffusion on a {@link Grid}, the twin of
 * {@link HeatConduction}: m_i·(X_i' − X_i)/Δt = Σ G·(X_j' − X_i') − J_face, with m_i the
 * dry mass of control volume i per m² of face, interface conductances G = ρ_dry·D/d
 * (ρ_dry and D averaged between the two nodes) and a face's evaporation linearised in
 * moisture as J ≈ J* + s·(X' − X*). Owns its scratch arrays; one instance per run.
 */
public final class MoistureDiffusion {

	/**
	 * Effective moisture diffusivity, m²/s, at a temperature (K) and moisture (kg/kg
	 * d.b.).
	 */
	@FunctionalInterface
	public interface Diffusivity {

		double at(double temperatureK, double moistureDryBasis);

	}

	private final Grid grid;

	private final Diffusivity diffusivity;

	private final double[] lower;

	private final double[] diag;

	private final double[] upper;

	private final double[] rhs;

	private final double[] conductance;

	private final Tridiagonal solver;

	public MoistureDiffusion(Grid grid, Diffusivity diffusivity) {
		this.grid = grid;
		this.diffusivity = diffusivity;
		int n = grid.size();
		lower = new double[n];
		diag = new double[n];
		upper = new double[n];
		rhs = new double[n];
		conductance = new double[n];
		solver = new Tridiagonal(n);
	}

	/**
	 * Builds the step's equations from the state at the start of the step.
	 * @param dryMass dry matter of each control volume per m² of face, kg/m²
	 * @param volume each control volume per m² of face, m
	 * @param temperature K, for the diffusivity
	 * @param moisture kg/kg d.b. at the start of the step
	 */
	public void assemble(double[] dryMass, double[] volume, double[] temperature, double[] moisture, double dt) {
		int n = grid.size();
		for (int i = 0; i < n; i++) {
			lower[i] = 0;
			upper[i] = 0;
			diag[i] = dryMass[i] / dt;
			rhs[i] = dryMass[i] / dt * moisture[i];
		}
		for (int i = 0; i < n - 1; i++) {
			double g = conductance(i, dryMass, volume, temperature, moisture);
			conductance[i] = g;
			diag[i] += g;
			diag[i + 1] += g;
			upper[i] = -g;
			lower[i + 1] = -g;
		}
	}

	/**
	 * Adds a face's evaporation J ≈ j + slope·(X' − x) to node i's assembled equation,
	 * kg/(m²·s); slope in kg/(m²·s) per unit of moisture.
	 */
	public void addEvaporation(int i, double j, double slope, double x) {
		diag[i] += slope;
		rhs[i] -= j - slope * x;
	}

	/**
	 * Takes water out of node i at a rate, kg/(m²·s) (water boiled off it), in the same
	 * implicit solve as the diffusion.
	 */
	public void addSink(int i, double rate) {
		rhs[i] -= rate;
	}

	/** Solves the assembled equations into {@code result} (kg/kg d.b.). */
	public void solve(double[] result) {
		solver.solve(lower, diag, upper, rhs, result);
	}

	/**
	 * The conductance between node i and i + 1 at the given state, kg/(m²·s) per unit of
	 * moisture, as {@link #assemble} builds it.
	 */
	public double conductance(int i, double[] dryMass, double[] volume, double[] temperature, double[] moisture) {
		double dryDensity = 0.5 * (dryMass[i] / volume[i] + dryMass[i + 1] / volume[i + 1]);
		return grid.faceArea(i) * dryDensity
				* diffusivity.at(0.5 * (temperature[i] + temperature[i + 1]), 0.5 * (moisture[i] + moisture[i + 1]))
				/ grid.spacing(i);
	}

	/**
	 * The conductance between node i and i + 1 of the last assembly, kg/(m²·s) per unit
	 * of moisture.
	 */
	public double conductance(int i) {
		return conductance[i];
	}

}
