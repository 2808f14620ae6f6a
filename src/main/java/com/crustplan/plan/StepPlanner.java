package com.crustplan.plan;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.assessment.AcrylamideEstimate;
import com.crustplan.engine.assessment.AcrylamideWarning;
import com.crustplan.engine.assessment.AcrylamideWarnings;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.doneness.DonenessJudge;
import com.crustplan.engine.doneness.DonenessWarning;
import com.crustplan.engine.doneness.FoodCode.Cut;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.FaceSchedule;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.StatedTemperature;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;

/**
 * Plans a cook in steps for {@link PlanService}: runs the steps, and turns the run into
 * what the line works from: a timeline of checkpoints (flip, into the oven, probe, pull,
 * rest) and which target came first. No Spring; a new simulation per call.
 */
final class StepPlanner {

	/**
	 * Start probing this far below the pull temperature: a probe reading lags and a cut
	 * cooks on (common practice).
	 */
	static final double PROBE_AHEAD_K = 5;

	/**
	 * More flips than this in one step are one line ("turn every 60 s"), not one line
	 * each (readability).
	 */
	static final int FLIPS_LISTED = 4;

	/**
	 * A rise of the core after the pull smaller than this is not worth a line (about a
	 * probe's resolution, common practice).
	 */
	static final double CARRY_OVER_SHOWN_K = 0.5;

	private StepPlanner() {
	}

	static PlanReport plan(Surface surface, Product product, List<CookStep> steps, List<String> labels, Target colour,
			Double coreTargetC, double horizonMinutes) {
		if (colour == null && coreTargetC == null) {
			throw new InvalidInputException("target", "give a colour (stage or L*), a core temperature, or both");
		}
		if (coreTargetC != null && !(coreTargetC > -20 && coreTargetC <= 120)) {
			throw new InvalidInputException("target.coreTemperatureC",
					"a core target lies above −20 °C and at most 120 °C");
		}
		FoodCategory category = surface.category();
		if (colour != null) {
			colour.extentFor(category);
		}
		for (int i = 0; i < steps.size(); i++) {
			if (steps.get(i).colour() != null) {
				try {
					steps.get(i).colour().extentFor(category);
				}
				catch (InvalidInputException e) {
					throw new InvalidInputException("steps[" + i + "]." + e.field().replace("target.", ""), e.reason());
				}
			}
		}
		CookSettings settings = CookSettings.defaults().withHorizonS(horizonMinutes * 60);
		AcrylamideCook.Inside<StepsResult> inside = AcrylamideCook.runStepsInside(surface, steps, colour, coreTargetC,
				settings);
		StepsResult run = inside.result();
		CookResult result = run.cook();
		// a plan with no colour target is never flagged darker than the colour guide:
		// judge it at the lightest stage
		Target judged = colour != null ? colour : Target.stage(category.stages().get(0).key());
		List<HeatSetup> heats = steps.stream().map(CookStep::setup).filter(h -> !(h instanceof Rest)).toList();
		HeatSetup first = heats.isEmpty() ? steps.get(0).setup() : heats.get(0);
		AcrylamideEstimate estimate = AcrylamideEstimate.of(surface, product, first, judged, result);
		List<PlanWarning> warnings = warnings(surface, steps, run, colour, coreTargetC);
		Set<String> seen = new LinkedHashSet<>();
		for (HeatSetup h : heats.isEmpty() ? List.of(first) : heats) {
			List<AcrylamideWarning> ws = h == first ? estimate.warnings()
					: AcrylamideWarnings.check(surface, product, h, judged, estimate.portionUgPerKg());
			for (AcrylamideWarning a : ws) {
				if (seen.add(a.code() + a.message())) {
					warnings.add(new PlanWarning(a.code().toLowerCase(Locale.ROOT).replace('_', '-'),
							Message.of("warning.with-basis", a.message(), Text.of(a.basis()))));
				}
			}
		}
		List<Message> cautions = new ArrayList<>();
		for (CookStep s : steps) {
			for (Message c : PlanService.cautions(surface, product, s.setup())) {
				if (!cautions.contains(c)) {
					cautions.add(c);
				}
			}
		}
		Message label = colour != null ? colour.describe(category)
				: Message.of("target.core", Temperature.celsius(coreTargetC));
		StepsReport report = new StepsReport(steps, labels, run, coreTargetC, timeline(steps, run, category),
				targetOrder(run, colour, coreTargetC, category));
		// acrylamide changes are worked out for one setup; a plan in steps shows the
		// estimate without them
		return new PlanReport(surface, first, label, horizonMinutes, result, warnings, cautions,
				AcrylamideView.of(estimate, List.of()), PlanService.swatches(result, category, inside.face()), report,
				CutFace.of(inside.interior()));
	}

