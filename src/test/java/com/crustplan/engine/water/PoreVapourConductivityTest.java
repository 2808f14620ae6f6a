package com.crustplan.engine.water;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The evaporation–condensation conductivity of a humid pore against values outside the
 * project.
 */
class PoreVapourConductivityTest {

	@Test
	void shouldMatchDeVriesAtTwentyDegrees() {
		// de Vries (1963, in Physics of Plant Environment; soil-physics texts
		// quote it) gives about 0.074 W/(m·K) for vapour transfer across saturated
		// air-filled pores at 20 °C (value from memory); 15 %: the vapour
		// diffusivity he used differs from Incropera's by a few per cent
		assertEquals(0.074, PoreVapourConductivity.at(293.15, 1), 0.15 * 0.074);
	}

	@Test
	void shouldUseTheClausiusClapeyronSlopeOfTheIapwsCurve() {
		// k_v ∝ dp_sat/dT: the Clausius–Clapeyron slope h_fg·p_sat/(R_v·T²) is
		// within 2 % of the IAPWS-IF97 curve's own slope from 20 to 95 °C (ideal
		// vapour, liquid volume neglected)
		for (double c = 20; c <= 95; c += 15) {
			double t = c + 273.15;
			double iapws = (SaturationPressure.pascal(t + 0.01) - SaturationPressure.pascal(t - 0.01)) / 0.02;
			double cc = WaterVapour.latentHeat(t) * SaturationPressure.pascal(t)
					/ (WaterVapour.GAS_CONSTANT.value() * t * t);
			assertEquals(iapws, cc, 0.02 * iapws, c + " °C");
		}
	}

	@Test
	void shouldRiseSteeplyTowardsBoilingAndVanishInADryCrust() {
		// bread-baking models carry crumb heat this way because it grows steeply
		// towards 100 °C (Thorvaldsson & Janestad 1999): at 90 °C over ten times
		// its 40 °C value
		double warm = PoreVapourConductivity.at(313.15, 1);
		double hot = PoreVapourConductivity.at(363.15, 1);
		assertTrue(hot > 10 * warm, warm + " → " + hot);
		// a hygroscopic crust only sorbs: nothing at aw 0.5; pure steam at the
		// boiling point: nothing
		assertEquals(0, PoreVapourConductivity.at(393.15, 0.5));
		assertEquals(0, PoreVapourConductivity.at(373.15 + 0.5, 1));
	}

	@Test
	void shouldOpenTheCellsOverThePublishedSettingRange() {
		// pore opening mainly at 71–81 °C (Zhang, Yang, Xu, Long & Ye 2025, Foods
		// 14:1649): dough cells closed below, set crumb one connected pore above
		// (Wang, Austin & Bell 2011, J Cereal Sci 54:203: about 99 % of crumb
		// porosity in one open cell)
		assertEquals(0, PoreVapourConductivity.openCellShare(273.15 + 65));
		assertEquals(0, PoreVapourConductivity.openCellShare(273.15 + 70.9));
		assertTrue(PoreVapourConductivity.openCellShare(273.15 + 76) > 0.3);
		assertTrue(PoreVapourConductivity.openCellShare(273.15 + 76) < 0.7);
		assertEquals(1, PoreVapourConductivity.openCellShare(273.15 + 81.1));
		assertEquals(1, PoreVapourConductivity.openCellShare(273.15 + 99));
	}

}
