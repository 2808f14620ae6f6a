package com.crustplan.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Side by side in one run: the engine's backward-Euler conduction step against
 * Hipparchus' Dormand–Prince 5(4) on the same equations and grid ({@link OvenSlab}), each
 * at the loosest setting that stays within 0.5 K of the 4× refined reference. The
 * settings are found in the trial setup from the accuracy table
 * ({@link IntegratorComparison}), not typed in, so they follow the model if it changes.
 * Goal (issue 6): own solver ≥ 10× faster at equal accuracy. Sampling mode, so the median
 * (p0.50) is reported: the machine is shared and the mean is pulled up by other
 * processes.
 */
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class IntegratorBenchmark {

	@Param({ "steak", "chips" })
	public String food;

	private IntegratorComparison.Case c;

	private OvenSlab slab;

	private double stepS;

	private double toleranceK;

	@Setup(Level.Trial)
	public void chooseSettings() {
		c = food.equals("steak") ? IntegratorComparison.STEAK : IntegratorComparison.CHIPS;
		slab = c.coarse();
		List<IntegratorComparison.Row> rows = IntegratorComparison.table(c, false);
		IntegratorComparison.Row be = IntegratorComparison.loosestWithin(rows, "backward", IntegratorComparison.GOAL_K);
		IntegratorComparison.Row dp = IntegratorComparison.loosestWithin(rows, "Dormand", IntegratorComparison.GOAL_K);
		if (be == null || dp == null) {
			throw new IllegalStateException("a solver misses 0.5 K at every setting tried for " + food);
		}
		stepS = be.setting();
		toleranceK = dp.setting();
		System.out.printf("%n%s: backward Euler dt %.3g s (%.3f K), Dormand-Prince tol %.3g K (%.3f K)%n", food, stepS,
				be.errorK(), toleranceK, dp.errorK());
	}

	@Benchmark
	public double[] backwardEulerEqualAccuracy() {
		return SlabSolvers.backwardEuler(slab, stepS, c.endS(), 0, null);
	}

	@Benchmark
	public double[] dormandPrince54EqualAccuracy() {
		return SlabSolvers.dormandPrince(slab, toleranceK, c.endS(), 0, null, null);
	}

	/** The engine's default step, for scale. */
	@Benchmark
	public double[] backwardEulerDefaultStep() {
		return SlabSolvers.backwardEuler(slab, 0.5, c.endS(), 0, null);
	}

}
