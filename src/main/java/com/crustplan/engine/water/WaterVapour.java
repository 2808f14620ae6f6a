package com.crustplan.engine.water;

import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.model.Parameter;

/** Ideal-gas vapour, latent heat and the kitchen's atmosphere. */
public final class WaterVapour {

	/** Specific gas constant of water vapour, J/(kg·K) (IAPWS R6-95: 461.51805). */
	public static final Parameter GAS_CONSTANT = Parameter.published("R_v", "specific gas constant of water vapour",
			461.51805, "J/(kg·K)", "IAPWS R6-95(2018)");

	/**
	 * Specific gas constant of dry air, J/(kg·K) (ISO 2533 standard atmosphere: 287.05).
	 */
	public static final double DRY_AIR_GAS_CONSTANT = 287.05;

	/** Standard atmosphere, Pa (ISO 2533). */
	public static final double ATMOSPHERE_PA = 101_325;

	/** Molar mass ratio water/dry air, 18.015/28.965 (ISO 2533; IAPWS). */
	public static final double MOLAR_MASS_RATIO = 0.621945;

	public static final Parameter LATENT_HEAT_0C = Parameter.fromMemory("h_fg,0", "latent heat of vaporisation at 0 °C",
			2501e3, "J/kg", "linear fit h_fg = 2501 − 2.36·t kJ/kg, steam tables (from memory); 2257 kJ/kg at 100 °C");

	public static final Parameter LATENT_HEAT_SLOPE = Parameter.fromMemory("dh_fg/dT",
			"slope of the latent heat with temperature", 2.36e3, "J/(kg·K)",
			"linear fit to steam tables (from memory)");

	/**
	 * Specific heat of dry air near 100 °C, J/(kg·K) (Incropera, Table A.4: 1.009–1.014
	 * kJ/kg·K).
	 */
	public static final double DRY_AIR_SPECIFIC_HEAT = 1011;

	/**
	 * Specific heat of water vapour at 1 atm near 400 K, J/(kg·K) (Incropera, Table A.6:
	 * 2.01 kJ/kg·K).
	 */
	public static final double VAPOUR_SPECIFIC_HEAT = 2010;

	private WaterVapour() {
	}

	public static double latentHeat(double temperatureK) {
		double t = temperatureK - 273.15;
		return LATENT_HEAT_0C.value() - LATENT_HEAT_SLOPE.value() * Math.min(t, 200);
	}

	/** Vapour density of saturated vapour at a water activity, kg/m³. */
	public static double saturatedVapourDensity(double temperatureK) {
		return SaturationPressure.pascal(temperatureK) / (GAS_CONSTANT.value() * temperatureK);
	}

	/** Vapour density from a partial pressure, kg/m³. */
	public static double vapourDensity(double vapourPressurePa, double temperatureK) {
		return vapourPressurePa / (GAS_CONSTANT.value() * temperatureK);
	}

	/**
	 * Humidity ratio (kg vapour per kg dry air) from the steam volume fraction of the
	 * atmosphere.
	 */
	public static double humidityRatio(double steamVolumeFraction) {
		double y = Math.min(steamVolumeFraction, 0.999_999);
		return MOLAR_MASS_RATIO * y / (1 - y);
	}

	/**
	 * Temperature at which water of activity {@code waterActivity} boils at 1 atm: where
	 * aw·p_sat(T) = p_atm (exact IAPWS-IF97 inverse).
	 */
	public static double boilingTemperatureK(double waterActivity) {
		double aw = Math.max(waterActivity, MIN_BOILING_AW);
		return SaturationPressure.saturationTemperatureK(Math.min(ATMOSPHERE_PA / aw, 2.2e7));
	}

	/**
	 * Below this water activity the boiling point is held (≈ 313 °C): the food is bone
	 * dry.
	 */
	private static final double MIN_BOILING_AW = 0.01;

	private static final int TABLE_SIZE = 2001;

	private static final double[] BOILING_TABLE = new double[TABLE_SIZE];

	/**
	 * Table intervals per unit of water activity (a multiply in the lookup, not a
	 * divide).
	 */
	private static final double TABLE_STEPS_PER_AW = (TABLE_SIZE - 1) / (1 - MIN_BOILING_AW);

	static {
		for (int i = 0; i < TABLE_SIZE; i++) {
			BOILING_TABLE[i] = boilingTemperatureK(MIN_BOILING_AW + (1 - MIN_BOILING_AW) * i / (TABLE_SIZE - 1));
		}
	}

	/**
	 * The same boiling point from a table with linear interpolation (error below 0.01 K
	 * against the exact inverse): the stepper calls it for every boiling node several
	 * times a step.
	 */
	public static double boilingTemperatureKFast(double waterActivity) {
		double u = (Math.max(MIN_BOILING_AW, Math.min(1, waterActivity)) - MIN_BOILING_AW) * TABLE_STEPS_PER_AW;
		int i = Math.min((int) u, TABLE_SIZE - 2);
		double f = u - i;
		return BOILING_TABLE[i] + f * (BOILING_TABLE[i + 1] - BOILING_TABLE[i]);
	}

	/**
	 * Specific enthalpy of liquid water relative to 0 °C, J/kg (Choi–Okos water cp
	 * integrated).
	 */
	public static double liquidEnthalpy(double temperatureK) {
		return FoodComponent.WATER.enthalpy(temperatureK - 273.15);
	}

}
