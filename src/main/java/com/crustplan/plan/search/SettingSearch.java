package com.crustplan.plan.search;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.ToDoubleFunction;
import java.util.stream.IntStream;

import org.springframework.stereotype.Service;

import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.assessment.AcrylamideWarnings;
import com.crustplan.engine.assessment.BenchmarkLevel;
import com.crustplan.engine.assessment.Mitigations;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.food.SurfaceField;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanService;
import com.crustplan.setup.HeatSettings;
import com.crustplan.system.Formats;
import com.crustplan.system.TemperatureUnit;

/**
 * "Which setting gets me there": runs the model once per setting of a range (each run
 * held for the time asked, recording when the colour and the core targets are reached),
 * marks the setting with least acrylamide where acrylamide matters and the gentlest
 * (lowest) elsewhere, and re-runs the marked one the way a plan is run. Where no setting
 * satisfies the goal it says why and tries the nearest changes (a thinner cut, a drier
 * surface, a pH tweak, finishing in the oven), each by running the model again.
 */
@Service
public class SettingSearch {

	/**
	 * A cut one size down: 10 mm chips to 7 mm, a 30 mm steak to 21 mm (common practice).
	 */
	static final double THINNER_FACTOR = 0.7;

	/**
	 * Patting dry or draining well leaves about half the surface water (assumption).
	 */
	static final double DRIER_FACTOR = 0.5;

	/**
	 * A pinch of bicarbonate of soda, about 1 g per kg, raises the surface pH and speeds
	 * Maillard browning (Martins, Jongen & van Boekel 2000, Trends Food Sci Technol
	 * 11:364); the amount is common practice.
	 */
	static final double BICARBONATE_PINCH_G_PER_KG = 1.0;

	/**
	 * Finishing oven for a sear-then-oven plan: dry fan oven at 160 °C (common practice).
	 */
	static final double FINISH_OVEN_C = 160;

	/** Regulation (EU) 2017/2158, Annex II Part A: fry cut potato below 175 °C. */
	static final double FRY_BELOW_C = AcrylamideWarnings.MAX_FRYING_C.value();

	/**
	 * How much longer the fastest setting is run to say how long it would take: three
	 * times the time asked, at most an hour more (readability; bounds the work).
	 */
	static final double LONGER_FACTOR = 3;

	static final double LONGER_MAX_EXTRA_S = 3600;

	/**
	 * Simulated cooking each alternative may re-run, settings × minutes; above it the
	 * alternative is re-run at settings spread evenly over the range, the hottest always
	 * among them (bounds the work of an infeasible search).
	 */
	static final double ALTERNATIVE_SETTING_MINUTES = 600;

	private final PlanService planner;

	SettingSearch(PlanService planner) {
		this.planner = planner;
	}

	public SearchAnswer search(Surface surface, Product product, List<HeatSetup> settings, SearchGoal goal,
			TemperatureUnit unit) {
		if (settings.isEmpty() || settings.size() > SettingRange.MAX_SETTINGS) {
			throw new InvalidInputException("range", "give 1 to " + SettingRange.MAX_SETTINGS + " settings");
		}
		if (goal.colour() != null) {
			goal.colour().extentFor(surface.category());
		}
		BenchmarkLevel benchmark = product.benchmark().orElse(null);
		List<String> notes = new ArrayList<>();
		if (goal.underBenchmark() && benchmark == null) {
			notes.add("No EU benchmark level applies to " + product.label()
					+ ": the search does not hold acrylamide to one.");
		}
		boolean acrylamideMatters = PlanReport.acrylamideMatters(surface.category(), benchmark != null);
		List<Trial> trials = trials(surface, product, settings, goal);
		int best = best(trials, goal, acrylamideMatters);
		String markedBy = acrylamideMatters ? SearchAnswer.LEAST_ACRYLAMIDE : SearchAnswer.GENTLEST;
		Double level = benchmark == null ? null : benchmark.microgramsPerKg();
		if (best >= 0 && surface.category() == FoodCategory.POTATO && trials.get(best).setup() instanceof DeepFryer f
				&& f.oilTemperatureC() > FRY_BELOW_C) {
			cooler(trials, goal)
				.ifPresent(c -> notes.add("The EU measures (Regulation (EU) 2017/2158, Annex II) "
						+ "asks for frying below " + unit.format(FRY_BELOW_C) + "; of the settings at or below it, "
						+ label(c.setup(), unit) + " gets there in " + Formats.duration(c.doneS())
						+ (Double.isFinite(c.portionUgPerKg())
								? " with " + Formats.number(c.portionUgPerKg(), 0) + " µg/kg in the portion" : "")
						+ "."));
		}
		if (best >= 0) {
			return new SearchAnswer(goal, trials, best, markedBy, level,
					verify(surface, product, trials.get(best).setup(), goal), List.of(), List.of(), notes);
		}
		List<String> why = why(surface, product, settings, trials, goal, level, unit);
		List<SearchAnswer.Alternative> alternatives = alternatives(surface, product, settings, trials, goal,
				acrylamideMatters, unit);
		return new SearchAnswer(goal, trials, -1, markedBy, level, null, why, alternatives, notes);
	}

