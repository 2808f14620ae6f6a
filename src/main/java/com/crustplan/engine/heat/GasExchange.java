package com.crustplan.engine.heat;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.Atmosphere;
import com.crustplan.engine.water.SaturationPressure;
import com.crustplan.engine.water.WaterVapour;

/**
 * A face open to gas (oven air, steam, kitchen air, or under a radiant heater):
 * convection, grey-body radiation to surroundings at {@code radiantK}, and evaporation J
 * = h_m·(aw·p_sat(Ts) − p_v)/(R_v·T_film) with h_m from the Chilton–Colburn analogy h/h_m
 * = ρ·cp·Le^(2/3) (Incropera, Fundamentals of Heat and Mass Transfer, §6.7): the
 * vapour-density form with both densities taken at the film temperature.
 */
public final class GasExchange implements FaceExchange {

	public static final Parameter LEWIS_NUMBER = Parameter.derived("Le", "Lewis number of water vapour in air", 0.85,
			"–",
			"α/D_AB with α ≈ 22e-6 m²/s for air and D_AB = 0.26e-4 m²/s for water vapour in air near 298 K (Incropera, Tables A.4 and A.8; values from memory)");

	private final Atmosphere gas;

	private final double convection;

	private final double radiantK;

	private final double emissivity;

	private final double gasVapourPressure;

	private final double gasSpecificHeat;

	private final double lewisFactor = Math.pow(LEWIS_NUMBER.value(), 2.0 / 3.0);

	private final Message description;

	public GasExchange(Atmosphere gas, double convectionWPerM2K, double radiantK, Message description) {
		this.gas = gas;
		this.convection = convectionWPerM2K;
		this.radiantK = radiantK;
		this.emissivity = Radiation.FOOD_EMISSIVITY.value();
		this.gasVapourPressure = gas.vapourPressurePa();
		this.gasSpecificHeat = gas.specificHeat();
		this.description = description;
	}

	@Override
	public void evaluate(double surfaceK, double waterActivity, double boilingFlux, FaceFlux out) {
		double ta = gas.temperatureK();
		double ts3 = surfaceK * surfaceK * surfaceK;
		double tr2 = radiantK * radiantK;
		out.heatFlux = convection * (ta - surfaceK) + emissivity * Radiation.SIGMA * (tr2 * tr2 - ts3 * surfaceK);
		out.heatFluxSlope = -convection - 4 * emissivity * Radiation.SIGMA * ts3;
		double film = 0.5 * (ta + surfaceK);
		// driving force in partial pressures over the film temperature, so a face below
		// the dew point
		// condenses and a wet face in pure steam settles at the boiling point
		double perPascal = massTransferCoefficient(film) / (WaterVapour.GAS_CONSTANT.value() * film);
		double pSat = SaturationPressure.pascal(surfaceK);
		double pSatUp = SaturationPressure.pascal(surfaceK + 0.05);
		out.evaporation = perPascal * (waterActivity * pSat - gasVapourPressure);
		out.evaporationSlopeT = perPascal * waterActivity * (pSatUp - pSat) / 0.05;
		out.evaporationSlopeAw = perPascal * pSat;
	}

	/** h_m = h / (ρ·cp·Le^(2/3)), m/s. */
	public double massTransferCoefficient(double filmK) {
		return convection / (gas.density(filmK) * gasSpecificHeat * lewisFactor);
	}

	public Atmosphere gas() {
		return gas;
	}

	@Override
	public Message describe() {
		return description;
	}

}
