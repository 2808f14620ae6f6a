package com.crustplan.engine.heat;

import com.crustplan.engine.water.SaturationPressure;

/**
 * A wet-bulb solver written for the tests, independent of the engine's {@link WetBulb}.
 */
public final class WetBulbReference {

	private WetBulbReference() {
	}

	/**
	 * Wet face temperature, °C, from h(T∞ − T) + εσ(T_wall⁴ − T⁴) = h_fg·h_m·(p_sat(T) −
	 * p_v,∞)/(R_v·T_film), the Chilton–Colburn analogy (Le = 0.85) in its vapour-density
	 * form with both densities at the film temperature (Incropera §6.7): an
	 * implementation independent of the engine's.
	 */
	public static double vapourDensityWetBulbC(double gasC, double humidityRatio, double h, double emissivity,
			double wallC) {
		double rv = 461.51805; // IAPWS R6-95
		double ra = 287.05; // ISO 2533
		double p = 101_325;
		double tg = gasC + 273.15;
		double tw = wallC + 273.15;
		double y = humidityRatio / (0.621945 + humidityRatio);
		double vapourMass = humidityRatio / (1 + humidityRatio);
		double cp = (1 - vapourMass) * 1011 + vapourMass * 2010;
		double vapourPressureGas = y * p;
		double lo = 273.16;
		double hi = Math.min(tg, 420);
		for (int i = 0; i < 100; i++) {
			double t = 0.5 * (lo + hi);
			double film = 0.5 * (t + tg);
			double rho = p * (1 - y) / (ra * film) + p * y / (rv * film);
			double hm = h / (rho * cp * Math.pow(0.85, 2.0 / 3.0));
			double heat = h * (tg - t) + emissivity * 5.670374419e-8 * (Math.pow(tw, 4) - Math.pow(t, 4));
			double latent = (2501e3 - 2.36e3 * (t - 273.15)) * hm * (SaturationPressure.pascal(t) - vapourPressureGas)
					/ (rv * film);
			if (heat > latent) {
				lo = t;
			}
			else {
				hi = t;
			}
		}
		return 0.5 * (lo + hi) - 273.15;
	}

}
