package com.crustplan.plan.search;

import java.security.Principal;
import java.util.List;
import java.util.Locale;

import org.springframework.security.authentication.InsufficientAuthenticationException;
import org.springframework.stereotype.Component;

import com.crustplan.api.FieldErrors;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.plan.PlanBody;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanService;
import com.crustplan.setup.HeatMode;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceBody;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.Formats;
import com.crustplan.system.NotFoundException;

/**
 * Reads the parts a search and a map share (surface, equipment, range, target) with the
 * plans API's field names and rules; every wrong field is collected, none stops the
 * others being read.
 */
@Component
class SearchReader {

	/** Longest stage key read, as the plans API. */
	static final int KEY_MAX = 80;

	private final SurfaceService surfaces;

	SearchReader(SurfaceService surfaces) {
		this.surfaces = surfaces;
	}

	record Food(Surface surface, Product product) {
	}

	/**
	 * The inline surface or the saved one; a saved surface is the kitchen's, so reading
	 * one needs a signed-in user (an inline one needs none, as for plans).
	 */
	Food food(SurfaceBody inline, Long surfaceId, Principal user, FieldErrors errors) {
		if (inline != null && surfaceId != null) {
			errors.add("surfaceId", "give either surface (inline) or surfaceId (a saved surface), not both");
			return null;
		}
		if (surfaceId != null) {
			if (user == null) {
				throw new InsufficientAuthenticationException("sign in to use a saved surface");
			}
			try {
				SavedSurface s = surfaces.get(surfaceId);
				SurfaceForm f = SurfaceForm.of(s, com.crustplan.system.TemperatureUnit.CELSIUS);
				return new Food(f.toSurface(), f.toProduct());
			}
			catch (NotFoundException e) {
				errors.add("surfaceId", "no saved surface has id " + surfaceId);
				return null;
			}
			catch (InvalidInputException e) {
				errors.add("surfaceId", "the saved surface needs fixing (" + e.field() + ": " + e.reason() + ")");
				return null;
			}
		}
		SurfaceBody s = errors.requireObject("surface", inline);
		if (s == null) {
			return null;
		}
		SurfaceBody.Read read = s.read(errors);
		return read.surface() == null || read.product() == null ? null : new Food(read.surface(), read.product());
	}

	/**
	 * The equipment as a template: the plans API's heat object, its temperature taken
	 * from the range where it has none.
	 */
	HeatSetup template(PlanBody.HeatBody h, SearchBody.RangeBody range, FieldErrors errors) {
		PlanBody.HeatBody heat = errors.requireObject("heat", h);
		if (heat == null) {
			return null;
		}
		if (heat.heatFluxKwPerM2() != null) {
			errors.add("heat.heatFluxKwPerM2",
					"a search or map varies the element temperature: give grill and temperatureC (or a range) instead");
			return null;
		}
		Double t = heat.temperatureC();
		if (t == null) {
			// a stand-in the range replaces: the range's first setting, or the mode's
			// usual one
			HeatMode mode = HeatMode.byKey(heat.mode()).orElse(null);
			t = range != null && range.fromC() != null ? range.fromC()
					: SettingRange.usualFor(mode == null ? "" : mode.key()).fromC();
		}
		PlanBody.HeatBody filled = new PlanBody.HeatBody(heat.mode(), t, heat.fan(), heat.fatFilm(), heat.steamPct(),
				heat.relativeHumidityPct(), heat.flipEverySeconds(), heat.grill(), null, heat.distanceMm(), heat.pan(),
				heat.fryer());
		return PlanBody.heat(filled, "heat", errors);
	}

