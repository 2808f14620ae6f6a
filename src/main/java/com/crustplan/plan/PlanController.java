package com.crustplan.plan;

import java.nio.charset.StandardCharsets;
import java.security.Principal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import tools.jackson.core.JacksonException;
import jakarta.validation.Valid;

import org.springframework.dao.ConcurrencyFailureException;
import org.springframework.http.HttpStatus;
import org.springframework.http.MediaType;
import org.springframework.http.ResponseEntity;
import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.validation.BindingResult;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.PathVariable;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;
import org.springframework.web.servlet.mvc.support.RedirectAttributes;
import org.springframework.web.util.UriUtils;

import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.setup.SavedSetup;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.Downloads;
import com.crustplan.system.FormBinding;
import com.crustplan.system.Formats;
import com.crustplan.system.StaleEditException;
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

	private final Formats fmt;

	PlanController(PlanService planner, SavedPlanService saved, SurfaceService surfaces, SetupService setups,
			JsonMapper json, FormTokens tokens, Formats fmt) {
		this.fmt = fmt;
		this.tokens = tokens;
		this.planner = planner;
		this.saved = saved;
		this.surfaces = surfaces;
		this.setups = setups;
		this.json = json;
	}

	@GetMapping("/plan")
	String plan(@Valid @ModelAttribute("form") PlanForm bound, BindingResult result,
			@RequestParam(name = "editing", required = false) Long editing,
			@ModelAttribute("units") TemperatureUnit units, Model model) {
		PlanForm form = bound.inUnit(units);
		if (editing != null) {
			// the save form then replaces this saved plan instead of adding one
			model.addAttribute("editing", saved.get(editing));
		}
		form = withDefaultStage(form, model);
		if (form.complete() && !result.hasErrors()) {
			PlanForm planned = form;
			resolve(form, result).ifPresent(inputs -> compute(inputs, planned, result, units, model));
		}
		return page(model, form, result);
	}

	/**
	 * A one-setup plan with no target yet aims at the category's middle stage (golden for
	 * chips, browned for a steak): kitchen words first, L* for those who measure it.
	 */
	private PlanForm withDefaultStage(PlanForm form, Model model) {
		boolean noTarget = (form.targetStage() == null || form.targetStage().isBlank())
				&& form.targetLightness() == null && form.coreTarget() == null;
		if (!noTarget || form.surfaceId() == null || form.stepped()) {
			return form;
		}
		try {
			FoodCategory c = FoodCategory.byKey(surfaces.get(form.surfaceId()).getCategory()).orElse(null);
			if (c == null || c.stages().isEmpty()) {
				return form;
			}
			BrowningStage stage = c.stages().get(c.stages().size() / 2);
			model.addAttribute("defaultStage", stage.label());
			return new PlanForm(form.surfaceId(), form.setupId(), stage.key(), null, form.horizonMinutes(), form.name(),
					form.steps(), null, form.temperatureUnit(), form.changes());
		}
		catch (NotFoundException e) {
			// resolve() says that the surface is gone
			return form;
		}
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
		Optional<PlanToSave> ready = checked(form, result, units, model);
		if (ready.isEmpty()) {
			return page(model, form, result);
		}
		Resolved r = ready.get().resolved();
		PlanReport report = ready.get().report();
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

	/**
	 * An edit of a saved plan, made on the plan form opened from it: the same plan with
	 * the new inputs and figures. A plan deleted or changed by someone else meanwhile is
	 * not overwritten: the form comes back saying so.
	 */
	@PostMapping("/plans/{id}/edit")
	String update(@PathVariable long id, @Valid @ModelAttribute("form") PlanForm bound, BindingResult result,
			@RequestParam(name = "version", required = false) Integer version,
			@ModelAttribute("units") TemperatureUnit units, Model model, RedirectAttributes redirect) {
		PlanForm form = bound.inUnit(units);
		SavedPlan existing;
		try {
			existing = saved.get(id);
		}
		catch (NotFoundException e) {
			result.reject("gone", "This plan was deleted by someone else meanwhile; save it as a new plan.");
			return page(model, form, result);
		}
		model.addAttribute("editing", existing);
		Optional<PlanToSave> ready = checked(form, result, units, model);
		if (ready.isEmpty()) {
			return page(model, form, result);
		}
		Resolved r = ready.get().resolved();
		try {
			saved.update(id, version, form.name(), r.surfaceName(), r.setupName(), r.inputs(), ready.get().report());
		}
		catch (StaleEditException | ConcurrencyFailureException e) {
			result.reject("stale", "Someone else changed this plan while you edited it; open it again to see theirs,"
					+ " or save yours as a new plan.");
			return page(model, form, result);
		}
		redirect.addFlashAttribute("message", "Plan “" + form.name().trim() + "” updated.");
		return "redirect:/plans/" + id;
	}

	/** The plan form opened from a saved plan, to change and save it again. */
	@GetMapping("/plans/{id}/edit")
	String edit(@PathVariable long id) {
		SavedPlan plan = saved.get(id);
		return "redirect:" + PlanLinks.url(formOf(plan, plan.getName())) + "&editing=" + id + "&name="
				+ UriUtils.encodeQueryParam(plan.getName(), StandardCharsets.UTF_8);
	}

	/** The plan form filled in from a saved plan, to save as a new one. */
	@GetMapping("/plans/{id}/copy")
	String copy(@PathVariable long id) {
		SavedPlan plan = saved.get(id);
		String name = "Copy of " + plan.getName();
		name = name.length() > 120 ? name.substring(0, 120) : name;
		return "redirect:" + PlanLinks.url(formOf(plan, name)) + "&name="
				+ UriUtils.encodeQueryParam(name, StandardCharsets.UTF_8);
	}

	/**
	 * Runs a saved plan against today's model, keeps today's figures for the list and
	 * says what changed.
	 */
	@PostMapping("/plans/{id}/rerun")
	String rerun(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units, RedirectAttributes redirect) {
		SavedPlan plan = saved.get(id);
		try {
			PlanReport report = planner.plan(saved.inputs(plan));
			List<String> changes = PlanRerun.differences(plan, report, units, fmt);
			saved.summarise(id, report);
			redirect.addFlashAttribute("message",
					changes.isEmpty() ? "Re-run with today's model: the same time, core and acrylamide as saved."
							: "Re-run with today's model: " + String.join("; ", changes) + ".");
		}
		catch (InvalidInputException e) {
			redirect.addFlashAttribute("message", "The model no longer accepts this plan's " + e.field() + ": "
					+ e.reason() + ". The saved values are kept unchanged.");
		}
		catch (JacksonException | NullPointerException e) {
			redirect.addFlashAttribute("message",
					"The saved inputs of this plan cannot be read. They are kept unchanged.");
		}
		return "redirect:/plans/" + id;
	}

	private PlanForm formOf(SavedPlan plan, String name) {
		PlanInputs in;
		try {
			in = saved.inputs(plan);
		}
		catch (JacksonException e) {
			throw new NotFoundException("Plan inputs of", plan.getId());
		}
		return PlanLinks.formOf(plan, in, surfaces.all(), setups.all(), name);
	}

	record PlanToSave(Resolved resolved, PlanReport report) {
	}

	/** The checks a plan passes before it is saved; empty with the reasons bound. */
	private Optional<PlanToSave> checked(PlanForm form, BindingResult result, TemperatureUnit units, Model model) {
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
			return Optional.empty();
		}
		Optional<Resolved> resolved = resolve(form, result);
		if (resolved.isEmpty()) {
			return Optional.empty();
		}
		PlanReport report = compute(resolved.get(), form, result, units, model);
		return report == null ? Optional.empty() : Optional.of(new PlanToSave(resolved.get(), report));
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
			model.addAttribute("applied", inputs.appliedChanges().stream().map(PlanChanges::title).toList());
			model.addAttribute("sinceSaved", PlanRerun.differences(plan, report, units, fmt));
			PlanForm again = PlanLinks.formOf(plan, inputs, surfaces.all(), setups.all(), null);
			if (again.complete() && !inputs.stepped()) {
				model.addAttribute("planLink", PlanLinks.url(again));
			}
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

	/** The saved plan's series as today's model runs it, as CSV for a spreadsheet. */
	@GetMapping("/plans/{id}/series.csv")
	ResponseEntity<String> series(@PathVariable long id, @ModelAttribute("units") TemperatureUnit units) {
		SavedPlan plan = saved.get(id);
		PlanReport report;
		try {
			report = planner.plan(saved.inputs(plan));
		}
		catch (InvalidInputException | JacksonException | NullPointerException e) {
			// the plan page says why; a file with only a header would look like a result
			return ResponseEntity.status(HttpStatus.CONFLICT)
				.contentType(MediaType.TEXT_PLAIN)
				.body("This plan cannot be run with today's model; open it to see why. Nothing was changed.\n");
		}
		return Downloads.csv(SeriesCsv.of(report, units), "plan", plan.getName());
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
			return surface == null ? Optional.empty()
					: PlanStepsForm.resolve(form, surface, setups, result).flatMap(r -> withChanges(r, form, result));
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
		Optional<Resolved> changed = withChanges(new Resolved(inputs, surface.getName(), setup.getName()), form,
				result);
		if (changed.isEmpty() || form.coreTarget() == null) {
			return changed;
		}
		return Optional.of(new Resolved(PlanStepsForm.toCore(changed.get().inputs(), setup.getName(), form),
				surface.getName(), setup.getName()));
	}

	/**
	 * The plan with its acrylamide changes applied; a change that does not fit is an
	 * error.
	 */
	private static Optional<Resolved> withChanges(Resolved r, PlanForm form, BindingResult result) {
		try {
			return Optional
				.of(new Resolved(PlanChanges.apply(r.inputs(), form.appliedChanges()), r.surfaceName(), r.setupName()));
		}
		catch (InvalidInputException e) {
			result.reject("changes", "Changes: " + e.reason());
			return Optional.empty();
		}
	}

	private PlanReport compute(Resolved r, PlanForm form, BindingResult result, TemperatureUnit units, Model model) {
		return compute(r.inputs(), form, result, units, model);
	}

	private PlanReport compute(PlanInputs inputs, PlanForm form, BindingResult result, TemperatureUnit units,
			Model model) {
		try {
			PlanReport report = planner.plan(inputs);
			addReport(model, report, units);
			model.addAttribute("applied", inputs.appliedChanges().stream().map(PlanChanges::title).toList());
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
		if (form.complete() && !form.stepped() && form.coreTarget() == null) {
			model.addAttribute("planLink", PlanLinks.url(form));
		}
		if (form.complete() && !form.appliedChanges().isEmpty()) {
			model.addAttribute("planLinkWithoutChanges",
					PlanLinks.url(new PlanForm(form.surfaceId(), form.setupId(), form.targetStage(),
							form.targetLightness(), form.horizonMinutes(), null, form.steps(), form.coreTarget(),
							form.temperatureUnit(), null)));
		}
		return "plan/plan";
	}

}
