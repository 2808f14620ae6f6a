package com.crustplan.engine.layers;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The backward-Euler finite-volume conduction step with constant properties against the
 * analytic solutions of Incropera, Fundamentals of Heat and Mass Transfer, ch. 5, and its
 * convergence order.
 */
class HeatConductionTest {

	/**
	 * Tolerance asked for by the project's validation list: 0.5 K against each analytic
	 * solution.
	 */
	private static final double HALF_KELVIN = 0.5;

	// ---------------------------------------------------------------- analytic solutions

	/**
	 * Semi-infinite solid, initially at Ti, surface convection to T∞ from t = 0
	 * (Incropera §5.7, eq. 5.60): (T − Ti)/(T∞ − Ti) = erfc(η) − exp(hx/k +
	 * h²αt/k²)·erfc(η + h√(αt)/k), η = x/(2√(αt)).
	 */
	static double semiInfinite(double x, double t, double ti, double tInf, double h, double k, double alpha) {
		double s = Math.sqrt(alpha * t);
		double eta = x / (2 * s);
		return ti + (tInf - ti)
				* (Erf.erfc(eta) - Math.exp(h * x / k + h * h * alpha * t / (k * k)) * Erf.erfc(eta + h * s / k));
	}

	/**
	 * The first {@code m} positive roots of ζ·tan ζ = Bi, the n-th in ((n−1)π, (n−1)π +
	 * π/2).
	 */
	static double[] eigenvalues(double biot, int m) {
		BrentSolver solver = new BrentSolver(1e-14);
		double[] z = new double[m];
		for (int i = 0; i < m; i++) {
			// ζ sin ζ − Bi cos ζ has no poles, unlike ζ tan ζ − Bi
			z[i] = solver.solve(1000, x -> x * Math.sin(x) - biot * Math.cos(x), i * Math.PI + 1e-12,
					i * Math.PI + Math.PI / 2 - 1e-12);
		}
		return z;
	}

	/**
	 * Plane wall of half-thickness L with convection on both faces (Incropera §5.5, eq.
	 * 5.39): θ* = Σ Cn exp(−ζn² Fo) cos(ζn x*), Cn = 4 sin ζn/(2ζn + sin 2ζn). 200 terms:
	 * at Fo ≥ 0.05 the neglected tail is below exp(−(199π)²·0.05), i.e. nothing.
	 */
	static double planeWall(double biot, double xStar, double fourier) {
		double theta = 0;
		for (double z : eigenvalues(biot, 200)) {
			theta += 4 * Math.sin(z) / (2 * z + Math.sin(2 * z)) * Math.exp(-z * z * fourier) * Math.cos(z * xStar);
		}
		return theta;
	}

	// ---------------------------------------------------------------- the numerical
	// solution

	/**
	 * Marches a slab at uniform Ti with convection h·(T∞ − T) on face 0 and h1 on face 1
	 * (0: adiabatic).
	 */
	static double[] march(Grid grid, double k, double rhoCp, double ti, double tInf, double h0, double h1, double endS,
			double dt) {
		int n = grid.size();
		double[] t = new double[n];
		double[] capacity = new double[n];
		double[] conductivity = new double[n];
		for (int i = 0; i < n; i++) {
			t[i] = ti;
			capacity[i] = rhoCp * grid.width(i);
			conductivity[i] = k;
		}
		HeatConduction conduction = new HeatConduction(grid);
		long steps = Math.round(endS / dt);
		for (long s = 0; s < steps; s++) {
			// q = h(T∞ − T'): slope a = h, source b = h·T∞
			conduction.step(t, capacity, conductivity, dt, h0, h0 * tInf, h1, h1 * tInf);
		}
		return t;
	}

	// ---------------------------------------------------------------- checks

	@Test
	void shouldMatchTheSemiInfiniteSolidWithSurfaceConvection() {
		// Incropera §5.7, eq. 5.60 with Ti 393 K, T∞ 355 K, h 50 W/m²K, k 10 W/mK, α
		// 4.029e-6 m²/s: at x = 3 mm
		// after 100 s the solid is at 389.54 K (worked example in a published
		// heat-transfer library's
		// documentation, recomputed here with Hipparchus' erfc).
		double alpha = 4.029e-6;
		double k = 10;
		assertEquals(389.54, semiInfinite(0.003, 100, 393, 355, 50, k, alpha), 0.005);
		// A 0.2 m slab is 10 penetration depths √(αt) = 20 mm thick: erfc(5) ≈ 1.5e-12,
		// so its insulated back
		// face cannot be felt and it acts as semi-infinite. Uniform 0.25 mm spacing puts
		// a node on x = 3 mm
		// (node 12) and keeps the spatial error far below the 0.5 K allowed; Δt = 0.1 s
		// likewise for time.
		Grid grid = Grid.uniform(0.2, 801);
		double[] t = march(grid, k, k / alpha, 393, 355, 50, 0, 100, 0.1);
		assertEquals(0.003, grid.position(12), 1e-12);
		assertEquals(semiInfinite(0.003, 100, 393, 355, 50, k, alpha), t[12], HALF_KELVIN);
		assertEquals(semiInfinite(0, 100, 393, 355, 50, k, alpha), t[0], HALF_KELVIN);
	}

