package com.crustplan.engine.heat;

import java.util.Arrays;
import java.util.Optional;

import com.crustplan.engine.model.Parameter;

/**
 * Kinds of radiant grill, each with the geometry a cook need not know: the heater's face,
 * the usual distance to the food, how much of the heater face glows at the element
 * temperature, and its emissivity. Together they give the heat flux at the food from an
 * element temperature; the defaults are from memory and are checked against what a line
 * cook expects (toast golden in 2–3 min under a salamander, a steak browned in 2–4 min a
 * side over hot coals; common practice).
 */
public enum GrillKind {

	SALAMANDER("salamander", "Salamander (electric element above the food)",
			Parameter.fromMemory("T_el", "salamander element temperature", 800, "°C",
					"sheathed or quartz elements glow orange at 700–900 °C (from memory)"),
			0.60, 0.35,
			Parameter.fromMemory("L", "food below a salamander's elements", 150, "mm",
					"middle shelf of a commercial salamander, 80–250 mm (from memory)"),
			Parameter.assumption("s", "share of a salamander's heater face that glows", 0.25, "–",
					"four to six tubes across the panel, a reflector between them counted at kitchen temperature (assumption)"),
			Parameter.fromMemory("ε_el", "emissivity of an oxidised sheathed element", 0.85, "–",
					"oxidised nickel-chromium and stainless sheaths 0.8–0.9 (from memory)")),

	BROILER("broiler", "Overhead broiler (grill element in an oven roof)", Parameter.fromMemory("T_el",
			"broiler element temperature", 800, "°C", "a looped sheathed element glowing orange (from memory)"), 0.40,
			0.35,
			Parameter.fromMemory("L", "food below an oven's broiler element", 120, "mm",
					"top shelf of a kitchen oven, 80–150 mm (from memory)"),
			Parameter.assumption("s", "share of the oven roof taken by the broiler element", 0.15, "–",
					"one looped tube across the roof (assumption)"),
			Parameter.fromMemory("ε_el", "emissivity of an oxidised sheathed element", 0.85, "–",
					"oxidised nickel-chromium and stainless sheaths 0.8–0.9 (from memory)")),

	CHARCOAL("charcoal", "Charcoal grill (glowing coals below the food)", Parameter.fromMemory("T_el",
			"surface of glowing charcoal", 650, "°C", "ash-covered coals at 550–800 °C at the surface (from memory)"),
			0.45, 0.45,
			Parameter.fromMemory("L", "grate above the coals", 100, "mm",
					"a kettle or cart grill, 80–150 mm (from memory)"),
			Parameter.assumption("s", "share of the coal bed that glows", 0.7, "–",
					"a full bed with gaps between the pieces (assumption)"),
			Parameter.fromMemory("ε_el", "emissivity of charcoal", 0.95, "–",
					"carbon surfaces 0.9–0.97 (from memory)"));

	/**
	 * Radius of the food face, m: a 12 cm portion or slice (common practice). The view
	 * factor is the mean over this face: its centre sees more, its edge less.
	 */
	public static final Parameter FOOD_RADIUS = Parameter.commonPractice("r_food",
			"radius of the food face under a grill", 0.06, "m", "a 12 cm slice or portion (common practice)");

	private final String key;

	private final String label;

	private final Parameter elementTemperature;

	private final double heaterWidthM;

	private final double heaterDepthM;

	private final Parameter distance;

	private final Parameter glowingShare;

	private final Parameter emissivity;

	GrillKind(String key, String label, Parameter elementTemperature, double heaterWidthM, double heaterDepthM,
			Parameter distance, Parameter glowingShare, Parameter emissivity) {
		this.key = key;
		this.label = label;
		this.elementTemperature = elementTemperature;
		// heater faces: a 600 × 350 mm salamander panel, a 400 × 350 mm oven roof, a 450
		// mm grate (from memory)
		this.heaterWidthM = heaterWidthM;
		this.heaterDepthM = heaterDepthM;
		this.distance = distance;
		this.glowingShare = glowingShare;
		this.emissivity = emissivity;
	}

	public static Optional<GrillKind> byKey(String key) {
		return Arrays.stream(values()).filter(k -> k.key.equalsIgnoreCase(key == null ? "" : key.trim())).findFirst();
	}

	public String key() {
		return key;
	}

	public String label() {
		return label;
	}

	public double defaultElementTemperatureC() {
		return elementTemperature.value();
	}

	public double defaultDistanceMm() {
		return distance.value();
	}

	public double glowingShare() {
		return glowingShare.value();
	}

	public double emissivity() {
		return emissivity.value();
	}

	/**
	 * Whether the heat comes from below (coals), so the food's upper face is the one in
	 * kitchen air.
	 */
	public boolean fromBelow() {
		return this == CHARCOAL;
	}

	/** Radius of the disc with the heater face's area, m. */
	public double heaterRadiusM() {
		return ViewFactor.equalAreaRadius(heaterWidthM, heaterDepthM);
	}

	/**
	 * Mean view factor from the food face to the heater face at a distance, coaxial
	 * parallel discs.
	 */
	public double viewFactor(double distanceMm) {
		return ViewFactor.coaxialDiscs(FOOD_RADIUS.value(), heaterRadiusM(), distanceMm / 1000);
	}

	/**
	 * Heat flux a black radiometer at 25 °C reads at the food, W/m²: q =
	 * σ·ε_el·s·F·(T_el⁴ − T_room⁴) (the heater's glowing share as a grey emitter; the
	 * rest of the food's view at kitchen temperature; one reflection neglected, a few per
	 * cent with emissivities near 0.9).
	 */
	public double heatFluxWPerM2(double elementTemperatureC, double distanceMm, double roomK) {
		double t = elementTemperatureC + 273.15;
		return Radiation.SIGMA * emissivity() * glowingShare() * viewFactor(distanceMm)
				* (Math.pow(t, 4) - Math.pow(roomK, 4));
	}

	/**
	 * The element temperature that gives a heat flux at the food at a distance, °C (the
	 * inverse of the above).
	 */
	public double elementTemperatureC(double heatFluxWPerM2, double distanceMm, double roomK) {
		double t4 = heatFluxWPerM2 / (Radiation.SIGMA * emissivity() * glowingShare() * viewFactor(distanceMm))
				+ Math.pow(roomK, 4);
		return Math.pow(t4, 0.25) - 273.15;
	}

}
