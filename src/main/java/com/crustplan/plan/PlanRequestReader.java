package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.setup.HeatMode;
import com.crustplan.setup.HeatSettings;

import tools.jackson.core.JacksonException;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Reads a {@code POST /api/v1/plans} body into engine inputs, field by field, so that every kind of
 * bad input (wrong type, NaN or Infinity, missing object, unknown mode) becomes a field error instead
 * of a binding exception. Missing optional fields take the category's defaults. The surface API's
 * save body ({@code name}, {@code notes}, {@code surface}) is read by the same code.
 */
public final class PlanRequestReader implements StepsReader.Fields {

	/** {@code steps} is null for a one-setup plan; a plan in steps may have a core target and no colour. */
	record PlanRequest(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean mitigations, StepsReader.Steps steps, Double coreTargetC) {
	}

	/**
	 * A surface to save: the engine's surface (already checked) with its name, notes and product key
	 * (null for the category's usual product).
	 */
	public record SurfaceRequest(String name, String notes, Surface surface, String product) {
	}

	/** Thrown with every field error found in one pass. */
	public static final class BadRequest extends RuntimeException {

		private final transient List<ApiError.FieldError> errors;

		BadRequest(List<ApiError.FieldError> errors) {
			super("bad request body", null, false, false);
			this.errors = List.copyOf(errors);
		}

		public List<ApiError.FieldError> errors() {
			return errors;
		}

	}

	/** Longest name and notes a saved surface keeps (the columns' lengths). */
	static final int NAME_MAX = 80;

	static final int NOTES_MAX = 1000;

	private final List<ApiError.FieldError> errors = new ArrayList<>();

	private PlanRequestReader() {
	}

	static PlanRequest read(String body, JsonMapper json) {
		return new PlanRequestReader().request(tree(body, json, "send a JSON object with surface, heat and target"));
	}

	/** Reads a surface save body: {@code name} (required), {@code notes} and {@code surface} as for a plan. */
	public static SurfaceRequest readSurface(String body, JsonMapper json) {
		return new PlanRequestReader().surfaceRequest(tree(body, json, "send a JSON object with name and surface"));
	}

	private static JsonNode tree(String body, JsonMapper json, String whatToSend) {
		if (body == null || body.isBlank()) {
			throw new BadRequest(List.of(new ApiError.FieldError("body", whatToSend)));
		}
		try {
			return json.readTree(body);
		}
		catch (JacksonException e) {
			throw new BadRequest(List.of(new ApiError.FieldError("body", "malformed JSON: " + shortMessage(e))));
		}
	}

	private static String shortMessage(JacksonException e) {
		String m = e.getOriginalMessage();
		if (m == null) {
			return "cannot be read";
		}
		m = m.replaceAll("[\\r\\n]+", " ");
		return m.length() > 200 ? m.substring(0, 200) + "…" : m;
	}

	private PlanRequest request(JsonNode root) {
		if (root == null || !root.isObject()) {
			throw new BadRequest(List.of(new ApiError.FieldError("body", "must be a JSON object")));
		}
		if (root.has("steps")) {
			return steppedRequest(root);
		}
		JsonNode s = object(root, "surface");
		JsonNode h = object(root, "heat");
		JsonNode t = object(root, "target");
		Double horizon = number(root, "horizonMinutes", "horizonMinutes");
		Boolean mitigations = bool(root, "mitigations", "mitigations");

		FoodCategory category = category(s);
		Surface surface = category == null ? null : surface(s, category);
		Product product = category == null ? null : product(s, category);
		HeatSetup setup = h == null ? null : heat(h);
		Target target = t == null ? null : target(t);
		if (!errors.isEmpty()) {
			throw new BadRequest(errors);
		}
		double horizonMinutes = horizon == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizon;
		// the reducing changes cost a dozen further runs: an API client asks for them
		return new PlanRequest(surface, product, setup, target, horizonMinutes, mitigations != null && mitigations, null,
				null);
	}

