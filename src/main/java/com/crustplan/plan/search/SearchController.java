package com.crustplan.plan.search;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;

import com.crustplan.api.FieldError;
import com.crustplan.api.FieldErrors;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.plan.PlanReport;
import com.crustplan.setup.SavedSetup;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.FormBinding;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.TemperatureUnit;

/**
 * "Find a setting" ({@code /plans/search}): computed on GET like the plan page, nothing
 * saved. The checks are the search API's, their errors put under the page's fields.
 */
@Controller
class SearchController {

	/** The API's field names as the page's. */
	static final Map<String, String> FIELDS = Map.of("range.fromC", "fromT", "range.toC", "toT", "range.stepC", "stepT",
			"range.steamPct", "steamPcts", "range", "stepT", "target", "targetStage", "target.stage", "targetStage",
			"target.coreTemperatureC", "coreTarget", "withinMinutes", "withinMinutes");

	private final SettingSearch search;

	private final SearchReader reader;

	private final SurfaceService surfaces;

	private final SetupService setups;

	SearchController(SettingSearch search, SearchReader reader, SurfaceService surfaces, SetupService setups) {
		this.search = search;
		this.reader = reader;
		this.surfaces = surfaces;
		this.setups = setups;
	}

	@GetMapping("/plans/search")
	String page(@ModelAttribute("form") SearchForm form, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model) {
		if (form.asked() && !result.hasErrors()) {
			run(form, result, units, model);
		}
		FormBinding.put(model, form, result);
		model.addAttribute("surfaces", surfaces.all());
		model.addAttribute("setups", setups.all());
		model.addAttribute("categories", Arrays.asList(FoodCategory.values()));
		return "plan/search";
	}

	private void run(SearchForm form, BindingResult result, TemperatureUnit units, Model model) {
		TemperatureUnit from = form.unit(units);
		SavedSurface surface = null;
		SavedSetup setup = null;
		if (form.surfaceId() == null) {
			result.rejectValue("surfaceId", "required", "choose a surface");
		}
		else {
			try {
				surface = surfaces.get(form.surfaceId());
			}
			catch (NotFoundException e) {
				result.rejectValue("surfaceId", "missing", "that surface no longer exists; choose another");
			}
		}
		if (form.setupId() == null) {
			result.rejectValue("setupId", "required", "choose the equipment: a saved setup of that kind");
		}
		else {
			try {
				setup = setups.get(form.setupId());
			}
			catch (NotFoundException e) {
				result.rejectValue("setupId", "missing", "that setup no longer exists; choose another");
			}
		}
		HeatSetup template = null;
		SearchReader.Food food = null;
		try {
			if (setup != null) {
				template = SetupForm.of(setup, TemperatureUnit.CELSIUS).toHeatSetup();
			}
			if (surface != null) {
				SurfaceForm f = SurfaceForm.of(surface, TemperatureUnit.CELSIUS);
				food = new SearchReader.Food(f.toSurface(), f.toProduct());
			}
		}
		catch (InvalidInputException e) {
			result.reject("engine." + e.field(), "The saved surface or setup needs fixing (" + e.field() + ": "
					+ e.reason() + "). Open it, correct it and search again.");
			return;
		}
		FieldErrors errors = new FieldErrors();
		List<Double> steam = steam(form.steamPcts(), result);
		SearchBody.RangeBody range = form.fromT() == null && form.toT() == null && form.stepT() == null && steam == null
				? null : new SearchBody.RangeBody(celsius(form.fromT(), from), celsius(form.toT(), from),
						form.stepT() == null ? null : form.stepT() / from.differenceFromCelsius(1), steam);
		SettingRange r = reader.range(range, template, errors);
		List<HeatSetup> settings = reader.settings(r, template, errors);
		String stage = form.targetStage() == null || form.targetStage().isBlank() ? null : form.targetStage().trim();
		Double coreC = celsius(form.coreTarget(), from);
		com.crustplan.plan.PlanBody.TargetBody t = new com.crustplan.plan.PlanBody.TargetBody(stage, null, coreC);
		Target colour = reader.colour(t, food == null ? null : food.surface().category(), errors);
		Double core = reader.core(t, errors);
		if (stage == null && coreC == null) {
			errors.add("target", "choose a colour, a core temperature, or both");
		}
		Double within = SearchReader.minutes("withinMinutes", form.withinMinutes(), null, errors);
		SearchReader.checkWork(r, within, "withinMinutes", errors);
		for (FieldError e : errors.list()) {
			String field = FIELDS.get(e.field());
			if (field != null && !result.hasFieldErrors(field)) {
				result.rejectValue(field, "search." + e.field(), e.message());
			}
			else if (field == null) {
				result.reject("search." + e.field(), e.field() + ": " + e.message());
			}
		}
		if (result.hasErrors() || food == null || settings == null) {
			return;
		}
		try {
			SearchAnswer a = search.search(food.surface(), food.product(), settings,
					new SearchGoal(colour, core, within, form.benchmark()), units);
			model.addAttribute("answer", a);
			model.addAttribute("acrylamideMatters",
					PlanReport.acrylamideMatters(food.surface().category(), food.product().benchmark().isPresent()));
			model.addAttribute("labels", a.trials().stream().map(x -> SettingSearch.label(x.setup(), units)).toList());
			model.addAttribute("cautions", SearchCautions.ALL);
			model.addAttribute("surfaceName", surface.getName());
			model.addAttribute("setupName", setup.getName());
		}
		catch (InvalidInputException e) {
			result.reject("engine." + e.field(), e.field() + ": " + e.reason());
		}
	}

	private static Double celsius(Double t, TemperatureUnit unit) {
		return t == null ? null : unit.toCelsius(t);
	}

	/** "0, 30, 60" as steam shares; null when blank. */
	private static List<Double> steam(String text, BindingResult result) {
		if (text == null || text.isBlank()) {
			return null;
		}
		List<Double> out = new ArrayList<>();
		for (String p : text.split("[,;\\s]+")) {
			if (p.isBlank()) {
				continue;
			}
			try {
				out.add(Double.parseDouble(p.trim()));
			}
			catch (NumberFormatException e) {
				result.rejectValue("steamPcts", "number",
						"give steam shares as numbers from 0 to 100, separated by commas (for example 2, 30, 60)");
				return null;
			}
		}
		return out;
	}

}
