package com.crustplan.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.crustplan.engine.cook.CookSettings;

/**
 * Prints the accuracy table of the side-by-side comparison: backward Euler (the engine's
 * HeatConduction step) at several steps and Dormand–Prince 5(4) at several tolerances, on
 * the same default grid (CookSettings.DEFAULT_NODES) and the same equations
 * ({@link OvenSlab}), each against a reference on the 4× refined grid (4·(n − 1) + 1
 * nodes, integrated to 1e-7 K tolerance, so its time error is far below anything
 * measured). The timings printed here are a rough median of repeated runs; the figures
 * for the README come from {@link IntegratorBenchmark}.
 * <p>
 * Run:
 * {@code mvn -o -Pbench test-compile exec:exec -Dbench.main=com.crustplan.bench.IntegratorComparison}
 */
public final class IntegratorComparison {

	/**
	 * Accuracy goal of issue 6: both solvers within 0.5 K of the reference everywhere, at
	 * every sample.
	 */
	static final double GOAL_K = 0.5;

	/** Profiles are compared every 20 s: every step tried below divides it. */
	static final double SAMPLE_S = 20;

	/** The engine's default grid. */
	static final int NODES = CookSettings.DEFAULT_NODES;

	static final int REFINEMENT = 4;

	/** The reference's tolerance: a thousandth of the smallest error we resolve. */
	static final double REFERENCE_TOLERANCE_K = 1e-7;

	static final double[] STEPS_S = { 4, 2, 1, 0.5, 0.25, 0.125 };

	static final double[] TOLERANCES_K = { 1, 0.3, 0.1, 0.03, 0.01, 1e-3, 1e-4 };

	/** One row of the table. */
	record Row(String solver, double setting, double errorK, double timeErrorK, int work, double msPerRun) {
	}

	/** A case: the food, the oven and how long it stays in. */
	record Case(String key, java.util.function.IntFunction<OvenSlab> slab, double endS) {

		OvenSlab coarse() {
			return slab.apply(NODES);
		}

		OvenSlab fine() {
			return slab.apply(REFINEMENT * (NODES - 1) + 1);
		}

	}

	static final Case STEAK = new Case("steak", OvenSlab::steak, 1200);

	static final Case CHIPS = new Case("chips", OvenSlab::chips, 600);

	private IntegratorComparison() {
	}

	static int samples(Case c) {
		return (int) Math.round(c.endS() / SAMPLE_S) + 1;
	}

	/** Reference samples on the refined grid. */
	static double[][] reference(Case c) {
		double[][] ref = new double[samples(c)][];
		SlabSolvers.dormandPrince(c.fine(), REFERENCE_TOLERANCE_K, c.endS(), SAMPLE_S, ref, null);
		return ref;
	}

	/**
	 * The same grid, integrated to the reference tolerance: what is left of an error is
	 * then the grid's.
	 */
	static double[][] sameGridConverged(Case c) {
		double[][] s = new double[samples(c)][];
		SlabSolvers.dormandPrince(c.coarse(), REFERENCE_TOLERANCE_K, c.endS(), SAMPLE_S, s, null);
		return s;
	}

	/**
	 * Largest |T − T_ref| over all coarse nodes and samples; the fine grid keeps every
	 * coarse node.
	 */
	static double maxError(double[][] coarse, double[][] fine, int stride) {
		double max = 0;
		for (int k = 0; k < coarse.length; k++) {
			for (int i = 0; i < coarse[k].length; i++) {
				max = Math.max(max, Math.abs(coarse[k][i] - fine[k][i * stride]));
			}
		}
		return max;
	}

	static double[][] backwardEuler(Case c, OvenSlab slab, double dt) {
		double[][] s = new double[samples(c)][];
		SlabSolvers.backwardEuler(slab, dt, c.endS(), SAMPLE_S, s);
		return s;
	}

	static double[][] dormandPrince(Case c, OvenSlab slab, double tol, int[] evaluations) {
		double[][] s = new double[samples(c)][];
		SlabSolvers.dormandPrince(slab, tol, c.endS(), SAMPLE_S, s, evaluations);
		return s;
	}

