package com.crustplan.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;

/**
 * Grid and time-step convergence of the full CookSimulation (heat, moisture, local
 * boiling, browning) for the two everyday plans: time to target and core temperature at
 * target for half, the default and twice the default nodes and 2/1/0.5/0.25 s steps,
 * against a reference refined 4× in both (4·(n − 1) + 1 nodes, a quarter of the default
 * step), with an 8× run to show how far the reference itself is from converged; then the
 * step alone, the grid alone and both together, with the observed order.
 * <p>
 * Run:
 * {@code mvn -o -Pbench test-compile exec:exec -Dbench.main=com.crustplan.bench.ConvergenceTable}
 */
public final class ConvergenceTable {

	/**
	 * Half, the default and twice the default resolution (every coarser node kept on the
	 * finer grids).
	 */
	static final int[] NODES = { (CookSettings.DEFAULT_NODES - 1) / 2 + 1, CookSettings.DEFAULT_NODES,
			2 * (CookSettings.DEFAULT_NODES - 1) + 1 };

	static final double[] STEPS_S = { 2, 1, 0.5, 0.25 };

	static final int REFERENCE_NODES = 4 * (CookSettings.DEFAULT_NODES - 1) + 1;

	static final double REFERENCE_STEP_S = CookSettings.DEFAULT_TIME_STEP_S / 4;

	record Row(int nodes, double stepS, double timeToTargetS, double coreAtTargetC, double errorS, double errorPct,
			double coreErrorK) {
	}

	record Plan(String name, Function<CookSettings, CookResult> run) {
	}

	static final Plan STEAK = new Plan("steak 25 mm, oiled pan 220 °C, not turned, to 'browned'", Plans::steak);

	static final Plan CHIPS = new Plan("chips 10 mm, fryer 175 °C, to 'golden'", Plans::chips);

	private ConvergenceTable() {
	}

	static CookResult run(Plan plan, int nodes, double dt) {
		return plan.run().apply(CookSettings.defaults().withNodes(nodes).withTimeStepS(dt).withRecordSeries(false));
	}

	static Row row(CookResult r, int nodes, double dt, CookResult ref) {
		double err = r.timeToTargetS() - ref.timeToTargetS();
		return new Row(nodes, dt, r.timeToTargetS(), r.coreTemperatureAtTargetC(), err, 100 * err / ref.timeToTargetS(),
				r.coreTemperatureAtTargetC() - ref.coreTemperatureAtTargetC());
	}

	static List<Row> table(Plan plan) {
		CookResult ref = run(plan, REFERENCE_NODES, REFERENCE_STEP_S);
		List<Row> rows = new ArrayList<>();
		for (int nodes : NODES) {
			for (double dt : STEPS_S) {
				rows.add(row(run(plan, nodes, dt), nodes, dt, ref));
			}
		}
		rows.add(row(ref, REFERENCE_NODES, REFERENCE_STEP_S, ref));
		rows.add(row(run(plan, 2 * REFERENCE_NODES - 1, REFERENCE_STEP_S / 2), 2 * REFERENCE_NODES - 1,
				REFERENCE_STEP_S / 2, ref));
		return rows;
	}

	/**
	 * Time to target along a sequence of settings, with successive differences and the
	 * observed order.
	 */
	static void sequence(Plan plan, String title, int[] nodes, double[] steps) {
		System.out.printf(Locale.ROOT,
				"%n%s%n| nodes | step s | time to target s | change s | observed order |%n|---:|---:|---:|---:|---:|%n",
				title);
		double previous = Double.NaN;
		double previousChange = Double.NaN;
		for (int k = 0; k < nodes.length; k++) {
			double t = run(plan, nodes[k], steps[k]).timeToTargetS();
			double change = t - previous;
			// halving the step (and the spacing, on the diagonal) divides the change by
			// 2^p
			double order = Math.log(previousChange / change) / Math.log(2);
			System.out.printf(Locale.ROOT, "| %d | %.5g | %.2f | %s | %s |%n", nodes[k], steps[k], t,
					Double.isNaN(change) ? "" : String.format(Locale.ROOT, "%+.2f", change),
					Double.isNaN(order) ? "" : String.format(Locale.ROOT, "%.2f", order));
			previousChange = change;
			previous = t;
		}
	}

	public static void main(String[] args) {
		for (Plan plan : List.of(STEAK, CHIPS)) {
			System.out.printf(Locale.ROOT,
					"%n## %s%n%ngrid x step, against the 4x refined reference (%d nodes, %.4g s)%n", plan.name(),
					REFERENCE_NODES, REFERENCE_STEP_S);
			System.out.printf(Locale.ROOT,
					"| nodes | step s | time to target s | error s | error %% | core at target °C | core error K |%n");
			System.out.printf(Locale.ROOT, "|---:|---:|---:|---:|---:|---:|---:|%n");
			for (Row r : table(plan)) {
				System.out.printf(Locale.ROOT, "| %d | %.4g | %.2f | %+.2f | %+.2f | %.2f | %+.2f |%n", r.nodes(),
						r.stepS(), r.timeToTargetS(), r.errorS(), r.errorPct(), r.coreAtTargetC(), r.coreErrorK());
			}
			int[] atDefault = new int[8];
			double[] halving = new double[8];
			for (int k = 0; k < 8; k++) {
				atDefault[k] = CookSettings.DEFAULT_NODES;
				halving[k] = 1.0 / (1 << k);
			}
			sequence(plan, "the step alone, default nodes", atDefault, halving);
			int[] diagonalNodes = new int[6];
			double[] diagonalSteps = new double[6];
			for (int k = 0; k < 6; k++) {
				diagonalNodes[k] = (CookSettings.DEFAULT_NODES - 1) / 2 * (1 << k) + 1;
				diagonalSteps[k] = 1.0 / (1 << k);
			}
			sequence(plan, "grid and step refined together", diagonalNodes, diagonalSteps);
			int[] gridNodes = new int[5];
			for (int k = 0; k < gridNodes.length; k++) {
				gridNodes[k] = (CookSettings.DEFAULT_NODES - 1) / 2 * (1 << k) + 1;
			}
			double[] fine = new double[gridNodes.length];
			java.util.Arrays.fill(fine, 1.0 / 32);
			sequence(plan, "the grid alone, step 1/32 s", gridNodes, fine);
		}
	}

}
