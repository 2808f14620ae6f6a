package com.crustplan.engine.doneness;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.doneness.FoodCode.Cut;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.TemperatureDifference;

/**
 * Judges a finished cook for doneness in both directions: a core short of done when the
 * food comes off (poultry or meat below the food code, raw crumb, a fry whose centre
 * never boiled) and a core past juiciness or done long before the colour. Each warning
 * gives its reason and a suggestion; the suggestions are checked by forward runs of the
 * engine in the tests. Browning says nothing about internal safety: the plan's cautions
 * still ask for a probe.
 */
public final class DonenessJudge {

	private DonenessJudge() {
	}

	/**
	 * A one-step cook, judged when the target colour is reached (the cook takes it off
	 * there).
	 */
	public static List<DonenessWarning> judge(Surface surface, HeatSetup setup, CookResult cook, Cut cut) {
		if (!cook.reached()) {
			// no pull moment: the plan already says the colour is not reached
			return List.of();
		}
		return judge(surface, setup, cook, cut, cook.timeToTargetS(), cook.coreTemperatureAtTargetC(),
				Message.of("doneness.moment.colour"));
	}

	/**
	 * A cook in steps, judged at the end of its last step (after any rest and its
	 * carry-over).
	 */
	public static List<DonenessWarning> judge(Surface surface, List<CookStep> steps, StepsResult result, Cut cut) {
		CookResult cook = result.cook();
		double end = cook.simulatedS();
		List<Sample> series = cook.series();
		double core = series.isEmpty() ? centreC(cook.finalState()) : series.get(series.size() - 1).coreTemperatureC();
		return judge(surface, browningSetup(steps), cook, cut, end, core, Message.of("doneness.moment.end"));
	}

	private static List<DonenessWarning> judge(Surface surface, HeatSetup setup, CookResult cook, Cut cut, double pullS,
			double coreC, Message moment) {
		FoodCategory category = surface.category();
		double done = DonenessLimits.doneAtC(category, cut);
		double dry = DonenessLimits.dryAboveC(category);
		List<DonenessWarning> w = new ArrayList<>();
		if (!Double.isFinite(coreC) || !Double.isFinite(done)) {
			return w;
		}
		FoodCode code = FoodCode.forCategory(category, cut);
		if (coreC < done) {
			w.add(new DonenessWarning(underCode(category), Message.of("warning.with-suggestion",
					under(category, cut, moment, coreC), whenUnder(surface, setup, code))));
		}
		double peak = peakCoreC(cook, pullS, coreC);
		if (Double.isFinite(dry) && peak > dry) {
			w.add(new DonenessWarning("core-past-juiciness",
					Message.of("warning.with-suggestion",
							dry(category, moment, Temperature.celsius(peak), Temperature.celsius(dry)),
							Message.of("suggestion.brown-first", code.stated()))));
			return w;
		}
		double colourS = cook.timeToTargetS();
		double doneS = firstReachedS(cook.series(), done, pullS);
		// a fry's centre boils long before its crust colours, which is how frying works:
		// not judged
		if (category != FoodCategory.POTATO && Double.isFinite(colourS) && Double.isFinite(doneS)
				&& colourS - doneS >= DonenessLimits.LONG_BEFORE_S.value() && doneS <= colourS / 2) {
			Message suggestion = code != null ? Message.of("suggestion.brown-first", code.stated()) : Message
				.of("suggestion.hotter", TemperatureDifference.kelvin(DonenessLimits.LOWER_OVEN_K.value()));
			w.add(new DonenessWarning("colour-after-core",
					Message.of("warning.with-suggestion", Message.of("warning.doneness.colour-late",
							Temperature.celsius(done), duration(doneS), duration(colourS)), suggestion)));
		}
		return w;
	}

	private static String underCode(FoodCategory category) {
		return switch (category) {
			case BREAD, SWEET_DOUGH -> "crumb-not-baked";
			case POTATO -> "centre-not-cooked";
			default -> "core-below-food-code";
		};
	}