	/**
	 * The range asked, or the mode's usual one; more than
	 * {@link SettingRange#MAX_SETTINGS} settings is refused on {@code range}.
	 */
	SettingRange range(SearchBody.RangeBody r, HeatSetup template, FieldErrors errors) {
		if (template == null) {
			return null;
		}
		SettingRange usual = SettingRange.usualFor(template);
		if (r == null) {
			return usual;
		}
		if (r.steamPct() != null && !(template instanceof Oven)) {
			errors.add("range.steamPct", "is for mode oven only; this heat is " + template.mode());
		}
		if (r.steamPct() != null && (r.steamPct().isEmpty() || r.steamPct().stream().anyMatch(x -> x == null))) {
			errors.add("range.steamPct", "give one or more steam shares in %, from 0 to 100");
		}
		boolean hasFrom = r.fromC() != null;
		boolean hasTo = r.toC() != null;
		if (hasFrom != hasTo) {
			errors.add(hasFrom ? "range.toC" : "range.fromC", "give both fromC and toC, or neither");
		}
		if (r.stepC() != null && !(r.stepC() > 0)) {
			errors.add("range.stepC", "must be above 0");
		}
		if (hasFrom && hasTo && r.toC() < r.fromC()) {
			errors.add("range.toC", "must be at least fromC (" + num(r.fromC()) + ")");
		}
		if (errors.hasUnder("range.")) {
			return null;
		}
		double from = hasFrom ? r.fromC() : usual.fromC();
		double to = hasTo ? r.toC() : usual.toC();
		double step = r.stepC() != null ? r.stepC() : usual.stepC();
		SettingRange range = new SettingRange(from, to, step, r.steamPct());
		int n = range.count();
		if (n > SettingRange.MAX_SETTINGS) {
			errors.add("range", n + " settings asked; at most " + SettingRange.MAX_SETTINGS
					+ " per request: use a larger stepC, a narrower range or fewer steam shares");
			return null;
		}
		return range;
	}

	/** The settings of the range; the engine's limits name the range's field. */
	List<HeatSetup> settings(SettingRange range, HeatSetup template, FieldErrors errors) {
		if (range == null || template == null) {
			return null;
		}
		try {
			return range.settings(template);
		}
		catch (InvalidInputException e) {
			errors.add(e.field(), e.reason());
			return null;
		}
	}

	/** A colour target (stage or lightness) or null, checked against the category. */
	Target colour(PlanBody.TargetBody t, FoodCategory category, FieldErrors errors) {
		if (t == null || (t.stage() == null && t.lightness() == null)) {
			return null;
		}
		String stage = errors.text("target.stage", t.stage(), KEY_MAX);
		if (errors.hasUnder("target.")) {
			return null;
		}
		try {
			Target target = PlanInputs.target(stage, t.lightness());
			if (category != null) {
				target.extentFor(category);
			}
			return target;
		}
		catch (InvalidInputException e) {
			errors.add(e.field().startsWith("target") ? e.field() : "target", e.reason());
			return null;
		}
	}

	/** A core target above −20 °C and at most 120 °C (the plans API's range), or null. */
	Double core(PlanBody.TargetBody t, FieldErrors errors) {
		if (t == null || t.coreTemperatureC() == null) {
			return null;
		}
		double c = t.coreTemperatureC();
		if (!(c > -20 && c <= 120)) {
			errors.add("target.coreTemperatureC", "a core target lies above −20 °C and at most 120 °C");
			return null;
		}
		return c;
	}

	/**
	 * The work bound: settings × minutes at most
	 * {@link SettingRange#MAX_SETTING_MINUTES}; refused on {@code field} saying so.
	 */
	static void checkWork(SettingRange range, Double minutes, String field, FieldErrors errors) {
		if (range == null || minutes == null) {
			return;
		}
		int n = range.count();
		if (n * minutes > SettingRange.MAX_SETTING_MINUTES + 1e-9) {
			errors.add(field,
					String.format(Locale.ROOT,
							"%d settings × %s min is more cooking than one request may simulate (at most %.0f "
									+ "setting-minutes): use fewer settings or fewer minutes",
							n, Formats.number(minutes, 1), SettingRange.MAX_SETTING_MINUTES));
		}
	}

	/** Minutes from 1 to the engine's 6 h; required unless {@code fallback} is given. */
	static Double minutes(String field, Double v, Double fallback, FieldErrors errors) {
		if (v == null && fallback == null) {
			errors.add(field, "is required: minutes, from 1 to " + num(PlanService.MAX_HORIZON_MINUTES));
			return null;
		}
		double m = v == null ? fallback : v;
		if (!(m >= 1 && m <= PlanService.MAX_HORIZON_MINUTES)) {
			errors.add(field, "must be from 1 to " + num(PlanService.MAX_HORIZON_MINUTES) + " minutes");
			return null;
		}
		return m;
	}

	static String num(double v) {
		return String.format(Locale.ROOT, "%.0f", v);
	}

}