	@ParameterizedTest(name = "Bi {0}: ζ1 {1}, C1 {2}")
	@CsvSource({ "0.1, 0.3111, 1.0161", "1, 0.8603, 1.1191", "10, 1.4289, 1.2620" })
	void shouldFindTheTabulatedFirstEigenvalues(double biot, double zeta1, double c1) {
		// Incropera Table 5.1 (plane wall): ζ1 and C1 to 4 decimals; tolerance half the
		// last digit.
		double z = eigenvalues(biot, 1)[0];
		assertEquals(zeta1, z, 5e-5);
		assertEquals(c1, 4 * Math.sin(z) / (2 * z + Math.sin(2 * z)), 5e-5);
	}

	@ParameterizedTest(name = "Bi {0}, Fo {1}")
	@CsvSource({ "0.1, 0.05", "0.1, 0.2", "0.1, 1", "1, 0.05", "1, 0.2", "1, 1", "10, 0.05", "10, 0.2", "10, 1" })
	void shouldMatchThePlaneWallSeriesSolutionOnTheProductionGrid(double biot, double fourier) {
		// Incropera §5.5, eq. 5.39 (full series, so Fo below 0.2 is checked too). A
		// food-like slab: 2L = 20 mm,
		// k 0.5 W/mK, ρcp 4 MJ/m³K (α = 1.25e-7 m²/s), from 20 °C into 200 °C gas, h =
		// Bi·k/L on both faces.
		// Grid and step are the simulation's defaults (25 nodes with face clustering, Δt
		// 0.5 s), so this also
		// shows that the defaults keep conduction within 0.5 K of the analytic answer.
		double half = 0.01;
		double k = 0.5;
		double rhoCp = 4e6;
		double alpha = k / rhoCp;
		double ti = 293.15;
		double tInf = 473.15;
		double h = biot * k / half;
		double time = fourier * half * half / alpha;
		Grid grid = new Grid(2 * half, 25, Grid.DEFAULT_CLUSTERING);
		double[] t = march(grid, k, rhoCp, ti, tInf, h, h, time, 0.5);
		assertEquals(half, grid.position(12), 1e-12);
		double surface = tInf + (ti - tInf) * planeWall(biot, 1, fourier);
		double centre = tInf + (ti - tInf) * planeWall(biot, 0, fourier);
		assertEquals(surface, t[0], HALF_KELVIN, "surface");
		assertEquals(surface, t[24], HALF_KELVIN, "other surface");
		assertEquals(centre, t[12], HALF_KELVIN, "centre");
	}

	@Test
	void shouldMatchTheFullSeriesBrassSlab() {
		// Çengel & Ghajar, Heat and Mass Transfer, transient conduction example (quoted;
		// recomputed here by the
		// full series): a 40 mm brass plate, k 110 W/mK, ρ 8530 kg/m³, cp 380 J/kgK, from
		// 20 °C in 500 °C
		// gas at h 120 W/m²K for 7 min has a surface at 279.76 °C. Our series must give
		// the printed value to
		// its last digit, and the simulation must be within 0.5 K on the default 25-node
		// grid with Δt 0.5 s.
		double half = 0.02;
		double k = 110;
		double rhoCp = 8530 * 380.0;
		double h = 120;
		double fourier = k / rhoCp * 420 / (half * half);
		double surface = 500 + (20 - 500) * planeWall(h * half / k, 1, fourier);
		assertEquals(279.76, surface, 0.005);
		double[] t = march(new Grid(2 * half, 25, Grid.DEFAULT_CLUSTERING), k, rhoCp, 20, 500, h, h, 420, 0.5);
		assertEquals(surface, t[0], HALF_KELVIN);
	}

