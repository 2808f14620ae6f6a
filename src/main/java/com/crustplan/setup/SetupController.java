package com.crustplan.setup;

import java.io.IOException;
import java.util.Arrays;
import java.util.Locale;

import jakarta.servlet.http.HttpServletResponse;
import jakarta.validation.Valid;

import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.ResponseEntity;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.multipart.MultipartFile;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.system.EditConflict;
import com.crustplan.system.Downloads;
import com.crustplan.system.EngineErrors;
import com.crustplan.system.RecordFile;
import com.crustplan.system.FormBinding;
import com.crustplan.system.FormTokens;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.StaleEditException;
import com.crustplan.system.TemperatureUnit;

@Controller
@RequestMapping("/setups")
class SetupController {

	private final SetupService setups;

	private final FormTokens tokens;

	/** The name of a setup in its file. */
	static final String KIND = "setup";

	private final RecordFile files;

	SetupController(SetupService setups, FormTokens tokens, RecordFile files) {
		this.files = files;
		this.setups = setups;
		this.tokens = tokens;
	}

	@GetMapping
	String list(Model model) {
		model.addAttribute("setups", setups.all());
		return "setup/list";
	}

	/** One setup with its settings, and the way to plan with it. */
	@GetMapping("/{id}")
	String show(@PathVariable long id, Model model) {
		model.addAttribute("setup", setups.get(id));
		return "setup/show";
	}

	/** The setup as a file; the list's import reads it back. */
	@GetMapping("/{id}.json")
	ResponseEntity<String> export(@PathVariable long id) {
		SavedSetup s = setups.get(id);
		return Downloads.json(files.write(KIND, SetupForm.of(s, TemperatureUnit.CELSIUS)), "setup", s.getName());
	}

	/**
	 * A setup file read back as a new setup; a file with any wrong field is refused
	 * whole, naming the field, and nothing is saved.
	 */
	@PostMapping("/import")
	String importFile(@RequestParam(name = "file", required = false) MultipartFile file, Model model,
			HttpServletResponse response, RedirectAttributes redirect) throws IOException {
		SetupForm form;
		try {
			form = files.read(KIND, file == null ? null : file.getBytes(), SetupForm.class);
			form.toHeatSetup();
			form.panBody();
			form.fryerBody();
		}
		catch (RecordFile.Refused e) {
			return refused(model, response, e.getMessage());
		}
		catch (InvalidInputException e) {
			return refused(model, response, KIND + "." + e.field() + ": " + e.reason());
		}
		SavedSetup saved = setups.create(form);
		redirect.addFlashAttribute("message", "Setup “" + saved.getName() + "” imported.");
		return "redirect:/setups/" + saved.getId();
	}

	private String refused(Model model, HttpServletResponse response, String reason) {
		response.setStatus(HttpStatus.UNPROCESSABLE_CONTENT.value());
		model.addAttribute("importError", "The file was not imported, nothing was changed: " + reason + ".");
		return list(model);
	}

	@GetMapping("/new")
	String newForm(@ModelAttribute("units") TemperatureUnit units, Model model) {
		model.addAttribute("formToken", FormTokens.issue());
		return form(model, SetupForm.blank(units), null, "/setups/new", "New heat setup", units);
	}

	@PostMapping("/new")
	String create(@Valid @ModelAttribute("form") SetupForm form, BindingResult result,
			@RequestParam(name = "formToken", required = false) String token,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		if (!check(form, result)) {
			model.addAttribute("formToken", FormTokens.keep(token));
			return form(model, form, result, "/setups/new", "New heat setup", units);
		}
		FormTokens.Submitted saved = tokens.once("setup", token, () -> setups.create(form).getId());
		redirect.addFlashAttribute("message", saved.repeat() ? "This form was sent twice; the setup was saved once."
				: "Setup “" + form.name().trim() + "” saved.");
		return "redirect:/setups";
	}

