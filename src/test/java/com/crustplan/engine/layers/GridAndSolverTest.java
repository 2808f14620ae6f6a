package com.crustplan.engine.layers;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.junit.jupiter.api.Test;

/** The finite-volume grid and the tridiagonal solver behind every step. */
class GridAndSolverTest {

	@Test
	void shouldTileTheThicknessWithControlVolumes() {
		// Vertex-centred finite volumes (Patankar, Numerical Heat Transfer and Fluid
		// Flow, §4.6, "Practice A":
		// faces midway between nodes): the volumes must add up to the thickness exactly,
		// half volumes at the faces.
		for (double clustering : new double[] { 0, Grid.DEFAULT_CLUSTERING, 1 }) {
			Grid g = new Grid(0.025, 25, clustering);
			double sum = 0;
			for (int i = 0; i < g.size(); i++) {
				sum += g.width(i);
				if (i > 0) {
					assertTrue(g.position(i) > g.position(i - 1));
				}
			}
			assertEquals(0.025, sum, 1e-15);
			assertEquals(0.5 * g.spacing(0), g.width(0), 1e-15);
			assertEquals(0.5 * g.spacing(23), g.width(24), 1e-15);
			// symmetric about the centre, so both faces are resolved alike
			for (int i = 0; i < g.size(); i++) {
				assertEquals(0.025 - g.position(i), g.position(24 - i), 1e-15);
			}
		}
	}

	@Test
	void shouldCrowdNodesTowardsTheFaces() {
		Grid uniform = Grid.uniform(0.02, 25);
		Grid clustered = new Grid(0.02, 25, Grid.DEFAULT_CLUSTERING);
		assertTrue(clustered.spacing(0) < uniform.spacing(0) / 2);
		assertTrue(clustered.spacing(12) > uniform.spacing(12));
	}

	@Test
	void shouldInterpolateLinearFieldsExactly() {
		Grid g = new Grid(0.03, 17, Grid.DEFAULT_CLUSTERING);
		double[] field = new double[g.size()];
		for (int i = 0; i < field.length; i++) {
			field[i] = 300 + 1000 * g.position(i);
		}
		for (double x = 0; x <= 0.03; x += 0.0007) {
			assertEquals(300 + 1000 * x, g.interpolate(field, x), 1e-9);
		}
	}

	@Test
	void shouldSolveTridiagonalSystemsLikeADenseLuDecomposition() {
		// Against Hipparchus' LU decomposition with partial pivoting on random diagonally
		// dominant systems;
		// relative 1e-10: both are direct solvers in double precision on well-conditioned
		// matrices.
		// Every size from 1 to 8 first: odd and even systems meet differently in the
		// middle of the two-ended sweep, and the smallest take the one-way sweep.
		Random random = new Random(42);
		for (int trial = 0; trial < 28; trial++) {
			int n = trial < 8 ? 1 + trial : 3 + random.nextInt(60);
			double[] lower = new double[n];
			double[] diag = new double[n];
			double[] upper = new double[n];
			double[] rhs = new double[n];
			RealMatrix dense = new Array2DRowRealMatrix(n, n);
			for (int i = 0; i < n; i++) {
				lower[i] = i > 0 ? -random.nextDouble() : 0;
				upper[i] = i < n - 1 ? -random.nextDouble() : 0;
				diag[i] = 2.01 + random.nextDouble();
				rhs[i] = 100 * random.nextGaussian();
				dense.setEntry(i, i, diag[i]);
				if (i > 0) {
					dense.setEntry(i, i - 1, lower[i]);
				}
				if (i < n - 1) {
					dense.setEntry(i, i + 1, upper[i]);
				}
			}
			double[] x = new double[n];
			new Tridiagonal(n).solve(lower, diag, upper, rhs, x);
			double[] expected = new LUDecomposition(dense).getSolver().solve(new ArrayRealVector(rhs)).toArray();
			double scale = 0;
			for (double v : expected) {
				scale = Math.max(scale, Math.abs(v));
			}
			assertArrayEquals(expected, x, 1e-10 * scale);
		}
	}

	@Test
	void shouldConserveEnergyInAnInsulatedSlab() {
		// With both faces adiabatic, Σ C_i T_i is invariant under the backward-Euler step
		// (the interface fluxes
		// cancel pairwise): a discrete form of the first law. Relative 1e-12.
		Grid g = new Grid(0.02, 25, Grid.DEFAULT_CLUSTERING);
		int n = g.size();
		double[] t = new double[n];
		double[] c = new double[n];
		double[] k = new double[n];
		for (int i = 0; i < n; i++) {
			t[i] = 280 + 100 * Math.sin(7 * g.position(i) / 0.02);
			c[i] = 3.5e6 * g.width(i) * (1 + 0.3 * i / n);
			k[i] = 0.4 + 0.2 * i / n;
		}
		double before = 0;
		for (int i = 0; i < n; i++) {
			before += c[i] * t[i];
		}
		HeatConduction h = new HeatConduction(g);
		for (int s = 0; s < 500; s++) {
			h.step(t, c, k, 1.0, 0, 0, 0, 0);
		}
		double after = 0;
		for (int i = 0; i < n; i++) {
			after += c[i] * t[i];
		}
		assertEquals(before, after, 1e-12 * before);
	}

}
