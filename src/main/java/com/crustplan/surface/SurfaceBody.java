package com.crustplan.surface;

import java.util.Arrays;
import java.util.List;

import com.crustplan.api.FieldErrors;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;

import com.fasterxml.jackson.annotation.JsonProperty;

/**
 * The API's {@code surface} object, as the plans and surfaces APIs both take it. Left-out
 * values take the category's defaults (the shape: the product's usual one); every error
 * is named {@code surface.<field>}. {@code thicknessMm} is the size as the shape reads
 * it: a slab's thickness, a strip's width, a cube's edge, a ball's diameter.
 */
public record SurfaceBody(String category, String product, Double waterPct, Double proteinPct, Double fatPct,
		Double reducingSugarPct, Double sucrosePct, Double starchPct, Double fibrePct, Double ashPct,
		Double asparagineMgPerKg, Double surfaceWaterGPerM2, Double thicknessMm, @JsonProperty("pH") Double ph,
		Double bicarbonateGPerKg, Double acidGPerKg, Double initialTemperatureC, String shape) {

	/** Longest category or product key read (the longest key is far shorter). */
	static final int KEY_MAX = 80;

	/**
	 * The engine's surface, checked, and its product; both null where a field is wrong.
	 */
	public record Read(Surface surface, Product product) {
	}

	public Read read(FieldErrors errors) {
		FoodCategory c = category(errors);
		if (c == null) {
			return new Read(null, null);
		}
		Product p = product(c, errors);
		Shape form = shape(p != null ? p.usualShape() : c.defaultShape(), errors);
		Surface s = surface(c, form, errors);
		return new Read(s, p);
	}

	/**
	 * The shape as sent, or where none is sent the usual shape of the product (of the
	 * category when no product is named); null when it names no shape.
	 */
	private Shape shape(Shape usual, FieldErrors errors) {
		String key = errors.text("surface.shape", shape, KEY_MAX);
		if (errors.has("surface.shape")) {
			return null;
		}
		if (key == null) {
			return usual;
		}
		Shape s = Shape.byKey(key).orElse(null);
		if (s == null) {
			errors.add("surface.shape", "'" + key + "' is not a shape; use one of " + Shape.keys());
		}
		return s;
	}

	private Surface surface(FoodCategory c, Shape form, FieldErrors errors) {
		if (errors.hasUnder("surface.") || form == null) {
			return null;
		}
		Composition d = c.defaultComposition();
		try {
			return new Surface(c,
					new Composition(or(waterPct, d.waterPct()), or(proteinPct, d.proteinPct()), or(fatPct, d.fatPct()),
							or(reducingSugarPct, d.reducingSugarPct()), or(sucrosePct, d.sucrosePct()),
							or(starchPct, d.starchPct()), or(fibrePct, d.fibrePct()), or(ashPct, d.ashPct())),
					or(asparagineMgPerKg, c.defaultAsparagineMgPerKg()),
					or(surfaceWaterGPerM2, c.defaultSurfaceWaterGPerM2()), or(thicknessMm, c.defaultThicknessMm()), ph,
					or(bicarbonateGPerKg, 0), or(acidGPerKg, 0),
					or(initialTemperatureC, c.defaultInitialTemperatureC()), form);
		}
		catch (InvalidInputException e) {
			errors.add("surface." + e.field(), e.reason());
			return null;
		}
	}

	/**
	 * The product key as sent (null: the category's usual product), once {@link #read}
	 * found it valid.
	 */
	public String productKey(Read read) {
		return product == null || read.product() == null ? null : read.product().key();
	}

	private FoodCategory category(FieldErrors errors) {
		String key = errors.text("surface.category", category, KEY_MAX);
		if (key != null) {
			FoodCategory c = FoodCategory.byKey(key).orElse(null);
			if (c == null) {
				errors.add("surface.category", "'" + key + "' is not a category; use one of " + categoryKeys());
			}
			return c;
		}
		if (!errors.has("surface.category")) {
			errors.add("surface.category", "is required; use one of " + categoryKeys());
		}
		return null;
	}

	private Product product(FoodCategory c, FieldErrors errors) {
		String key = errors.text("surface.product", product, KEY_MAX);
		if (errors.has("surface.product")) {
			return null;
		}
		try {
			return Product.forSurface(c, key);
		}
		catch (InvalidInputException e) {
			errors.add("surface.product", e.reason());
			return null;
		}
	}

	private static double or(Double v, double fallback) {
		return v == null ? fallback : v;
	}

	private static List<String> categoryKeys() {
		return Arrays.stream(FoodCategory.values()).map(FoodCategory::key).toList();
	}

}
