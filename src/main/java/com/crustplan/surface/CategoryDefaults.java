package com.crustplan.surface;

import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.Map;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.food.SurfaceField;

/**
 * A category's defaults as named fields, read from the engine: for the API and the form's
 * defaults button.
 */
public final class CategoryDefaults {

	private CategoryDefaults() {
	}

	/**
	 * The defaults of the given fields under their API names, in the order given; pH is
	 * the category's typical pH, bicarbonate and acid are 0.
	 */
	public static Map<String, Object> of(FoodCategory c, Collection<SurfaceField> fields) {
		Surface d = Surface.defaults(c);
		Map<String, Object> out = new LinkedHashMap<>();
		for (SurfaceField f : fields) {
			out.put(f.key(), f == SurfaceField.PH ? d.basePh() : f.of(d));
		}
		return out;
	}

}
