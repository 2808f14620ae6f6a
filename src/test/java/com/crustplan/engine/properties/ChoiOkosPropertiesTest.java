package com.crustplan.engine.properties;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Choi &amp; Okos (1986) component polynomials and mixing rules, as reproduced in the
 * ASHRAE Handbook — Refrigeration, "Thermal Properties of Foods", against values worked
 * out by hand from those formulas and against handbook properties of real water.
 */
class ChoiOkosPropertiesTest {

	/**
	 * Mass fractions in FoodComponent order: water, protein, fat, carbohydrate, fibre,
	 * ash.
	 */
	private static final double[] PURE_WATER = { 1, 0, 0, 0, 0, 0 };

	/** The ASHRAE worked example: 83 % water, 12 % protein, 5 % carbohydrate. */
	private static final double[] LEAN_MIX = { 0.83, 0.12, 0, 0.05, 0, 0 };

	@Test
	void shouldReproduceTheFitsOwnWaterAt20C() {
		// Hand evaluation of the Choi–Okos water polynomials at 20 °C (ASHRAE
		// Refrigeration, Thermal
		// Properties of Foods, Table 1): ρ = 997.18 + 3.1439e-3·20 − 3.7574e-3·400 =
		// 995.74 kg/m³,
		// cp = 4.1289 − 9.0864e-5·20 + 5.4731e-6·400 = 4.1293 kJ/kgK, k = 0.57109 +
		// 1.7625e-3·20 − 6.7036e-6·400 = 0.6037.
		// Tolerance: half a unit in the last quoted digit — this is the same arithmetic,
		// so only rounding may differ.
		assertEquals(995.74, ThermalProperties.density(PURE_WATER, 20), 0.005);
		assertEquals(4129.3, ThermalProperties.specificHeat(PURE_WATER, 20), 0.05);
		assertEquals(0.6037, ThermalProperties.conductivity(PURE_WATER, 20), 0.00005);
	}

	@Test
	void shouldStayCloseToHandbookPropertiesOfRealWater() {
		// Real water at 20 °C: ρ 998.2 kg/m³, cp 4.182 kJ/kgK, k 0.598 W/mK (CRC Handbook
		// of Chemistry and
		// Physics; Incropera, Fundamentals of Heat and Mass Transfer, Table A.6). The
		// Choi–Okos fit is a
		// regression over −40…150 °C and misses real water by 0.25 % (ρ), 1.3 % (cp) and
		// 0.9 % (k);
		// tolerances 1 % for ρ and 2 % for cp and k hold the fit to its known deviation,
		// no tighter.
		assertEquals(998.2, ThermalProperties.density(PURE_WATER, 20), 998.2 * 0.01);
		assertEquals(4182, ThermalProperties.specificHeat(PURE_WATER, 20), 4182 * 0.02);
		assertEquals(0.598, ThermalProperties.conductivity(PURE_WATER, 20), 0.598 * 0.02);
	}

	@Test
	void shouldMatchTheWorkedExampleForALeanComposition() {
		// ASHRAE Refrigeration, Thermal Properties of Foods, worked example (83 % water,
		// 12 % protein,
		// 5 % carbohydrate at 22 °C): ρ 1045.8 kg/m³; cp 3.751 kJ/kgK and k 0.556 W/mK by
		// the same mixing
		// rules (cp mass-weighted, k volume-weighted). Tolerance: rounding of the quoted
		// figures.
		assertEquals(1045.8, ThermalProperties.density(LEAN_MIX, 22), 0.05);
		assertEquals(3751, ThermalProperties.specificHeat(LEAN_MIX, 22), 0.5);
		assertEquals(0.556, ThermalProperties.conductivity(LEAN_MIX, 22), 0.0005);
	}

	@Test
	void shouldHaveWaterSpecificHeatRisingFrom40To100C() {
		// Real water's cp has its minimum near 35 °C and rises towards 100 °C (4.179 →
		// 4.217 kJ/kgK, Incropera
		// Table A.6); some reproductions of the fit flip the signs of the cp terms, which
		// would make it fall.
		double previous = FoodComponent.WATER.specificHeat(40);
		for (int t = 45; t <= 100; t += 5) {
			double cp = FoodComponent.WATER.specificHeat(t);
			assertTrue(cp > previous, "water cp must rise at " + t + " °C");
			previous = cp;
		}
		// and by a realistic amount: the fit rises 4.1619 → 4.1745 kJ/kgK, real water
		// about 0.04 kJ/kgK.
		double rise = FoodComponent.WATER.specificHeat(100) - FoodComponent.WATER.specificHeat(40);
		assertTrue(rise > 10 && rise < 80, "rise " + rise + " J/kgK");
	}

	@Test
	void shouldIntegrateSpecificHeatExactlyIntoEnthalpy() {
		// Enthalpy relative to 0 °C must be the integral of cp: checked against a
		// 2000-panel Simpson rule of
		// the same polynomial (error far below 1e-6 J/kg for a quadratic, where Simpson
		// is exact).
		for (FoodComponent c : FoodComponent.values()) {
			for (double t : new double[] { -20, 25, 100, 150 }) {
				int panels = 2000;
				double h = t / panels;
				double sum = c.specificHeat(0) + c.specificHeat(t);
				for (int i = 1; i < panels; i++) {
					sum += (i % 2 == 1 ? 4 : 2) * c.specificHeat(i * h);
				}
				assertEquals(sum * h / 3, c.enthalpy(t), 1e-6, c + " at " + t);
			}
		}
	}

}
