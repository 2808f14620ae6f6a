package com.crustplan.engine.heat;

import com.crustplan.engine.water.Atmosphere;
import com.crustplan.engine.water.WaterVapour;

/**
 * The temperature a wet face settles at in gas, by convection alone: h(T_gas − T) = h_fg·h_m·(ρv,sat(T) −
 * ρv,gas), solved by bisection. Radiation from hot walls lifts a real face a few kelvin above it.
 */
public final class WetBulb {

	private WetBulb() {
	}

	public static double temperatureC(Atmosphere gas, double convectionWPerM2K) {
		GasExchange face = new GasExchange(gas, convectionWPerM2K, gas.temperatureK(), "wet bulb");
		double lo = 273.16;
		double hi = Math.min(gas.temperatureK(), 373.15 + 50);
		for (int i = 0; i < 60; i++) {
			double t = 0.5 * (lo + hi);
			double hm = face.massTransferCoefficient(0.5 * (gas.temperatureK() + t));
			double balance = convectionWPerM2K * (gas.temperatureK() - t)
					- WaterVapour.latentHeat(t) * hm * (WaterVapour.saturatedVapourDensity(t) - gas.vapourDensity());
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
