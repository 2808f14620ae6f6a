package com.crustplan.engine.assessment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.system.MessageText;

/**
 * Warnings from Regulation (EU) 2017/2158 Annex II (retail and catering measures) and the
 * estimate's cautions.
 */
class AcrylamideWarningsTest {

	/** The engine speaks in codes: its text is read as the API shows it (°C). */
	static final MessageText TEXT = new MessageText();

	private static final Surface CHIPS = Surface.defaults(FoodCategory.POTATO);

	private static List<String> codes(Surface s, HeatSetup h, Target t, double portion) {
		return AcrylamideWarnings.check(s, Product.defaultFor(s.category()), h, t, portion)
			.stream()
			.map(AcrylamideWarning::code)
			.toList();
	}

	@Test
	void fryingAt175OrAboveIsFlagged() {
		// Annex II Part A: frying temperatures shall be below 175 °C
		assertTrue(
				codes(CHIPS, new DeepFryer(175), Target.stage("golden"), 0).contains(AcrylamideWarning.FRYING_TOO_HOT));
		assertFalse(
				codes(CHIPS, new DeepFryer(170), Target.stage("golden"), 0).contains(AcrylamideWarning.FRYING_TOO_HOT));
		// the measure is for potato products
		assertFalse(codes(Surface.defaults(FoodCategory.FISH), new DeepFryer(180), Target.stage("golden"), 0)
			.contains(AcrylamideWarning.FRYING_TOO_HOT));
	}

	@Test
	void darkerThanTheColourGuideIsFlagged() {
		// Annex II Part A: colour guides for fries; bake and toast to a lighter colour
		assertTrue(codes(CHIPS, new DeepFryer(170), Target.stage("brown"), 0)
			.contains(AcrylamideWarning.DARKER_THAN_GUIDE));
		assertFalse(codes(CHIPS, new DeepFryer(170), Target.stage("golden"), 0)
			.contains(AcrylamideWarning.DARKER_THAN_GUIDE));
		assertTrue(codes(Surface.defaults(FoodCategory.BREAD), new Oven(220, false, 1.6), Target.stage("dark"), 0)
			.contains(AcrylamideWarning.DARKER_THAN_GUIDE));
		assertFalse(
				codes(Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 60), Target.stage("charred"), 0)
					.contains(AcrylamideWarning.DARKER_THAN_GUIDE),
				"no colour guide measure for meat");
	}

	@Test
	void highSugarPotatoesAreFlagged() {
		// Annex II Part A: use lower-sugar varieties; store above 6 °C
		Surface sweet = CHIPS.withComposition(new Composition(79, 2, 0.1, 1.2, 0.2, 14.7, 1.8, 1));
		assertTrue(codes(sweet, new DeepFryer(170), Target.stage("golden"), 0)
			.contains(AcrylamideWarning.HIGH_SUGAR_POTATO));
		assertFalse(codes(CHIPS, new DeepFryer(170), Target.stage("golden"), 0)
			.contains(AcrylamideWarning.HIGH_SUGAR_POTATO));
	}

	@Test
	void estimatesNearOrOverTheBenchmarkAreFlagged() {
		assertTrue(codes(CHIPS, new DeepFryer(170), Target.stage("golden"), 600)
			.contains(AcrylamideWarning.OVER_BENCHMARK));
		assertTrue(codes(CHIPS, new DeepFryer(170), Target.stage("golden"), 300)
			.contains(AcrylamideWarning.NEAR_BENCHMARK));
		assertEquals(List.of(), codes(CHIPS, new DeepFryer(170), Target.stage("golden"), 100));
	}

	@Test
	void everyEstimateCarriesTheCautions() {
		HeatSetup fryer = new DeepFryer(170);
		Target golden = Target.stage("golden");
		CookResult r = AcrylamideCook.run(CHIPS, fryer, golden);
		AcrylamideEstimate e = AcrylamideEstimate.of(CHIPS, Product.FRENCH_FRIES, fryer, golden, r);
		assertTrue(e.atTarget());
		assertEquals(r.portionAcrylamideAtTargetUgPerKg(), e.portionUgPerKg(), 0.0);
		assertEquals(BenchmarkLevel.FRENCH_FRIES, e.benchmark().orElseThrow());
		assertEquals(BenchmarkLevel.FRENCH_FRIES.zoneOf(e.portionUgPerKg()), e.zone());
		// IARC Monographs vol. 60: Group 2A
		assertTrue(TEXT.celsius(e.cautions())
			.stream()
			.anyMatch(c -> c.contains("Group 2A") && c.contains("probably carcinogenic")));
		assertTrue(TEXT.celsius(e.cautions()).stream().anyMatch(c -> c.contains("not an analysis")));
		assertTrue(TEXT.celsius(e.cautions())
			.stream()
			.anyMatch(c -> c.contains("laboratory analysis") && c.contains("food authority")));
		AcrylamideEstimate meat = AcrylamideEstimate.of(Surface.defaults(FoodCategory.MEAT), Product.MEAT,
				new PanContact(220, true, 60), Target.stage("browned"), AcrylamideCook
					.run(Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 60), Target.stage("browned")));
		assertEquals(AcrylamideZone.NO_BENCHMARK, meat.zone());
		assertEquals(AcrylamideCautions.ALL, meat.cautions());
	}

}
