package com.crustplan.engine.water;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.model.Parameter;

/**
 * The GAB sorption isotherm, X = Xm·C·K·aw / ((1 − K·aw)(1 − K·aw + C·K·aw)), and its
 * inverse.
 */
class GabIsothermTest {

	/** Potato, 40–50 °C: Xm 0.209, C 4.416, K 0.976 (Chemkhi et al. 2004, quoted). */
	private static final GabIsotherm POTATO = new GabIsotherm(
			Parameter.secondary("Xm", "", 0.209, "", "Chemkhi et al. 2004"),
			Parameter.secondary("C", "", 4.416, "", "Chemkhi et al. 2004"),
			Parameter.secondary("K", "", 0.976, "", "Chemkhi et al. 2004"));

	@Test
	void shouldEvaluateTheGabEquationForPotato() {
		// GAB equation written out by hand with Chemkhi et al.'s constants (van den Berg
		// 1985 form);
		// tolerance 1e-12, the same arithmetic.
		for (double aw = 0.05; aw < 1; aw += 0.05) {
			double ka = 0.976 * aw;
			double expected = 0.209 * 4.416 * ka / ((1 - ka) * (1 - ka + 4.416 * ka));
			assertEquals(expected, POTATO.moisture(aw), 1e-12, "aw " + aw);
		}
		// the monolayer: solving the GAB equation for X = Xm gives K·aw = 1/(1 + √C)
		double awMonolayer = 1 / (0.976 * (1 + Math.sqrt(4.416)));
		assertEquals(0.209, POTATO.moisture(awMonolayer), 1e-12);
	}

	@Test
	void shouldInvertTheIsothermForEveryCategory() {
		// The inverse (positive root of the GAB quadratic) must return the water activity
		// it came from, for
		// every category's isotherm; 1e-9 covers rounding.
		for (FoodCategory c : FoodCategory.values()) {
			GabIsotherm g = c.isotherm();
			for (double aw = 0.01; aw < 0.999; aw += 0.01) {
				assertEquals(aw, g.waterActivity(g.moisture(aw)), 1e-9, c + " aw " + aw);
			}
			assertEquals(1.0, g.waterActivity(g.freeWaterMoisture() * 1.5), 0, c + ": free water has aw 1");
			assertEquals(0.0, g.waterActivity(0), 0);
		}
	}

	@Test
	void shouldRiseMonotonicallyWithWaterActivity() {
		// Sorption isotherms of foods are monotone (type II, Brunauer classification).
		for (FoodCategory c : FoodCategory.values()) {
			double previous = -1;
			for (double aw = 0.01; aw <= 1.0; aw += 0.01) {
				double x = c.isotherm().moisture(aw);
				assertTrue(x > previous, c + " at aw " + aw);
				previous = x;
			}
		}
	}

	@Test
	void shouldRaiseTheBoilingPointOfBoundWater() {
		// Water at activity aw boils where aw·p_sat(T) = 101.325 kPa: aw 1 → 99.97 °C, aw
		// 0.5 → p_sat = 202.65 kPa →
		// 120.6 °C (IAPWS-IF97 saturation line; steam tables give 120.21 °C at 200 kPa).
		// Tolerance 0.05 K.
		assertEquals(373.12, WaterVapour.boilingTemperatureK(1.0), 0.05);
		assertEquals(SaturationPressure.saturationTemperatureK(202_650), WaterVapour.boilingTemperatureK(0.5), 1e-9);
		assertEquals(120.21 + 273.15, SaturationPressure.saturationTemperatureK(200_000), 0.05);
	}

	@Test
	void shouldKeepRossProductInTheRebasedIsotherm() {
		// Ross 1975 (Food Technol 29(3):26): aw of the mixture = aw of the matrix at its
		// own moisture × aw of the sugar solution; the rebased GAB must give exactly that
		GabIsotherm syrup = POTATO.withDissolvedSugar(0.6, 0.98, "test", "test");
		for (double x = 0.05; x < 1.2; x += 0.05) {
			double matrix = POTATO.waterActivity(x / 0.6);
			assertEquals(Math.min(1, matrix * 0.98), syrup.waterActivity(x), 1e-9, "X " + x);
		}
		assertEquals(POTATO.waterActivity(0.3), POTATO.withDissolvedSugar(1, 1, "same", "same").waterActivity(0.3),
				1e-15);
		assertEquals(0.5 / 0.98, syrup.matrixActivity(0.5), 1e-15);
	}

}
