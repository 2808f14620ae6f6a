package com.crustplan.engine.acrylamide;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;

/**
 * The default fries (the category's frying potato cut in 10 mm strips, 175 °C oil, fried
 * golden) against measured acrylamide in French fries cut from fresh potatoes, whole
 * portion as served (the basis the surveys measured).
 */
class GoldenFriesLevelTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(3600).withRecordSeries(false);

	private static double goldenPortion(double widthMm) {
		Surface fries = Surface.defaults(FoodCategory.POTATO).withShape(Shape.STRIP).withThicknessMm(widthMm);
		CookResult r = CookSimulation.run(fries, new DeepFryer(175), Target.stage("golden"), SETTINGS,
				AcrylamideFormation.REACTION);
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		return r.portionAcrylamideAtTargetUgPerKg();
	}

	@Test
	void goldenTenMillimetreFriesWithinTheMeasuredRangeForFreshCutFries() {
		// Lower bound: fries sorted "golden" in 31 school canteens, mean 134 µg/kg
		// (Mesias, Delgado-Andrade, Holgado & Morales 2020, Food Funct 11:1489; fries of
		// fresh potatoes there averaged 460, all colours). Upper bound: fries of fresh
		// potatoes fried in 208 households with "golden" as the end point, 95th
		// percentile 1747 µg/kg, mean 550 (Mesias et al. 2019, Food Addit Contam A). Both
		// whole portions. The model (1142 µg/kg at the last fit) sits in the range but
		// above both means: its potato is a 0.4 % reducing-sugar lot, near the top of
		// what
		// fry processing accepts, and its "golden" anchors are from memory.
		double ug = goldenPortion(10);
		assertTrue(ug > 134 && ug < 1747, () -> "golden 10 mm fries " + ug + " µg/kg");
	}

	@Test
	void sevenMillimetreFriesCarryMoreThanTenByMoreThanTheirSurfaceToVolumeRatio() {
		// Acrylamide of French fries follows the surface-to-volume ratio (Matthäus, Haase
		// & Vosmann 2004, Eur J Lipid Sci Technol 106:793). At equal crust depth and
		// level the 7 mm strip's portion holds 10/7 as much; fried to the same colour its
		// centre also heats and dries sooner, so its crust forms over a larger share of
		// the strip. Upper bound ours, only to catch a runaway: 3.5. Each of the three
		// effects (crust share, relative crust depth, drier centre) no larger than the
		// ratio itself would give (10/7)³ ≈ 2.9; the model gives 2.9–3.0 because its 7 mm
		// strip is down to about 14 % water by golden, where kitchens fry thin cuts for
		// less time: a known gap (README, what moved).
		double ratio = goldenPortion(7) / goldenPortion(10);
		double sv = 10.0 / 7.0;
		assertTrue(ratio > sv && ratio < 3.5, () -> "7 mm / 10 mm = " + ratio);
	}

}
