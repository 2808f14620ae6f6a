package com.crustplan.engine.calibration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.Parameter;

/**
 * Each category's browning k0 was calibrated to a kitchen-practice claim (the comment
 * beside the constant in FoodCategory); these tests re-run that claim so a later change
 * that breaks it fails.
 */
class CategoryCalibrationTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(3600).withOutputIntervalS(5);

	@Test
	@DisplayName("potato k0: 10 mm square strips (fries) in 175 °C oil are golden in 6–8 min (common practice)")
	void potatoChipsGoldenInSixToEightMinutes() {
		// run on the strip, the category's usual shape, since fries became strips (it ran
		// on a 10 mm slab before; 1.5e5 1/s gave 4.6 min on the strip)
		CookResult r = CookSimulation.run(
				Surface.defaults(FoodCategory.POTATO).withShape(Shape.STRIP).withThicknessMm(10), new DeepFryer(175),
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

	@Test
	@DisplayName("poultry k0: skin-on chicken in a 200 °C fan oven is golden in 20–30 min (common practice)")
	void poultrySkinGoldenInTwentyToThirtyMinutes() {
		CookResult r = CookSimulation.run(Surface.defaults(FoodCategory.POULTRY_SKIN), new Oven(200, true, 1.6),
				Target.stage("golden"), SETTINGS);
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		double min = r.timeToTargetS() / 60;
		assertTrue(min >= 20 && min <= 30, "golden at " + min + " min");
	}

	@Test
	@DisplayName("bread k0: Zanoni, Peri & Bruno 1995 (LWT 28:604), 42 000 1/s, published, not calibrated; sweet dough borrows it, labelled an assumption")
	void breadKineticsArePublishedNotCalibrated() {
		Parameter bread = FoodCategory.BREAD.browning().rate().preExponential();
		assertThat(bread.value()).isEqualTo(42_000);
		assertThat(bread.evidence()).isEqualTo(Evidence.PUBLISHED);
		assertThat(bread.source()).contains("Zanoni");
		// the bread crust fit was never measured on sweet dough
		Parameter sweet = FoodCategory.SWEET_DOUGH.browning().rate().preExponential();
		assertThat(sweet.value()).isEqualTo(42_000);
		assertThat(sweet.evidence()).isEqualTo(Evidence.ASSUMPTION);
		assertThat(sweet.source()).contains("Zanoni");
		assertThat(FoodCategory.SWEET_DOUGH.browning().rate().activationEnergy().evidence())
			.isEqualTo(Evidence.ASSUMPTION);
	}

	@Test
	@DisplayName("fish k0: the first-order L* fit of radial grilling (J Food Eng 116:130, 2013), 4759 1/s, authors from memory")
	void fishKineticsAreTheGrillingFit() {
		Parameter k0 = FoodCategory.FISH.browning().rate().preExponential();
		assertThat(k0.value()).isEqualTo(4759);
		assertThat(k0.evidence()).isEqualTo(Evidence.FROM_MEMORY);
		assertThat(FoodCategory.FISH.browning().rate().activationEnergy().value()).isEqualTo(50.7e3);
	}

	@Test
	@DisplayName("vegetable k0: the potato calibration borrowed, labelled an assumption, never calibrated for vegetables")
	void vegetableBorrowsThePotatoValue() {
		Parameter k0 = FoodCategory.VEGETABLE.browning().rate().preExponential();
		assertThat(k0.value()).isEqualTo(FoodCategory.POTATO.browning().rate().preExponential().value());
		assertThat(k0.evidence()).isEqualTo(Evidence.ASSUMPTION);
	}

}