	/**
	 * The least-acrylamide setting at or below the frying measure that satisfies the
	 * goal.
	 */
	private static Optional<Trial> cooler(List<Trial> trials, SearchGoal goal) {
		return trials.stream()
			.filter(t -> t.satisfies(goal) && t.temperatureC() <= FRY_BELOW_C)
			.min(Comparator.comparingDouble(Trial::portionUgPerKg));
	}

	/**
	 * Every setting run once for the time asked; runs are independent, so in parallel.
	 */
	static List<Trial> trials(Surface surface, Product product, List<HeatSetup> settings, SearchGoal goal) {
		BenchmarkLevel benchmark = product.benchmark().orElse(null);
		return IntStream.range(0, settings.size())
			.parallel()
			.mapToObj(i -> trial(surface, benchmark, settings.get(i), goal, goal.withinS()))
			.toList();
	}

	/**
	 * One timed run of {@code horizonS}; the targets are recorded where reached, so the
	 * series runs on past them.
	 */
	static Trial trial(Surface surface, BenchmarkLevel benchmark, HeatSetup setup, SearchGoal goal, double horizonS) {
		// with one target the run ends there; with both it goes on until the later one
		CookStep step = goal.coreC() == null ? CookStep.toColour(setup, goal.colour(), horizonS) : goal.colour() == null
				? CookStep.toCore(setup, goal.coreC(), horizonS) : CookStep.timed(setup, horizonS);
		StepsResult r = AcrylamideCook.runSteps(surface, List.of(step), goal.colour(), goal.coreC(),
				CookSettings.defaults().withHorizonS(horizonS));
		double colourS = goal.colour() == null ? Double.NaN : r.cook().timeToTargetS();
		double coreS = goal.coreC() == null ? Double.NaN : r.coreReachedAtS();
		boolean colourOk = goal.colour() == null || Double.isFinite(colourS);
		boolean coreOk = goal.coreC() == null || Double.isFinite(coreS);
		double doneS = colourOk && coreOk
				? Math.max(goal.colour() == null ? 0 : colourS, goal.coreC() == null ? 0 : coreS) : Double.NaN;
		List<Sample> series = r.cook().series();
		double portion;
		double core;
		String hex;
		double extent;
		if (Double.isFinite(doneS) && !series.isEmpty()) {
			Sample at = at(series, doneS);
			portion = goal.coreC() == null ? r.cook().portionAcrylamideAtTargetUgPerKg()
					: interpolate(series, doneS, Sample::portionAcrylamideUgPerKg);
			core = interpolate(series, doneS, Sample::coreTemperatureC);
			hex = at.colourHex();
			extent = at.browningExtent();
		}
		else {
			Sample last = series.isEmpty() ? null : series.get(series.size() - 1);
			portion = last == null ? Double.NaN : last.portionAcrylamideUgPerKg();
			core = last == null ? Double.NaN : last.coreTemperatureC();
			hex = last == null ? null : last.colourHex();
			extent = last == null ? 0 : last.browningExtent();
		}
		boolean inTime = Double.isFinite(doneS) && doneS <= horizonS + 1e-6;
		boolean under = benchmark == null || (Double.isFinite(portion) && portion <= benchmark.microgramsPerKg());
		return new Trial(setup, colourS, coreS, doneS, portion, core, hex, stageAt(surface.category(), extent), inTime,
				under);
	}

