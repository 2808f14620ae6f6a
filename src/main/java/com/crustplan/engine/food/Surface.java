package com.crustplan.engine.food;

import com.crustplan.engine.input.InvalidInputException;

/**
 * A food surface as a cook describes it: the engine's input. Units are in the names;
 * {@code phOverride} null means the category's typical pH.
 */
public record Surface(FoodCategory category, Composition composition, double asparagineMgPerKg,
		double surfaceWaterGPerM2, double thicknessMm, Double phOverride, double bicarbonateGPerKg, double acidGPerKg,
		double initialTemperatureC) {

	/** Checks every field against its {@link SurfaceField} range. */
	public Surface {
		if (category == null) {
			throw new InvalidInputException("category", "is required");
		}
		if (composition == null) {
			throw new InvalidInputException("composition", "is required");
		}
		SurfaceField.ASPARAGINE.check(asparagineMgPerKg);
		SurfaceField.SURFACE_WATER.check(surfaceWaterGPerM2);
		SurfaceField.THICKNESS.check(thicknessMm);
		if (phOverride != null) {
			SurfaceField.PH.check(phOverride);
		}
		SurfaceField.BICARBONATE.check(bicarbonateGPerKg);
		SurfaceField.ACID.check(acidGPerKg);
		SurfaceField.INITIAL_TEMPERATURE.check(initialTemperatureC);
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
