package com.crustplan.engine.food;

import com.crustplan.engine.colour.ColourPath;

/**
 * A named browning stage of a category, reached when the surface gets as dark as
 * {@code lightness} (L*), or, for categories whose colour is not monotone in L*, when the
 * browning extent reaches {@code extent}. Exactly one of the two is set.
 */
public record BrowningStage(String key, String label, Double lightness, Double extent) {

	public BrowningStage {
		if ((lightness == null) == (extent == null)) {
			throw new IllegalArgumentException("a stage is defined by L* or by extent, not both");
		}
	}

	public static BrowningStage byLightness(String key, String label, double lightness) {
		return new BrowningStage(key, label, lightness, null);
	}

	public static BrowningStage byExtent(String key, String label, double extent) {
		return new BrowningStage(key, label, null, extent);
	}

	public boolean definedByExtent() {
		return extent != null;
	}

	/**
	 * The browning extent at which this stage is reached along the category's colour
	 * path.
	 */
	public double extentOn(ColourPath path) {
		return extent != null ? extent : path.extentAtLightness(lightness);
	}

}
