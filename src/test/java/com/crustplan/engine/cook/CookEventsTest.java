package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.PanContact;

/**
 * Events and listeners of the cook, checked against the run's own series: an event fires
 * where the quantity it watches crosses its threshold (linear interpolation inside the
 * step, so to within what the quantity moves in one step), and a stopping handler ends
 * the cook there.
 */
class CookEventsTest {

	private static final Surface STEAK = Surface.defaults(FoodCategory.MEAT);

	private static final HeatSetup PAN = new PanContact(220, true, 60);

	private static final Target NEVER = Target.stage("charred");

	@Test
	void coreTemperatureEventStopsTheCookWhereTheCoreCrossesIt() {
		double[] firedAt = { Double.NaN };
		CookResult r = CookSimulation.of(STEAK, PAN, CookSettings.defaults().withOutputIntervalS(1), LayerReaction.NONE)
			.on(CookEvent.coreTemperatureReached(273.15 + 40), (step, f) -> {
				firedAt[0] = step.timeAt(f);
				return EventHandler.STOP.eventOccurred(step, f);
			})
			.run(NEVER);
		assertTrue(firedAt[0] > 0, "the event fired");
		List<Sample> series = r.series();
		Sample last = series.get(series.size() - 1);
		assertTrue(last.coreTemperatureC() >= 40 && last.coreTemperatureC() < 41, "stopped just past 40 °C: " + last);
		// the sample before the end was still below 40 °C and earlier than the event
		Sample before = series.get(series.size() - 2);
		assertTrue(before.coreTemperatureC() < 40 && before.timeS() <= firedAt[0] && firedAt[0] <= last.timeS());
		assertFalse(r.reached());
	}

	@Test
	void faceDriedFiresAfterTheStandingWaterIsGone() {
		Surface wet = STEAK.withSurfaceWaterGPerM2(100);
		double[] firedAt = { Double.NaN };
		double[] waterWhenFired = { Double.NaN };
		CookResult r = CookSimulation.of(wet, PAN, CookSettings.defaults().withRecordSeries(false), LayerReaction.NONE)
			.listen(new StepListener() {
				@Override
				public void handleStep(CookState state, StepInterpolator step) {
					if (Double.isNaN(waterWhenFired[0]) && !Double.isNaN(firedAt[0])) {
						waterWhenFired[0] = state.standingWater(0);
					}
				}
			})
			.on(CookEvent.faceDried(0.9), (step, f) -> {
				firedAt[0] = step.timeAt(f);
				return EventHandler.CONTINUE.eventOccurred(step, f);
			})
			.run(Target.stage("browned"));
		assertTrue(firedAt[0] > 0 && firedAt[0] < r.timeToTargetS(), "dried before it browned: " + firedAt[0]);
		assertEquals(0, waterWhenFired[0], 0.0, "no standing water once the face has dried");
	}

	@Test
	void listenersSeeStartEveryStepAndEnd() {
		int[] calls = new int[3];
		CookSettings settings = CookSettings.defaults().withHorizonS(10).withRecordSeries(false);
		CookSimulation.of(STEAK, PAN, settings, LayerReaction.NONE).listen(new StepListener() {
			@Override
			public void init(CookState state, StepInterpolator step) {
				calls[0]++;
			}

			@Override
			public void handleStep(CookState state, StepInterpolator step) {
				calls[1]++;
			}

			@Override
			public void finish(CookState state, StepInterpolator step) {
				calls[2]++;
			}
		}).run(NEVER);
		assertEquals(1, calls[0]);
		assertEquals(20, calls[1], "10 s in steps of 0.5 s");
		assertEquals(1, calls[2]);
	}

}
