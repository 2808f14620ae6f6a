package com.crustplan.engine.acrylamide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;

/**
 * Acrylamide follows its precursors in the direction the fry literature measures: 10 mm
 * square strips (fries) in 175 °C oil, the category's usual product.
 */
class AcrylamidePrecursorTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(3600).withOutputIntervalS(10);

	/**
	 * A frying potato with the given reducing sugar; starch gives way so the parts still
	 * sum to 100 %.
	 */
	private static Surface strip(double reducingSugarPct, double asparagineMgPerKg) {
		Composition c = FoodCategory.POTATO.defaultComposition();
		double starch = c.starchPct() - (reducingSugarPct - c.reducingSugarPct());
		Composition lot = new Composition(c.waterPct(), c.proteinPct(), c.fatPct(), reducingSugarPct, c.sucrosePct(),
				starch, c.fibrePct(), c.ashPct());
		return Surface.defaults(FoodCategory.POTATO)
			.withShape(Shape.STRIP)
			.withThicknessMm(10)
			.withComposition(lot)
			.withAsparagineMgPerKg(asparagineMgPerKg);
	}

	private static CookResult toGolden(Surface s) {
		CookResult r = CookSimulation.run(s, new DeepFryer(175), Target.stage("golden"),
				SETTINGS.withRecordSeries(false), AcrylamideFormation.REACTION);
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		return r;
	}

	/** Whole-strip acrylamide, µg/kg, after a fixed time in the oil. */
	private static double afterMinutes(Surface s, double minutes) {
		Target never = Target.lightness(FoodCategory.POTATO.colourPath().darkestLightness());
		CookResult r = CookSimulation.run(s, new DeepFryer(175), never, SETTINGS.withHorizonS(minutes * 60),
				AcrylamideFormation.REACTION);
		List<Sample> series = r.series();
		Sample last = series.get(series.size() - 1);
		assertEquals(minutes * 60, last.timeS(), 1e-6);
		return last.portionAcrylamideUgPerKg();
	}

	@Test
	void atEqualColourMoreReducingSugarGivesMoreAcrylamide() {
		// Amrein et al. 2003 (J Agric Food Chem 51:5556): acrylamide in potato follows
		// reducing sugar, asparagine being in excess; Pedreschi, Kaack & Granby 2006
		// (Food
		// Res Int 39:40): across pretreatments, acrylamide and colour rise together. A
		// low-
		// sugar lot fried to the same golden must not come out higher.
		double low = toGolden(strip(0.1, 3000)).portionAcrylamideAtTargetUgPerKg();
		double normal = toGolden(strip(0.4, 3000)).portionAcrylamideAtTargetUgPerKg();
		double high = toGolden(strip(1.0, 3000)).portionAcrylamideAtTargetUgPerKg();
		assertTrue(low < normal && normal < high, () -> low + " < " + normal + " < " + high + " µg/kg");
	}

	@Test
	void lowSugarLotTakesLongerToColourButNotFourTimesLonger() {
		// colour depends on reducing sugar less than linearly (chip colour also follows
		// protein, ascorbic acid and other constituents: Blenkinsop et al. 2002, J Agric
		// Food Chem 50:4545): a quarter of the sugar must not need four times the fry
		double low = toGolden(strip(0.1, 3000)).timeToTargetS();
		double normal = toGolden(strip(0.4, 3000)).timeToTargetS();
		assertTrue(low > normal && low < 2 * normal, () -> low / 60 + " min against " + normal / 60 + " min");
	}

	@Test
	void atEqualTimeMoreAsparagineGivesMoreAcrylamide() {
		// asparagine is the other precursor (Becalski et al. 2004; Knol et al. 2005, J
		// Agric Food Chem 53:6133): at the same time in the oil, more of it, more
		// acrylamide
		double less = afterMinutes(strip(0.4, 1500), 6);
		double usual = afterMinutes(strip(0.4, 3000), 6);
		double more = afterMinutes(strip(0.4, 6000), 6);
		assertTrue(less < usual && usual < more, () -> less + " < " + usual + " < " + more + " µg/kg");
	}

	@Test
	void atEqualTimeMoreReducingSugarGivesMoreAcrylamide() {
		// reducing sugar limits acrylamide in potato (Amrein et al. 2003; Becalski et al.
		// 2004): at the same time in the oil, more of it, more acrylamide
		double low = afterMinutes(strip(0.1, 3000), 6);
		double normal = afterMinutes(strip(0.4, 3000), 6);
		double high = afterMinutes(strip(1.0, 3000), 6);
		assertTrue(low < normal && normal < high, () -> low + " < " + normal + " < " + high + " µg/kg");
	}

}