	private static Message under(FoodCategory category, Cut cut, Message moment, double coreC) {
		Temperature core = Temperature.celsius(coreC);
		return switch (category) {
			case POULTRY_SKIN -> Message.of("warning.food-code.poultry", moment, core, FoodCode.POULTRY.stated());
			case MEAT, FISH ->
				cut == Cut.MINCED ? Message.of("warning.food-code.minced", moment, core, FoodCode.COMMINUTED.stated())
						: Message.of("warning.food-code.whole-cut", moment, core, FoodCode.WHOLE_CUT.stated(),
								FoodCode.COMMINUTED.stated());
			case POTATO -> Message.of("warning.doneness.fry-centre", moment, core,
					Temperature.celsius(DonenessLimits.FRY_CENTRE_C.value()));
			default -> Message.of("warning.doneness.crumb-raw", moment, core,
					Temperature.celsius(DonenessLimits.doneAtC(category, cut)));
		};
	}

	private static Message dry(FoodCategory category, Message moment, Temperature peak, Temperature limit) {
		return switch (category) {
			case POULTRY_SKIN -> Message.of("warning.doneness.dry.poultry", moment, peak, limit);
			case FISH -> Message.of("warning.doneness.dry.fish", moment, peak, limit);
			default -> Message.of("warning.doneness.dry.meat", moment, peak, limit);
		};
	}

	/**
	 * What brings the centre up before the colour: cooler and longer, a finish in the
	 * oven, a thinner cut.
	 */
	private static Message whenUnder(Surface surface, HeatSetup setup, FoodCode code) {
		FoodCategory category = surface.category();
		if (category == FoodCategory.BREAD || category == FoodCategory.SWEET_DOUGH) {
			return Message.of("suggestion.bake-lower",
					TemperatureDifference.kelvin(DonenessLimits.LOWER_BREAD_OVEN_K.value()));
		}
		if (setup instanceof DeepFryer fryer) {
			double cap = DonenessLimits.FRY_AT_C.value();
			double at = fryer.temperatureC() > cap ? cap : fryer.temperatureC() - DonenessLimits.LOWER_FRYER_K.value();
			return Message.of("suggestion.fry-cooler-or-thinner", Temperature.celsius(at),
					Quantity.of(surface.thicknessMm() * DonenessLimits.THINNER_SHARE.value(), "mm"));
		}
		if (code != null && (setup instanceof PanContact || setup instanceof RadiantGrill)) {
			return Message.of("suggestion.lower-or-finish",
					TemperatureDifference.kelvin(DonenessLimits.LOWER_PAN_K.value()),
					Temperature.celsius(DonenessLimits.FINISH_OVEN_C.value()), code.stated());
		}
		double step = setup instanceof PanContact || setup instanceof RadiantGrill ? DonenessLimits.LOWER_PAN_K.value()
				: DonenessLimits.LOWER_OVEN_K.value();
		return Message.of("suggestion.lower-heat", TemperatureDifference.kelvin(step));
	}

	/**
	 * The hottest the centre got up to the pull moment (−∞ with no samples and no core).
	 */
	static double peakCoreC(CookResult cook, double pullS, double coreC) {
		double peak = Double.isFinite(coreC) ? coreC : Double.NEGATIVE_INFINITY;
		for (Sample s : cook.series()) {
			if (s.timeS() <= pullS + 1e-9 && s.coreTemperatureC() > peak) {
				peak = s.coreTemperatureC();
			}
		}
		return peak;
	}

	/**
	 * When the centre first reached {@code c} (linear between samples), or NaN if not by
	 * {@code untilS}.
	 */
	static double firstReachedS(List<Sample> series, double c, double untilS) {
		for (int i = 0; i < series.size(); i++) {
			Sample s = series.get(i);
			if (s.timeS() > untilS + 1e-9) {
				break;
			}
			if (s.coreTemperatureC() >= c) {
				if (i == 0) {
					return s.timeS();
				}
				Sample p = series.get(i - 1);
				double f = (c - p.coreTemperatureC()) / (s.coreTemperatureC() - p.coreTemperatureC());
				return p.timeS() + f * (s.timeS() - p.timeS());
			}
		}
		return Double.NaN;
	}

	/** The heat that browns: the first step that is not a rest. */
	private static HeatSetup browningSetup(List<CookStep> steps) {
		return steps.stream()
			.map(CookStep::setup)
			.filter(h -> !(h instanceof Rest))
			.findFirst()
			.orElse(steps.get(0).setup());
	}

	private static double centreC(CookResult.FinalState state) {
		double[] t = state.temperatureK();
		return t.length == 0 ? Double.NaN : t[t.length / 2] - 273.15;
	}

	/** Seconds under two minutes, whole minutes above. */
	private static Duration duration(double s) {
		return s < 120 ? Duration.seconds(s) : Duration.minutes(s / 60);
	}

}
