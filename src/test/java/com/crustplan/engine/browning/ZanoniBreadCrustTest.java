package com.crustplan.engine.browning;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.food.FoodCategory;

/**
 * Bread-crust colour kinetics of Zanoni, Peri &amp; Bruno (1995, LWT 28:604–609):
 * first-order approach of ΔE to ΔE∞ = 52, k = k0·exp(−Ea/RT), k0 = 42 000 s⁻¹, Ea = 64
 * 151 J/mol, checked through the bread category's rate and colour path.
 */
class ZanoniBreadCrustTest {

	private static final double DELTA_E_INFINITY = 52;

	private static double kelvin(double c) {
		return c + 273.15;
	}

	/**
	 * ΔE from the dough colour along the category's path after {@code seconds} at a
	 * constant surface temperature.
	 */
	private static double deltaEAfter(double seconds, double surfaceC) {
		BrowningKinetics kinetics = FoodCategory.BREAD.browning();
		double k = kinetics.rate().at(kelvin(surfaceC));
		double extent = 1 - Math.exp(-k * seconds);
		ColourPath path = FoodCategory.BREAD.colourPath();
		return path.colourAt(extent).deltaE(path.colourAt(0));
	}

	@Test
	void shouldUseZanonisRateConstant() {
		// Zanoni, Peri & Bruno 1995: k(200 °C) = 42 000·exp(−64 151/(8.314·473.15)) =
		// 3.478e-3 s⁻¹
		// (design note, derived). Tolerance: the fourth significant digit.
		assertEquals(3.478e-3, FoodCategory.BREAD.browning().rate().at(kelvin(200)), 0.0005e-3);
	}

	@Test
	void shouldMatchZanonisCrustColourAtAConstant200C() {
		// ΔE(t) = 52·(1 − exp(−k t)) at 200 °C: 17.74 after 120 s and 33.68 after 300 s
		// (design note, derived
		// from Zanoni et al. 1995). Tolerance 0.02: the path's end point sits at ΔE 51.99
		// from the dough colour
		// (anchors rounded to the quoted L*a*b* ranges), 0.02 % short of 52.
		assertEquals(17.74, deltaEAfter(120, 200), 0.02);
		assertEquals(33.68, deltaEAfter(300, 200), 0.02);
	}

	@Test
	void shouldFollowTheFirstOrderCurveAtEveryOvenTemperature() {
		// The same first-order law at the surface temperatures of Zanoni's bakes (crust
		// 140–220 °C here):
		// ΔE along the path must be 52·(1 − e^(−kt)) at every time; tolerance as above
		// (0.02 % of ΔE).
		for (double c = 140; c <= 220; c += 20) {
			double k = 42_000 * Math.exp(-64_151 / (8.314462618 * kelvin(c)));
			for (double t = 60; t <= 1800; t += 60) {
				double expected = DELTA_E_INFINITY * (1 - Math.exp(-k * t));
				assertEquals(expected, deltaEAfter(t, c), 0.0005 * expected + 1e-9, c + " °C, " + t + " s");
			}
		}
	}

	@Test
	void shouldLeaveTheRateAtZanonisValueOnADryCrustAtTheReferenceRecipe() {
		// Zanoni's rates were measured on dried crust: no second, peaked water-activity
		// factor below 1 may be
		// applied to a dry crust (design note §3), and the reference bread's pH and
		// reactants give factor 1.
		BrowningKinetics kinetics = FoodCategory.BREAD.browning();
		for (double aw = 0.05; aw <= kinetics.referenceWaterActivity().value() + 1e-9; aw += 0.05) {
			assertEquals(1.0, WaterActivityFactor.relative(aw, kinetics.referenceWaterActivity().value()), 1e-12);
		}
		assertEquals(1.0, kinetics.phFactor(FoodCategory.BREAD.defaultPh()), 1e-12);
		assertEquals(1.0, kinetics.reactantFactor(FoodCategory.BREAD.defaultComposition().reducingSugarPct(),
				FoodCategory.BREAD.defaultComposition().proteinPct()), 1e-12);
		// and the colour runs from dough (L* ≈ 80) towards dark crust, never lighter
		// (quoted bread range 80 → 25)
		Lab dough = FoodCategory.BREAD.colourPath().colourAt(0);
		assertEquals(80, dough.lightness(), 1e-9);
		assertTrue(FoodCategory.BREAD.colourPath().colourAt(1).lightness() >= 25);
	}

}
