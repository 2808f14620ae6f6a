package com.crustplan.engine.food;

import com.crustplan.engine.input.InvalidInputException;

/**
 * A food surface as a cook describes it: the engine's input. Units are in the names;
 * {@code phOverride} null means the category's typical pH. {@code thicknessMm} is the
 * piece's size as its {@link Shape} reads it: the thickness of a slab, the width (side or
 * diameter) of a strip, the edge of a cube, the diameter of a ball.
 */
public record Surface(FoodCategory category, Composition composition, double asparagineMgPerKg,
		double surfaceWaterGPerM2, double thicknessMm, Double phOverride, double bicarbonateGPerKg, double acidGPerKg,
		double initialTemperatureC, Shape shape) {

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
		if (shape == null) {
			throw new InvalidInputException("shape", "is required");
		}
	}

	/** A slab (two heated faces) of the given thickness. */
	public Surface(FoodCategory category, Composition composition, double asparagineMgPerKg, double surfaceWaterGPerM2,
			double thicknessMm, Double phOverride, double bicarbonateGPerKg, double acidGPerKg,
			double initialTemperatureC) {
		this(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride, bicarbonateGPerKg,
				acidGPerKg, initialTemperatureC, Shape.SLAB);
	}

	/**
	 * A surface with the category's defaults, as a slab of the category's default size:
	 * the engine's reference case, which its checks and calibrations compare on.
	 */
	public static Surface defaults(FoodCategory category) {
		return new Surface(category, category.defaultComposition(), category.defaultAsparagineMgPerKg(),
				category.defaultSurfaceWaterGPerM2(), category.defaultThicknessMm(), null, 0, 0,
				category.defaultInitialTemperatureC());
	}

	/**
	 * A surface with the category's defaults in the category's usual shape (fries as
	 * strips): what a new surface starts from.
	 */
	public static Surface typical(FoodCategory category) {
		return defaults(category).withShape(category.defaultShape());
	}

	public double basePh() {
		return phOverride != null ? phOverride : category.defaultPh();
	}

	public double ph() {
		return Acidity.adjustedPh(basePh(), bicarbonateGPerKg, acidGPerKg, category.bufferCapacity().value());
	}

	public Surface withComposition(Composition c) {
		return new Surface(category, c, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC, shape);
	}

	public Surface withAsparagineMgPerKg(double v) {
		return new Surface(category, composition, v, surfaceWaterGPerM2, thicknessMm, phOverride, bicarbonateGPerKg,
				acidGPerKg, initialTemperatureC, shape);
	}

	public Surface withSurfaceWaterGPerM2(double v) {
		return new Surface(category, composition, asparagineMgPerKg, v, thicknessMm, phOverride, bicarbonateGPerKg,
				acidGPerKg, initialTemperatureC, shape);
	}

	public Surface withThicknessMm(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, v, phOverride,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC, shape);
	}

	public Surface withPh(Double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, v,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC, shape);
	}

	public Surface withBicarbonateGPerKg(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride, v,
				acidGPerKg, initialTemperatureC, shape);
	}

	public Surface withAcidGPerKg(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, v, initialTemperatureC, shape);
	}

	public Surface withInitialTemperatureC(double v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, acidGPerKg, v, shape);
	}

	public Surface withShape(Shape v) {
		return new Surface(category, composition, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, phOverride,
				bicarbonateGPerKg, acidGPerKg, initialTemperatureC, v);
	}

}
