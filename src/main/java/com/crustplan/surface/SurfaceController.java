package com.crustplan.surface;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import jakarta.validation.Valid;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.food.SurfaceField;
import com.crustplan.system.EngineErrors;
import com.crustplan.system.FormBinding;
import com.crustplan.system.JsonText;
import com.crustplan.system.TemperatureUnit;

@Controller
@RequestMapping("/surfaces")
class SurfaceController {

	private static final String FORM = "surface/form";

	/** What the form's defaults button fills in: the composition and size, not the cook's additions. */
	private static final List<SurfaceField> FILLED_BY_DEFAULTS = Stream
		.concat(SurfaceField.COMPOSITION.stream(),
				Stream.of(SurfaceField.ASPARAGINE, SurfaceField.SURFACE_WATER, SurfaceField.THICKNESS))
		.toList();

	private final SurfaceService surfaces;

	private final JsonText json;

	SurfaceController(SurfaceService surfaces, JsonText json) {
		this.surfaces = surfaces;
		this.json = json;
	}

	@GetMapping
	String list(Model model) {
		model.addAttribute("surfaces", surfaces.all());
		return "surface/list";
	}

	@GetMapping("/new")
	String newForm(@RequestParam(name = "category", required = false) String category,
			@ModelAttribute("units") TemperatureUnit units, Model model) {
		FoodCategory c = FoodCategory.byKey(category == null ? "" : category).orElse(FoodCategory.MEAT);
		return form(model, SurfaceForm.defaults(c, "", units), null, "/surfaces/new", "New surface", units);
	}

	@PostMapping("/new")
	String create(@Valid @ModelAttribute("form") SurfaceForm form, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		if (!check(form, result)) {
			return form(model, form, result, "/surfaces/new", "New surface", units);
		}
		SavedSurface saved = surfaces.create(form);
		redirect.addFlashAttribute("message", "Surface “" + saved.getName() + "” saved.");
		return "redirect:/surfaces/" + saved.getId();
	}

	@GetMapping("/{id}")
	String show(@PathVariable long id, Model model) {
		SavedSurface s = surfaces.get(id);
		model.addAttribute("surface", s);
		model.addAttribute("derived", derived(SurfaceForm.of(s, TemperatureUnit.CELSIUS)));
		return "surface/show";
	}

	@GetMapping("/{id}/edit")
	String editForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSurface s = surfaces.get(id);
		return form(model, SurfaceForm.of(s, units), null, "/surfaces/" + id + "/edit", "Edit " + s.getName(), units);
	}

	@PostMapping("/{id}/edit")
	String update(@PathVariable long id, @Valid @ModelAttribute("form") SurfaceForm form, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		SavedSurface existing = surfaces.get(id);
		if (!check(form, result)) {
			return form(model, form, result, "/surfaces/" + id + "/edit", "Edit " + existing.getName(), units);
		}
		surfaces.update(id, form);
		redirect.addFlashAttribute("message", "Surface “" + form.name().trim() + "” updated.");
		return "redirect:/surfaces/" + id;
	}

	@GetMapping("/{id}/copy")
	String copyForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSurface s = surfaces.get(id);
		String name = ("Copy of " + s.getName());
		SurfaceForm copy = SurfaceForm.of(s, units).withName(name.length() > 80 ? name.substring(0, 80) : name);
		return form(model, copy, null, "/surfaces/new", "Copy of " + s.getName(), units);
	}

	@GetMapping("/{id}/delete")
	String confirmDelete(@PathVariable long id, Model model) {
		model.addAttribute("surface", surfaces.get(id));
		return "surface/delete";
	}

	@PostMapping("/{id}/delete")
	String delete(@PathVariable long id, RedirectAttributes redirect) {
		String name = surfaces.get(id).getName();
		surfaces.delete(id);
		redirect.addFlashAttribute("message", "Surface “" + name + "” deleted. Saved plans keep their own copy.");
		return "redirect:/surfaces";
	}

	/** Bean Validation first, then the engine's checks; true when the form can be saved. */
	private static boolean check(SurfaceForm form, BindingResult result) {
		if (result.hasErrors()) {
			return false;
		}
		try {
			form.toSurface();
			form.toProduct();
			return true;
		}
		catch (InvalidInputException e) {
			EngineErrors.bind(e, result, SurfaceForm::formField, form.unit(), form.initialTemperatureC(),
					"initialTemperature");
			return false;
		}
	}

	private String form(Model model, SurfaceForm form, BindingResult errors, String action, String title,
			TemperatureUnit units) {
		SurfaceForm shown = form.unit() == units ? form : form.inUnit(units);
		FormBinding.put(model, shown, errors);
		model.addAttribute("action", action);
		model.addAttribute("title", title);
		model.addAttribute("categories", Arrays.asList(FoodCategory.values()));
		model.addAttribute("products", Arrays.asList(Product.values()));
		model.addAttribute("derived", derived(shown));
		model.addAttribute("defaultsJson", json.write(defaultsByKey(units)));
		model.addAttribute("thicknessRange", InRange.Check.range(SurfaceField.THICKNESS));
		return FORM;
	}

	/** Computed pH and the remainder, shown on the form and the detail page. */
	static Derived derived(SurfaceForm f) {
		Double remainder = null;
		Double ph = null;
		Double basePh = null;
		try {
			Surface s = f.toSurface();
			remainder = s.composition().remainderPct();
			ph = s.ph();
			basePh = s.basePh();
		}
		catch (InvalidInputException | NullPointerException e) {
			// an incomplete form has no derived values yet; its field errors say why
		}
		return new Derived(remainder, ph, basePh);
	}

	record Derived(Double remainderPct, Double ph, Double basePh) {
	}

	/** Category defaults for the form's "fill in defaults" button, temperatures in the cook's unit. */
	private static Map<String, Map<String, Object>> defaultsByKey(TemperatureUnit units) {
		Map<String, Map<String, Object>> all = new LinkedHashMap<>();
		for (FoodCategory c : FoodCategory.values()) {
			Map<String, Object> d = CategoryDefaults.of(c, FILLED_BY_DEFAULTS);
			d.put("phPlaceholder", c.defaultPh());
			d.put("initialTemperature", Math.round(units.fromCelsius(c.defaultInitialTemperatureC()) * 10) / 10.0);
			all.put(c.key(), d);
		}
		return all;
	}

}
