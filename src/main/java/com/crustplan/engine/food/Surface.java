package com.crustplan.engine.food;

import com.crustplan.engine.input.InvalidInputException;

/**
 * A food surface as a cook describes it: the engine's input. Units are in the names; {@code phOverride}
 * null means the category's typical pH.
 */
public record Surface(FoodCategory category, Composition composition, double asparagineMgPerKg,
		double surfaceWaterGPerM2, double thicknessMm, Double phOverride, double bicarbonateGPerKg, double acidGPerKg,
		double initialTemperatureC) {

	/** Thickness limits: thinner than a crisp slice or thicker than a large roast is outside the 1D model. */
	public static final double MIN_THICKNESS_MM = 0.5;

	public static final double MAX_THICKNESS_MM = 200;

	public Surface {
		if (category == null) {
			throw new InvalidInputException("category", "is required");
		}
		if (composition == null) {
			throw new InvalidInputException("composition", "is required");
		}
		range("asparagineMgPerKg", asparagineMgPerKg, 0, 50_000);
		range("surfaceWaterGPerM2", surfaceWaterGPerM2, 0, 2_000);
		range("thicknessMm", thicknessMm, MIN_THICKNESS_MM, MAX_THICKNESS_MM);
		if (phOverride != null) {
			range("pH", phOverride, 2, 10);
		}
		range("bicarbonateGPerKg", bicarbonateGPerKg, 0, 50);
		range("acidGPerKg", acidGPerKg, 0, 50);
		range("initialTemperatureC", initialTemperatureC, -20, 80);
	}

	private static void range(String field, double v, double min, double max) {
		if (!Double.isFinite(v) || v < min || v > max) {
			throw new InvalidInputException(field, "must be a number from " + fmt(min) + " to " + fmt(max));
		}
	}

	private static String fmt(double v) {
		return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
	}

	/** A surface with the category's defaults. */
	public static Surface defaults(FoodCategory category) {
		return new Surface(category, category.defaultComposition(), category.defaultAsparagineMgPerKg(),
				category.defaultSurfaceWaterGPerM2(), category.defaultThicknessMm(), null, 0, 0,
				category.defaultInitialTemperatureC());
	}

	public double basePh() {
		return phOverride != null ? phOverride : category.defaultPh();
	}

	public double ph() {
		return Acidity.adjustedPh(basePh(), bicarbonateGPerKg, acidGPerKg, category.bufferCapacity().value());
	}

	public Surface withComposition(Composition c) {
		return new Surface(category, c, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC);
	}

	public Surface withAsparagineMgPerKg(double v) {
		return new Surface(category, composition, v, surfaceWaterGPerM2, thicknessMm, phOverride, bicarbonateGPerKg,
				acidGPerKg, initialTemperatureC);
	}

	public Surface withSurfaceWaterGPerM2(double v) {
		return new Surface(category, composition, asparagineMgPerKg, v, thicknessMm, phOverride, bicarbonateGPerKg,
				acidGPerKg, initialTemperatureC);
	}

	public Surface withThicknessMm(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, v, phOverride,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC);
	}

	public Surface withPh(Double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, v,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC);
	}

	public Surface withBicarbonateGPerKg(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride, v,
				acidGPerKg, initialTemperatureC);
	}

	public Surface withAcidGPerKg(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, v, initialTemperatureC);
	}

	public Surface withInitialTemperatureC(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, acidGPerKg, v);
	}

}
