package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.browning.Caramelisation;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

/**
 * Whole cooks against what every kitchen knows and the browning literature reports: wet
 * surfaces do not brown, dry ones at 140–165 °C brown in minutes, browning needs reducing
 * sugar, runs faster at higher pH, and sucrose alone only caramelises, slowly below about
 * 160 °C.
 */
class BrowningTradeFactsTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(1800).withOutputIntervalS(5);

	private static final Surface STEAK = Surface.defaults(FoodCategory.MEAT);

	private static final HeatSetup HOT_PAN = new PanContact(220, true, 0);

	private static CookResult cook(Surface surface, HeatSetup setup, Target target) {
		return CookSimulation.run(surface, setup, target, SETTINGS);
	}

	/** Surface temperature at the last output before the target was reached, °C. */
	private static double surfaceAtTarget(CookResult r) {
		double ts = Double.NaN;
		for (Sample s : r.series()) {
			if (s.timeS() <= r.timeToTargetS()) {
				ts = s.surfaceTemperatureC();
			}
		}
		return ts;
	}

	@Test
	void shouldBarelyBrownAWetSurfacePinnedNearBoilingInThirtyMinutes() {
		// A thick (40 mm) cold steak carrying 1 kg/m² of water in an oven of pure steam
		// at 100 °C: the face is
		// held wet at ≈ 100 °C (steam condenses on it) for the whole 30 min. Browning
		// needs a drying surface
		// (Labuza et al. 1977: rate → 0 as aw → 1); "barely browns" is taken as extent
		// below 0.05, a tenth of a
		// browned crust.
		CookResult r = cook(STEAK.withSurfaceWaterGPerM2(1000).withThicknessMm(40), new Oven(100, false, 100),
				Target.stage("light-sear"));
		assertFalse(r.reached());
		assertEquals(Outcome.WET_PLATEAU, r.outcome());
		assertTrue(r.finalBrowningExtent() < 0.05, "extent " + r.finalBrowningExtent());
		assertTrue(r.maxSurfaceTemperatureC() <= 100.5, "max surface " + r.maxSurfaceTemperatureC());
		assertEquals(1800, r.simulatedS(), 1e-6);
	}

	@Test
	void shouldBrownADrySurfaceAt140To165CInMinutes() {
		// A patted-dry steak on a pan at 170, 185 and 200 °C: its face settles at 140–165
		// °C and is browned
		// (stage "browned", extent 0.45) within minutes — common kitchen practice, 2–5
		// min a side. Bounds: the
		// face between 135 and 170 °C when the target is reached, the time between 1 and
		// 8 min.
		for (double pan : new double[] { 170, 185, 200 }) {
			CookResult r = cook(STEAK.withSurfaceWaterGPerM2(0), new PanContact(pan, true, 0), Target.stage("browned"));
			assertTrue(r.reached(), pan + " °C pan: " + r.explanation());
			double ts = surfaceAtTarget(r);
			assertTrue(ts >= 135 && ts <= 170, pan + " °C pan: face " + ts + " °C at the target");
			assertTrue(r.timeToTargetS() >= 60 && r.timeToTargetS() <= 480,
					pan + " °C pan: " + r.timeToTargetS() + " s");
		}
	}

	@Test
	void shouldBrownFarSlowerWithoutReducingSugar() {
		// Maillard browning needs a reducing sugar (design note §4; Martins & van Boekel
		// 2005): the same steak
		// without any must not reach the stage in 5× the time the normal steak needs —
		// here not at all.
		CookResult normal = cook(STEAK, HOT_PAN, Target.stage("browned"));
		assertTrue(normal.reached(), String.valueOf(normal.explanation()));
		Surface sugarFree = STEAK.withComposition(STEAK.composition().withReducingSugarPct(0));
		CookResult none = CookSimulation.run(sugarFree, HOT_PAN, Target.stage("browned"),
				SETTINGS.withHorizonS(5 * normal.timeToTargetS()));
		assertFalse(none.reached());
		assertEquals(Outcome.NO_REACTANTS, none.outcome());
		assertTrue(none.finalBrowningExtent() < 0.01, "extent " + none.finalBrowningExtent());
	}

	@Test
	void shouldBrownFasterAtHigherPh() {
		// log k rises about linearly with pH in the food range (Martins & van Boekel
		// 2005, Food Chem 92:437):
		// the same steak at pH 5.0, 5.6 and 6.6 must reach the stage sooner each time.
		double previous = Double.MAX_VALUE;
		for (double ph : new double[] { 5.0, 5.6, 6.6 }) {
			CookResult r = cook(STEAK.withPh(ph), HOT_PAN, Target.stage("browned"));
			assertTrue(r.reached(), "pH " + ph + ": " + r.explanation());
			assertTrue(r.timeToTargetS() < previous, "pH " + ph + ": " + r.timeToTargetS() + " s after " + previous);
			previous = r.timeToTargetS();
		}
	}

	@Test
	void shouldBrownFasterWithAPinchOfBicarbonate() {
		// 1.15 g of sodium bicarbonate per 454 g of beef raises pH by 0.59 (β 51
		// mmol/(pH·kg), Puolanne &
		// Kivikari 2000; see AcidityTest), and so browns the steak sooner (Martins & van
		// Boekel 2005).
		CookResult plain = cook(STEAK.withPh(5.6), HOT_PAN, Target.stage("browned"));
		CookResult treated = cook(STEAK.withPh(5.6).withBicarbonateGPerKg(1.15 / 0.454), HOT_PAN,
				Target.stage("browned"));
		assertEquals(5.6 + 0.591, treated.ph(), 0.001);
		assertTrue(treated.timeToTargetS() < plain.timeToTargetS(),
				treated.timeToTargetS() + " s with bicarbonate, " + plain.timeToTargetS() + " s without");
	}

	@Test
	void shouldBrownSucroseOnlyByCaramelisationAndSlowlyBelow160C() {
		// Sucrose is not a reducing sugar: without reducing sugar a sweet dough browns
		// only by caramelisation,
		// significant above ≈ 160 °C (design note §4). In a 150 °C oven (face stays below
		// 160 °C) the extent
		// after 30 min must stay under 0.05 (ΔE below 3 on the sweet-dough path: barely
		// visible), against more
		// than 0.2 for the same dough with 2 % reducing sugar;
		// at 200 °C caramelisation must make clearly more colour than at 150 °C.
		Surface sweet = Surface.defaults(FoodCategory.SWEET_DOUGH);
		Composition c = sweet.composition();
		assertTrue(c.sucrosePct() >= 10 && c.reducingSugarPct() > 0);
		Surface sucroseOnly = sweet.withComposition(c.withReducingSugarPct(0));
		HeatSetup cool = new Oven(150, true, 2);
		CookResult caramelCool = cook(sucroseOnly, cool, Target.stage("golden"));
		CookResult maillardCool = cook(sweet, cool, Target.stage("golden"));
		assertTrue(caramelCool.maxSurfaceTemperatureC() < 160);
		assertTrue(caramelCool.finalBrowningExtent() < 0.05,
				"sucrose only at 150 °C: " + caramelCool.finalBrowningExtent());
		assertTrue(maillardCool.finalBrowningExtent() > 0.2,
				"with reducing sugar: " + maillardCool.finalBrowningExtent());
		CookResult caramelHot = cook(sucroseOnly, new Oven(200, true, 2), Target.stage("golden"));
		assertTrue(caramelHot.finalBrowningExtent() > 5 * caramelCool.finalBrowningExtent(),
				"200 °C " + caramelHot.finalBrowningExtent() + " vs 150 °C " + caramelCool.finalBrowningExtent());
		// and with neither sugar the dough cannot brown at all
		CookResult noSugar = cook(sweet.withComposition(c.withReducingSugarPct(0).withSucrosePct(0)),
				new Oven(200, true, 2), Target.stage("golden"));
		assertEquals(Outcome.NO_REACTANTS, noSugar.outcome());
	}

	@Test
	void shouldGiveCaramelisationAMuchSteeperTemperatureDependenceThanMaillard() {
		// Caramelisation's activation energy (≈ 130 kJ/mol, Quintas, Brandão & Silva 2007
		// — from memory) is twice
		// Zanoni's 64 kJ/mol: from 150 to 180 °C it must speed up more than tenfold
		// (exp(−Ea/R·Δ(1/T)) = 11.5),
		// where Maillard browning speeds up about threefold. Tolerance 1 %: exact
		// Arrhenius arithmetic.
		double ratio = Caramelisation.RATE.at(453.15) / Caramelisation.RATE.at(423.15);
		assertEquals(Math.exp(130e3 / 8.314462618 * (1 / 423.15 - 1 / 453.15)), ratio, ratio * 0.01);
		assertTrue(ratio > 10);
		double maillard = FoodCategory.BREAD.browning().rate().at(453.15)
				/ FoodCategory.BREAD.browning().rate().at(423.15);
		assertTrue(maillard < 4, "Maillard ratio " + maillard);
	}

	@Test
	void shouldFryPotatoChipsGoldenInAPlausibleTime() {
		// Plausibility only (potato k0 is still being calibrated): 10 mm chips in oil at
		// 175 °C reach golden
		// (L* 62) in 3–15 min — single-stage frying of chips takes 5–10 min in common
		// practice, and Krokida et
		// al. 2001 (J Food Eng 48:219) report first-order colour change that is faster at
		// higher oil temperature.
		Surface chips = Surface.defaults(FoodCategory.POTATO).withThicknessMm(10);
		CookResult r = cook(chips, new DeepFryer(175), Target.lightness(62));
		assertTrue(r.reached(), String.valueOf(r.explanation()));
		assertTrue(r.timeToTargetS() >= 180 && r.timeToTargetS() <= 900, r.timeToTargetS() + " s");
		// the face in oil stays below the oil temperature (design note §3)
		assertTrue(r.maxSurfaceTemperatureC() < 175);
	}

	@Test
	void shouldFryPotatoFasterInHotterOilAndWithMoreSugar() {
		// Monotone trends of the frying literature (Krokida et al. 2001: colour rate
		// rises with oil temperature;
		// Pedreschi et al. 2005, Food Res Int 38:1: darker with more reducing sugar):
		// strictly shorter times to
		// golden at 160 → 175 → 190 °C, and longer with a quarter of the sugar.
		Surface chips = Surface.defaults(FoodCategory.POTATO).withThicknessMm(10);
		double previous = Double.MAX_VALUE;
		double at175 = Double.NaN;
		for (double oil : new double[] { 160, 175, 190 }) {
			CookResult r = cook(chips, new DeepFryer(oil), Target.lightness(62));
			assertTrue(r.reached(), oil + " °C: " + r.explanation());
			assertTrue(r.timeToTargetS() < previous, oil + " °C: " + r.timeToTargetS() + " s after " + previous);
			previous = r.timeToTargetS();
			if (oil == 175) {
				at175 = r.timeToTargetS();
			}
		}
		Surface lowSugar = chips.withComposition(chips.composition().withReducingSugarPct(0.1));
		CookResult slow = cook(lowSugar, new DeepFryer(175), Target.lightness(62));
		assertTrue(!slow.reached() || slow.timeToTargetS() > at175,
				"low sugar " + slow.timeToTargetS() + " s vs " + at175);
	}

}
