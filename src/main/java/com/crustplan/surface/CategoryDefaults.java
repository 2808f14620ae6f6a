package com.crustplan.surface;

import java.util.LinkedHashMap;
import java.util.Map;

import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;

/** A category's typical composition and size as named fields: for the API and the form's defaults button. */
public final class CategoryDefaults {

	private CategoryDefaults() {
	}

	/** Composition (%), asparagine, standing water and thickness under the API's field names. */
	public static Map<String, Object> of(FoodCategory c) {
		Composition k = c.defaultComposition();
		Map<String, Object> d = new LinkedHashMap<>();
		d.put("waterPct", k.waterPct());
		d.put("proteinPct", k.proteinPct());
		d.put("fatPct", k.fatPct());
		d.put("reducingSugarPct", k.reducingSugarPct());
		d.put("sucrosePct", k.sucrosePct());
		d.put("starchPct", k.starchPct());
		d.put("fibrePct", k.fibrePct());
		d.put("ashPct", k.ashPct());
		d.put("asparagineMgPerKg", c.defaultAsparagineMgPerKg());
		d.put("surfaceWaterGPerM2", c.defaultSurfaceWaterGPerM2());
		d.put("thicknessMm", c.defaultThicknessMm());
		return d;
	}

}