	/** A plan in steps: {@code steps} instead of {@code heat}; the target a colour, a core temperature or both. */
	private PlanRequest steppedRequest(JsonNode root) {
		if (root.has("heat")) {
			error("heat", "give either heat (a one-setup plan) or steps, not both");
		}
		JsonNode s = object(root, "surface");
		JsonNode t = object(root, "target");
		Double horizon = number(root, "horizonMinutes", "horizonMinutes");
		FoodCategory category = category(s);
		Surface surface = category == null ? null : surface(s, category);
		Product product = category == null ? null : product(s, category);
		double horizonMinutes = horizon == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizon;
		StepsReader.Steps steps = StepsReader.read(root.get("steps"), category, horizonMinutes, this);
		Target colour = t == null ? null : StepsReader.colour(t, "target", category, this);
		Double core = t == null ? null : StepsReader.coreTarget(t, this);
		if (t != null && colour == null && core == null && !hasErrorUnder("target")) {
			error("target", "give a stage or lightness, a coreTemperatureC, or both");
		}
		if (!errors.isEmpty()) {
			throw new BadRequest(errors);
		}
		return new PlanRequest(surface, product, steps.steps().get(0).setup(), colour, horizonMinutes, false, steps,
				core);
	}

	private SurfaceRequest surfaceRequest(JsonNode root) {
		if (root == null || !root.isObject()) {
			throw new BadRequest(List.of(new ApiError.FieldError("body", "must be a JSON object")));
		}
		String name = text(root, "name", "name", NAME_MAX);
		if (name == null && !hasError("name")) {
			error("name", "is required: give the surface a name");
		}
		String notes = text(root, "notes", "notes", NOTES_MAX);
		JsonNode s = object(root, "surface");
		FoodCategory category = category(s);
		Surface surface = category == null ? null : surface(s, category);
		Product product = category == null ? null : product(s, category);
		if (!errors.isEmpty()) {
			throw new BadRequest(errors);
		}
		// a product left out stays empty, so the record follows the category's usual product
		String productKey = text(s, "product", "surface.product") == null ? null : product.key();
		return new SurfaceRequest(name, notes, surface, productKey);
	}

	private FoodCategory category(JsonNode s) {
		if (s == null) {
			return null;
		}
		String key = text(s, "category", "surface.category");
		if (key != null) {
			FoodCategory category = FoodCategory.byKey(key).orElse(null);
			if (category == null) {
				error("surface.category", "'" + key + "' is not a category; use one of " + categoryKeys());
			}
			return category;
		}
		if (!hasError("surface.category")) {
			error("surface.category", "is required; use one of " + categoryKeys());
		}
		return null;
	}

	private Surface surface(JsonNode s, FoodCategory c) {
		Composition d = c.defaultComposition();
		double water = or(number(s, "waterPct", "surface.waterPct"), d.waterPct());
		double protein = or(number(s, "proteinPct", "surface.proteinPct"), d.proteinPct());
		double fat = or(number(s, "fatPct", "surface.fatPct"), d.fatPct());
		double reducing = or(number(s, "reducingSugarPct", "surface.reducingSugarPct"), d.reducingSugarPct());
		double sucrose = or(number(s, "sucrosePct", "surface.sucrosePct"), d.sucrosePct());
		double starch = or(number(s, "starchPct", "surface.starchPct"), d.starchPct());
		double fibre = or(number(s, "fibrePct", "surface.fibrePct"), d.fibrePct());
		double ash = or(number(s, "ashPct", "surface.ashPct"), d.ashPct());
		double asparagine = or(number(s, "asparagineMgPerKg", "surface.asparagineMgPerKg"), c.defaultAsparagineMgPerKg());
		double film = or(number(s, "surfaceWaterGPerM2", "surface.surfaceWaterGPerM2"), c.defaultSurfaceWaterGPerM2());
		double thickness = or(number(s, "thicknessMm", "surface.thicknessMm"), c.defaultThicknessMm());
		Double ph = number(s, "pH", "surface.pH");
		double bicarbonate = or(number(s, "bicarbonateGPerKg", "surface.bicarbonateGPerKg"), 0);
		double acid = or(number(s, "acidGPerKg", "surface.acidGPerKg"), 0);
		double start = or(number(s, "initialTemperatureC", "surface.initialTemperatureC"), c.defaultInitialTemperatureC());
		if (hasErrorUnder("surface.")) {
			return null;
		}
		try {
			return new Surface(c, new Composition(water, protein, fat, reducing, sucrose, starch, fibre, ash), asparagine,
					film, thickness, ph, bicarbonate, acid, start);
		}
		catch (InvalidInputException e) {
			error("surface." + e.field(), e.reason());
			return null;
		}
	}

	private Product product(JsonNode s, FoodCategory c) {
		String key = text(s, "product", "surface.product");
		try {
			return Product.forSurface(c, key);
		}
		catch (InvalidInputException e) {
			error("surface.product", e.reason());
			return null;
		}
	}

