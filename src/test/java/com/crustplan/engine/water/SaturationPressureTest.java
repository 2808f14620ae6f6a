package com.crustplan.engine.water;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** IAPWS-IF97 region 4 against the verification values printed in the release itself. */
class SaturationPressureTest {

	@Test
	void shouldMatchTheIf97VerificationTableForSaturationPressure() {
		// IAPWS R7-97(2012), Table 35: p_s(300 K) = 0.353658941e-2 MPa, p_s(500 K) =
		// 0.263889776e1 MPa,
		// p_s(600 K) = 0.123443146e2 MPa. Relative 1e-8: the table has 9 significant
		// digits and the
		// formula is evaluated in double precision.
		assertEquals(3.53658941e3, SaturationPressure.pascal(300), 3.53658941e3 * 1e-8);
		assertEquals(2.63889776e6, SaturationPressure.pascal(500), 2.63889776e6 * 1e-8);
		assertEquals(12.3443146e6, SaturationPressure.pascal(600), 12.3443146e6 * 1e-8);
	}

	@Test
	void shouldMatchTheIf97VerificationTableForSaturationTemperature() {
		// IAPWS R7-97(2012), Table 36: T_s(0.1 MPa) = 0.372755919e3 K, T_s(1 MPa) =
		// 0.453035632e3 K,
		// T_s(10 MPa) = 0.584149488e3 K. Tolerance 1e-6 K: the table's last digit.
		assertEquals(372.755919, SaturationPressure.saturationTemperatureK(0.1e6), 1e-6);
		assertEquals(453.035632, SaturationPressure.saturationTemperatureK(1e6), 1e-6);
		assertEquals(584.149488, SaturationPressure.saturationTemperatureK(10e6), 1e-6);
	}

	@Test
	void shouldGiveTheNormalBoilingPointPressure() {
		// IF97 at 100 °C: 101.418 kPa (IAPWS-IF97 steam tables); tolerance the quoted
		// last digit.
		assertEquals(101_418, SaturationPressure.pascal(373.15), 0.5);
	}

	@Test
	void shouldInvertSaturationPressureRoundTrip() {
		// Eqs. 30 and 31 of IAPWS R7-97 are consistent to about 1e-5 K in temperature
		// (the release states
		// the backward equation reproduces eq. 30 within its numerical consistency);
		// tolerance 1e-4 K.
		for (double t = 275; t <= 640; t += 5) {
			assertEquals(t, SaturationPressure.saturationTemperatureK(SaturationPressure.pascal(t)), 1e-4,
					"at " + t + " K");
		}
	}

	@Test
	void shouldAgreeWithTheBuckEquationBelowBoiling() {
		// Buck (1981, J Appl Meteorol 20:1527; 1996 revision): e = 0.61121·exp((18.678 −
		// t/234.5)·t/(257.14 + t))
		// kPa; at 20 °C 2.3383 kPa. Buck's fit is stated accurate to about 0.05 % from 0
		// to 50 °C: tolerance 0.1 %.
		assertEquals(2338.3, SaturationPressure.pascal(293.15), 2338.3 * 1e-3);
		for (double t = 0.5; t <= 50; t += 2.5) {
			double buck = 611.21 * Math.exp((18.678 - t / 234.5) * (t / (257.14 + t)));
			assertEquals(buck, SaturationPressure.pascal(t + 273.15), buck * 1e-3, "at " + t + " °C");
		}
	}

}
