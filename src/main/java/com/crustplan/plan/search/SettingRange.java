package com.crustplan.plan.search;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;

import com.crustplan.engine.assessment.HeatSetups;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.input.InvalidInputException;

/**
 * The settings a search or map tries: set temperatures from {@code fromC} to {@code toC}
 * by {@code stepC}, and for an oven each steam share in {@code steamPcts} (none: the
 * template's own). A grill's temperature is its element's.
 */
public record SettingRange(double fromC, double toC, double stepC, List<Double> steamPcts) {

	/**
	 * Most settings one search or map runs (one engine run each): bounds the work of a
	 * request to a few seconds on two cores (calibrated to the demo plans).
	 */
	public static final int MAX_SETTINGS = 15;

	/**
	 * Most simulated cooking one search or map runs, settings × minutes: about 6 s of
	 * work on two cores (calibrated to the demo plans: about 450 simulated minutes a
	 * second).
	 */
	public static final double MAX_SETTING_MINUTES = 2700;

	public SettingRange {
		steamPcts = steamPcts == null ? List.of() : List.copyOf(steamPcts);
	}

	/**
	 * The mode's usual range: fryer 150–190 °C by 5 (the common frying range; Regulation
	 * (EU) 2017/2158, Annex II asks for below 175 °C); grill element 500–1000 °C by 50
	 * (from memory); pan surfaces and oven air 150–250 °C by 10 (common practice).
	 */
	public static SettingRange usualFor(HeatSetup template) {
		return usualFor(template.mode());
	}

	/** The same by the mode's key (pan, oven, grill, fryer). */
	public static SettingRange usualFor(String mode) {
		if ("fryer".equals(mode)) {
			return new SettingRange(150, 190, 5, List.of());
		}
		if ("grill".equals(mode)) {
			return new SettingRange(500, 1000, 50, List.of());
		}
		return new SettingRange(150, 250, 10, List.of());
	}

	/** The temperatures, in order; the last step may be shorter so {@code toC} is in. */
	public List<Double> temperaturesC() {
		TreeSet<Double> t = new TreeSet<>();
		if (!(stepC > 0)) {
			return List.of(fromC);
		}
		for (int i = 0; fromC + i * stepC <= toC + 1e-9 && t.size() <= 10 * MAX_SETTINGS; i++) {
			t.add(fromC + i * stepC);
		}
		t.add(toC);
		return List.copyOf(t);
	}

	public int count() {
		return temperaturesC().size() * Math.max(1, steamPcts.size());
	}

	/**
	 * The template at each setting, temperatures outermost; the engine's range checks
	 * name {@code range.fromC}, {@code range.toC} or {@code range.steamPct}.
	 */
	public List<HeatSetup> settings(HeatSetup template) {
		List<HeatSetup> out = new ArrayList<>();
		for (double t : temperaturesC()) {
			HeatSetup at;
			try {
				at = HeatSetups.withTemperature(template, t);
			}
			catch (InvalidInputException e) {
				throw new InvalidInputException(t == fromC ? "range.fromC" : "range.toC",
						String.format(Locale.ROOT, "%.0f °C: %s", t, e.reason()));
			}
			if (steamPcts.isEmpty()) {
				out.add(at);
				continue;
			}
			Oven o = (Oven) at;
			for (double steam : steamPcts) {
				try {
					out.add(new Oven(o.airTemperatureC(), o.fan(), steam));
				}
				catch (InvalidInputException e) {
					throw new InvalidInputException("range.steamPct", e.reason());
				}
			}
		}
		return out;
	}

}
