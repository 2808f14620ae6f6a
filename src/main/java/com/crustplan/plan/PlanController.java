package com.crustplan.plan;

import java.security.Principal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import tools.jackson.core.JacksonException;
import jakarta.validation.Valid;

import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.setup.SavedSetup;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.FormBinding;
import com.crustplan.system.FormTokens;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.TemperatureUnit;

import tools.jackson.databind.json.JsonMapper;

/** The plan page (compute on GET, nothing saved), saving a plan, and the saved plans. */
@Controller
class PlanController {

	private final PlanService planner;

	private final SavedPlanService saved;

	private final SurfaceService surfaces;

	private final SetupService setups;

	private final JsonMapper json;

	private final FormTokens tokens;

	PlanController(PlanService planner, SavedPlanService saved, SurfaceService surfaces, SetupService setups,
			JsonMapper json, FormTokens tokens) {
		this.tokens = tokens;
		this.planner = planner;
		this.saved = saved;
		this.surfaces = surfaces;
		this.setups = setups;
		this.json = json;
	}

	@GetMapping("/plan")
	String plan(@Valid @ModelAttribute("form") PlanForm bound, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model) {
		PlanForm form = bound.inUnit(units);
		if (form.complete() && !result.hasErrors()) {
			resolve(form, result).ifPresent(inputs -> compute(inputs, form, result, units, model));
		}
		return page(model, form, result);
	}

	@GetMapping("/plan/risk-map")
	String riskMap(@Valid @ModelAttribute("form") PlanForm form, BindingResult result,
			@ModelAttribute("units") TemperatureUnit units, Model model) {
		if (!form.complete()) {
			result.reject("incomplete", "choose a surface and a setup first");
		}
		if (!result.hasErrors()) {
			resolve(form, result).ifPresent(r -> {
				PlanInputs in = r.inputs();
				try {
					model.addAttribute("map",
							planner.riskMap(in.surface().toSurface(), in.surface().toProduct(),
									in.setup().toHeatSetup(), in.target(), in.horizonMinutes(), r.surfaceName(),
									r.setupName()));
				}
				catch (InvalidInputException e) {
					result.reject("engine." + e.field(), e.field() + ": " + e.reason());
				}
			});
		}
		if (result.hasErrors()) {
			return page(model, form, result);
		}
		return "plan/risk";
	}

	@PostMapping("/plans")
	String save(@Valid @ModelAttribute("form") PlanForm bound, BindingResult result,
			@RequestParam(name = "formToken", required = false) String token,
			@ModelAttribute("units") TemperatureUnit units, Model model, Principal principal,
			RedirectAttributes redirect) {
		model.addAttribute("formToken", FormTokens.keep(token));
		PlanForm form = bound.inUnit(units);
		// a name refused while binding (a control character) already has its error, and
		// no target to reject on
		if ((form.name() == null || form.name().isBlank()) && !result.hasFieldErrors("name")) {
			result.rejectValue("name", "required", "give the plan a name to save it");
		}
		if (!form.complete()) {
			result.reject("incomplete", "choose a surface and a setup first");
		}
		if (result.hasErrors()) {
			if (form.complete() && !result.hasFieldErrors("targetLightness")
					&& !result.hasFieldErrors("horizonMinutes")) {
				resolve(form, result).ifPresent(inputs -> compute(inputs, form, result, units, model));
			}
			return page(model, form, result);
		}
		Optional<Resolved> resolved = resolve(form, result);
		if (resolved.isEmpty()) {
			return page(model, form, result);
		}
		PlanReport report = compute(resolved.get(), form, result, units, model);
		if (report == null) {
			return page(model, form, result);
		}
		Resolved r = resolved.get();
		// the form's one-time token: a double submit leads to the one plan it saved
		FormTokens.Submitted plan = tokens.once("plan", token,
				() -> saved
					.save(form.name(), r.surfaceName(), r.setupName(), r.inputs(), report,
							principal == null ? null : principal.getName())
					.getId());
		redirect.addFlashAttribute("message", plan.repeat() ? "This form was sent twice; the plan was saved once."
				: "Plan “" + form.name().trim() + "” saved.");
		return "redirect:/plans/" + plan.id();
	}

	@GetMapping("/plans")
	String list(Model model) {
		model.addAttribute("plans", saved.all());
		return "plan/list";
	}

	@GetMapping("/plans/{id}")
	String show(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, Model model) {
		SavedPlan plan = saved.get(id);
		model.addAttribute("saved", plan);
		try {
			PlanInputs inputs = saved.inputs(plan);
			PlanReport report = planner.plan(inputs);
			addReport(model, report, units);
		}
		catch (InvalidInputException e) {
			// kept as saved; the model's limits changed since, so say which value and why
			model.addAttribute("problem", "The model no longer accepts this plan's " + e.field() + ": " + e.reason()
					+ ". The saved values are kept unchanged.");
		}
		catch (JacksonException | NullPointerException e) {
			model.addAttribute("problem", "The saved inputs of this plan cannot be read. They are kept unchanged.");
		}
		return "plan/show";
	}

