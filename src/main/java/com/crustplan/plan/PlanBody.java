package com.crustplan.plan;

import java.util.List;

import com.crustplan.api.FieldErrors;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.setup.EquipmentSettings;
import com.crustplan.setup.HeatMode;
import com.crustplan.setup.HeatSettings;
import com.crustplan.surface.SurfaceBody;

/**
 * A {@code POST /api/v1/plans} body. Jackson binds it (wrong values become field errors, see
 * {@code api/Bound}); {@link #toRequest} checks what binding cannot and builds the engine's inputs.
 */
record PlanBody(SurfaceBody surface, HeatBody heat, TargetBody target, Double horizonMinutes,
		Boolean mitigations) {

	/** Longest mode or stage key read. */
	static final int KEY_MAX = 80;

	/**
	 * {@code relativeHumidityPct} is round one's oven field, still read (as a combi oven's humidity
	 * reading, converted as the migration does) and named in the answer's deprecations. {@code pan} and
	 * {@code fryer} are optional: without them the pan or oil is held at its set temperature whatever the
	 * load, as before they existed, so older requests get the same answer.
	 */
	record HeatBody(String mode, Double temperatureC, Boolean fan, Boolean fatFilm, Double steamPct,
			Double relativeHumidityPct, Double flipEverySeconds, String grill, Double heatFluxKwPerM2, Double distanceMm,
			PanObject pan, FryerObject fryer) {
	}

	/** A pan's body; each value left out takes the default for a typical line pan. */
	record PanObject(String material, Double massKg, Double diameterCm, Double powerKw, String control,
			Double coverPct) {
	}

	/** A fryer's body; each value left out takes the default for a typical line fryer. */
	record FryerObject(Double oilLitres, Double heaterKw, Double loadKg) {
	}

	/** Said in the answer while the old oven field is still read (it goes in the next API version). */
	static final String RELATIVE_HUMIDITY_DEPRECATED = "heat.relativeHumidityPct is deprecated and will be removed in the next "
			+ "API version: send heat.steamPct, the steam share of the oven atmosphere by volume (0 = dry, kitchen air "
			+ "about 1.6; 100 = pure steam). The old value was read as a combi oven's humidity reading: 10 or less as dry "
			+ "kitchen air (1.6 % steam), above it 1.6 + (value − 10)·98.4/90 % steam.";

	record TargetBody(String stage, Double lightness) {
	}

	record PlanRequest(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean mitigations, List<String> deprecations) {
	}

	PlanRequest toRequest(FieldErrors errors) {
		SurfaceBody s = errors.requireObject("surface", surface);
		HeatBody h = errors.requireObject("heat", heat);
		TargetBody t = errors.requireObject("target", target);
		SurfaceBody.Read read = s == null ? null : s.read(errors);
		HeatSetup setup = h == null ? null : heat(h, errors);
		Target goal = t == null ? null : target(t, errors);
		if (!errors.isEmpty()) {
			return null;
		}
		double horizon = horizonMinutes == null ? PlanService.DEFAULT_HORIZON_MINUTES : horizonMinutes;
		// the reducing changes cost a dozen further runs: an API client asks for them
		List<String> deprecations = heat.relativeHumidityPct() == null ? List.of() : List.of(RELATIVE_HUMIDITY_DEPRECATED);
		return new PlanRequest(read.surface(), read.product(), setup, goal, horizon,
				mitigations != null && mitigations, deprecations);
	}

	private static HeatSetup heat(HeatBody h, FieldErrors errors) {
		String key = errors.text("heat.mode", h.mode(), KEY_MAX);
		HeatMode mode = key == null ? null : HeatMode.byKey(key).orElse(null);
		if (mode == null && !errors.has("heat.mode")) {
			errors.add("heat.mode", key == null ? "is required: pan, oven, grill or fryer"
					: "'" + key + "' is not a mode; use pan, oven, grill or fryer");
		}
		String grill = errors.text("heat.grill", h.grill(), KEY_MAX);
		// a grill given by its heat flux at the food needs no element temperature
		boolean byFlux = mode == HeatMode.GRILL && h.heatFluxKwPerM2() != null;
		if (h.temperatureC() == null && !byFlux && !errors.has("heat.temperatureC")) {
			errors.add("heat.temperatureC", "is required");
		}
		if (mode != null && h.pan() != null && mode != HeatMode.PAN && !errors.hasUnder("heat.pan")) {
			errors.add("heat.pan", "is for mode pan only; this heat is " + mode.key());
		}
		if (mode != null && h.fryer() != null && mode != HeatMode.FRYER && !errors.hasUnder("heat.fryer")) {
			errors.add("heat.fryer", "is for mode fryer only; this heat is " + mode.key());
		}
		if (mode == null || errors.hasUnder("heat.")) {
			return null;
		}
		HeatSetup setup;
		try {
			setup = HeatSettings.toHeatSetup(mode, new HeatSettings.Values(h.temperatureC(), h.fan(), h.fatFilm(), h.steamPct(),
					h.relativeHumidityPct(), h.flipEverySeconds(), grill, h.heatFluxKwPerM2(), h.distanceMm()));
		}
		catch (InvalidInputException e) {
			errors.add("heat." + e.field(), e.reason());
			setup = null;
		}
		PanBody pan = null;
		FryerBody fryer = null;
		try {
			pan = h.pan() == null ? null : pan(h.pan(), errors);
			fryer = h.fryer() == null ? null : fryer(h.fryer());
		}
		catch (InvalidInputException e) {
			errors.add((h.pan() != null ? "heat.pan." : "heat.fryer.") + e.field(), e.reason());
			return null;
		}
		return setup == null || errors.hasUnder("heat.") ? null : EquipmentSettings.withBody(setup, pan, fryer);
	}

	private static PanBody pan(PanObject p, FieldErrors errors) {
		String material = errors.text("heat.pan.material", p.material(), KEY_MAX);
		String control = errors.text("heat.pan.control", p.control(), KEY_MAX);
		if (errors.hasUnder("heat.pan.")) {
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