	/** The first recorded moment at or after {@code t}: the colour the cook then sees. */
	private static Sample at(List<Sample> s, double t) {
		return s.stream().filter(x -> x.timeS() >= t - 1e-6).findFirst().orElse(s.get(s.size() - 1));
	}

	private static double interpolate(List<Sample> s, double t, ToDoubleFunction<Sample> f) {
		for (int i = 1; i < s.size(); i++) {
			Sample a = s.get(i - 1);
			Sample b = s.get(i);
			if (b.timeS() >= t) {
				double w = b.timeS() > a.timeS() ? (t - a.timeS()) / (b.timeS() - a.timeS()) : 1;
				return f.applyAsDouble(a) + w * (f.applyAsDouble(b) - f.applyAsDouble(a));
			}
		}
		return f.applyAsDouble(s.get(s.size() - 1));
	}

	/** The darkest stage reached at this extent ("Unbrowned" before the first). */
	static String stageAt(FoodCategory category, double extent) {
		String label = "Unbrowned";
		double reached = -1;
		for (BrowningStage st : category.stages()) {
			double e = st.extentOn(category.colourPath());
			if (extent >= e - 1e-12 && e > reached) {
				reached = e;
				label = st.label();
			}
		}
		return label;
	}

	/**
	 * The setting to mark among those that satisfy the goal: least acrylamide, or the
	 * lowest setting; −1 if none.
	 */
	static int best(List<Trial> trials, SearchGoal goal, boolean byAcrylamide) {
		Comparator<Trial> gentlest = Comparator.comparingDouble(Trial::temperatureC)
			.thenComparingDouble(t -> t.setup() instanceof Oven o ? o.steamPct() : 0);
		Comparator<Trial> order = byAcrylamide ? Comparator
			.comparingDouble((Trial t) -> Double.isFinite(t.portionUgPerKg()) ? t.portionUgPerKg() : Double.MAX_VALUE)
			.thenComparing(gentlest) : gentlest;
		return IntStream.range(0, trials.size())
			.filter(i -> trials.get(i).satisfies(goal))
			.boxed()
			.min(Comparator.comparing(trials::get, order))
			.orElse(-1);
	}

	/**
	 * The marked setting planned as the plan page plans it: one setup to the colour, or
	 * in one timed step where there is a core target.
	 */
	SearchAnswer.Verified verify(Surface surface, Product product, HeatSetup setup, SearchGoal goal) {
		if (goal.coreC() == null) {
			PlanReport r = planner.plan(surface, product, setup, goal.colour(), goal.withinMinutes(), false);
			return new SearchAnswer.Verified(nan(r.timeToTargetS()), nan(r.coreTemperatureAtTargetC()),
					nan(r.acrylamide().portionUgPerKg()));
		}
		PlanReport r = planner.planSteps(surface, product, List.of(CookStep.timed(setup, goal.withinS())),
				List.of(setup.mode()), goal.colour(), goal.coreC(), goal.withinMinutes());
		double core = nan(r.steps().coreTargetReachedS());
		double colour = goal.colour() == null ? 0 : nan(r.timeToTargetS());
		return new SearchAnswer.Verified(Math.max(core, colour), goal.coreC(), nan(r.acrylamide().portionUgPerKg()));
	}

	private static double nan(Double v) {
		return v == null ? Double.NaN : v;
	}

