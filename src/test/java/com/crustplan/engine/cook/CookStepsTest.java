package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

/**
 * Cooks in several steps: the state carries across step boundaries, and each step ends as
 * it says.
 */
class CookStepsTest {

	private static final Surface STEAK = Surface.defaults(FoodCategory.MEAT).withThicknessMm(30);

	private static final CookSettings SETTINGS = CookSettings.defaults();

	private static StepsResult run(List<CookStep> steps, Double coreC) {
		return CookSimulation.runSteps(STEAK, steps, Target.stage("browned"), coreC, SETTINGS, LayerReaction.NONE);
	}

	/**
	 * A boundary between two identical steps changes nothing: conservation of the state
	 * across it.
	 */
	@Test
	void twoIdenticalStepsEqualOneStepOfTheirCombinedLength() {
		HeatSetup pan = new PanContact(230, true, 60);
		StepsResult one = run(List.of(CookStep.timed(pan, 240)), null);
		StepsResult two = run(List.of(CookStep.timed(pan, 120), CookStep.timed(pan, 120)), null);
		CookResult.FinalState a = one.cook().finalState();
		CookResult.FinalState b = two.cook().finalState();
		assertArrayEquals(a.temperatureK(), b.temperatureK(), 1e-9);
		assertArrayEquals(a.moistureDryBasis(), b.moistureDryBasis(), 1e-12);
		assertArrayEquals(a.standingWaterKgPerM2(), b.standingWaterKgPerM2(), 1e-12);
		assertEquals(one.cook().energy().heatInJPerM2(), two.cook().energy().heatInJPerM2(),
				1e-9 * Math.abs(one.cook().energy().heatInJPerM2()));
		assertEquals(one.cook().series().size(), two.cook().series().size());
		assertEquals(2, two.steps().size());
		assertEquals(120, two.steps().get(0).endS(), 1e-9);
		assertEquals(240, two.steps().get(1).endS(), 1e-9);
	}

	/**
	 * Sear, oven to 52 °C at the core, rest 5 min in kitchen air: the oven step ends on
	 * the core, and the core keeps rising after the pull (carry-over, as every kitchen
	 * knows: a few kelvin for a thick cut).
	 */
	@Test
	void searThenOvenToCoreThenRestCarriesOver() {
		HeatSetup pan = new PanContact(240, true, 60);
		HeatSetup oven = new Oven(180, true, 0);
		HeatSetup kitchen = new Rest(22);
		StepsResult r = run(
				List.of(CookStep.timed(pan, 180), CookStep.toCore(oven, 52, 3600), CookStep.timed(kitchen, 300)), 55.0);
		assertEquals(3, r.steps().size());
		CookStep.Record ovenStep = r.steps().get(1);
		assertEquals(CookStep.Ending.CORE, ovenStep.endedBy());
		assertTrue(ovenStep.coreAtEndC() >= 52 && ovenStep.coreAtEndC() < 53, "pulled at 52 °C: " + ovenStep);
		double peakDuringRest = r.cook()
			.series()
			.stream()
			.filter(s -> s.timeS() >= ovenStep.endS())
			.mapToDouble(Sample::coreTemperatureC)
			.max()
			.orElseThrow();
		assertTrue(peakDuringRest > ovenStep.coreAtEndC() + 1, "carry-over: " + peakDuringRest);
		assertEquals(300, r.steps().get(2).durationS(), 1e-9);
		assertEquals(CookStep.Ending.TIME, r.steps().get(2).endedBy());
	}

	@Test
	void aColourEndStopsTheStepAtThatColour() {
		HeatSetup pan = new PanContact(230, true, 0);
		StepsResult r = CookSimulation.runSteps(STEAK, List.of(CookStep.toColour(pan, Target.stage("browned"), 1800)),
				Target.stage("browned"), null, SETTINGS, LayerReaction.NONE);
		CookStep.Record step = r.steps().get(0);
		assertEquals(CookStep.Ending.COLOUR, step.endedBy());
		assertTrue(r.colourReached());
		assertTrue(step.endS() - r.cook().timeToTargetS() <= SETTINGS.timeStepS() + 1e-9, "ends in the step it browns");
	}

}
