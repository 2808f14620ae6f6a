package com.crustplan.engine.doneness;

import java.util.List;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.model.Parameter;

/**
 * The core temperatures that mark a food done or overdone, and the steps the suggestions
 * take.
 */
public final class DonenessLimits {

	private DonenessLimits() {
	}

	public static final Parameter MEAT_DRY_C = Parameter.commonPractice("T_dry,meat",
			"core past which whole-muscle red meat is past well done and dries", 70, "°C",
			"well done ≈ 70 °C (common practice doneness words); myoglobin is fully denatured by about 75–80 °C"
					+ " (King & Whyte 2006, J Food Sci 71:R31; from memory)");

	public static final Parameter POULTRY_DRY_C = Parameter.commonPractice("T_dry,poultry",
			"core past which poultry breast dries", 80, "°C",
			"breast meat is juicy from 74 °C and dry past about 80 °C; leg meat tolerates 80–85 °C (common practice, from memory)");

	public static final Parameter FISH_DRY_C = Parameter.commonPractice("T_dry,fish",
			"core past which fish turns dry and chalky", 65, "°C",
			"white fish flakes at 55–60 °C and dries past about 65 °C (common practice, from memory); set above the"
					+ " Food Code's 63 °C so a fish cooked to the code is not called dry");

	public static final Parameter BREAD_BAKED_C = Parameter.commonPractice("T_baked,bread",
			"crumb temperature of baked lean bread", 96, "°C",
			"bakers probe lean bread to 96–99 °C (205–210 °F) (common practice); the lower end is taken");

	public static final Parameter SWEET_DOUGH_BAKED_C = Parameter.commonPractice("T_baked,enriched",
			"crumb temperature of baked enriched dough", 90, "°C",
			"enriched doughs (brioche, buns) are probed to 88–93 °C (190–200 °F) (common practice, from memory)");

	public static final Parameter FRY_CENTRE_C = Parameter.commonPractice("T_cooked,fry",
			"centre of a cooked potato piece", 98, "°C",
			"a wet centre cooked through sits at its boiling point, ≈ 100 °C (fry cores measured ≈ 103 °C, from memory);"
					+ " 2 K below for the grid's centre node");

	public static final Parameter LONG_BEFORE_S = Parameter.assumption("Δt_late",
			"the core is done long before the colour when it is done this much earlier", 300, "s",
			"five minutes, and before half the time to the colour: long enough to matter on the line (assumption)");

	public static final Parameter LOWER_PAN_K = Parameter.commonPractice("ΔT_pan",
			"how much lower to set a pan or grill", 20, "K",
			"one step down on a burner, e.g. 200 → 180 °C (common practice)");

	public static final Parameter LOWER_OVEN_K = Parameter.commonPractice("ΔT_oven",
			"how much lower or higher to set an oven", 30, "K", "a usual step on an oven dial (common practice)");

	public static final Parameter LOWER_BREAD_OVEN_K = Parameter.commonPractice("ΔT_bake",
			"how much lower to bake bread", 40, "K",
			"e.g. 230 → 190 °C, from a hearth bake to a tin-loaf bake (common practice)");

	public static final Parameter FRY_AT_C = Parameter.published("T_fry", "fry at or below", 175, "°C",
			"Regulation (EU) 2017/2158, Annex II: fry potato products below 175 °C");

	public static final Parameter LOWER_FRYER_K = Parameter.commonPractice("ΔT_fry",
			"how much lower to fry when already cool", 15, "K",
			"e.g. 175 → 160 °C, a blanching temperature (common practice)");

	public static final Parameter FINISH_OVEN_C = Parameter.commonPractice("T_finish",
			"oven to finish a seared piece in", 180, "°C",
			"a moderate oven for finishing after a sear (common practice)");

	public static final Parameter THINNER_SHARE = Parameter.assumption("f_thin", "share of the thickness to cut to",
			0.5, "–",
			"half is our choice of advice; what it buys is derived: a slab's heating time goes with the square of its thickness"
					+ " (Fourier number), so half as thick heats about four times sooner");

	public static List<Parameter> parameters() {
		return List.of(MEAT_DRY_C, POULTRY_DRY_C, FISH_DRY_C, BREAD_BAKED_C, SWEET_DOUGH_BAKED_C, FRY_CENTRE_C,
				LONG_BEFORE_S, LOWER_PAN_K, LOWER_OVEN_K, LOWER_BREAD_OVEN_K, FRY_AT_C, LOWER_FRYER_K, FINISH_OVEN_C,
				THINNER_SHARE);
	}

	/** The core past which the category dries, °C, or NaN where none is judged. */
	public static double dryAboveC(FoodCategory category) {
		return switch (category) {
			case MEAT -> MEAT_DRY_C.value();
			case POULTRY_SKIN -> POULTRY_DRY_C.value();
			case FISH -> FISH_DRY_C.value();
			default -> Double.NaN;
		};
	}

	/**
	 * The core at which the category is done, °C, or NaN where none is judged
	 * (vegetables).
	 */
	public static double doneAtC(FoodCategory category, FoodCode.Cut cut) {
		FoodCode code = FoodCode.forCategory(category, cut);
		if (code != null) {
			return code.celsius();
		}
		return switch (category) {
			case BREAD -> BREAD_BAKED_C.value();
			case SWEET_DOUGH -> SWEET_DOUGH_BAKED_C.value();
			case POTATO -> FRY_CENTRE_C.value();
			default -> Double.NaN;
		};
	}

}
