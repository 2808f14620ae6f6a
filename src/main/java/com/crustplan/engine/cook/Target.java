package com.crustplan.engine.cook;

import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;

/** The colour to cook to: a CIE L* value or one of the category's named stages. */
public record Target(Double lightness, String stage) {

	public Target {
		if ((lightness == null) == (stage == null || stage.isBlank())) {
			throw new InvalidInputException("target", "give either a lightness (L*) or a stage");
		}
	}

	public static Target lightness(double lStar) {
		return new Target(lStar, null);
	}

	public static Target stage(String key) {
		return new Target(null, key);
	}

	/** The browning extent this target stands for on the category's colour path. */
	public double extentFor(FoodCategory category) {
		ColourPath path = category.colourPath();
		if (stage != null) {
			BrowningStage s = category.stage(stage)
				.orElseThrow(() -> new InvalidInputException("target.stage", "'" + stage + "' is not a stage of "
						+ category.label() + "; use one of " + category.stages().stream().map(BrowningStage::key).toList()));
			return s.extentOn(path);
		}
		double e = Double.isFinite(lightness) ? path.extentAtLightness(lightness) : Double.NaN;
		if (Double.isNaN(e)) {
			throw new InvalidInputException("target.lightness",
					String.format("L* must lie between %.0f (darkest) and %.0f (palest) for %s", path.darkestLightness(),
							path.palestLightness(), category.label()));
		}
		return e;
	}

	public String describe(FoodCategory category) {
		if (stage != null) {
			return category.stage(stage).map(BrowningStage::label).orElse(stage);
		}
		return String.format("L* %.0f", lightness);
	}

}
