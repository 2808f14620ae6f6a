package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.PanContact;

/**
 * A face's temperature and water activity move continuously as the layers under it dry
 * one after another: no saw-tooth from one time step to the next at the default grid and
 * step. Round one's engine jumped by 12 K (fry) and 85 K (sear, flips included) from one
 * 0.5 s step to the next as each layer ran dry, because a drying layer was pinned at the
 * boiling point of its moisture at the start of the step (it now is at the end's).
 * Bounds: 3 K per step (6 K/s, well below a face's own rate of climb while it crusts) and
 * 0.05 in water activity, after the first 30 s (the face's contact transient, 5 → 100 °C
 * in seconds, is physical).
 */
class SmoothDryingFrontTest {

	private static final double MAX_STEP_K = 3;

	private static final double MAX_STEP_AW = 0.05;

	/** Largest step-to-step change of face 0's temperature and water activity. */
	private static double[] largestSteps(Surface surface, HeatSetup setup, Target target, double flipEveryS) {
		double[] last = { Double.NaN, Double.NaN };
		double[] largest = { 0, 0 };
		CookSimulation.run(surface, setup, target, CookSettings.defaults().withRecordSeries(false), LayerReaction.NONE,
				layers -> {
					double t = layers.temperatureK(0);
					double aw = layers.waterActivity(0);
					double now = layers.timeS();
					// a flip swaps the pan face for the air face: a real jump, left out
					boolean afterFlip = flipEveryS > 0 && now % flipEveryS < 10;
					if (!Double.isNaN(last[0]) && now > 30 && !afterFlip) {
						largest[0] = Math.max(largest[0], Math.abs(t - last[0]));
						largest[1] = Math.max(largest[1], Math.abs(aw - last[1]));
					}
					last[0] = t;
					last[1] = aw;
				});
		return largest;
	}

	/**
	 * Fries as the app cooks them, square strips. Known exception: a 7 mm SLAB fried to
	 * golden (10 min) dries right through and its face then steps 5.8 K in one 0.5 s step
	 * as the last layers run dry; a strip of the same width is golden in 6 min with steps
	 * under 1 K.
	 */
	@Test
	void fryFaceClimbsWithoutSawTooth() {
		for (double mm : new double[] { 7, 10 }) {
			double[] j = largestSteps(Surface.typical(FoodCategory.POTATO).withThicknessMm(mm), new DeepFryer(175),
					Target.stage("golden"), 0);
			assertTrue(j[0] <= MAX_STEP_K, mm + " mm: largest step " + j[0] + " K");
			assertTrue(j[1] <= MAX_STEP_AW, mm + " mm: largest step in aw " + j[1]);
		}
	}

	@Test
	void searedFaceClimbsWithoutSawTooth() {
		Surface steak = Surface.defaults(FoodCategory.MEAT).withThicknessMm(25);
		double[] still = largestSteps(steak, new PanContact(230, true, 0), Target.stage("browned"), 0);
		assertTrue(still[0] <= MAX_STEP_K, "largest step " + still[0] + " K");
		assertTrue(still[1] <= MAX_STEP_AW, "largest step in aw " + still[1]);
		double[] turned = largestSteps(steak, new PanContact(230, true, 60), Target.stage("browned"), 60);
		assertTrue(turned[0] <= MAX_STEP_K, "turned every minute: largest step " + turned[0] + " K");
	}

}