	/** Why no setting satisfies the goal, in the cook's words. */
	static List<String> why(Surface surface, Product product, List<HeatSetup> settings, List<Trial> trials,
			SearchGoal goal, Double benchmark, TemperatureUnit unit) {
		List<String> why = new ArrayList<>();
		String within = Formats.duration(goal.withinS());
		String target = goalText(surface.category(), goal, unit);
		List<Trial> inTime = trials.stream().filter(Trial::inTime).toList();
		if (inTime.isEmpty()) {
			Trial fastest = trials.stream().max(Comparator.comparingDouble(Trial::temperatureC)).orElseThrow();
			double longer = Math.min(Math.min(goal.withinS() * LONGER_FACTOR, goal.withinS() + LONGER_MAX_EXTRA_S),
					CookSettings.MAX_HORIZON_S);
			Trial slow = trial(surface, product.benchmark().orElse(null), fastest.setup(), goal, longer);
			String s = "No setting in the range reaches " + target + " within " + within + ".";
			if (slow.inTime()) {
				s += " The hottest, " + label(fastest.setup(), unit) + ", gets there in "
						+ Formats.duration(slow.doneS()) + ", " + Formats.duration(slow.doneS() - goal.withinS())
						+ " more than asked.";
			}
			else {
				s += " Even the hottest, " + label(fastest.setup(), unit) + ", does not get there in "
						+ Formats.duration(longer) + ".";
			}
			why.add(s);
			if (goal.colour() != null && goal.coreC() != null && Double.isFinite(fastest.colourS())
					&& !Double.isFinite(fastest.coreS())) {
				why.add("At " + label(fastest.setup(), unit) + " the crust reaches the colour at "
						+ Formats.duration(fastest.colourS()) + ", but the core stays below "
						+ unit.format(goal.coreC()) + " (" + unit.format(fastest.coreAtDoneC())
						+ " at the end): the heat does not get to the centre in time.");
			}
			if (goal.coreC() != null && !(fastest.setup() instanceof RadiantGrill)
					&& fastest.temperatureC() <= goal.coreC()) {
				// heat flows from hot to cold: the centre never passes the air, oil or
				// pan
				why.add("The centre cannot get hotter than the heat around it: the hottest setting, "
						+ unit.format(fastest.temperatureC()) + ", is not above the " + unit.format(goal.coreC())
						+ " asked.");
			}
			if (settings.get(0) instanceof RadiantGrill) {
				why.add("A grill stops where the surface would char, so a hotter element is not always sooner.");
			}
		}
		else if (goal.underBenchmark() && benchmark != null) {
			Trial least = inTime.stream().min(Comparator.comparingDouble(Trial::portionUgPerKg)).orElseThrow();
			why.add("Every setting that reaches " + target + " within " + within + " is above the benchmark level of "
					+ Formats.number(benchmark, 0) + " µg/kg: the least is " + Formats.number(least.portionUgPerKg(), 0)
					+ " µg/kg, at " + label(least.setup(), unit) + ".");
		}
		return why;
	}