	@GetMapping("/plans/{id}/delete")
	String confirmDelete(@PathVariable long id, Model model) {
		model.addAttribute("saved", saved.get(id));
		return "plan/delete";
	}

	@PostMapping("/plans/{id}/delete")
	String delete(@PathVariable long id, RedirectAttributes redirect) {
		String name = saved.get(id).getName();
		try {
			saved.delete(id);
		}
		catch (ConcurrencyFailureException | NotFoundException e) {
			// two deletes at once: the other one won
			redirect.addFlashAttribute("message", "Plan “" + name + "” was already deleted by someone else.");
			return "redirect:/plans";
		}
		redirect.addFlashAttribute("message", "Plan “" + name + "” deleted.");
		return "redirect:/plans";
	}

	record Resolved(PlanInputs inputs, String surfaceName, String setupName) {
	}

	/**
	 * The saved surface and setup as engine-ready form values; missing ones become field
	 * errors.
	 */
	private Optional<Resolved> resolve(PlanForm form, BindingResult result) {
		SavedSurface surface = null;
		SavedSetup setup = null;
		try {
			surface = surfaces.get(form.surfaceId());
		}
		catch (NotFoundException e) {
			result.rejectValue("surfaceId", "missing", "that surface no longer exists; choose another");
		}
		if (form.stepped()) {
			return surface == null ? Optional.empty() : PlanStepsForm.resolve(form, surface, setups, result);
		}
		try {
			setup = setups.get(form.setupId());
		}
		catch (NotFoundException e) {
			result.rejectValue("setupId", "missing", "that setup no longer exists; choose another");
		}
		if (surface == null || setup == null) {
			return Optional.empty();
		}
		PlanInputs inputs = new PlanInputs(SurfaceForm.of(surface, TemperatureUnit.CELSIUS),
				SetupForm.of(setup, TemperatureUnit.CELSIUS), form.targetStage(), form.targetLightness(),
				form.horizonOrDefault());
		if (form.coreTarget() != null) {
			inputs = PlanStepsForm.toCore(inputs, setup.getName(), form);
		}
		return Optional.of(new Resolved(inputs, surface.getName(), setup.getName()));
	}

	private PlanReport compute(Resolved r, PlanForm form, BindingResult result, TemperatureUnit units, Model model) {
		return compute(r.inputs(), form, result, units, model);
	}

	private PlanReport compute(PlanInputs inputs, PlanForm form, BindingResult result, TemperatureUnit units,
			Model model) {
		try {
			PlanReport report = planner.plan(inputs);
			addReport(model, report, units);
			return report;
		}
		catch (InvalidInputException e) {
			String field = switch (e.field()) {
				case "target", "target.stage", "target.lightness" -> form.targetField();
				case "horizonMinutes" -> "horizonMinutes";
				case "target.coreTemperatureC" -> "coreTarget";
				default -> null;
			};
			if (e.field().startsWith("steps[")) {
				result.reject("engine.steps", PlanStepsForm.stepError(e, inputs));
			}
			else if (field != null) {
				result.rejectValue(field, "engine." + e.field(), e.reason());
			}
			else {
				// a saved surface or setup the engine no longer accepts: say which and
				// why
				result.reject("engine." + e.field(), "The saved surface or setup needs fixing (" + e.field() + ": "
						+ e.reason() + "). Open it, correct it and plan again.");
			}
			return null;
		}
	}

	private void addReport(Model model, PlanReport report, TemperatureUnit units) {
		model.addAttribute("report", report);
		model.addAttribute("chartJson", json.writeValueAsString(PlanCharts.data(report, units)));
	}

	private String page(Model model, PlanForm form, BindingResult result) {
		FormBinding.put(model, form, result);
		if (!model.containsAttribute("formToken")) {
			model.addAttribute("formToken", FormTokens.issue());
		}
		model.addAttribute("stepErrors", PlanStepsForm.bindingErrors(result));
		// the filled rows and one blank one: without script a cook adds a step by
		// planning again
		List<StepForm> rows = new ArrayList<>(form.filledSteps());
		rows.add(new StepForm(null, null, null, null));
		model.addAttribute("stepRows", rows);
		model.addAttribute("surfaces", surfaces.all());
		model.addAttribute("setups", setups.all());
		model.addAttribute("categories", Arrays.asList(FoodCategory.values()));
		return "plan/plan";
	}

}
