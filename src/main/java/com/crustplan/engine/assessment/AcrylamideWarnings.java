package com.crustplan.engine.assessment;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;
import com.crustplan.engine.model.Parameter;

/**
 * Checks a setup against the retail and catering measures of Regulation (EU) 2017/2158,
 * Annex II.
 */
public final class AcrylamideWarnings {

	private static final String ANNEX_II = "Regulation (EU) 2017/2158, Annex II";

	public static final Parameter MAX_FRYING_C = Parameter.published("T_fry,max",
			"frying temperature the measures ask to stay below", 175, "°C",
			"Regulation (EU) 2017/2158, Annex II Part A (French fries and other cut potato products)");

	public static final Parameter HIGH_SUGAR_PCT = Parameter.fromMemory("RS,high",
			"reducing sugar above which a potato is a high-sugar lot", 0.5, "%",
			"frying-quality potatoes usually hold well under 0.5 % reducing sugar fresh weight (from memory)");

	/**
	 * Store potatoes above this (Regulation (EU) 2017/2158, Annex II Part A: storage
	 * above 6 °C).
	 */
	public static final double WARM_STORAGE_C = 6;

	/**
	 * The darkest stage a colour guide for the category recommends (common practice:
	 * fries and bread cooked to golden).
	 */
	public static final String GUIDE_STAGE = "golden";

	private AcrylamideWarnings() {
	}

	/**
	 * Warnings for one planned cook; {@code portionUgPerKg} may be NaN when there is no
	 * estimate.
	 */
	public static List<AcrylamideWarning> check(Surface surface, Product product, HeatSetup setup, Target target,
			double portionUgPerKg) {
		List<AcrylamideWarning> list = new ArrayList<>();
		FoodCategory category = surface.category();
		if (category == FoodCategory.POTATO && setup instanceof DeepFryer fryer
				&& fryer.oilTemperatureC() >= MAX_FRYING_C.value()) {
			list.add(new AcrylamideWarning(
					AcrylamideWarning.FRYING_TOO_HOT, Message.of("warning.acrylamide.frying-too-hot",
							Temperature.celsius(fryer.oilTemperatureC()), Temperature.celsius(MAX_FRYING_C.value())),
					ANNEX_II + ", Part A (French fries)"));
		}
		if (guideApplies(category)) {
			category.stage(GUIDE_STAGE).ifPresent(guide -> {
				double guideExtent = guide.extentOn(category.colourPath());
				double targetExtent = target.extentFor(category);
				if (targetExtent > guideExtent + 1e-9) {
					list.add(new AcrylamideWarning(AcrylamideWarning.DARKER_THAN_GUIDE,
							Message.of("warning.acrylamide.darker-than-guide", target.describe(category),
									Text.of(guide.label().toLowerCase())),
							ANNEX_II + ", Part A (colour guides; bake and toast to a lighter colour)"));
				}
			});
		}
		if (category == FoodCategory.POTATO && surface.composition().reducingSugarPct() > HIGH_SUGAR_PCT.value()) {
			list.add(new AcrylamideWarning(AcrylamideWarning.HIGH_SUGAR_POTATO,
					Message.of("warning.acrylamide.high-sugar-potato",
							Quantity.of(surface.composition().reducingSugarPct(), "%", 2),
							Temperature.celsius(WARM_STORAGE_C)),
					ANNEX_II + ", Part A (varieties, storage, soaking)"));
		}
		product.benchmark().ifPresent(b -> {
			AcrylamideZone zone = b.zoneOf(portionUgPerKg);
			if (zone == AcrylamideZone.HIGH) {
				list.add(new AcrylamideWarning(AcrylamideWarning.OVER_BENCHMARK,
						Message.of("warning.acrylamide.over-benchmark", Quantity.of(portionUgPerKg, "µg/kg"),
								Quantity.of(b.microgramsPerKg(), "µg/kg"), Text.of(product.label().toLowerCase())),
						BenchmarkLevel.SOURCE));
			}
			else if (zone == AcrylamideZone.ELEVATED) {
				list.add(new AcrylamideWarning(AcrylamideWarning.NEAR_BENCHMARK,
						Message.of("warning.acrylamide.near-benchmark", Quantity.of(portionUgPerKg, "µg/kg"),
								Quantity.of(b.microgramsPerKg(), "µg/kg"), Text.of(product.label().toLowerCase())),
						BenchmarkLevel.SOURCE));
			}
		});
		return list;
	}

	private static boolean guideApplies(FoodCategory category) {
		return category == FoodCategory.POTATO || category == FoodCategory.BREAD
				|| category == FoodCategory.SWEET_DOUGH;
	}

	/** The stage of a category that a colour guide recommends, if it has one. */
	public static Optional<BrowningStage> guideStage(FoodCategory category) {
		return guideApplies(category) ? category.stage(GUIDE_STAGE) : Optional.empty();
	}

}
