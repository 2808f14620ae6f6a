package com.crustplan.plan;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.system.TemperatureUnit;

/**
 * The series the plan page's charts draw, temperatures in the cook's unit, times in
 * minutes.
 */
final class PlanCharts {

	private PlanCharts() {
	}

	static Map<String, Object> data(PlanReport report, TemperatureUnit unit) {
		List<Double> t = new ArrayList<>();
		List<Double> surface = new ArrayList<>();
		List<Double> other = new ArrayList<>();
		List<Double> core = new ArrayList<>();
		List<Double> aw = new ArrayList<>();
		List<Double> browning = new ArrayList<>();
		List<Double> lightness = new ArrayList<>();
		List<Double> source = new ArrayList<>();
		boolean hasBody = false;
		// a far side only where there is one that differs: a slab heated from one face
		// (pan, grill), not a strip, cube or ball, nor a slab with the same heat on both
		boolean farSide = false;
		for (Sample s : report.result().series()) {
			farSide |= Math.abs(s.otherFaceTemperatureC() - s.surfaceTemperatureC()) > 0.5;
			source.add(round(unit.fromCelsius(s.heatSourceTemperatureC()), 1));
			hasBody |= Double.isFinite(s.heatSourceTemperatureC());
			t.add(round(s.timeS() / 60, 3));
			surface.add(round(unit.fromCelsius(s.surfaceTemperatureC()), 1));
			other.add(round(unit.fromCelsius(s.otherFaceTemperatureC()), 1));
			core.add(round(unit.fromCelsius(s.coreTemperatureC()), 1));
			aw.add(round(s.surfaceWaterActivity(), 3));
			browning.add(round(s.browningExtent() * 100, 2));
			lightness.add(round(s.colour().lightness(), 1));
		}
		Map<String, Object> d = new LinkedHashMap<>();
		d.put("unit", unit.symbol());
		d.put("timeMin", t);
		d.put("surfaceTemperature", surface);
		if (farSide && report.surface().shape() == Shape.SLAB) {
			d.put("otherFaceTemperature", other);
		}
		d.put("coreTemperature", core);
		d.put("surfaceWaterActivity", aw);
		d.put("browningPct", browning);
		d.put("lightness", lightness);
		if (hasBody) {
			// the pan or the oil as the load draws it down: its own line on the
			// temperature chart
			d.put("heatSourceTemperature", source);
			d.put("heatSourceLabel", "fryer".equals(report.setup().mode()) ? "Oil" : "Pan");
		}
		d.put("targetBrowningPct", round(report.result().targetExtent() * 100, 2));
		// the category's stages along the browning axis: one scale a cook reads
		List<Map<String, Object>> stages = new ArrayList<>();
		var category = report.category();
		double target = report.result().targetExtent();
		String targetLabel = report.targetLightness() == null ? null : "L* " + Math.round(report.targetLightness());
		for (BrowningStage s : category.stages()) {
			double extent = s.extentOn(category.colourPath());
			Map<String, Object> st = new LinkedHashMap<>();
			st.put("label", s.label());
			st.put("pct", round(extent * 100, 2));
			stages.add(st);
			if (Math.abs(extent - target) < 1e-6) {
				targetLabel = s.label();
			}
		}
		d.put("stages", stages);
		d.put("targetLabel", targetLabel);
		d.put("targetTimeMin", report.timeToTargetS() == null ? null : round(report.timeToTargetS() / 60, 3));
		if (report.stepped()) {
			d.put("steps", bands(report.steps(), unit));
		}
		return d;
	}

	/** One shaded band per step: from and to in minutes, and what the cook calls it. */
	static List<Map<String, Object>> bands(StepsReport steps, TemperatureUnit unit) {
		List<Map<String, Object>> out = new ArrayList<>();
		for (CookStep.Record r : steps.records()) {
			HeatSetup h = steps.steps().get(r.index()).setup();
			Map<String, Object> b = new LinkedHashMap<>();
			b.put("fromMin", round(r.startS() / 60, 3));
			b.put("toMin", round(r.endS() / 60, 3));
			b.put("mode", h.mode());
			b.put("label",
					(r.index() + 1) + " " + steps.labels().get(r.index()) + " · " + unit.format(h.temperatureC()));
			out.add(b);
		}
		return out;
	}

	/** Nulls for NaN so the JSON stays valid and Chart.js leaves a gap. */
	private static Double round(double v, int digits) {
		if (!Double.isFinite(v)) {
			return null;
		}
		double f = Math.pow(10, digits);
		return Math.round(v * f) / f;
	}

}
