package com.crustplan.engine.heat;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.water.Atmosphere;

/**
 * The wet-bulb temperature of oven air. The engine uses the vapour-density form of the
 * heat and mass transfer analogy, J = h_m(ρv,s − ρv,∞) with h/h_m = ρ·cp·Le^(2/3)
 * (Chilton–Colburn; Incropera, Fundamentals of Heat and Mass Transfer, §6.7), Le = 0.85.
 */
class WetBulbTest {

	/**
	 * Humidity ratio W (kg vapour per kg dry air) → steam volume fraction y = W/(0.622 +
	 * W).
	 */
	static Atmosphere ovenAir(double temperatureC, double humidityRatio) {
		return new Atmosphere(temperatureC + 273.15, humidityRatio / (0.621945 + humidityRatio));
	}

	@Test
	void shouldMatchThePsychrometricWetBulbOfDryOvenAir() {
		// Design note figures (psychrometric balance with Le = 1, derived): 200 °C air
		// with W = 0.01 kg/kg
		// → about 45–48 °C. The textbook forms of the analogy (humidity-ratio or
		// vapour-density driving force,
		// Le = 1 or Le^(2/3)) differ by 2.5–5 K at oven conditions, so the tolerance is
		// ±5 K around that band.
		double wb = WetBulb.temperatureC(ovenAir(200, 0.01), HeatSetup.OVEN_FAN.value());
		assertTrue(wb >= 45 - 5 && wb <= 48 + 5, "wet bulb " + wb + " °C");
	}

	@Test
	void shouldMatchThePsychrometricWetBulbOfSteamyOvenAir() {
		// Design note: 200 °C air with W = 0.2 kg/kg → about 70 °C; ±5 K for the same
		// reason as above.
		double wb = WetBulb.temperatureC(ovenAir(200, 0.2), HeatSetup.OVEN_FAN.value());
		assertEquals(70, wb, 5, "wet bulb " + wb + " °C");
	}

	@Test
	void shouldAgreeWithAnIndependentSolutionOfTheSameBalance() {
		// The same balance h(T∞ − T) = h_fg(T)·h_m·(ρv,sat(T) − ρv,∞) solved here from
		// scratch: ideal-gas
		// mixture density, cp of dry air 1.011 and of vapour 2.01 kJ/kgK (Incropera
		// Tables A.4, A.6), h_fg =
		// 2501 − 2.36·t kJ/kg (steam-table fit), IF97 saturation pressure. Tolerance 0.05
		// K: only the root
		// finders differ. The result does not depend on h, which cancels.
		for (double w : new double[] { 0.005, 0.01, 0.05, 0.2 }) {
			for (double h : new double[] { 18, 40 }) {
				assertEquals(WetBulbReference.vapourDensityWetBulbC(200, w, h, 0, 0),
						WetBulb.temperatureC(ovenAir(200, w), h), 0.05, "W " + w + ", h " + h);
			}
		}
	}

	@Test
	void shouldNeverPutTheWetBulbBelowTheDewPoint() {
		// Psychrometrics: dew point ≤ wet bulb ≤ dry bulb (ASHRAE Handbook —
		// Fundamentals, ch. 1); a wet surface
		// in superheated steam at 1 atm sits at the saturation temperature during the
		// constant-rate period
		// (superheated-steam drying, e.g. Mujumdar, Handbook of Industrial Drying).
		// Tolerance 0.01 K.
		for (double y : new double[] { 0.1, 0.3, 0.5, 0.8, 1.0 }) {
			for (double t : new double[] { 150, 200, 250 }) {
				Atmosphere gas = new Atmosphere(t + 273.15, y);
				double wb = WetBulb.temperatureC(gas, HeatSetup.OVEN_FAN.value());
				assertTrue(wb >= gas.dewPointK() - 273.15 - 0.01, String.format(
						"y %.2f at %.0f °C: wet bulb %.2f °C, dew point %.2f °C", y, t, wb, gas.dewPointK() - 273.15));
			}
		}
	}

}
