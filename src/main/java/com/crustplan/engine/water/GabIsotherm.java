package com.crustplan.engine.water;

import java.util.Locale;

import com.crustplan.engine.model.Parameter;

/**
 * Guggenheim–Anderson–de Boer sorption isotherm, X = Xm·C·K·aw / ((1 − K·aw)(1 − K·aw +
 * C·K·aw)), with X in kg water per kg dry matter. Above the moisture at aw = 1 the water
 * is free (aw = 1).
 * <p>
 * {@code solution} is the water activity of the food's water with its own sugars
 * dissolved in it (1 when it holds next to none). Ross's rule (Ross 1975, Food Technol
 * 29(3):26; from memory) takes a mixture's water activity as the product of its parts':
 * the sorbing matrix times the sugar solution. Liquid on the pore walls then depends on
 * the matrix's share, aw/solution, not on aw itself: a syrup is liquid at an activity
 * where a starch–gluten crust only sorbs.
 */
public record GabIsotherm(Parameter monolayer, Parameter c, Parameter k, Parameter solution) {

	public static final Parameter NORRISH_SUCROSE = Parameter.fromMemory("K_N,s",
			"Norrish constant of sucrose in water", 6.47, "–",
			"Chirife, Ferro Fontan & Benmergui 1980, J Food Technol 15:59 (from memory); ln aw = ln x_w − K·x_s² (Norrish 1966, J Food Technol 1:25)");

	public static final Parameter NORRISH_GLUCOSE = Parameter.fromMemory("K_N,g",
			"Norrish constant of glucose and fructose in water", 2.25, "–",
			"Chirife, Ferro Fontan & Benmergui 1980, J Food Technol 15:59 (from memory)");

	private static final Parameter NO_SOLUTES = Parameter.derived("aw,sol",
			"water activity of the food's sugar solution", 1, "–", "sugars too dilute to count");

	/** An isotherm of a food whose water holds next to no dissolved sugar. */
	public GabIsotherm(Parameter monolayer, Parameter c, Parameter k) {
		this(monolayer, c, k, NO_SOLUTES);
	}

	/**
	 * Water activity of water with sucrose and reducing sugar (glucose, fructose)
	 * dissolved, by Norrish's equation in its multi-solute form, ln aw = ln x_w − (Σ
	 * √K_i·x_i)² (Chirife, Ferro Fontan &amp; Benmergui 1980), from mass percentages.
	 */
	public static double sugarSolutionActivity(double waterPct, double sucrosePct, double reducingSugarPct) {
		double water = waterPct / 18.015;
		double sucrose = sucrosePct / 342.30;
		double hexose = reducingSugarPct / 180.16;
		double total = water + sucrose + hexose;
		double sum = Math.sqrt(NORRISH_SUCROSE.value()) * sucrose / total
				+ Math.sqrt(NORRISH_GLUCOSE.value()) * hexose / total;
		return water / total * Math.exp(-sum * sum);
	}

	/**
	 * This matrix isotherm for a food in which only a share of the dry matter sorbs water
	 * (fat and dissolved sugar do not) and whose water is a sugar solution of activity
	 * aw,sol. By Ross's rule aw = aw_matrix(X/s)·aw,sol, which keeps the GAB form with
	 * Xm' = s·Xm, C' = C and K' = K/aw,sol (derived; aw,sol is held at the raw
	 * composition, though it falls as a crust dries and its syrup concentrates).
	 */
	public GabIsotherm withDissolvedSugar(double sorbingShare, double solutionActivity, String food, String basis) {
		if (!(sorbingShare > 0 && sorbingShare <= 1) || !(solutionActivity > k.value() && solutionActivity <= 1)) {
			throw new IllegalArgumentException("sorbing share in (0, 1] and solution activity in (K, 1] required");
		}
		String rule = "Ross's rule (Ross 1975, Food Technol 29(3):26; from memory) on the matrix isotherm ("
				+ monolayer.description() + ": " + monolayer.source() + "): " + basis;
		return new GabIsotherm(
				Parameter.derived("Xm", "GAB monolayer moisture, " + food, monolayer.value() * sorbingShare,
						monolayer.unit(),
						rule + "; Xm' = s·Xm with s = " + String.format(Locale.ROOT, "%.3f", sorbingShare)),
				Parameter.derived("C", "GAB constant C, " + food, c.value(), c.unit(), "unchanged by " + rule),
				Parameter.derived("K", "GAB constant K, " + food, k.value() / solutionActivity, k.unit(),
						rule + "; K' = K/aw,sol"),
				Parameter.derived("aw,sol", "water activity of the sugar solution in " + food, solutionActivity, "–",
						"Norrish's equation (Norrish 1966, J Food Technol 1:25; constants from Chirife, Ferro Fontan & Benmergui 1980, from memory): "
								+ basis));
	}

	/**
	 * The matrix's own share of a water activity aw (Ross's rule), for wet pore walls.
	 */
	public double matrixActivity(double waterActivity) {
		return Math.min(1, waterActivity / solution.value());
	}

	public double moisture(double waterActivity) {
		double xm = monolayer.value();
		double cc = c.value();
		double y = k.value() * waterActivity;
		return xm * cc * y / ((1 - y) * (1 - y + cc * y));
	}

	/** Moisture at aw = 1: more than this is free water. */
	public double freeWaterMoisture() {
		return moisture(1.0);
	}

	/**
	 * Water activity at moisture {@code x} (kg/kg dry basis), from the positive root of
	 * the GAB quadratic.
	 */
	public double waterActivity(double x) {
		if (x <= 0) {
			return 0;
		}
		double xm = monolayer.value();
		double cc = c.value();
		double a = x * (cc - 1);
		double b = xm * cc - x * (cc - 2);
		double kk = k.value();
		double aw;
		if (Math.abs(a) < 1e-12) {
			aw = x / (b * kk);
		}
		else {
			// x(C−1)y² + (Xm·C − x(C−2))y − x = 0 with y = K·aw; the root is written to
			// avoid cancellation, and with one division (the stepper's boiling-point
			// search waits on this)
			aw = 2 * x / ((b + Math.sqrt(b * b + 4 * a * x)) * kk);
		}
		return Math.min(1.0, aw);
	}

}