	private static List<PlanWarning> warnings(Surface surface, List<CookStep> steps, StepsResult run, Target colour,
			Double coreTargetC) {
		CookResult result = run.cook();
		List<PlanWarning> w = new ArrayList<>();
		if (colour != null && !result.reached()) {
			w.add(new PlanWarning("target-not-reached",
					Message.of("warning.target-not-reached", result.explanation())));
		}
		double peak = result.series().stream().mapToDouble(Sample::coreTemperatureC).max().orElse(Double.NaN);
		if (coreTargetC != null && !run.coreReached()) {
			w.add(new PlanWarning("core-target-not-reached", Message.of("warning.core-target-not-reached",
					Temperature.celsius(coreTargetC), Temperature.celsius(peak))));
		}
		// doneness both ways (food code, juiciness, crumb, fry centre), judged at the end
		// of the last step
		for (DonenessWarning d : DonenessJudge.judge(surface, steps, run, Cut.WHOLE)) {
			w.add(new PlanWarning(d.code(), d.message()));
		}
		if (surface.ph() > PlanService.ALKALINE_PH) {
			w.add(new PlanWarning("alkaline-surface",
					Message.of("warning.alkaline-surface", PlainNumber.of(surface.ph(), 1))));
		}
		return w;
	}

	/**
	 * Which target came first and by how much; or which was missed. Null for one target
	 * that was reached.
	 */
	static Message targetOrder(StepsResult run, Target colour, Double coreTargetC, FoodCategory category) {
		boolean colourReached = colour != null && run.colourReached();
		boolean coreReached = coreTargetC != null && run.coreReached();
		if (colour == null || coreTargetC == null) {
			if (colour != null && !colourReached) {
				return Message.of("targets.colour-missed", colour.describeInText(category));
			}
			if (coreTargetC != null && !coreReached) {
				return Message.of("targets.core-missed", Temperature.celsius(coreTargetC));
			}
			return null;
		}
		Message crust = colour.describeInText(category);
		Temperature core = Temperature.celsius(coreTargetC);
		if (colourReached && coreReached) {
			double lead = run.colourLeadOverCoreS();
			return Message.of(lead <= 0 ? "targets.colour-first" : "targets.core-first", crust,
					duration(Math.abs(lead)), core);
		}
		if (colourReached) {
			return Message.of("targets.core-not-reached", crust, core);
		}
		if (coreReached) {
			return Message.of("targets.colour-not-reached", core, crust);
		}
		return Message.of("targets.neither", crust, core);
	}

	/** Seconds under two minutes, whole minutes above. */
	private static Duration duration(double s) {
		return s < 120 ? Duration.seconds(Math.round(s)) : Duration.minutes(Math.round(s / 60));
	}

