package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.springframework.validation.BindingResult;
import org.springframework.validation.FieldError;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.setup.SavedSetup;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.TemperatureUnit;

/**
 * The plan page's steps: step rows resolved to saved setups and copied into
 * {@link PlanInputs} (°C), and their errors worded for the cook ("Step 2, minutes: …").
 */
final class PlanStepsForm {

	/** A saved plan's list of setups, as long as its column allows. */
	static final int SETUP_NAMES_MAX = 80;

	private static final Pattern STEP_FIELD = Pattern.compile("^steps\\[(\\d+)]\\.?(.*)$");

	/** As typeMismatch in messages.properties words it for the other fields. */
	static final String NOT_A_NUMBER = "must be a number";

	private PlanStepsForm() {
	}

	static Optional<PlanController.Resolved> resolve(PlanForm form, SavedSurface surface, SetupService setups,
			BindingResult result) {
		TemperatureUnit unit = form.unit(TemperatureUnit.CELSIUS);
		List<PlanStep> steps = new ArrayList<>();
		SetupForm first = null;
		List<String> names = new ArrayList<>();
		List<StepForm> rows = form.filledSteps();
		for (int i = 0; i < rows.size(); i++) {
			StepForm row = rows.get(i);
			Double core = unit.toCelsius(row.core());
			if (row.rest()) {
				steps.add(new PlanStep(null, null, null, row.minutes(), row.stageOrNull(), null, core));
				names.add("Rest");
				continue;
			}
			SavedSetup setup = null;
			try {
				setup = row.setupId() == null ? null : setups.get(row.setupId());
			}
			catch (NotFoundException e) {
				// reported below
			}
			if (setup == null) {
				result.reject("steps.missing", "Step " + (i + 1) + ": that setup no longer exists; choose another");
				continue;
			}
			SetupForm s = SetupForm.of(setup, TemperatureUnit.CELSIUS);
			first = first == null ? s : first;
			steps.add(new PlanStep(s, setup.getName(), null, row.minutes(), row.stageOrNull(), null, core));
			names.add(setup.getName());
		}
		if (result.hasGlobalErrors()) {
			return Optional.empty();
		}
		PlanInputs inputs = new PlanInputs(SurfaceForm.of(surface, TemperatureUnit.CELSIUS), first, form.targetStage(),
				form.targetLightness(), form.horizonOrDefault(), steps, unit.toCelsius(form.coreTarget()));
		return Optional.of(new PlanController.Resolved(inputs, surface.getName(), names(names)));
	}

	/**
	 * A one-setup plan aimed at the core too: one step that ends when the core reaches
	 * it.
	 */
	static PlanInputs toCore(PlanInputs in, String setupName, PlanForm form) {
		Double core = form.unit(TemperatureUnit.CELSIUS).toCelsius(form.coreTarget());
		PlanStep step = new PlanStep(in.setup(), setupName, null, null, null, null, core);
		return new PlanInputs(in.surface(), in.setup(), in.targetStage(), in.targetLightness(), in.horizonMinutes(),
				List.of(step), core, in.changes());
	}

	/** "Setup A → Setup B → Rest", cut to the column's length. */
	static String names(List<String> names) {
		String s = String.join(" → ", names);
		return s.length() <= SETUP_NAMES_MAX ? s : s.substring(0, SETUP_NAMES_MAX - 1) + "…";
	}

	/** An engine error in a step, worded with the step's number (from 1) and name. */
	static String stepError(InvalidInputException e, PlanInputs in) {
		Matcher m = STEP_FIELD.matcher(e.field());
		if (!m.matches()) {
			return e.field() + ": " + e.reason();
		}
		int i = Integer.parseInt(m.group(1));
		String name = in.steps() != null && i < in.steps().size() ? " (" + in.steps().get(i).label() + ")" : "";
		return "Step " + (i + 1) + name + ", " + field(m.group(2)) + ": " + e.reason();
	}

	/** Step fields the form could not read (text in a number), worded per step. */
	static List<String> bindingErrors(BindingResult result) {
		List<String> out = new ArrayList<>();
		for (FieldError e : result.getFieldErrors()) {
			Matcher m = STEP_FIELD.matcher(e.getField());
			if (m.matches()) {
				out.add("Step " + (Integer.parseInt(m.group(1)) + 1) + ", " + field(m.group(2)) + ": "
						+ (e.isBindingFailure() ? NOT_A_NUMBER : e.getDefaultMessage()));
			}
		}
		for (FieldError e : result.getFieldErrors("coreTarget")) {
			out.add("Core target: " + (e.isBindingFailure() ? NOT_A_NUMBER : e.getDefaultMessage()));
		}
		return out;
	}

	private static String field(String f) {
		return switch (f) {
			case "minutes" -> "minutes";
			case "core", "coreTemperatureC" -> "core temperature";
			case "stage", "target.stage" -> "colour";
			case "temperatureC" -> "temperature";
			default -> f.isEmpty() ? "step" : f;
		};
	}

}