	private HeatSetup heat(JsonNode h) {
		return heat(h, "heat");
	}

	/** A heat object; its fields' errors are named under {@code at} ("heat", "steps[1].heat"). */
	@Override
	public HeatSetup heat(JsonNode h, String at) {
		String modeKey = text(h, "mode", at + ".mode");
		HeatMode mode = modeKey == null ? null : HeatMode.byKey(modeKey).orElse(null);
		if (mode == null && !hasError(at + ".mode")) {
			error(at + ".mode", modeKey == null ? "is required: pan, oven, grill or fryer"
					: "'" + modeKey + "' is not a mode; use pan, oven, grill or fryer");
		}
		Double temperature = number(h, "temperatureC", at + ".temperatureC");
		if (temperature == null && !hasError(at + ".temperatureC")) {
			error(at + ".temperatureC", "is required");
		}
		Boolean fan = bool(h, "fan", at + ".fan");
		Boolean fatFilm = bool(h, "fatFilm", at + ".fatFilm");
		Double rh = number(h, "relativeHumidityPct", at + ".relativeHumidityPct");
		Double flip = number(h, "flipEverySeconds", at + ".flipEverySeconds");
		if (mode == null || hasErrorUnder(at + ".")) {
			return null;
		}
		try {
			return HeatSettings.toHeatSetup(mode, temperature, fan, fatFilm, rh, flip);
		}
		catch (InvalidInputException e) {
			error(at + "." + e.field(), e.reason());
			return null;
		}
	}

	private Target target(JsonNode t) {
		Double lightness = number(t, "lightness", "target.lightness");
		String stage = text(t, "stage", "target.stage");
		if (hasErrorUnder("target.")) {
			return null;
		}
		try {
			return PlanInputs.target(stage, lightness);
		}
		catch (InvalidInputException e) {
			error("target", e.reason());
			return null;
		}
	}

	private JsonNode object(JsonNode parent, String name) {
		JsonNode n = parent.get(name);
		if (n == null || n.isNull()) {
			error(name, "is required (a JSON object)");
			return null;
		}
		if (!n.isObject()) {
			error(name, "must be a JSON object");
			return null;
		}
		return n;
	}

	/** A finite number, or null when absent; anything else is a field error. */
	@Override
	public Double number(JsonNode parent, String name, String field) {
		JsonNode n = parent.get(name);
		if (n == null || n.isNull()) {
			return null;
		}
		if (n.isNumber()) {
			double v = n.doubleValue();
			if (!Double.isFinite(v)) {
				error(field, "is too large a number");
				return null;
			}
			return v;
		}
		if (n.isString()) {
			String v = n.asString().trim().toLowerCase(Locale.ROOT);
			if (v.contains("nan") || v.contains("inf")) {
				error(field, "must be a finite number (NaN and Infinity are not allowed)");
			}
			else {
				error(field, "must be a number, not text");
			}
			return null;
		}
		error(field, "must be a number");
		return null;
	}

	@Override
	public String text(JsonNode parent, String name, String field) {
		return text(parent, name, field, 80);
	}

	private String text(JsonNode parent, String name, String field, int maxLength) {
		JsonNode n = parent.get(name);
		if (n == null || n.isNull()) {
			return null;
		}
		if (!n.isString()) {
			error(field, "must be text");
			return null;
		}
		String v = n.asString().trim();
		if (v.isEmpty()) {
			return null;
		}
		if (v.length() > maxLength) {
			error(field, "is too long (at most " + maxLength + " characters)");
			return null;
		}
		return v;
	}

	private Boolean bool(JsonNode parent, String name, String field) {
		JsonNode n = parent.get(name);
		if (n == null || n.isNull()) {
			return null;
		}
		if (!n.isBoolean()) {
			error(field, "must be true or false");
			return null;
		}
		return n.booleanValue();
	}

	private static double or(Double v, double fallback) {
		return v == null ? fallback : v;
	}

	@Override
	public void error(String field, String message) {
		errors.add(new ApiError.FieldError(field, message));
	}

	private boolean hasError(String field) {
		return errors.stream().anyMatch(e -> e.field().equals(field));
	}

	@Override
	public int errorCount() {
		return errors.size();
	}

	private boolean hasErrorUnder(String prefix) {
		return errors.stream().anyMatch(e -> e.field().startsWith(prefix));
	}

	private static List<String> categoryKeys() {
		return java.util.Arrays.stream(FoodCategory.values()).map(FoodCategory::key).toList();
	}

}