	/**
	 * The checkpoints of a run in time order: each step's start, the flips within it, a
	 * probe reading before a pull on the core, the pull, the carry-over peak of a rest,
	 * and the end.
	 */
	static List<StepsReport.Checkpoint> timeline(List<CookStep> steps, StepsResult run, FoodCategory category) {
		List<StepsReport.Checkpoint> out = new ArrayList<>();
		List<Sample> series = run.cook().series();
		List<CookStep.Record> records = run.steps();
		for (CookStep.Record r : records) {
			CookStep step = steps.get(r.index());
			HeatSetup h = step.setup();
			out.add(new StepsReport.Checkpoint(r.startS(), "step", into(h)));
			flips(h.schedule(), r.startS(), r.durationS(), out);
			if (r.endedBy() == CookStep.Ending.CORE) {
				double probeAt = firstTimeCoreAbove(series, r.startS(), r.endS(),
						step.coreTemperatureC() - PROBE_AHEAD_K);
				if (Double.isFinite(probeAt) && probeAt > r.startS() + 1) {
					out.add(new StepsReport.Checkpoint(probeAt, "probe",
							Message.of("timeline.probe", Temperature.celsius(step.coreTemperatureC() - PROBE_AHEAD_K),
									Temperature.celsius(step.coreTemperatureC()))));
				}
				out.add(new StepsReport.Checkpoint(r.endS(), "pull",
						Message.of("timeline.pull.core", Temperature.celsius(step.coreTemperatureC()))));
			}
			else if (r.endedBy() == CookStep.Ending.COLOUR) {
				out.add(new StepsReport.Checkpoint(r.endS(), "pull",
						Message.of("timeline.pull.colour", step.colour().describeInText(category))));
			}
			else if (r.endedBy() == CookStep.Ending.HORIZON) {
				out.add(new StepsReport.Checkpoint(r.endS(), "stop", Message.of("timeline.horizon")));
			}
			// a rest's carry-over peak; at the very end of the plan the end line says it
			boolean last = r == records.get(records.size() - 1);
			if (h instanceof Rest) {
				Sample peak = peakCore(series, r.startS(), r.endS());
				if (peak != null && peak.coreTemperatureC() > coreAt(series, r.startS()) + CARRY_OVER_SHOWN_K
						&& !(last && peak.timeS() > r.endS() - 1e-6)) {
					out.add(new StepsReport.Checkpoint(peak.timeS(), "rest",
							Message.of("timeline.rest.peak", Temperature.celsius(peak.coreTemperatureC()))));
				}
			}
		}
		if (!records.isEmpty()) {
			CookStep.Record last = records.get(records.size() - 1);
			out.add(new StepsReport.Checkpoint(last.endS(), "end", Message.of("timeline.end",
					Temperature.celsius(last.coreAtEndC()), Temperature.celsius(last.surfaceAtEndC()))));
		}
		out.sort((a, b) -> Double.compare(a.timeS(), b.timeS()));
		return out;
	}

	static Message into(HeatSetup h) {
		Temperature t = Temperature.celsius(h.temperatureC());
		if (h instanceof PanContact) {
			return Message.of("timeline.into.pan", t);
		}
		if (h instanceof Oven) {
			return Message.of("timeline.into.oven", t);
		}
		if (h instanceof RadiantGrill) {
			return Message.of("timeline.into.grill", t);
		}
		if (h instanceof DeepFryer) {
			return Message.of("timeline.into.fryer", t);
		}
		return Message.of("timeline.into.rest", t);
	}

	/** The flips of a step that starts at {@code startS} and lasts {@code durationS}. */
	static void flips(FaceSchedule schedule, double startS, double durationS, List<StepsReport.Checkpoint> out) {
		List<Double> at = new ArrayList<>();
		double t = schedule.nextChangeAfter(0);
		while (t < durationS - 1e-6) {
			at.add(t);
			t = schedule.nextChangeAfter(t + 1e-6);
		}
		if (at.size() > FLIPS_LISTED) {
			out.add(new StepsReport.Checkpoint(startS + at.get(0), "flip",
					Message.of("timeline.flips", Duration.seconds(at.get(0)), PlainNumber.of(at.size(), 0))));
			return;
		}
		for (double f : at) {
			out.add(new StepsReport.Checkpoint(startS + f, "flip", Message.of("timeline.flip")));
		}
	}

	private static double firstTimeCoreAbove(List<Sample> series, double fromS, double toS, double coreC) {
		for (Sample s : series) {
			if (s.timeS() >= fromS && s.timeS() <= toS && s.coreTemperatureC() >= coreC) {
				return s.timeS();
			}
		}
		return Double.NaN;
	}

	private static Sample peakCore(List<Sample> series, double fromS, double toS) {
		Sample best = null;
		for (Sample s : series) {
			if (s.timeS() >= fromS - 1e-9 && s.timeS() <= toS + 1e-9
					&& (best == null || s.coreTemperatureC() > best.coreTemperatureC())) {
				best = s;
			}
		}
		return best;
	}

	private static double coreAt(List<Sample> series, double timeS) {
		Sample best = null;
		for (Sample s : series) {
			if (best == null || Math.abs(s.timeS() - timeS) < Math.abs(best.timeS() - timeS)) {
				best = s;
			}
		}
		return best == null ? Double.NaN : best.coreTemperatureC();
	}

}
