package com.crustplan.bench;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The accuracy side of the integrator comparison, checked against what numerical analysis
 * says the two schemes must do (the speed side is {@link IntegratorBenchmark}, not a
 * timed test).
 */
class SlabIntegratorAccuracyTest {

	@Test
	void backwardEulerTimeErrorHalvesWhenTheStepHalves() {
		// backward Euler is first-order in time (Hairer & Wanner, Solving ODEs II,
		// §IV.3); measured against
		// the same grid integrated to 1e-7 K so only the time error is left. ±10 %: steps
		// of 0.5–1 s are in
		// the asymptotic range here (the table shows ratios within 1 % of 2).
		IntegratorComparison.Case c = IntegratorComparison.STEAK;
		double[][] same = IntegratorComparison.sameGridConverged(c);
		double e1 = IntegratorComparison.maxError(IntegratorComparison.backwardEuler(c, c.coarse(), 1.0), same, 1);
		double eHalf = IntegratorComparison.maxError(IntegratorComparison.backwardEuler(c, c.coarse(), 0.5), same, 1);
		assertThat(e1 / eHalf).isBetween(1.8, 2.2);
	}

	@Test
	void theEngineSchemeOnTheRefinedGridAgreesWithTheIndependentReference() {
		// two different integrators (backward Euler at 0.125 s and Dormand–Prince at 1e-7
		// K) on the refined
		// grid: they may differ only by backward Euler's own time error, ≈ 0.2 K·s⁻¹ ×
		// 0.125 s on this case
		// (first-order constant from the default-grid table), so 0.05 K
		IntegratorComparison.Case c = IntegratorComparison.STEAK;
		double[][] reference = IntegratorComparison.reference(c);
		double[][] engine = IntegratorComparison.backwardEuler(c, c.fine(), 0.125);
		assertThat(IntegratorComparison.maxError(engine, reference, 1)).isLessThan(0.05);
	}

	@Test
	void bothSolversReachHalfAKelvinOnTheDefaultGrid() {
		// the accuracy level for the speed comparison: each solver has a setting
		// within 0.5 K of the
		// 4× refined reference on the default grid, for a thick (steak) and a thin
		// (chips) slab
		for (IntegratorComparison.Case c : List.of(IntegratorComparison.STEAK, IntegratorComparison.CHIPS)) {
			List<IntegratorComparison.Row> rows = IntegratorComparison.table(c, false);
			assertThat(IntegratorComparison.loosestWithin(rows, "backward", 0.5)).as(c.key()).isNotNull();
			assertThat(IntegratorComparison.loosestWithin(rows, "Dormand", 0.5)).as(c.key()).isNotNull();
		}
	}

}
