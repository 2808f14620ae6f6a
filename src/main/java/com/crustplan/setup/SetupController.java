package com.crustplan.setup;

import java.util.Arrays;
import java.util.Locale;

import jakarta.validation.Valid;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestMapping;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.system.EngineErrors;
import com.crustplan.system.FormBinding;
import com.crustplan.system.TemperatureUnit;

@Controller
@RequestMapping("/setups")
class SetupController {

	private final SetupService setups;

	SetupController(SetupService setups) {
		this.setups = setups;
	}

	@GetMapping
	String list(Model model) {
		model.addAttribute("setups", setups.all());
		return "setup/list";
	}

	@GetMapping("/new")
	String newForm(@ModelAttribute("units") TemperatureUnit units, Model model) {
		return form(model, SetupForm.blank(units), null, "/setups/new", "New heat setup", units);
	}

	@PostMapping("/new")
	String create(@Valid @ModelAttribute("form") SetupForm form, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		if (!check(form, result)) {
			return form(model, form, result, "/setups/new", "New heat setup", units);
		}
		SavedSetup saved = setups.create(form);
		redirect.addFlashAttribute("message", "Setup “" + saved.getName() + "” saved.");
		return "redirect:/setups";
	}

	@GetMapping("/{id}/edit")
	String editForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSetup s = setups.get(id);
		return form(model, SetupForm.of(s, units), null, "/setups/" + id + "/edit", "Edit " + s.getName(), units);
	}

	@PostMapping("/{id}/edit")
	String update(@PathVariable long id, @Valid @ModelAttribute("form") SetupForm form, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		SavedSetup existing = setups.get(id);
		if (!check(form, result)) {
			return form(model, form, result, "/setups/" + id + "/edit", "Edit " + existing.getName(), units);
		}
		setups.update(id, form);
		redirect.addFlashAttribute("message", "Setup “" + form.name().trim() + "” updated.");
		return "redirect:/setups";
	}

	@GetMapping("/{id}/copy")
	String copyForm(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedSetup s = setups.get(id);
		String name = "Copy of " + s.getName();
		return form(model, SetupForm.of(s, units).withName(name.length() > 80 ? name.substring(0, 80) : name), null,
				"/setups/new", name, units);
	}

	@GetMapping("/{id}/delete")
	String confirmDelete(@PathVariable long id, Model model) {
		model.addAttribute("setup", setups.get(id));
		return "setup/delete";
	}

	@PostMapping("/{id}/delete")
	String delete(@PathVariable long id, RedirectAttributes redirect) {
		String name = setups.get(id).getName();
		setups.delete(id);
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
			return false;
		}
	}

	private static String form(Model model, SetupForm form, BindingResult errors, String action, String title,
			TemperatureUnit units) {
		FormBinding.put(model, form.unit() == units ? form : form.inUnit(units), errors);
		model.addAttribute("action", action);
		model.addAttribute("title", title);
		model.addAttribute("modes", Arrays.asList(HeatMode.values()));
		// a new pan or grill setup turns at this interval unless changed: the form says so beside the field
		model.addAttribute("flipHelp", String.format(Locale.ROOT,
				"new setups turn every %.0f s: each face is off the heat half the time, so the crust takes nearly twice as long;"
						+ " 0 for not turned; at least 10 s",
				HeatSettings.DEFAULT_FLIP_EVERY_S));
		return "setup/form";
	}

}
