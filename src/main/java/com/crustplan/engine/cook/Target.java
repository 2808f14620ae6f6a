package com.crustplan.engine.cook;

import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Text;

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
				.orElseThrow(() -> new InvalidInputException("target.stage",
						"'" + stage + "' is not a stage of " + category.label() + "; use one of "
								+ category.stages().stream().map(BrowningStage::key).toList()));
			return s.extentOn(path);
		}
		double e = Double.isFinite(lightness) ? path.extentAtLightness(lightness) : Double.NaN;
		if (Double.isNaN(e)) {
			throw new InvalidInputException("target.lightness",
					String.format("L* must lie between %.0f (darkest) and %.0f (palest) for %s",
							path.darkestLightness(), path.palestLightness(), category.label()));
		}
		return e;
	}

	/** The target as a page names it: the stage's label, or "L* 62". */
	public Message describe(FoodCategory category) {
		if (stage != null) {
			return Message.of("target.stage", Text.of(stageLabel(category)));
		}
		return Message.of("target.lightness", PlainNumber.of(lightness, 0));
	}

	/**
	 * The same in running text: a stage's label in lower case ("cook to golden"); L*
	 * keeps its capital.
	 */
	public Message describeInText(FoodCategory category) {
		return stage != null ? Message.of("target.stage", Text.of(stageLabel(category).toLowerCase()))
				: describe(category);
	}

	private String stageLabel(FoodCategory category) {
		return category.stage(stage).map(BrowningStage::label).orElse(stage);
	}

}
