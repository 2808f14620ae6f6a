package com.crustplan.engine.calibration;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.PanContact;

/**
 * Each category's browning k0 was calibrated to a kitchen-practice claim (the comment
 * beside the constant in FoodCategory); these tests re-run that claim so a later change
 * that breaks it fails.
 */
class CategoryCalibrationTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(3600).withOutputIntervalS(5);

	@Test
	@DisplayName("potato k0: 10 mm chips in 175 °C oil are golden in 6–8 min (common practice)")
	void potatoChipsGoldenInSixToEightMinutes() {
		CookResult r = CookSimulation.run(Surface.defaults(FoodCategory.POTATO).withThicknessMm(10), new DeepFryer(175),
				Target.stage("golden"), SETTINGS);
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		double min = r.timeToTargetS() / 60;
		assertTrue(min >= 6 && min <= 8, "golden at " + min + " min");
	}

	@Test
	@DisplayName("meat k0: a patted-dry 25 mm steak in a 220 °C oiled pan is browned in 3–4 min a side (common practice)")
	void meatBrownedInThreeToFourMinutesASide() {
		// recalibrated when the drying crust became a shrinking solid rather than an air
		// shell: the face runs cooler, 2.0e5 1/s gave 4.3 min
		CookResult r = CookSimulation.run(Surface.defaults(FoodCategory.MEAT).withSurfaceWaterGPerM2(0),
				new PanContact(220, true, 0), Target.stage("browned"), SETTINGS);
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		double min = r.timeToTargetS() / 60;
		assertTrue(min >= 3 && min <= 4, "browned at " + min + " min");
	}

}
