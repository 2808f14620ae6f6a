package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.input.InvalidInputException;

import tools.jackson.databind.JsonNode;

/**
 * Reads the {@code steps} of a {@code POST /api/v1/plans} body and the plan target's
 * {@code coreTemperatureC}: each step a {@code heat} (as a one-setup plan's, or {@code mode: "rest"}
 * with an optional air {@code temperatureC}) and its end ({@code minutes}, {@code stage} or
 * {@code lightness}, {@code coreTemperatureC}; whichever comes first). Every error names its JSON path
 * ({@code steps[1].minutes}). The body's typed reading (numbers, text, a heat object) is the caller's.
 */
final class StepsReader {

	/** Most steps in one plan: more than any kitchen sequence needs (common practice), few enough to chart. */
	static final int MAX_STEPS = 12;

	/** How the body is read field by field, and where errors go. */
	interface Fields {

		Double number(JsonNode parent, String name, String field);

		String text(JsonNode parent, String name, String field);

		void error(String field, String message);

		int errorCount();

		/** A heat object of the four modes; errors are named under {@code prefix} ("steps[0].heat"). */
		HeatSetup heat(JsonNode heat, String prefix);

	}

	/** Steps read, with their names for the page ("pan", "rest"). */
	record Steps(List<CookStep> steps, List<String> labels) {
	}

	private StepsReader() {
	}

	/** The steps, or null where any of them has an error (all errors are reported to {@code fields}). */
	static Steps read(JsonNode node, FoodCategory category, double horizonMinutes, Fields fields) {
		if (node == null || node.isNull() || !node.isArray()) {
			fields.error("steps", "must be a list of steps, each with a heat and an end");
			return null;
		}
		if (node.isEmpty() || node.size() > MAX_STEPS) {
			fields.error("steps", "give 1 to " + MAX_STEPS + " steps");
			return null;
		}
		int before = fields.errorCount();
		List<CookStep> steps = new ArrayList<>();
		List<String> labels = new ArrayList<>();
		for (int i = 0; i < node.size(); i++) {
			String at = "steps[" + i + "]";
			CookStep step = step(node.get(i), at, category, horizonMinutes, fields);
			if (step != null) {
				steps.add(step);
				labels.add(step.setup().mode());
			}
		}
		return fields.errorCount() > before ? null : new Steps(steps, labels);
	}

	private static CookStep step(JsonNode s, String at, FoodCategory category, double horizonMinutes, Fields fields) {
		if (s == null || !s.isObject()) {
			fields.error(at, "must be a JSON object with a heat and an end");
			return null;
		}
		int before = fields.errorCount();
		JsonNode h = s.get("heat");
		HeatSetup heat = null;
		if (h == null || h.isNull() || !h.isObject()) {
			fields.error(at + ".heat", "is required (a JSON object, as a one-setup plan's heat, or {\"mode\": \"rest\"})");
		}
		else if (h.has("mode") && h.get("mode").isString() && "rest".equalsIgnoreCase(h.get("mode").asString().trim())) {
			Double air = fields.number(h, "temperatureC", at + ".heat.temperatureC");
			if (fields.errorCount() == before) {
				heat = engine(() -> new HeatSetup.Rest(air == null ? HeatSetup.KITCHEN_AIR_C.value() : air),
						at + ".heat", fields);
			}
		}
		else {
			heat = fields.heat(h, at + ".heat");
		}
		Double minutes = fields.number(s, "minutes", at + ".minutes");
		Double core = fields.number(s, "coreTemperatureC", at + ".coreTemperatureC");
		Target colour = colour(s, at, category, fields);
		if (minutes == null && core == null && colour == null && fields.errorCount() == before) {
			fields.error(at, "say when the step ends: minutes, a stage or lightness, a coreTemperatureC, or several");
		}
		if (heat == null || fields.errorCount() > before) {
			return null;
		}
		HeatSetup setup = heat;
		double maxS = (minutes == null ? horizonMinutes : minutes) * 60;
		return engine(() -> new CookStep(setup, maxS, colour, core), at, fields);
	}

	/** A colour end of a step or of the plan target, checked against the category; null when none is given. */
	static Target colour(JsonNode node, String at, FoodCategory category, Fields fields) {
		Double lightness = fields.number(node, "lightness", at + ".lightness");
		String stage = fields.text(node, "stage", at + ".stage");
		if (lightness == null && stage == null) {
			return null;
		}
		if (lightness != null && stage != null) {
			fields.error(at + ".stage", "give either a stage or a lightness (L*), not both");
			return null;
		}
		Target t = stage != null ? Target.stage(stage) : Target.lightness(lightness);
		if (category != null) {
			try {
				t.extentFor(category);
			}
			catch (InvalidInputException e) {
				fields.error(at + "." + (stage != null ? "stage" : "lightness"), e.reason());
				return null;
			}
		}
		return t;
	}

	/** The plan's target core temperature, °C, or null when none is given. */
	static Double coreTarget(JsonNode target, Fields fields) {
		Double c = fields.number(target, "coreTemperatureC", "target.coreTemperatureC");
		// −20 °C (frozen) to 120 °C, as the engine's step ends
		if (c != null && !(c > -20 && c <= 120)) {
			fields.error("target.coreTemperatureC", "a core target lies above −20 °C and at most 120 °C");
			return null;
		}
		return c;
	}

	private interface Build<T> {

		T get();

	}

	/** The engine's own checks, their field put under the step's path. */
	private static <T> T engine(Build<T> build, String at, Fields fields) {
		try {
			return build.get();
		}
		catch (InvalidInputException e) {
			String f = e.field();
			fields.error(at + "." + (f.equals("temperatureC") && !at.endsWith(".heat") ? "heat.temperatureC" : f),
					e.reason());
			return null;
		}
	}

}
