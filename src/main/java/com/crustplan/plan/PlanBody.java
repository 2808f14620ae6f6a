package com.crustplan.plan;

import java.util.List;

import com.crustplan.api.FieldErrors;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.setup.EquipmentSettings;
import com.crustplan.setup.HeatMode;
import com.crustplan.setup.HeatSettings;
import com.crustplan.surface.SurfaceBody;

/**
 * A {@code POST /api/v1/plans} body. Jackson binds it (wrong values become field errors,
 * see {@code api/Bound}); {@link #toRequest} checks what binding cannot and builds the
 * engine's inputs.
 */
public record PlanBody(SurfaceBody surface, HeatBody heat, TargetBody target, Double horizonMinutes,
		Boolean mitigations, List<StepsReader.StepBody> steps) {

	/** Longest mode or stage key read. */
	static final int KEY_MAX = 80;

	/**
	 * {@code relativeHumidityPct} is round one's oven field, still read (as a combi
	 * oven's humidity reading, converted as the migration does) and named in the answer's
	 * deprecations. {@code pan} and {@code fryer} are optional: without them the pan or
	 * oil is held at its set temperature whatever the load, as before they existed, so
	 * older requests get the same answer.
	 */
	public record HeatBody(String mode, Double temperatureC, Boolean fan, Boolean fatFilm, Double steamPct,
			Double relativeHumidityPct, Double flipEverySeconds, String grill, Double heatFluxKwPerM2,
			Double distanceMm, PanObject pan, FryerObject fryer) {
	}

	/** A pan's body; each value left out takes the default for a typical line pan. */
	public record PanObject(String material, Double massKg, Double diameterCm, Double powerKw, String control,
			Double coverPct) {
	}

	/** A fryer's body; each value left out takes the default for a typical line fryer. */
	public record FryerObject(Double oilLitres, Double heaterKw, Double loadKg) {
	}

	/**
	 * Said in the answer while the old oven field is still read (it goes in the next API
	 * version).
	 */
	static final String RELATIVE_HUMIDITY_DEPRECATED = "heat.relativeHumidityPct is deprecated and will be removed in the next "
			+ "API version: send heat.steamPct, the steam share of the oven atmosphere by volume (0 = dry, kitchen air "
			+ "about 1.6; 100 = pure steam). The old value was read as a combi oven's humidity reading: 10 or less as dry "
			+ "kitchen air (1.6 % steam), above it 1.6 + (value − 10)·98.4/90 % steam.";

	/**
	 * A colour ({@code stage} or {@code lightness}); a plan in steps may also or instead
	 * aim at a core temperature.
	 */
	public record TargetBody(String stage, Double lightness, Double coreTemperatureC) {
	}

	/**
	 * {@code steps} is null for a one-setup plan; a plan in steps may have a core target
	 * and no colour.
	 */
	record PlanRequest(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean mitigations, List<String> deprecations, StepsReader.Steps steps, Double coreTargetC) {
	}

	PlanRequest toRequest(FieldErrors errors) {
		if (steps != null) {
			return steppedRequest(errors);
		}
		SurfaceBody s = errors.requireObject("surface", surface);
		HeatBody h = errors.requireObject("heat", heat);
		TargetBody t = errors.requireObject("target", target);
		SurfaceBody.Read read = s == null ? null : s.read(errors);
		HeatSetup setup = h == null ? null : heat(h, "heat", errors);
		Target goal = t == null ? null : target(t, errors);
		if (!errors.isEmpty()) {
			return null;
		}
		double horizon = horizonMinutes == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizonMinutes;
		// the reducing changes cost a dozen further runs: an API client asks for them
		List<String> deprecations = heat.relativeHumidityPct() == null ? List.of()
				: List.of(RELATIVE_HUMIDITY_DEPRECATED);
		return new PlanRequest(read.surface(), read.product(), setup, goal, horizon, mitigations != null && mitigations,
				deprecations, null, null);
	}

	/**
	 * A plan in steps: {@code steps} instead of {@code heat}; the target a colour, a core
	 * temperature or both.
	 */
	private PlanRequest steppedRequest(FieldErrors errors) {
		if (heat != null) {
			errors.add("heat", "give either heat (a one-setup plan) or steps, not both");
		}
		SurfaceBody s = errors.requireObject("surface", surface);
		SurfaceBody.Read read = s == null ? null : s.read(errors);
		FoodCategory category = read == null ? null : read.surface().category();
		double horizon = horizonMinutes == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizonMinutes;
		StepsReader.Steps read2 = StepsReader.read(steps, category, horizon, errors);
		Target colour = target == null ? null
				: StepsReader.colour(target.stage(), target.lightness(), "target", category, errors);
		Double core = target == null ? null : StepsReader.coreTarget(target.coreTemperatureC(), errors);
		if (target != null && colour == null && core == null && !errors.has("target") && !errors.hasUnder("target.")) {
			errors.add("target", "give a stage or lightness, a coreTemperatureC, or both");
		}
		if (!errors.isEmpty() || read2 == null) {
			return null;
		}
		boolean old = steps.stream()
			.anyMatch(x -> x != null && x.heat() != null && x.heat().relativeHumidityPct() != null);
		return new PlanRequest(read.surface(), read.product(), read2.steps().get(0).setup(), colour, horizon, false,
				old ? List.of(RELATIVE_HUMIDITY_DEPRECATED) : List.of(), read2, core);
	}

	/**
	 * A heat object; its fields' errors are named under {@code at} ("heat",
	 * "steps[1].heat").
	 */
	public static HeatSetup heat(HeatBody h, String at, FieldErrors errors) {
		String key = errors.text(at + ".mode", h.mode(), KEY_MAX);
		HeatMode mode = key == null ? null : HeatMode.byKey(key).orElse(null);
		if (mode == null && !errors.has(at + ".mode")) {
			errors.add(at + ".mode", key == null ? "is required: pan, oven, grill or fryer"
					: "'" + key + "' is not a mode; use pan, oven, grill or fryer");
		}
		String grill = errors.text(at + ".grill", h.grill(), KEY_MAX);
		// a grill given by its heat flux at the food needs no element temperature
		boolean byFlux = mode == HeatMode.GRILL && h.heatFluxKwPerM2() != null;
		if (h.temperatureC() == null && !byFlux && !errors.has(at + ".temperatureC")) {
			errors.add(at + ".temperatureC", "is required");
		}
		if (mode != null && h.pan() != null && mode != HeatMode.PAN && !errors.hasUnder(at + ".pan")) {
			errors.add(at + ".pan", "is for mode pan only; this heat is " + mode.key());
		}
		if (mode != null && h.fryer() != null && mode != HeatMode.FRYER && !errors.hasUnder(at + ".fryer")) {
			errors.add(at + ".fryer", "is for mode fryer only; this heat is " + mode.key());
		}
		if (mode == null || errors.hasUnder(at + ".")) {
			return null;
		}
		HeatSetup setup;
		try {
			setup = HeatSettings.toHeatSetup(mode,
					new HeatSettings.Values(h.temperatureC(), h.fan(), h.fatFilm(), h.steamPct(),
							h.relativeHumidityPct(), h.flipEverySeconds(), grill, h.heatFluxKwPerM2(), h.distanceMm()));
		}
		catch (InvalidInputException e) {
			errors.add(at + "." + e.field(), e.reason());
			setup = null;
		}
		PanBody pan = null;
		FryerBody fryer = null;
		try {
			pan = h.pan() == null ? null : pan(h.pan(), at, errors);
			fryer = h.fryer() == null ? null : fryer(h.fryer());
		}
		catch (InvalidInputException e) {
			errors.add(at + (h.pan() != null ? ".pan." : ".fryer.") + e.field(), e.reason());
			return null;
		}
		return setup == null || errors.hasUnder(at + ".") ? null : EquipmentSettings.withBody(setup, pan, fryer);
	}

	private static PanBody pan(PanObject p, String at, FieldErrors errors) {
		String material = errors.text(at + ".pan.material", p.material(), KEY_MAX);
		String control = errors.text(at + ".pan.control", p.control(), KEY_MAX);
		if (errors.hasUnder(at + ".pan.")) {
			return null;
		}
		return EquipmentSettings.pan(material, p.massKg(), p.diameterCm(), p.powerKw(), control, p.coverPct());
	}

	private static FryerBody fryer(FryerObject f) {
		return EquipmentSettings.fryer(f.oilLitres(), f.heaterKw(), f.loadKg());
	}

	private static Target target(TargetBody t, FieldErrors errors) {
		String stage = errors.text("target.stage", t.stage(), KEY_MAX);
		if (errors.hasUnder("target.")) {
			return null;
		}
		try {
			return PlanInputs.target(stage, t.lightness());
		}
		catch (InvalidInputException e) {
			errors.add("target", e.reason());
			return null;
		}
	}

}
