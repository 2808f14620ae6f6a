package com.crustplan.engine.cook;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.water.GabIsotherm;
import com.crustplan.engine.water.PoreVapourConductivity;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Sweet dough holds its water as a syrup: its water activity by Ross's rule, and
 * evaporation–condensation through the batter, which carries heat to the centre of a
 * baking sponge batter before its crust forms (Lostie, Peczalski, Andrieu &amp; Laurent
 * 2002, J Food Eng 51:131, "heating up" period; abstract seen).
 */
class SweetDoughBakeTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(3 * 3600).withOutputIntervalS(5);

	@Test
	void norrishMatchesMeasuredSucroseSolutions() {
		// 1 mol/kg sucrose: aw 0.9806 (osmotic coefficient 1.088; Robinson & Stokes 1959,
		// Electrolyte Solutions, appendix; from memory)
		assertThat(GabIsotherm.sugarSolutionActivity(1000, 342.3, 0)).isCloseTo(0.9806, within(0.002));
		// saturated sucrose at 25 °C, 67.4 % w/w: aw about 0.85 (Chirife, Ferro Fontan &
		// Benmergui 1980; from memory)
		assertThat(GabIsotherm.sugarSolutionActivity(32.6, 67.4, 0)).isCloseTo(0.85, within(0.02));
	}

	@Test
	void isothermIsTakenAtTheCategoryTypicalComposition() {
		Composition c = Surface.typical(FoodCategory.SWEET_DOUGH).composition();
		double solution = GabIsotherm.sugarSolutionActivity(c.waterPct(), c.sucrosePct(), c.reducingSugarPct());
		GabIsotherm sweet = FoodCategory.SWEET_DOUGH.isotherm();
		assertThat(sweet.solution().value()).isCloseTo(solution, within(1e-12));
		double sorbing = (c.proteinPct() + c.starchPct() + c.fibrePct() + c.ashPct()) / (100 - c.waterPct());
		assertThat(sweet.monolayer().value() / FoodCategory.BREAD.isotherm().monolayer().value()).isCloseTo(sorbing,
				within(1e-12));
		// bread's water is not a syrup: its walls are judged on aw itself, as before
		assertThat(FoodCategory.BREAD.isotherm().matrixActivity(0.93)).isEqualTo(0.93);
	}

	@Test
	void sweetBatterWallsAreWetWhereBreadCrustOnlySorbs() {
		GabIsotherm sweet = FoodCategory.SWEET_DOUGH.isotherm();
		double x = 25.0 / 75;
		double aw = sweet.waterActivity(x);
		// Ross: the typical batter's syrup (aw ≈ 0.95) on a matrix near 0.96
		assertThat(aw).isBetween(0.90, 0.95);
		assertThat(PoreVapourConductivity.at(363.15, aw, sweet.matrixActivity(aw))).isGreaterThan(0);
		// the same water on the bread-crust isotherm alone sits below the wet-wall
		// activity
		double asBread = FoodCategory.BREAD.isotherm().waterActivity(x);
		assertThat(PoreVapourConductivity.at(363.15, asBread)).isZero();
	}

	@Test
	void aFiftyMillimetreCakeBakesThroughInTheTimePracticeGives() {
		// 50 mm sponge or loaf cake at 170–180 °C: centre about 95–99 °C in 30–45 min
		// with
		// a golden top (common practice); the centre then holds near its boiling point
		Surface cake = Surface.typical(FoodCategory.SWEET_DOUGH).withThicknessMm(50);
		Oven oven = new Oven(180, false, 1.6);
		StepsResult done = AcrylamideCook.runSteps(cake, List.of(CookStep.toCore(oven, 96, SETTINGS.horizonS())), null,
				96.0, SETTINGS);
		assertThat(done.coreReachedAtS() / 60).isBetween(30.0, 45.0);
		CookResult golden = AcrylamideCook.run(cake, oven, Target.stage("golden"), SETTINGS);
		assertThat(golden.timeToTargetS() / 60).isBetween(20.0, 45.0);
		assertThat(golden.coreTemperatureAtTargetC()).isGreaterThan(60);
		assertThat(golden.series().stream().mapToDouble(Sample::coreTemperatureC).max().orElseThrow()).isLessThan(103);
	}

	@Test
	void aBiscuitIsGoldenAndBakedThroughInTheUsualTime() {
		// biscuits and cookies, 170–190 °C for 10–20 min (common practice)
		Surface biscuit = Surface.typical(FoodCategory.SWEET_DOUGH).withThicknessMm(15);
		CookResult golden = AcrylamideCook.run(biscuit, new Oven(180, false, 1.6), Target.stage("golden"), SETTINGS);
		assertThat(golden.timeToTargetS() / 60).isBetween(10.0, 20.0);
		assertThat(golden.coreTemperatureAtTargetC()).isGreaterThan(96);
	}

}