	@Test
	void shouldHalveTheErrorWhenTheTimeStepIsHalved() {
		// Backward Euler is first order in time: halving Δt should halve the error
		// (observed order 0.7–1.3).
		// A fine uniform grid (201 nodes over the half-slab, adiabatic centre) keeps the
		// spatial error well
		// below the temporal one at these steps. Reference: plane-wall series, Bi 1, Fo
		// 0.5 (Incropera eq. 5.39).
		double half = 0.01;
		double k = 0.5;
		double rhoCp = 4e6;
		double h = 1 * k / half;
		double time = 0.5 * half * half / (k / rhoCp);
		double exact = 473.15 + (293.15 - 473.15) * planeWall(1, 1, 0.5);
		double previous = Double.NaN;
		for (double dt : new double[] { 40, 20, 10, 5 }) {
			double error = Math
				.abs(march(Grid.uniform(half, 201), k, rhoCp, 293.15, 473.15, h, 0, time, dt)[0] - exact);
			if (!Double.isNaN(previous)) {
				double order = Math.log(previous / error) / Math.log(2);
				assertTrue(order > 0.7 && order < 1.3, "observed order " + order + " at Δt " + dt);
			}
			previous = error;
		}
	}

	@Test
	void shouldReduceTheErrorWhenTheGridIsRefined() {
		// The vertex-centred finite volume with half cells at the faces is second order
		// in space; each halving
		// of the spacing must cut the error at least threefold (4 expected; the allowance
		// covers the small
		// time-step error left at Δt 0.01 s). Both the uniform and the production
		// (clustered) grid are checked.
		// Reference: plane-wall series, Bi 1, Fo 0.2 (Incropera eq. 5.39).
		double half = 0.01;
		double k = 0.5;
		double rhoCp = 4e6;
		double h = 1 * k / half;
		double time = 0.2 * half * half / (k / rhoCp);
		double exact = 473.15 + (293.15 - 473.15) * planeWall(1, 1, 0.2);
		for (double clustering : new double[] { 0, Grid.DEFAULT_CLUSTERING }) {
			double previous = Double.NaN;
			for (int nodes : new int[] { 5, 9, 17, 33 }) {
				double[] t = march(new Grid(half, nodes, clustering), k, rhoCp, 293.15, 473.15, h, 0, time, 0.01);
				double error = Math.abs(t[0] - exact);
				if (!Double.isNaN(previous)) {
					assertTrue(previous / error > 3, "clustering " + clustering + ", " + nodes + " nodes: error "
							+ error + " after " + previous);
				}
				previous = error;
			}
		}
	}

	@ParameterizedTest(name = "shape {0}, Bi {1}, Fo {4}")
	@CsvSource({ "1, 1, 1.2558, 1.2071, 0.3", "1, 1, 1.2558, 1.2071, 1", "1, 10, 2.1795, 1.5677, 0.3",
			"1, 10, 2.1795, 1.5677, 1", "2, 1, 1.5708, 1.2732, 0.3", "2, 1, 1.5708, 1.2732, 1",
			"2, 10, 2.8363, 1.9249, 0.3", "2, 10, 2.8363, 1.9249, 0.6" })
	void shouldMatchTheOneTermSeriesAtTheCentreOfACylinderAndASphere(int shape, double biot, double zeta1, double c1,
			double fourier) {
		// Incropera Table 5.1 (infinite cylinder, sphere: ζ1, C1) and eqs. 5.49–5.52: at
		// the centre J0(0) = 1 and sin(ζ1 r*)/(ζ1 r*) → 1, so θ0* = C1 exp(−ζ1² Fo),
		// valid
		// for Fo > 0.2. Radius 10 mm, k 0.5 W/mK, ρcp 4 MJ/m³K, Bi = h·r0/k, heat in from
		// the outside surface only (node 0), centre a symmetry point (node n−1, no flux).
		// Default 25-node clustered grid and Δt 0.5 s; centre excess temperature within 2
		// %.
		double radius = 0.01;
		double k = 0.5;
		double rhoCp = 4e6;
		double h = biot * k / radius;
		double time = fourier * radius * radius / (k / rhoCp);
		Grid grid = new Grid(radius, 25, Grid.DEFAULT_CLUSTERING, shape);
		double[] t = march(grid, k, rhoCp, 293.15, 473.15, h, 0, time, 0.5);
		double exact = c1 * Math.exp(-zeta1 * zeta1 * fourier);
		double numeric = (t[24] - 473.15) / (293.15 - 473.15);
		assertEquals(exact, numeric, 0.02 * exact, "centre θ*");
	}

	@Test
	void shouldGiveTheVolumeOfACylinderAndASphere() {
		// Geometry: per unit outside area, a cylinder holds r0/2 and a sphere r0/3 (V/A).
		for (int shape = 0; shape <= 2; shape++) {
			Grid grid = new Grid(0.01, 25, Grid.DEFAULT_CLUSTERING, shape);
			double sum = 0;
			for (int i = 0; i < grid.size(); i++) {
				sum += grid.width(i);
			}
			assertEquals(0.01 / (shape + 1), sum, 1e-15);
		}
	}

}
