package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.Oven;

/**
 * A whole loaf against what bakers and baking studies report: the crumb is baked before
 * the crust is golden, and a wet crumb holds at its boiling point.
 */
class BreadCrumbBakeTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(2 * 3600).withOutputIntervalS(10);

	/** An 80 mm loaf as a long strip (a tin loaf or bâtard heated on all four sides). */
	private final Surface loaf = Surface.typical(FoodCategory.BREAD).withShape(Shape.STRIP).withThicknessMm(80);

	private final Oven oven = new Oven(200, false, 1.6);

	@Test
	void shouldBakeTheCrumbBeforeTheCrustIsGolden() {
		// common practice: a loaf is done, crumb 96–99 °C, in roughly 25–45 min at
		// 200 °C with a golden crust; the crumb reaches its ≈100 °C plateau before
		// the crust is finished (the evaporation front of Zanoni, Peri & Pierucci
		// 1993, J Food Eng 19:389, behind which the crumb tends to 100 °C)
		CookResult golden = CookSimulation.run(loaf, oven, Target.stage("golden"), SETTINGS);
		assertTrue(golden.reached(), String.valueOf(golden.explanation()));
		double goldenMin = golden.timeToTargetS() / 60;
		assertTrue(goldenMin >= 25 && goldenMin <= 45, "golden at " + goldenMin + " min");
		StepsResult crumb = CookSimulation.runSteps(loaf, List.of(CookStep.toCore(oven, 96, SETTINGS.horizonS())), null,
				96.0, SETTINGS, LayerReaction.NONE);
		assertTrue(crumb.coreReached());
		assertTrue(crumb.coreReachedAtS() < golden.timeToTargetS(),
				"crumb 96 °C at " + crumb.coreReachedAtS() / 60 + " min, golden at " + goldenMin + " min");
	}

	@Test
	void shouldHoldTheWetCrumbAtItsBoilingPoint() {
		// Zanoni, Peri & Pierucci 1993: the crumb's moisture stays near its
		// initial value and its temperature tends to 100 °C, however long the bake
		// (crumb ≈ 99–100 °C in bread-baking measurements)
		CookResult dark = CookSimulation.run(loaf, oven, Target.stage("dark"), SETTINGS);
		double hottestCore = dark.series().stream().mapToDouble(Sample::coreTemperatureC).max().orElseThrow();
		assertTrue(hottestCore > 98 && hottestCore < 101, "hottest crumb " + hottestCore + " °C");
	}

}
