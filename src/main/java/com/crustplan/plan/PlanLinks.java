package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.springframework.web.util.UriComponentsBuilder;

import com.crustplan.setup.SavedSetup;
import com.crustplan.surface.SavedSurface;
import com.crustplan.system.TemperatureUnit;

/**
 * Links that open the plan form filled in: from a plan on the page, or from a saved plan
 * (edit, copy), whose surface and setups are found again by name among today's.
 */
final class PlanLinks {

	private PlanLinks() {
	}

	/** The plan page for this form, planned at once. */
	static String url(PlanForm f) {
		UriComponentsBuilder b = UriComponentsBuilder.fromPath("/plan");
		add(b, "surfaceId", f.surfaceId());
		if (!f.stepped()) {
			add(b, "setupId", f.setupId());
		}
		add(b, "targetStage", blankToNull(f.targetStage()));
		add(b, "targetLightness", f.targetLightness());
		add(b, "coreTarget", f.coreTarget());
		add(b, "horizonMinutes", f.horizonMinutes());
		add(b, "temperatureUnit", f.temperatureUnit());
		List<StepForm> steps = f.filledSteps();
		for (int i = 0; i < steps.size(); i++) {
			StepForm s = steps.get(i);
			add(b, "steps[" + i + "].setup", s.setup());
			add(b, "steps[" + i + "].minutes", s.minutes());
			add(b, "steps[" + i + "].stage", s.stageOrNull());
			add(b, "steps[" + i + "].core", s.core());
		}
		for (String c : f.appliedChanges()) {
			b.queryParam("changes", c);
		}
		return b.encode().build().toUriString();
	}

	/** The saved plan as a plan form (°C), named {@code name}. */
	static PlanForm formOf(SavedPlan plan, PlanInputs in, List<SavedSurface> surfaces, List<SavedSetup> setups,
			String name) {
		Long surfaceId = surfaces.stream()
			.filter(s -> s.getName().equals(plan.getSurfaceName()))
			.map(SavedSurface::getId)
			.findFirst()
			.orElse(null);
		Long setupId = null;
		List<StepForm> steps = new ArrayList<>();
		if (in.stepped()) {
			for (PlanStep p : in.steps()) {
				String setup = p.rest() ? StepForm.REST : idOf(setups, p.setupName());
				steps.add(new StepForm(setup, p.minutes(), p.stage(), p.coreTemperatureC()));
			}
		}
		else if (in.setup() != null) {
			String id = idOf(setups, in.setup().name());
			setupId = id == null ? null : Long.valueOf(id);
		}
		// a one-setup plan aimed at the core too was kept as one step of that setup
		boolean coreOnOneSetup = in.stepped() && in.steps().size() == 1 && !in.steps().get(0).rest()
				&& Objects.equals(in.steps().get(0).coreTemperatureC(), in.coreTargetC())
				&& in.steps().get(0).minutes() == null;
		if (coreOnOneSetup) {
			setupId = steps.get(0).setup() == null ? null : Long.valueOf(steps.get(0).setup());
			steps = List.of();
		}
		return new PlanForm(surfaceId, setupId, in.targetStage(), in.targetLightness(), in.horizonMinutes(), name,
				steps, in.coreTargetC(), TemperatureUnit.CELSIUS.code(), in.appliedChanges());
	}

	private static String idOf(List<SavedSetup> setups, String name) {
		return setups.stream()
			.filter(s -> s.getName().equals(name))
			.map(s -> String.valueOf(s.getId()))
			.findFirst()
			.orElse(null);
	}

	private static void add(UriComponentsBuilder b, String name, Object value) {
		if (value != null) {
			b.queryParam(name, value instanceof Double d ? plain(d) : value);
		}
	}

	private static String plain(double d) {
		return d == Math.rint(d) ? String.valueOf((long) d) : String.valueOf(d);
	}

	private static String blankToNull(String s) {
		return s == null || s.isBlank() ? null : s;
	}

}
