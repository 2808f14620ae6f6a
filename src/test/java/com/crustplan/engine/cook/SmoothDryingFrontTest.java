package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

/**
 * A face's temperature and water activity move continuously as the layers under it dry
 * one after another: no saw-tooth from one time step to the next at the default grid and
 * step, on strips and on slabs, in oil, in a pan and in an oven. Round one's engine
 * jumped by 12 K (fry) and 85 K (sear, flips included) from one 0.5 s step to the next as
 * each layer ran dry, because a drying layer was pinned at the boiling point of its
 * moisture at the start of the step (it now is at the end's). Round two's jumped 5.8 K on
 * a 7 mm potato slab in the 0.03 s step that lands on the end of the cook: the face
 * layer, a tenth of a millimetre thick, boiled nearly dry in each step and diffusion
 * refilled it afterwards, so it ended every step above its boiling point and a short step
 * flashed the superheat off (the boiling now leaves in the moisture solve, with the
 * diffusion that refills the layer).
 * <p>
 * Bounds: 3 K per step (6 K/s, well below a face's own rate of climb while it crusts) and
 * 0.05 in water activity (the raw tissue's own aw is 0.97 on the potato isotherm: the one
 * step in which the last standing water leaves a face may drop it from 1 to there), after
 * the first 30 s (the face's contact transient, 5 → 100 °C in seconds, is physical).
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

	/** Fries as the app cooks them, square strips. */
	@Test
	void fryFaceClimbsWithoutSawTooth() {
		for (double mm : new double[] { 7, 10 }) {
			assertSmooth(mm + " mm strip", largestSteps(Surface.typical(FoodCategory.POTATO).withThicknessMm(mm),
					new DeepFryer(175), Target.stage("golden"), 0));
		}
	}

	/**
	 * Potato slabs fried to golden: the 7 mm slab dries right through its outer
	 * millimetres (10 min) and is where the last short step used to jump 5.8 K.
	 */
	@Test
	void friedSlabFaceClimbsWithoutSawTooth() {
		for (double mm : new double[] { 7, 10 }) {
			assertSmooth(mm + " mm slab",
					largestSteps(Surface.defaults(FoodCategory.POTATO).withShape(Shape.SLAB).withThicknessMm(mm),
							new DeepFryer(175), Target.stage("golden"), 0));
		}
	}

	@Test
	void searedFaceClimbsWithoutSawTooth() {
		Surface steak = Surface.defaults(FoodCategory.MEAT).withShape(Shape.SLAB).withThicknessMm(25);
		assertSmooth("still", largestSteps(steak, new PanContact(230, true, 0), Target.stage("browned"), 0));
		double[] turned = largestSteps(steak, new PanContact(230, true, 60), Target.stage("browned"), 60);
		assertTrue(turned[0] <= MAX_STEP_K, "turned every minute: largest step " + turned[0] + " K");
	}

	/** A loaf in a still deck oven: its crust dries over half an hour. */
	@Test
	void bakedFaceClimbsWithoutSawTooth() {
		Surface loaf = Surface.defaults(FoodCategory.BREAD).withShape(Shape.SLAB).withThicknessMm(40);
		assertSmooth("loaf", largestSteps(loaf, new Oven(200, false, 1.6), Target.stage("golden"), 0));
	}

	private static void assertSmooth(String what, double[] largest) {
		assertTrue(largest[0] <= MAX_STEP_K, what + ": largest step " + largest[0] + " K");
		assertTrue(largest[1] <= MAX_STEP_AW, what + ": largest step in aw " + largest[1]);
	}

}