	/**
	 * The nearest changes, each re-run over the same settings: one cut size down, a drier
	 * surface, a pH tweak (bicarbonate where acrylamide does not matter, an acid dip
	 * against the benchmark) and, with a core target, colour first then the oven.
	 */
	List<SearchAnswer.Alternative> alternatives(Surface surface, Product product, List<HeatSetup> settings,
			List<Trial> trials, SearchGoal goal, boolean acrylamideMatters, TemperatureUnit unit) {
		List<SearchAnswer.Alternative> out = new ArrayList<>();
		boolean slow = trials.stream().noneMatch(Trial::inTime);
		double thinner = Math.max(SurfaceField.THICKNESS.min(), surface.thicknessMm() * THINNER_FACTOR);
		if (thinner < surface.thicknessMm() - 0.05) {
			out.add(changed(surface.withThicknessMm(thinner), product, settings, goal, "thinner",
					"Cut thinner: " + Formats.number(thinner, 1) + " mm instead of "
							+ Formats.number(surface.thicknessMm(), 1) + " mm.",
					acrylamideMatters, unit));
		}
		// water and pH change the colour's pace, not the centre's
		if (slow && goal.colour() != null && surface.surfaceWaterGPerM2() >= 2) {
			double drier = surface.surfaceWaterGPerM2() * DRIER_FACTOR;
			out.add(changed(surface.withSurfaceWaterGPerM2(drier), product, settings, goal, "drier",
					"Dry the surface: pat dry or drain well, to about " + Formats.number(drier, 0)
							+ " g/m² of surface water instead of " + Formats.number(surface.surfaceWaterGPerM2(), 0)
							+ ".",
					acrylamideMatters, unit));
		}
		if (slow && goal.colour() != null && !acrylamideMatters) {
			double bicarbonate = Math.min(SurfaceField.BICARBONATE.max(),
					surface.bicarbonateGPerKg() + BICARBONATE_PINCH_G_PER_KG);
			out.add(changed(surface.withBicarbonateGPerKg(bicarbonate), product, settings, goal, "ph",
					"Raise the surface pH a little: a pinch of bicarbonate of soda, about "
							+ Formats.number(BICARBONATE_PINCH_G_PER_KG, 1)
							+ " g per kg, browns sooner (it also changes the taste).",
					acrylamideMatters, unit));
		}
		if (!slow && goal.underBenchmark() && product.benchmark().isPresent()) {
			double acid = Math.min(SurfaceField.ACID.max(), surface.acidGPerKg() + Mitigations.ACID_DIP_UPTAKE.value());
			out.add(changed(surface.withAcidGPerKg(acid), product, settings, goal, "acid",
					"Lower the surface pH: a dip in about 1 % citric acid before cooking (about "
							+ Formats.number(Mitigations.ACID_DIP_UPTAKE.value(), 1)
							+ " g of acid per kg) slows acrylamide formation more than browning.",
					acrylamideMatters, unit));
		}
		if (goal.coreC() != null && goal.colour() != null) {
			finishInOven(surface, product, trials, goal, unit).ifPresent(out::add);
		}
		return out;
	}

	private SearchAnswer.Alternative changed(Surface changed, Product product, List<HeatSetup> settings,
			SearchGoal goal, String code, String change, boolean acrylamideMatters, TemperatureUnit unit) {
		List<HeatSetup> tried = spread(settings, goal);
		List<Trial> again = trials(changed, product, tried, goal);
		int best = best(again, goal, acrylamideMatters);
		String rerun = tried.size() == settings.size() ? "Re-run: "
				: "Re-run at " + tried.size() + " of the " + settings.size() + " settings: ";
		if (best < 0) {
			boolean inTime = again.stream().anyMatch(Trial::inTime);
			return new SearchAnswer.Alternative(code, change, false, null,
					rerun + (inTime ? "reaches the target in time, but still above the benchmark level."
							: "still no setting gets there in time."));
		}
		Trial t = again.get(best);
		return new SearchAnswer.Alternative(code, change, true, t, rerun + label(t.setup(), unit) + " gets there in "
				+ Formats.duration(t.doneS()) + acrylamideText(t, acrylamideMatters) + ".");
	}

	/** The settings an alternative is re-run at, within its share of the work. */
	static List<HeatSetup> spread(List<HeatSetup> settings, SearchGoal goal) {
		int k = (int) Math.max(1,
				Math.min(settings.size(), Math.floor(ALTERNATIVE_SETTING_MINUTES / goal.withinMinutes())));
		if (k >= settings.size()) {
			return settings;
		}
		List<HeatSetup> out = new ArrayList<>();
		for (int i = 0; i < k; i++) {
			// from the hottest down, evenly spaced
			int j = settings.size() - 1 - (int) Math.round(i * (settings.size() - 1) / (double) Math.max(1, k - 1));
			if (k == 1) {
				j = settings.size() - 1;
			}
			HeatSetup h = settings.get(j);
			if (!out.contains(h)) {
				out.add(0, h);
			}
		}
		return out;
	}

