package com.crustplan.engine.layers;

/**
 * One backward-Euler step of 1D transient conduction on a {@link Grid}: C_i·(T_i' −
 * T_i)/Δt = Σ G·(T_j' − T_i') + q_face, with interface conductances G = 1/(d/2k_i +
 * d/2k_j) (series resistances of the two half-spacings) and each face's flux linearised
 * as q = b − a·T'.
 * <p>
 * Nodes can be pinned at a temperature (a layer boiling at its boiling point): their rows
 * become T' = T_pin and {@link #surplus(int, double[])} returns the power the pinned
 * layer must shed — the heat that boils water off instead of warming it. Owns its scratch
 * arrays; one instance per run.
 */
public final class HeatConduction {

	private final Grid grid;

	private final double[] lower;

	private final double[] diag;

	private final double[] upper;

	private final double[] rhs;

	private final double[] pinnedLower;

	private final double[] pinnedDiag;

	private final double[] pinnedUpper;

	private final double[] pinnedRhs;

	private final Tridiagonal solver;

	/** 1/k at each node, m·K/W (one division per node, not two per interface). */
	private final double[] resistivity;

	public HeatConduction(Grid grid) {
		this.grid = grid;
		int n = grid.size();
		lower = new double[n];
		diag = new double[n];
		upper = new double[n];
		rhs = new double[n];
		pinnedLower = new double[n];
		pinnedDiag = new double[n];
		pinnedUpper = new double[n];
		pinnedRhs = new double[n];
		solver = new Tridiagonal(n);
		resistivity = new double[n];
	}

	/**
	 * Advances {@code temperature} (K) in place with no pinned nodes.
	 * @param capacity heat capacity of each control volume per m² of face, J/(m²·K)
	 * @param conductivity W/(m·K) at each node
	 * @param face0Slope a₀ ≥ 0 in q₀ = b₀ − a₀·T₀', W/(m²·K)
	 * @param face0Source b₀, W/m²
	 */
	public void step(double[] temperature, double[] capacity, double[] conductivity, double dt, double face0Slope,
			double face0Source, double face1Slope, double face1Source) {
		assemble(temperature, capacity, conductivity, dt, face0Slope, face0Source, face1Slope, face1Source);
		solver.solve(lower, diag, upper, rhs, temperature);
	}

	/** Builds the step's equations from the temperatures at the start of the step. */
	public void assemble(double[] temperature, double[] capacity, double[] conductivity, double dt, double face0Slope,
			double face0Source, double face1Slope, double face1Source) {
		int n = grid.size();
		double perSecond = 1 / dt;
		for (int i = 0; i < n; i++) {
			lower[i] = 0;
			upper[i] = 0;
			diag[i] = capacity[i] * perSecond;
			rhs[i] = diag[i] * temperature[i];
			resistivity[i] = 1 / conductivity[i];
		}
		for (int i = 0; i < n - 1; i++) {
			double d = grid.spacing(i);
			double g = grid.faceArea(i) / (0.5 * d * (resistivity[i] + resistivity[i + 1]));
			diag[i] += g;
			diag[i + 1] += g;
			upper[i] = -g;
			lower[i + 1] = -g;
		}
		diag[0] += face0Slope;
		rhs[0] += face0Source;
		diag[n - 1] += face1Slope;
		rhs[n - 1] += face1Source;
	}

	/**
	 * Adds a heat source (negative: a sink, e.g. water boiling off) to node i's assembled
	 * equation, W/m².
	 */
	public void addSource(int i, double watts) {
		rhs[i] += watts;
	}

	/**
	 * Solves the assembled equations, holding pinned nodes at their pinned temperature.
	 */
	public void solve(double[] result, boolean[] pinned, double[] pinnedTemperature) {
		int n = grid.size();
		for (int i = 0; i < n; i++) {
			if (pinned != null && pinned[i]) {
				pinnedLower[i] = 0;
				pinnedDiag[i] = 1;
				pinnedUpper[i] = 0;
				pinnedRhs[i] = pinnedTemperature[i];
			}
			else {
				pinnedLower[i] = lower[i];
				pinnedDiag[i] = diag[i];
				pinnedUpper[i] = upper[i];
				pinnedRhs[i] = rhs[i];
			}
		}
		solver.solve(pinnedLower, pinnedDiag, pinnedUpper, pinnedRhs, result);
	}

	/**
	 * How fast node i's surplus falls per kelvin it is held hotter, its neighbours held:
	 * the assembled diagonal, W/(m²·K).
	 */
	public double diagonal(int i) {
		return diag[i];
	}

	/**
	 * Power (W/m²) that node i's own energy balance leaves over at temperatures
	 * {@code t}: positive for a pinned node that receives more heat than it stores.
	 */
	public double surplus(int i, double[] t) {
		double s = rhs[i] - diag[i] * t[i];
		if (i > 0) {
			s -= lower[i] * t[i - 1];
		}
		if (i < t.length - 1) {
			s -= upper[i] * t[i + 1];
		}
		return s;
	}

}