	static List<Row> table(Case c, boolean timed) {
		double[][] ref = reference(c);
		double[][] same = sameGridConverged(c);
		OvenSlab slab = c.coarse();
		List<Row> rows = new ArrayList<>();
		rows.add(new Row("grid only (time-converged)", REFERENCE_TOLERANCE_K, maxError(same, ref, REFINEMENT), 0, 0,
				Double.NaN));
		for (double dt : STEPS_S) {
			double[][] s = backwardEuler(c, slab, dt);
			double ms = timed ? time(() -> SlabSolvers.backwardEuler(slab, dt, c.endS(), 0, null)) : Double.NaN;
			rows.add(new Row("backward Euler, dt s", dt, maxError(s, ref, REFINEMENT), maxError(s, same, 1),
					(int) Math.round(c.endS() / dt), ms));
		}
		for (double tol : TOLERANCES_K) {
			int[] evaluations = new int[1];
			double[][] s = dormandPrince(c, slab, tol, evaluations);
			double ms = timed ? time(() -> SlabSolvers.dormandPrince(slab, tol, c.endS(), 0, null, null)) : Double.NaN;
			rows.add(new Row("Dormand-Prince 5(4), abs tol K", tol, maxError(s, ref, REFINEMENT), maxError(s, same, 1),
					evaluations[0], ms));
		}
		// the literal 4× refined run of the engine's own scheme (4× the nodes, a quarter
		// of the step)
		double[][] be4 = backwardEuler(c, c.fine(), 0.125);
		rows.add(new Row("check: backward Euler, 4x nodes, dt s", 0.125, maxError(be4, ref, 1), 0,
				(int) Math.round(c.endS() / 0.125), Double.NaN));
		return rows;
	}

	/** Loosest setting of a solver that meets the goal (the rows come tightest-last). */
	static Row loosestWithin(List<Row> rows, String solverPrefix, double goalK) {
		for (Row r : rows) {
			if (r.solver().startsWith(solverPrefix) && r.errorK() <= goalK) {
				return r;
			}
		}
		return null;
	}

	/**
	 * Median wall time of one run in ms over about half a second of runs after a warm-up:
	 * a rough figure; the median rather than the mean because the machine is shared.
	 */
	private static double time(Runnable run) {
		for (int i = 0; i < 5; i++) {
			run.run();
		}
		List<Long> runs = new ArrayList<>();
		long start = System.nanoTime();
		while (System.nanoTime() - start < 500_000_000L) {
			long t0 = System.nanoTime();
			run.run();
			runs.add(System.nanoTime() - t0);
		}
		runs.sort(null);
		return runs.get(runs.size() / 2) / 1e6;
	}

	public static void main(String[] args) {
		for (Case c : List.of(STEAK, CHIPS)) {
			OvenSlab slab = c.coarse();
			System.out.printf(Locale.ROOT,
					"%n%s, %d nodes, %.0f s; reference %d nodes at %.0e K; error = max |T - T_ref| over nodes and %d samples%n",
					slab.name, NODES, c.endS(), REFINEMENT * (NODES - 1) + 1, REFERENCE_TOLERANCE_K, samples(c));
			System.out.printf(Locale.ROOT, "%-40s %9s %10s %12s %8s %10s%n", "solver", "setting", "error K",
					"time err K", "steps/f", "ms/run");
			List<Row> rows = table(c, true);
			for (Row r : rows) {
				System.out.printf(Locale.ROOT, "%-40s %9.3g %10.4f %12.4f %8d %10.3f%n", r.solver(), r.setting(),
						r.errorK(), r.timeErrorK(), r.work(), r.msPerRun());
			}
			Row be = loosestWithin(rows, "backward", GOAL_K);
			Row dp = loosestWithin(rows, "Dormand", GOAL_K);
			if (be != null && dp != null) {
				System.out.printf(Locale.ROOT,
						"at <= %.1f K: backward Euler dt %.3g s (%.4f K) vs DP54 tol %.3g K (%.4f K): rough speed ratio %.1fx%n",
						GOAL_K, be.setting(), be.errorK(), dp.setting(), dp.errorK(), dp.msPerRun() / be.msPerRun());
			}
			else {
				System.out.printf(Locale.ROOT, "a solver misses %.1f K at every setting on this grid%n", GOAL_K);
			}
		}
	}

}
