package com.crustplan.engine.acrylamide;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import com.crustplan.engine.layers.Grid;

/**
 * The crust's share of a piece by the geometry of its shape: the outer shell of depth d
 * holds 1 − (1 − d/R)^(m+1) of a cylinder (m = 1) or sphere (m = 2) of radius R, where
 * slab area × depth would give d/R.
 */
class CrustShellTest {

	@ParameterizedTest(name = "m {0}, R {1} mm, d {2} mm")
	@CsvSource({ "1, 5, 1", "2, 5, 1", "1, 3.5, 1", "2, 17.5, 1", "1, 5, 0.3", "2, 2, 1.7" })
	void shouldGiveTheShellVolumeOfACylinderAndASphere(int m, double radiusMm, double depthMm) {
		double r = radiusMm / 1000;
		double d = depthMm / 1000;
		Grid grid = new Grid(r, 31, Grid.DEFAULT_CLUSTERING, m);
		int n = grid.size();
		double crust = 0;
		double all = 0;
		for (int i = 0; i < n; i++) {
			double left = i == 0 ? 0 : 0.5 * (grid.position(i - 1) + grid.position(i));
			double right = i == n - 1 ? r : 0.5 * (grid.position(i) + grid.position(i + 1));
			crust += AcrylamideFormation.shellShare(r, m, left, right, d) * grid.width(i);
			all += grid.width(i);
		}
		// geometry: exact up to rounding, whatever the grid
		assertEquals(1 - Math.pow(1 - d / r, m + 1), crust / all, 1e-12);
	}

}