	/**
	 * Colour at the setting that browns soonest, then a dry fan oven to the core: the
	 * crust stops darkening while the centre catches up.
	 */
	private Optional<SearchAnswer.Alternative> finishInOven(Surface surface, Product product, List<Trial> trials,
			SearchGoal goal, TemperatureUnit unit) {
		Optional<Trial> browns = trials.stream()
			.filter(t -> Double.isFinite(t.colourS()))
			.min(Comparator.comparingDouble(Trial::colourS));
		if (browns.isEmpty()) {
			return Optional.empty();
		}
		HeatSetup first = browns.get().setup();
		Oven oven = new Oven(FINISH_OVEN_C, true, HeatSettings.DEFAULT_STEAM_PCT);
		List<CookStep> steps = List.of(CookStep.toColour(first, goal.colour(), goal.withinS()),
				CookStep.toCore(oven, goal.coreC(), goal.withinS()));
		String change = "Another step: brown at " + label(first, unit) + ", then finish in a dry fan oven at "
				+ unit.format(FINISH_OVEN_C) + " until the core reaches " + unit.format(goal.coreC()) + ".";
		PlanReport r = planner.planSteps(surface, product, steps, List.of(first.mode(), "oven"), goal.colour(),
				goal.coreC(), goal.withinMinutes());
		Double core = r.steps().coreTargetReachedS();
		Double colour = r.timeToTargetS();
		Double portion = r.acrylamide().portionUgPerKg();
		Double level = product.benchmark().map(BenchmarkLevel::microgramsPerKg).orElse(null);
		boolean under = !goal.underBenchmark() || level == null || (portion != null && portion <= level);
		if (core == null || colour == null) {
			return Optional.of(new SearchAnswer.Alternative("finish-in-oven", change, false, null,
					"Re-run: the core does not reach " + unit.format(goal.coreC()) + " within "
							+ Formats.duration(goal.withinS()) + " this way either."));
		}
		double done = Math.max(core, colour);
		Trial t = new Trial(first, colour, core, done, portion == null ? Double.NaN : portion, goal.coreC(), null, null,
				true, under);
		if (!under) {
			return Optional.of(new SearchAnswer.Alternative("finish-in-oven", change, false, null,
					"Re-run: done in " + Formats.duration(done) + ", but above the benchmark level."));
		}
		return Optional.of(new SearchAnswer.Alternative("finish-in-oven", change, true, t,
				"Re-run: done in " + Formats.duration(done) + acrylamideText(t, level != null) + "."));
	}

	private static String acrylamideText(Trial t, boolean matters) {
		return matters && Double.isFinite(t.portionUgPerKg())
				? ", " + Formats.number(t.portionUgPerKg(), 0) + " µg/kg acrylamide in the portion" : "";
	}

	/** The goal as a cook reads it: "golden and a core of 63 °C". */
	static String goalText(FoodCategory category, SearchGoal goal, TemperatureUnit unit) {
		String colour = goal.colour() == null ? null
				: goal.colour().stage() != null ? category.stage(goal.colour().stage())
					.map(BrowningStage::label)
					.orElse(goal.colour().stage())
					.toLowerCase(Locale.ROOT) : "L* " + Formats.number(goal.colour().lightness(), 0);
		String core = goal.coreC() == null ? null : "a core of " + unit.format(goal.coreC());
		return colour == null ? core : core == null ? colour : colour + " and " + core;
	}

	/** A setting as the line sets it: "oil 175 °C", "oven 200 °C, fan, steam 30 %". */
	public static String label(HeatSetup h, TemperatureUnit unit) {
		if (h instanceof DeepFryer f) {
			return "oil " + unit.format(f.oilTemperatureC());
		}
		if (h instanceof Oven o) {
			return "oven " + unit.format(o.airTemperatureC()) + (o.fan() ? ", fan" : "")
					+ (o.steamPct() > HeatSettings.DEFAULT_STEAM_PCT + 0.05
							? ", steam " + Formats.number(o.steamPct(), 0) + " %" : "");
		}
		if (h instanceof PanContact p) {
			return "pan " + unit.format(p.temperatureC());
		}
		if (h instanceof RadiantGrill g) {
			return "element " + unit.format(g.heaterTemperatureC());
		}
		return unit.format(h.temperatureC());
	}

}
