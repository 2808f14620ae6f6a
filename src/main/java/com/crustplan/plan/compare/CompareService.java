package com.crustplan.plan.compare;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.springframework.stereotype.Service;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.SavedPlan;
import com.crustplan.plan.SavedPlanService;
import com.crustplan.system.Formats;
import com.crustplan.system.NotFoundException;
import com.crustplan.system.TemperatureUnit;

import tools.jackson.core.JacksonException;

/**
 * Runs two to four saved plans against today's model and says how each differs from the
 * first: time to target, core at target and, where acrylamide matters, the portion's
 * acrylamide.
 */
@Service
public class CompareService {

	public static final int MIN_PLANS = 2;

	public static final int MAX_PLANS = 4;

	/**
	 * Line colours, one per plan: distinct for the common colour-vision deficiencies
	 * (Okabe & Ito 2008, "Color Universal Design"), with a dash each as a second cue.
	 */
	static final String[] COLOURS = { "#0072b2", "#d55e00", "#009e73", "#cc79a7" };

	static final String[] DASHES = { "", "8 4", "2 3", "12 4 2 4" };

	/**
	 * Differences this small are said as "about the same": a second of the clock, a
	 * degree of a probe, a per cent of a model estimate (common practice).
	 */
	static final double SAME_TIME_S = 1;

	static final double SAME_CORE_K = 0.5;

	static final double SAME_ACRYLAMIDE = 0.01;

	/** A request the page answers with a message instead of a comparison. */
	public static class Refused extends RuntimeException {

		Refused(String message) {
			super(message, null, false, false);
		}

	}

	private final SavedPlanService saved;

	private final PlanService planner;

	CompareService(SavedPlanService saved, PlanService planner) {
		this.saved = saved;
		this.planner = planner;
	}

	/**
	 * The ids as typed in the address or sent by the list's checkboxes ("1,2,3"); repeats
	 * count once.
	 */
	public static List<Long> ids(String text) {
		if (text == null || text.isBlank()) {
			throw new Refused("Choose " + MIN_PLANS + " to " + MAX_PLANS + " saved plans to compare.");
		}
		Set<Long> ids = new LinkedHashSet<>();
		for (String part : text.split("[,\\s]+")) {
			if (part.isBlank()) {
				continue;
			}
			try {
				ids.add(Long.parseLong(part.trim()));
			}
			catch (NumberFormatException e) {
				throw new Refused("“" + (part.length() > 20 ? part.substring(0, 20) + "…" : part)
						+ "” is not a plan number; the address takes plan numbers separated by commas.");
			}
		}
		if (ids.size() < MIN_PLANS || ids.size() > MAX_PLANS) {
			throw new Refused("Choose " + MIN_PLANS + " to " + MAX_PLANS + " different saved plans to compare ("
					+ ids.size() + " chosen).");
		}
		return List.copyOf(ids);
	}

	public Comparison compare(List<Long> ids, TemperatureUnit unit) {
		List<SavedPlan> plans = new ArrayList<>();
		List<Long> missing = new ArrayList<>();
		for (long id : ids) {
			try {
				plans.add(saved.get(id));
			}
			catch (NotFoundException e) {
				missing.add(id);
			}
		}
		if (!missing.isEmpty()) {
			throw new Refused((missing.size() == 1 ? "There is no saved plan number " + missing.get(0)
					: "There are no saved plans numbered " + missing) + " in this kitchen; it may have been deleted.");
		}
		List<PlanReport> reports = new ArrayList<>();
		List<String> problems = new ArrayList<>();
		for (SavedPlan p : plans) {
			try {
				reports.add(planner.plan(saved.inputs(p)));
				problems.add(null);
			}
			catch (InvalidInputException e) {
				reports.add(null);
				problems.add("The model no longer accepts this plan's " + e.field() + ": " + e.reason() + ".");
			}
			catch (JacksonException | NullPointerException e) {
				reports.add(null);
				problems.add("The saved inputs of this plan cannot be read.");
			}
		}
		boolean matters = reports.stream().anyMatch(r -> r != null && r.acrylamideMatters());
		List<Comparison.Entry> entries = new ArrayList<>();
		for (int i = 0; i < plans.size(); i++) {
			String diff = i == 0 ? null : difference(reports.get(0), reports.get(i), unit);
			entries
				.add(new Comparison.Entry(plans.get(i), reports.get(i), problems.get(i), COLOURS[i], DASHES[i], diff));
		}
		return new Comparison(entries, matters);
	}

	/**
	 * The plan against the first in words: "3 min 10 s sooner, core 4 °C cooler, 40 %
	 * more acrylamide".
	 */
	static String difference(PlanReport first, PlanReport other, TemperatureUnit unit) {
		if (first == null || other == null) {
			return "Cannot be compared: one of the two plans could not be run.";
		}
		List<String> parts = new ArrayList<>();
		Double a = first.timeToTargetS();
		Double b = other.timeToTargetS();
		if (a != null && b != null) {
			double d = b - a;
			parts.add(Math.abs(d) < SAME_TIME_S ? "same time to target"
					: Formats.duration(Math.abs(d)) + (d < 0 ? " sooner" : " later"));
		}
		else if (b == null && a != null) {
			parts.add("does not reach its target (the first does)");
		}
		else if (a == null && b != null) {
			parts.add("reaches its target in " + Formats.duration(b) + " (the first does not)");
		}
		Double ca = first.coreTemperatureAtTargetC();
		Double cb = other.coreTemperatureAtTargetC();
		if (ca != null && cb != null) {
			double d = cb - ca;
			parts.add(Math.abs(d) < SAME_CORE_K ? "same core"
					: "core " + Formats.number(Math.abs(unit.differenceFromCelsius(d)), 0) + "\u00a0" + unit.symbol()
							+ (d < 0 ? " cooler" : " hotter"));
		}
		Double pa = first.acrylamideMatters() ? first.acrylamide().portionUgPerKg() : null;
		Double pb = other.acrylamideMatters() ? other.acrylamide().portionUgPerKg() : null;
		if (pa != null && pb != null && pa > 0) {
			double rel = pb / pa - 1;
			parts.add(Math.abs(rel) < SAME_ACRYLAMIDE ? "about the same acrylamide" : String.format(Locale.ROOT,
					"%.0f %% %s acrylamide", Math.abs(rel) * 100, rel < 0 ? "less" : "more"));
		}
		if (parts.isEmpty()) {
			return "No figure to compare.";
		}
		String s = String.join(", ", parts);
		return Character.toUpperCase(s.charAt(0)) + s.substring(1) + ".";
	}

}
