package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Supplier;

import com.crustplan.api.FieldErrors;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.input.InvalidInputException;

/**
 * Reads the {@code steps} of a {@code POST /api/v1/plans} body and the plan target's
 * {@code coreTemperatureC}: each step a {@code heat} (as a one-setup plan's, or
 * {@code mode: "rest"} with an optional air {@code temperatureC}) and its end
 * ({@code minutes}, {@code stage} or {@code lightness}, {@code coreTemperatureC};
 * whichever comes first). Every error names its JSON path ({@code steps[1].minutes}).
 */
final class StepsReader {

	/**
	 * Most steps in one plan: more than any kitchen sequence needs (common practice), few
	 * enough to chart.
	 */
	static final int MAX_STEPS = 12;

	/** One step as the body gives it. */
	record StepBody(PlanBody.HeatBody heat, Double minutes, String stage, Double lightness, Double coreTemperatureC) {
	}

	/** Steps read, with their names for the page ("pan", "rest"). */
	record Steps(List<CookStep> steps, List<String> labels) {
	}

	private StepsReader() {
	}

	/**
	 * The steps, or null where any of them has an error (all errors are reported to
	 * {@code errors}).
	 */
	static Steps read(List<StepBody> body, FoodCategory category, double horizonMinutes, FieldErrors errors) {
		if (body.isEmpty() || body.size() > MAX_STEPS) {
			errors.add("steps", "give 1 to " + MAX_STEPS + " steps");
			return null;
		}
		boolean before = errors.hasUnder("steps");
		List<CookStep> steps = new ArrayList<>();
		List<String> labels = new ArrayList<>();
		for (int i = 0; i < body.size(); i++) {
			CookStep step = step(body.get(i), "steps[" + i + "]", category, horizonMinutes, errors);
			if (step != null) {
				steps.add(step);
				labels.add(step.setup().mode());
			}
		}
		return errors.hasUnder("steps") && !before ? null : new Steps(steps, labels);
	}

	private static CookStep step(StepBody s, String at, FoodCategory category, double horizonMinutes,
			FieldErrors errors) {
		if (s == null) {
			errors.add(at, "must be a JSON object with a heat and an end");
			return null;
		}
		PlanBody.HeatBody h = s.heat();
		HeatSetup heat = null;
		if (h == null) {
			errors.add(at + ".heat",
					"is required (a JSON object, as a one-setup plan's heat, or {\"mode\": \"rest\"})");
		}
		else if (h.mode() != null && "rest".equalsIgnoreCase(h.mode().trim())) {
			Double air = h.temperatureC();
			heat = engine(() -> new Rest(air == null ? HeatSetup.KITCHEN_AIR_C.value() : air), at + ".heat", errors);
		}
		else {
			heat = PlanBody.heat(h, at + ".heat", errors);
		}
		Target colour = colour(s.stage(), s.lightness(), at, category, errors);
		if (s.minutes() == null && s.coreTemperatureC() == null && colour == null && !wrong(errors, at)) {
			errors.add(at, "say when the step ends: minutes, a stage or lightness, a coreTemperatureC, or several");
		}
		if (heat == null || wrong(errors, at)) {
			return null;
		}
		HeatSetup setup = heat;
		double maxS = (s.minutes() == null ? horizonMinutes : s.minutes()) * 60;
		return engine(() -> new CookStep(setup, maxS, colour, s.coreTemperatureC()), at, errors);
	}

	/**
	 * A colour end of a step or of the plan target, checked against the category; null
	 * when none is given.
	 */
	static Target colour(String stageGiven, Double lightness, String at, FoodCategory category, FieldErrors errors) {
		String stage = errors.text(at + ".stage", stageGiven, PlanBody.KEY_MAX);
		if (lightness == null && stage == null) {
			return null;
		}
		if (lightness != null && stage != null) {
			errors.add(at + ".stage", "give either a stage or a lightness (L*), not both");
			return null;
		}
		Target t = stage != null ? Target.stage(stage) : Target.lightness(lightness);
		if (category != null) {
			try {
				t.extentFor(category);
			}
			catch (InvalidInputException e) {
				errors.add(at + "." + (stage != null ? "stage" : "lightness"), e.reason());
				return null;
			}
		}
		return t;
	}

	/** The plan's target core temperature, °C, or null when none is given. */
	static Double coreTarget(Double c, FieldErrors errors) {
		// −20 °C (frozen) to 120 °C, as the engine's step ends
		if (c != null && !(c > -20 && c <= 120)) {
			errors.add("target.coreTemperatureC", "a core target lies above −20 °C and at most 120 °C");
			return null;
		}
		return c;
	}

	/**
	 * An error on the step itself or on one of its fields (steps[1] is not steps[10]).
	 */
	private static boolean wrong(FieldErrors errors, String at) {
		return errors.has(at) || errors.hasUnder(at + ".");
	}

	/** The engine's own checks, their field put under the step's path. */
	private static <T> T engine(Supplier<T> build, String at, FieldErrors errors) {
		try {
			return build.get();
		}
		catch (InvalidInputException e) {
			String f = e.field();
			errors.add(at + "." + (f.equals("temperatureC") && !at.endsWith(".heat") ? "heat.temperatureC" : f),
					e.reason());
			return null;
		}
	}

}
