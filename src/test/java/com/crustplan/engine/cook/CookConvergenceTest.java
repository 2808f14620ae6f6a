package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

/**
 * Step and grid convergence of whole cooks: the time to a target colour at the default
 * settings (31 nodes, Δt 0.5 s) against a run with twice the nodes and a quarter of the
 * step. 5 % is the tolerance: a plan read to the nearest quarter minute on a 5 min sear,
 * and well above the conduction error alone (HeatConductionTest). Under a radiant grill
 * the drying front is a fraction of a millimetre thick and crosses the face nodes one by
 * one, so the default grid is allowed 10 % there — still well inside the spread of the
 * calibrated browning rates.
 */
class CookConvergenceTest {

	private static final double TOLERANCE = 0.05;

	private static final double GRILL_TOLERANCE = 0.10;

	private static double timeToTarget(Surface surface, HeatSetup setup, String stage, int nodes, double dt) {
		CookSettings settings = CookSettings.defaults().withNodes(nodes).withTimeStepS(dt).withRecordSeries(false);
		CookResult r = CookSimulation.run(surface, setup, Target.stage(stage), settings);
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		return r.timeToTargetS();
	}

	private static void assertConverged(Surface surface, HeatSetup setup, String stage) {
		assertConverged(surface, setup, stage, TOLERANCE);
	}

	private static void assertConverged(Surface surface, HeatSetup setup, String stage, double tolerance) {
		double coarse = timeToTarget(surface, setup, stage, CookSettings.DEFAULT_NODES,
				CookSettings.DEFAULT_TIME_STEP_S);
		double fine = timeToTarget(surface, setup, stage, 2 * CookSettings.DEFAULT_NODES - 1,
				CookSettings.DEFAULT_TIME_STEP_S / 4);
		assertEquals(fine, coarse, tolerance * fine, String.format("defaults %.1f s, refined %.1f s", coarse, fine));
	}

	@Test
	void shouldConvergeMonotonicallyAsTheStepIsHalved() {
		// First-order time stepping: successive halvings of Δt must change the answer by
		// less each time
		// (no oscillation, no drift), on a pan sear and a fry.
		Object[][] cases = { { Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 0), "browned" },
				{ Surface.defaults(FoodCategory.POTATO), new DeepFryer(175), "golden" } };
		for (Object[] c : cases) {
			double previousChange = Double.MAX_VALUE;
			double previous = Double.NaN;
			for (double dt : new double[] { 1, 0.5, 0.25, 0.125 }) {
				double t = timeToTarget((Surface) c[0], (HeatSetup) c[1], (String) c[2], CookSettings.DEFAULT_NODES,
						dt);
				if (!Double.isNaN(previous)) {
					double change = Math.abs(t - previous);
					// or converged: below 0.25 % of the answer, where first-order error
					// terms of opposite sign (face linearisation, end-of-step boiling
					// point) can trade places; since boiling is coupled to the moisture
					// solve the 10 mm fry moves by about 1 s in 580 s per halving
					assertTrue(change < previousChange || change < 2.5e-3 * t,
							c[1] + ": change " + change + " s at Δt " + dt);
					previousChange = change;
				}
				previous = t;
			}
		}
	}

	@Test
	void shouldConvergeAPanSearAtTheDefaultSettings() {
		assertConverged(Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 0), "browned");
	}

	@Test
	void shouldConvergeAFryAtTheDefaultSettings() {
		assertConverged(Surface.defaults(FoodCategory.POTATO), new DeepFryer(175), "golden");
	}

	@Test
	void shouldConvergeAnOvenRoastAtTheDefaultSettings() {
		assertConverged(Surface.defaults(FoodCategory.POULTRY_SKIN), new Oven(200, true, 2), "golden");
	}

	@Test
	void shouldConvergeAGrillAtTheDefaultSettings() {
		assertConverged(Surface.defaults(FoodCategory.FISH), new RadiantGrill(800, 0), "golden", GRILL_TOLERANCE);
	}

}
