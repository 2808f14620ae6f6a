package com.crustplan.surface;

import java.io.IOException;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;

import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BeanPropertyBindingResult;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

import com.crustplan.engine.assessment.Pretreatment;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.food.SurfaceField;
import com.crustplan.engine.food.TypicalValues;
import com.crustplan.engine.message.Message;
import com.crustplan.system.EditConflict;
import com.crustplan.system.EngineErrors;
import com.crustplan.system.FormBinding;
import com.crustplan.system.FormTokens;
import com.crustplan.system.Downloads;
import com.crustplan.system.JsonText;
import com.crustplan.system.RecordFile;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.StaleEditException;
import com.crustplan.system.TemperatureUnit;

@Controller
@RequestMapping("/surfaces")
class SurfaceController {

	private static final String FORM = "surface/form";

	/**
	 * What the form's defaults button fills in: the composition and size, not the cook's
	 * additions.
	 */
	private static final List<SurfaceField> FILLED_BY_DEFAULTS = Stream
		.concat(SurfaceField.COMPOSITION.stream(),
				Stream.of(SurfaceField.ASPARAGINE, SurfaceField.SURFACE_WATER, SurfaceField.THICKNESS))
		.toList();

	private final SurfaceService surfaces;

	private final JsonText json;

	private final FormTokens tokens;

	/** The name of a surface in its file. */
	static final String KIND = "surface";

	private final RecordFile files;

	SurfaceController(SurfaceService surfaces, JsonText json, FormTokens tokens, RecordFile files) {
		this.files = files;
		this.surfaces = surfaces;
		this.json = json;
		this.tokens = tokens;
	}

	@GetMapping
	String list(Model model) {
		model.addAttribute("surfaces", surfaces.all());
		return "surface/list";
	}

	/**
	 * The surface as a file to keep or move to another kitchen; the list's import reads
	 * it back.
	 */
	@GetMapping("/{id}.json")
	ResponseEntity<String> export(@PathVariable long id) {
		SavedSurface s = surfaces.get(id);
		return Downloads.json(files.write(KIND, SurfaceForm.of(s, TemperatureUnit.CELSIUS)), "surface", s.getName());
	}

	/**
	 * A surface file read back as a new surface; a file with any wrong field is refused
	 * whole, naming the field, and nothing is saved.
	 */
	@PostMapping("/import")
	String importFile(@RequestParam(name = "file", required = false) MultipartFile file, Model model,
			HttpServletResponse response, RedirectAttributes redirect) throws IOException {
		SurfaceForm form;
		try {
			form = files.read(KIND, file == null ? null : file.getBytes(), SurfaceForm.class);
			form.toSurface();
			form.toProduct();
			form.toPretreatment();
		}
		catch (RecordFile.Refused e) {
			return refused(model, response, e.getMessage());
		}
		catch (InvalidInputException e) {
			return refused(model, response, KIND + "." + e.field() + ": " + e.reason());
		}
		SavedSurface saved = surfaces.create(form);
		redirect.addFlashAttribute("message", "Surface “" + saved.getName() + "” imported.");
		return "redirect:/surfaces/" + saved.getId();
	}

	private String refused(Model model, HttpServletResponse response, String reason) {
		response.setStatus(HttpStatus.UNPROCESSABLE_CONTENT.value());
		model.addAttribute("importError", "The file was not imported, nothing was changed: " + reason + ".");
		return list(model);
	}

	@GetMapping("/new")
	String newForm(@RequestParam(name = "category", required = false) String category,
			@ModelAttribute("units") TemperatureUnit units, Model model) {
		FoodCategory c = FoodCategory.byKey(category == null ? "" : category).orElse(FoodCategory.MEAT);
		model.addAttribute("formToken", FormTokens.issue());
		return form(model, SurfaceForm.defaults(c, "", units), null, "/surfaces/new", "New surface", units);
	}

	/**
	 * The form's one-time token makes a double submit lead to the one surface it saved.
	 */
	@PostMapping("/new")
	String create(@Valid @ModelAttribute("form") SurfaceForm form, BindingResult result,
			@RequestParam(name = "formToken", required = false) String token,
			@RequestParam(name = "refill", required = false) String refill,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		if (refill != null) {
			model.addAttribute("formToken", FormTokens.keep(token));
			return refilled(model, form, "/surfaces/new", "New surface", units);
		}
		if (!check(form, result)) {
			model.addAttribute("formToken", FormTokens.keep(token));
			return form(model, form, result, "/surfaces/new", "New surface", units);
		}
		FormTokens.Submitted saved = tokens.once("surface", token, () -> surfaces.create(form).getId());
		redirect.addFlashAttribute("message", saved.repeat() ? "This form was sent twice; the surface was saved once."
				: "Surface “" + form.name().trim() + "” saved.");
		return "redirect:/surfaces/" + saved.id();
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
		model.addAttribute("version", s.getVersion());
		return form(model, SurfaceForm.of(s, units), null, "/surfaces/" + id + "/edit", "Edit " + s.getName(), units);
	}

	/**
	 * Saves an edit made on the version the form carries. If someone else saved or
	 * deleted the surface meanwhile, the form comes back with everything typed and both
	 * versions side by side.
	 */
	@PostMapping("/{id}/edit")
	String update(@PathVariable long id, @Valid @ModelAttribute("form") SurfaceForm form, BindingResult result,
			@RequestParam(name = "version", required = false) Integer version,
			@RequestParam(name = "refill", required = false) String refill,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		try {
			SavedSurface existing = surfaces.get(id);
			if (refill != null) {
				model.addAttribute("version", version);
				return refilled(model, form, "/surfaces/" + id + "/edit", "Edit " + existing.getName(), units);
			}
			if (!check(form, result)) {
				model.addAttribute("version", version);
				return form(model, form, result, "/surfaces/" + id + "/edit", "Edit " + existing.getName(), units);
			}
			surfaces.update(id, form, version);
		}
		catch (StaleEditException | ConcurrencyFailureException | NotFoundException e) {
			return conflict(id, form, units, model);
		}
		redirect.addFlashAttribute("message", "Surface “" + form.name().trim() + "” updated.");
		return "redirect:/surfaces/" + id;
	}

