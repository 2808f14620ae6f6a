package com.crustplan.engine.assessment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

class AcrylamideRiskMapTest {

	private static final Surface CHIPS = Surface.defaults(FoodCategory.POTATO);

	private static final Target GOLDEN = Target.stage("golden");

	private static final double STEP_S = 30;

	private static final double MAX_S = 900;

	private static RiskMap map;

	@BeforeAll
	static void compute() {
		map = RiskMap.compute(CHIPS, Product.FRENCH_FRIES, new DeepFryer(175), GOLDEN, new double[] { 160, 190 },
				STEP_S, MAX_S, CookSettings.defaults());
	}

	@Test
	void cellsAgreeWithSingleRunsAtTheSameSettings() {
		// each row is one run: a single run at the map's settings must give the same
		// numbers (same arithmetic:
		// exact to 1e-9)
		for (RiskMap.Row row : map.rows()) {
			CookResult single = AcrylamideCook.run(CHIPS, new DeepFryer(row.temperatureC()), GOLDEN,
					RiskMap.settingsFor(CookSettings.defaults(), STEP_S, MAX_S));
			List<Sample> series = single.series();
			assertEquals(series.size(), row.cells().size());
			assertEquals((int) (MAX_S / STEP_S) + 1, row.cells().size(), "a column every step from 0 to the end");
			for (int k = 0; k < series.size(); k++) {
				Sample s = series.get(k);
				RiskMap.Cell c = row.cells().get(k);
				assertEquals(k * STEP_S, c.timeS(), 1e-9);
				assertEquals(s.portionAcrylamideUgPerKg(), c.portionUgPerKg(),
						1e-9 * (1 + s.portionAcrylamideUgPerKg()));
				assertEquals(s.crustAcrylamideUgPerKg(), c.crustUgPerKg(), 1e-9 * (1 + s.crustAcrylamideUgPerKg()));
				assertEquals(s.browningExtent(), c.browningExtent(), 1e-12);
				assertEquals(BenchmarkLevel.FRENCH_FRIES.zoneOf(s.portionAcrylamideUgPerKg()), c.zone());
			}
		}
	}

	@Test
	void targetLineIsTheSingleRunsTimeToTarget() {
		// the run-on past the target and the output interval do not change when the
		// target is reached
		for (RiskMap.Row row : map.rows()) {
			CookResult plain = AcrylamideCook.run(CHIPS, new DeepFryer(row.temperatureC()), GOLDEN);
			assertTrue(row.reachesTarget());
			assertEquals(plain.timeToTargetS(), row.targetTimeS(), 1e-9);
			assertEquals(plain.portionAcrylamideAtTargetUgPerKg(), row.targetPortionUgPerKg(),
					1e-9 * plain.portionAcrylamideAtTargetUgPerKg());
		}
		assertTrue(map.rows().get(1).targetTimeS() < map.rows().get(0).targetTimeS(), "hotter oil, sooner golden");
	}

	@Test
	void stagesFollowTheCategoryAndZonesTheBenchmark() {
		RiskMap.Row hot = map.rows().get(1);
		assertEquals(RiskMap.UNBROWNED_KEY, hot.cells().get(0).stageKey());
		assertEquals(AcrylamideZone.LOW, hot.cells().get(0).zone());
		RiskMap.Cell atTarget = hot.cells()
			.stream()
			.filter(c -> c.timeS() >= hot.targetTimeS())
			.findFirst()
			.orElseThrow();
		assertEquals("golden", atTarget.stageKey());
		assertTrue(FoodCategory.POTATO.stage(hot.cells().get(hot.cells().size() - 1).stageKey()).isPresent());
		assertEquals(BenchmarkLevel.FRENCH_FRIES, map.benchmarkOrNull());
		assertEquals(AcrylamideCautions.ALL, map.cautions());
	}

	@Test
	void rowsChangeOnlyTheTemperatureOfTheHeatMode() {
		assertEquals(new Oven(180, true, 20), HeatSetups.withTemperature(new Oven(220, true, 20), 180));
		assertEquals(new PanContact(160, false, 45), HeatSetups.withTemperature(new PanContact(200, false, 45), 160));
		assertEquals(new RadiantGrill(600, 0), HeatSetups.withTemperature(new RadiantGrill(800, 0), 600));
		assertEquals(new DeepFryer(165), HeatSetups.withTemperature(new DeepFryer(180), 165));
		// a row outside the mode's range is refused with the field named
		assertEquals("temperatureC",
				assertThrows(InvalidInputException.class, () -> HeatSetups.withTemperature(new DeepFryer(180), 230))
					.field());
	}

	@Test
	void refusesMapsTooLargeOrForAnotherCategory() {
		InvalidInputException e = assertThrows(InvalidInputException.class,
				() -> RiskMap.compute(CHIPS, Product.FRENCH_FRIES, new DeepFryer(175), GOLDEN, new double[] { 170 }, 1,
						3600, CookSettings.defaults()));
		assertEquals("timeStepS", e.field());
		e = assertThrows(InvalidInputException.class, () -> RiskMap.compute(CHIPS, Product.BISCUITS, new DeepFryer(175),
				GOLDEN, new double[] { 170 }, 30, 600, CookSettings.defaults()));
		assertEquals("product", e.field());
	}

}