	@GetMapping("/{id}/edit")
	String editForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSetup s = setups.get(id);
		model.addAttribute("version", s.getVersion());
		model.addAttribute("legacyHumidityPct", s.getLegacyHumidityPct());
		return form(model, SetupForm.of(s, units).withBodyDefaults(), null, "/setups/" + id + "/edit",
				"Edit " + s.getName(), units);
	}

	/**
	 * As for surfaces: a save from a stale form comes back with both versions, nothing
	 * typed lost.
	 */
	@PostMapping("/{id}/edit")
	String update(@PathVariable long id, @Valid @ModelAttribute("form") SetupForm form, BindingResult result,
			@RequestParam(name = "version", required = false) Integer version,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		try {
			SavedSetup existing = setups.get(id);
			if (!check(form, result)) {
				model.addAttribute("version", version);
				return form(model, form, result, "/setups/" + id + "/edit", "Edit " + existing.getName(), units);
			}
			setups.update(id, form, version);
		}
		catch (StaleEditException | ConcurrencyFailureException | NotFoundException e) {
			return conflict(id, form, units, model);
		}
		redirect.addFlashAttribute("message", "Setup “" + form.name().trim() + "” updated.");
		return "redirect:/setups";
	}

	private String conflict(long id, SetupForm form, TemperatureUnit units, Model model) {
		SavedSetup now;
		try {
			now = setups.get(id);
		}
		catch (NotFoundException gone) {
			model.addAttribute("conflict", EditConflict.deleted("setup"));
			model.addAttribute("formToken", FormTokens.issue());
			return form(model, form, null, "/setups/new", "New heat setup", units);
		}
		SetupForm yours = form.unit() == units ? form : form.inUnit(units);
		// unused body fields are compared as the defaults both forms show
		model.addAttribute("conflict", EditConflict.between("setup", now.getName(), now.getUpdatedAt(),
				yours.withBodyDefaults(), SetupForm.of(now, units).withBodyDefaults()));
		model.addAttribute("version", now.getVersion());
		return form(model, form, null, "/setups/" + id + "/edit", "Edit " + now.getName(), units);
	}

	@GetMapping("/{id}/copy")
	String copyForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSetup s = setups.get(id);
		String name = "Copy of " + s.getName();
		model.addAttribute("formToken", FormTokens.issue());
		return form(model,
				SetupForm.of(s, units).withBodyDefaults().withName(name.length() > 80 ? name.substring(0, 80) : name),
				null, "/setups/new", name, units);
	}

	@GetMapping("/{id}/delete")
	String confirmDelete(@PathVariable long id, Model model) {
		model.addAttribute("setup", setups.get(id));
		return "setup/delete";
	}

	@PostMapping("/{id}/delete")
	String delete(@PathVariable long id, RedirectAttributes redirect) {
		String name = setups.get(id).getName();
		try {
			setups.delete(id);
		}
		catch (ConcurrencyFailureException | NotFoundException e) {
			boolean gone = setups.all().stream().noneMatch(s -> s.getId() == id);
			redirect.addFlashAttribute("message",
					gone ? "Setup “" + name + "” was already deleted by someone else."
							: "Setup “" + name + "” was changed by someone else while you deleted it, so it was kept. "
									+ "Delete it again if you still want to.");
			return "redirect:/setups";
		}
		redirect.addFlashAttribute("message", "Setup “" + name + "” deleted. Saved plans keep their own copy.");
		return "redirect:/setups";
	}

	private static boolean check(SetupForm form, BindingResult result) {
		if (result.hasErrors()) {
			return false;
		}
		try {
			form.toHeatSetup();
			return true;
		}
		catch (InvalidInputException e) {
			EngineErrors.bind(e, result, SetupForm::formField, form.unit(), form.temperatureC(), "temperature");
			// a wrong pan or fryer value is named as well, not only the first wrong
			// setting
			try {
				form.panBody();
				form.fryerBody();
			}
			catch (InvalidInputException body) {
				EngineErrors.bind(body, result, SetupForm::formField, form.unit(), form.temperatureC(), "temperature");
			}
			return false;
		}
	}

	private static String form(Model model, SetupForm form, BindingResult errors, String action, String title,
			TemperatureUnit units) {
		FormBinding.put(model, form.unit() == units ? form : form.inUnit(units), errors);
		model.addAttribute("action", action);
		model.addAttribute("title", title);
		model.addAttribute("modes", Arrays.asList(HeatMode.values()));
		model.addAttribute("grillKinds", SetupForm.grillKinds());
		model.addAttribute("dewPoints", SetupForm.dewPointTable(units));
		// a new pan or grill setup turns at this interval unless changed: the form says
		// so beside the field
		model.addAttribute("flipHelp", String.format(Locale.ROOT,
				"new setups turn every %.0f s: each face is off the heat half the time, so the crust takes nearly twice as long;"
						+ " 0 for not turned; at least 10 s",
				HeatSettings.DEFAULT_FLIP_EVERY_S));
		model.addAttribute("materials", EquipmentSettings.materials());
		model.addAttribute("controls", EquipmentSettings.controls());
		return "setup/form";
	}

}