	/**
	 * The edit form again, the chef's values kept, with the saved version (or its
	 * deletion) in words.
	 */
	private String conflict(long id, SurfaceForm form, TemperatureUnit units, Model model) {
		SavedSurface now;
		try {
			now = surfaces.get(id);
		}
		catch (NotFoundException gone) {
			model.addAttribute("conflict", EditConflict.deleted("surface"));
			model.addAttribute("formToken", FormTokens.issue());
			return form(model, form, null, "/surfaces/new", "New surface", units);
		}
		SurfaceForm yours = form.unit() == units ? form : form.inUnit(units);
		model.addAttribute("conflict",
				EditConflict.between("surface", now.getName(), now.getUpdatedAt(), yours, SurfaceForm.of(now, units)));
		model.addAttribute("version", now.getVersion());
		return form(model, form, null, "/surfaces/" + id + "/edit", "Edit " + now.getName(), units);
	}

	@GetMapping("/{id}/copy")
	String copyForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSurface s = surfaces.get(id);
		String name = ("Copy of " + s.getName());
		SurfaceForm copy = SurfaceForm.of(s, units).withName(name.length() > 80 ? name.substring(0, 80) : name);
		model.addAttribute("formToken", FormTokens.issue());
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
		try {
			surfaces.delete(id);
		}
		catch (ConcurrencyFailureException | NotFoundException e) {
			// deleted or changed by someone else in the same moment
			return collided(id, name, redirect);
		}
		redirect.addFlashAttribute("message", "Surface “" + name + "” deleted. Saved plans keep their own copy.");
		return "redirect:/surfaces";
	}

	private String collided(long id, String name, RedirectAttributes redirect) {
		try {
			surfaces.get(id);
		}
		catch (NotFoundException gone) {
			redirect.addFlashAttribute("message", "Surface “" + name + "” was already deleted by someone else.");
			return "redirect:/surfaces";
		}
		redirect.addFlashAttribute("message", "Surface “" + name
				+ "” was changed by someone else while you deleted it, so it was kept. Look at it and delete it again if you still want to.");
		return "redirect:/surfaces/" + id;
	}

	/**
	 * Bean Validation first, then the engine's checks; true when the form can be saved.
	 */
	private static boolean check(SurfaceForm form, BindingResult result) {
		if (result.hasErrors()) {
			return false;
		}
		try {
			form.toSurface();
			form.toProduct();
			form.toPretreatment();
			return true;
		}
		catch (InvalidInputException e) {
			EngineErrors.bind(e, result, SurfaceForm::formField, form.unit(), form.initialTemperatureC(),
					"initialTemperature");
			return false;
		}
	}

	/**
	 * The form again, nothing saved, with the chosen category's typical values filled in
	 * (the refill button without script).
	 */
	private String refilled(Model model, SurfaceForm form, String action, String title, TemperatureUnit units) {
		Optional<FoodCategory> c = FoodCategory.byKey(form.category() == null ? "" : form.category());
		if (c.isEmpty()) {
			BindingResult errors = new BeanPropertyBindingResult(form, "form");
			errors.rejectValue("category", "unknown", "choose a category from the list");
			return form(model, form, errors, action, title, units);
		}
		model.addAttribute("message", "Filled in the typical values of " + c.get().label()
				+ ". Nothing is saved until you press Save surface.");
		return form(model, form.refilledFrom(c.get()), null, action, title, units);
	}

	private String form(Model model, SurfaceForm form, BindingResult errors, String action, String title,
			TemperatureUnit units) {
		SurfaceForm shown = form.unit() == units ? form : form.inUnit(units);
		FormBinding.put(model, shown, errors);
		model.addAttribute("action", action);
		model.addAttribute("title", title);
		model.addAttribute("categories", Arrays.asList(FoodCategory.values()));
		model.addAttribute("products", Arrays.asList(Product.values()));
		model.addAttribute("shapes", Arrays.asList(Shape.values()));
		model.addAttribute("pretreatments", Arrays.asList(Pretreatment.values()));
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
		List<Message> atypical = List.of();
		try {
			Surface s = f.toSurface();
			remainder = s.composition().remainderPct();
			ph = s.ph();
			basePh = s.basePh();
			atypical = TypicalValues.check(s);
		}
		catch (InvalidInputException | NullPointerException e) {
			// an incomplete form has no derived values yet; its field errors say why
		}
		return new Derived(remainder, ph, basePh, atypical);
	}

	/** {@code atypical}: precursors far from the category's typical values. */
	record Derived(Double remainderPct, Double ph, Double basePh, List<Message> atypical) {
	}

	/**
	 * Category defaults for the form's "fill in defaults" button, temperatures in the
	 * cook's unit.
	 */
	private static Map<String, Map<String, Object>> defaultsByKey(TemperatureUnit units) {
		Map<String, Map<String, Object>> all = new LinkedHashMap<>();
		for (FoodCategory c : FoodCategory.values()) {
			Map<String, Object> d = CategoryDefaults.of(c, FILLED_BY_DEFAULTS);
			d.put("phPlaceholder", c.defaultPh());
			d.put("shape", c.defaultShape().key());
			d.put("initialTemperature", Math.round(units.fromCelsius(c.defaultInitialTemperatureC()) * 10) / 10.0);
			all.put(c.key(), d);
		}
		return all;
	}

}
