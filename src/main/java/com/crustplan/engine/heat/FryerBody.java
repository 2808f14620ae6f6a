package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.model.Parameter;

/** A fryer as a body: its oil, its heater, and the food that goes into it per batch. */
public record FryerBody(double oilLitres, double heaterKw, double loadKg) {

	public static final Parameter OIL_DENSITY = Parameter.fromMemory("ρ_oil",
			"density of frying oil at frying temperature", 830, "kg/m³",
			"vegetable oils ≈ 915 kg/m³ at 20 °C, falling by about 0.65 kg/m³ per kelvin (from memory)");

	public static final Parameter OIL_SPECIFIC_HEAT = Parameter.fromMemory("cp,oil", "specific heat of frying oil",
			2200, "J/(kg·K)", "vegetable oils 2.0–2.4 kJ/kg·K at 150–190 °C (from memory)");

	public static final Parameter DEFAULT_OIL = Parameter.commonPractice("V_oil", "oil in a catering fryer", 8, "L",
			"single-basket countertop fryers hold 5–10 L (common practice)");

	public static final Parameter DEFAULT_HEATER = Parameter.commonPractice("P_fryer", "heater of a catering fryer",
			3.2, "kW", "countertop fryers of 8 L carry 3–3.5 kW elements on a 13–16 A supply (common practice)");

	public static final Parameter DEFAULT_LOAD = Parameter.commonPractice("m_load", "food per basket", 0.5, "kg",
			"about one part food to 12–15 parts oil keeps the oil from dropping too far (common practice)");

	public static final Parameter OPEN_SURFACE = Parameter.assumption("A_oil", "open oil surface per litre of oil",
			0.0095, "m²/L",
			"an 8 L pan of about 0.28 × 0.27 m (assumption); its insulated walls are taken to lose little");

	public static final FryerBody DEFAULT = new FryerBody(DEFAULT_OIL.value(), DEFAULT_HEATER.value(),
			DEFAULT_LOAD.value());

	public FryerBody {
		Limits.within("oilLitres", oilLitres, 1, 60, "L");
		Limits.within("heaterKw", heaterKw, 0.5, 40, "kW");
		Limits.within("loadKg", loadKg, 0.01, 10, "kg");
	}

	public double oilKg() {
		return oilLitres / 1000 * OIL_DENSITY.value();
	}

	/**
	 * A fresh body for one run, its oil at the set temperature when the basket goes in;
	 * always thermostatted.
	 */
	public HeatedBody start(double setK) {
		double roomK = HeatSetup.KITCHEN_AIR_C.value() + 273.15;
		// the open surface radiates like oil (ε ≈ 0.9, as a food surface)
		return new HeatedBody(oilKg() * OIL_SPECIFIC_HEAT.value(), oilLitres * OPEN_SURFACE.value(),
				Radiation.FOOD_EMISSIVITY.value(), HeatSetup.NATURAL_CONVECTION.value(), heaterKw * 1000,
				HeatedBody.Control.THERMOSTAT, setK, roomK, Double.NaN, loadKg);
	}

	public static List<Parameter> parameters() {
		return List.of(OIL_DENSITY, OIL_SPECIFIC_HEAT, DEFAULT_OIL, DEFAULT_HEATER, DEFAULT_LOAD, OPEN_SURFACE);
	}

}
