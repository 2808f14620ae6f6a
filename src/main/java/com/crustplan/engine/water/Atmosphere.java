package com.crustplan.engine.water;

/**
 * The gas around a heated face: temperature and vapour content. The humidity input is the
 * steam volume fraction y of the atmosphere (dry kitchen air ≈ 0.016, pure steam 1), i.e.
 * the vapour partial pressure is y·p_atm.
 */
public record Atmosphere(double temperatureK, double steamVolumeFraction) {

	/**
	 * Steam share of kitchen air at 25 °C and 50 % relative humidity: p_v = 0.5·3.17 kPa
	 * = 1.58 kPa, y = 0.0156 (common practice for the room; p_sat from IAPWS-IF97).
	 */
	public static final double KITCHEN_STEAM_FRACTION = 0.0156;

	public Atmosphere {
		if (!(steamVolumeFraction >= 0 && steamVolumeFraction <= 1)) {
			throw new IllegalArgumentException("steam volume fraction must be in [0, 1]: " + steamVolumeFraction);
		}
	}

	public static Atmosphere kitchen(double temperatureK) {
		return new Atmosphere(temperatureK, KITCHEN_STEAM_FRACTION);
	}

	/**
	 * From a relative humidity taken at the gas temperature (p_v = RH·p_sat(T), capped at
	 * 1 atm).
	 */
	public static Atmosphere fromRelativeHumidity(double temperatureK, double relativeHumidity) {
		double pv = Math.min(relativeHumidity * SaturationPressure.pascal(temperatureK), WaterVapour.ATMOSPHERE_PA);
		return new Atmosphere(temperatureK, pv / WaterVapour.ATMOSPHERE_PA);
	}

	public double vapourPressurePa() {
		return steamVolumeFraction * WaterVapour.ATMOSPHERE_PA;
	}

	public double vapourDensity() {
		return WaterVapour.vapourDensity(vapourPressurePa(), temperatureK);
	}

	/** Dew point, K: the face temperature below which steam condenses on it. */
	public double dewPointK() {
		double pv = vapourPressurePa();
		return pv < 612 ? 273.15 : SaturationPressure.saturationTemperatureK(pv);
	}

	/** Density of the gas mixture at temperature {@code filmK}, kg/m³ (ideal gases). */
	public double density(double filmK) {
		double y = steamVolumeFraction;
		double p = WaterVapour.ATMOSPHERE_PA;
		return p * (1 - y) / (WaterVapour.DRY_AIR_GAS_CONSTANT * filmK)
				+ p * y / (WaterVapour.GAS_CONSTANT.value() * filmK);
	}

	/** Mass-weighted specific heat of the gas mixture, J/(kg·K). */
	public double specificHeat() {
		double w = WaterVapour.humidityRatio(steamVolumeFraction);
		double vapourMassFraction = w / (1 + w);
		return (1 - vapourMassFraction) * WaterVapour.DRY_AIR_SPECIFIC_HEAT
				+ vapourMassFraction * WaterVapour.VAPOUR_SPECIFIC_HEAT;
	}

}
