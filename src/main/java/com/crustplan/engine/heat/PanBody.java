package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.model.Parameter;

/**
 * A pan or griddle as a body: what it is made of, how heavy and how wide it is, the heat
 * its burner or element can put in, how that heat is controlled, and how much of it the
 * food covers.
 */
public record PanBody(PanMaterial material, double massKg, double diameterCm, double powerKw,
		HeatedBody.Control control, double coverPct) {

	public static final Parameter DEFAULT_MASS = Parameter.fromMemory("m_pan", "mass of a catering skillet", 2.3, "kg",
			"a 26–28 cm cast-iron skillet weighs 2–3 kg, a carbon-steel one 1.2–1.8 kg (from memory)");

	public static final Parameter DEFAULT_DIAMETER = Parameter.commonPractice("D_pan", "diameter of a catering skillet",
			28, "cm", "26–32 cm skillets are the usual line pans (common practice)");

	public static final Parameter DEFAULT_POWER = Parameter.fromMemory("P_pan", "heat a range burner puts into the pan",
			2.5, "kW",
			"catering gas burners of 5–9 kW input reach a pan at roughly 35–50 % efficiency; induction hobs deliver 2–3.5 kW (from memory)");

	public static final Parameter DEFAULT_COVER = Parameter.commonPractice("cover", "share of the pan the food covers",
			50, "%", "two portions in a line pan, with room to turn them (common practice)");

	/**
	 * The pan a chef who knows nothing of watts gets: cast iron, 2.3 kg, 28 cm, 2.5 kW,
	 * the flame kept up, half covered.
	 */
	public static final PanBody DEFAULT = new PanBody(PanMaterial.CAST_IRON, DEFAULT_MASS.value(),
			DEFAULT_DIAMETER.value(), DEFAULT_POWER.value(), HeatedBody.Control.THERMOSTAT, DEFAULT_COVER.value());

	public PanBody {
		if (material == null) {
			throw new InvalidInputException("material", "give the pan's material");
		}
		if (control == null) {
			throw new InvalidInputException("control", "say how the heat is controlled");
		}
		// from a small omelette pan to a griddle plate
		Limits.within("massKg", massKg, 0.3, 60, "kg");
		Limits.within("diameterCm", diameterCm, 12, 120, "cm");
		Limits.within("powerKw", powerKw, 0.2, 30, "kW");
		Limits.within("coverPct", coverPct, 1, 100, "%");
	}

	public PanBody withControl(HeatedBody.Control c) {
		return new PanBody(material, massKg, diameterCm, powerKw, c, coverPct);
	}

	public PanBody withMassKg(double m) {
		return new PanBody(material, m, diameterCm, powerKw, control, coverPct);
	}

	/** Area of the pan's cooking surface, m². */
	public double areaM2() {
		double r = diameterCm / 200;
		return Math.PI * r * r;
	}

	/** A fresh body for one run, preheated to the set temperature. */
	public HeatedBody start(double setK) {
		double area = areaM2();
		// the top not under the food and the underside and rim lose heat; the burner side
		// is counted once
		double lossArea = area * (1 - coverPct / 100) + area;
		double roomK = HeatSetup.KITCHEN_AIR_C.value() + 273.15;
		return new HeatedBody(massKg * material.specificHeat().value(), lossArea, material.emissivity().value(),
				HeatSetup.NATURAL_CONVECTION.value(), powerKw * 1000, control, setK, roomK, area * coverPct / 100,
				Double.NaN);
	}

	public static List<Parameter> parameters() {
		return List.of(DEFAULT_MASS, DEFAULT_DIAMETER, DEFAULT_POWER, DEFAULT_COVER);
	}

}
