package com.crustplan.engine.heat;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.water.Atmosphere;
import com.crustplan.engine.water.WaterVapour;

/**
 * The temperature a wet face settles at in gas, by convection alone: h(T_gas − T) =
 * h_fg·J(T) with the evaporation flux of {@link GasExchange}, solved by bisection.
 * Radiation from hot walls lifts a real face a few kelvin above it.
 */
public final class WetBulb {

	private WetBulb() {
	}

	public static double temperatureC(Atmosphere gas, double convectionWPerM2K) {
		GasExchange face = new GasExchange(gas, convectionWPerM2K, gas.temperatureK(), Message.of("exchange.wet-bulb"));
		double lo = 273.16;
		double hi = Math.min(gas.temperatureK(), 373.15 + 50);
		FaceFlux flux = new FaceFlux();
		for (int i = 0; i < 60; i++) {
			double t = 0.5 * (lo + hi);
			face.evaluate(t, 1.0, 0, flux);
			// radiation is excluded: the gas exchange radiates to walls at the gas
			// temperature
			double convective = convectionWPerM2K * (gas.temperatureK() - t);
			double balance = convective - WaterVapour.latentHeat(t) * flux.evaporation;
			if (balance > 0) {
				lo = t;
			}
			else {
				hi = t;
			}
		}
		return 0.5 * (lo + hi) - 273.15;
	}

}
