package com.crustplan.engine.heat;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The lumped pan or oil body against its closed form: with linear losses (no radiation)
 * and a constant input, m·c·dT/dt = P − h·A·(T − T_room) gives T(t) = T∞ + (T₀ −
 * T∞)·exp(−t/τ), T∞ = T_room + P/(h·A), τ = m·c/(h·A) (lumped capacitance, Incropera
 * §5.2).
 */
class HeatedBodyTest {

	private static final double ROOM_K = 298.15;

	@Test
	void fryerRecoveringAtFullPowerFollowsTheLumpedClosedForm() {
		double c = 7.0 * 2200; // 7 kg of oil
		double area = 0.08;
		double h = 10;
		double power = 3200;
		double setK = 448.15;
		HeatedBody oil = new HeatedBody(c, area, 0, h, power, HeatedBody.Control.THERMOSTAT, setK, ROOM_K, 0.05,
				Double.NaN);
		double startK = setK - 30;
		oil.preheatTo(startK);
		double tInf = ROOM_K + power / (h * area);
		double tau = c / (h * area);
		double dt = 0.5;
		double t = 0;
		// below the proportional band the heater runs at full power: the closed form
		// holds there
		while (oil.temperatureK() < setK - HeatedBody.THERMOSTAT_BAND_K - 1) {
			oil.advance(dt);
			t += dt;
			double exact = tInf + (startK - tInf) * Math.exp(-t / tau);
			// explicit Euler on a time constant of hours: error far below 0.01 K over
			// minutes
			assertEquals(exact, oil.temperatureK(), 0.01, "at " + t + " s");
		}
		assertTrue(t > 60 && t < 600, "30 K back in minutes, as catering fryers recover: " + t + " s");
	}

	@Test
	void fixedInputHoldsTheEmptyPanAtItsSetTemperature() {
		HeatedBody pan = PanBody.DEFAULT.withControl(HeatedBody.Control.FIXED_INPUT).start(503.15);
		for (int i = 0; i < 2400; i++) {
			pan.advance(0.5);
		}
		assertEquals(503.15, pan.temperatureK(), 1e-6, "the flame was set where the empty pan sits");
	}

	@Test
	void ledgerBalancesInputAgainstStoredHeatFoodAndLosses() {
		HeatedBody pan = PanBody.DEFAULT.start(503.15);
		double u0 = pan.heatCapacity() * pan.temperatureK();
		for (int i = 0; i < 600; i++) {
			pan.draw(8000 - 10 * i); // a load that draws less as it warms, W/m²
			pan.advance(0.5);
		}
		double stored = pan.heatCapacity() * pan.temperatureK() - u0;
		assertEquals(pan.inputJ(), stored + pan.toFoodJ() + pan.lossJ(), 1e-9 * pan.inputJ());
	}

}
