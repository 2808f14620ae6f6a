package com.crustplan.plan.compare;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import jakarta.servlet.http.HttpServletResponse;

import org.springframework.stereotype.Controller;
import org.springframework.ui.Model;
import org.springframework.web.bind.annotation.GetMapping;
import org.springframework.web.bind.annotation.ModelAttribute;
import org.springframework.web.bind.annotation.RequestParam;

import com.crustplan.engine.cook.Sample;
import com.crustplan.system.TemperatureUnit;

import tools.jackson.databind.json.JsonMapper;

/**
 * Two to four saved plans side by side: {@code /plans/compare?ids=1,2,3} (the saved-plans
 * list's checkboxes send {@code ids} once per plan).
 */
@Controller
class CompareController {

	private final CompareService compare;

	private final JsonMapper json;

	CompareController(CompareService compare, JsonMapper json) {
		this.compare = compare;
		this.json = json;
	}

	@GetMapping("/plans/compare")
	String compare(@RequestParam(name = "ids", required = false) List<String> ids,
			@ModelAttribute("units") TemperatureUnit units, Model model, HttpServletResponse response) {
		try {
			Comparison c = compare.compare(CompareService.ids(ids == null ? null : String.join(",", ids)), units);
			model.addAttribute("comparison", c);
			model.addAttribute("chartJson", json.writeValueAsString(charts(c, units)));
		}
		catch (CompareService.Refused e) {
			// the address asked for something that cannot be compared: say what and why
			response.setStatus(HttpServletResponse.SC_BAD_REQUEST);
			model.addAttribute("refused", e.getMessage());
		}
		return "plan/compare";
	}

	/** Surface and core series per plan in the cook's unit; minutes across. */
	static Map<String, Object> charts(Comparison c, TemperatureUnit unit) {
		List<Map<String, Object>> plans = new ArrayList<>();
		for (Comparison.Entry e : c.entries()) {
			if (!e.ok()) {
				continue;
			}
			List<Double> t = new ArrayList<>();
			List<Double> surface = new ArrayList<>();
			List<Double> core = new ArrayList<>();
			for (Sample s : e.report().result().series()) {
				t.add(round(s.timeS() / 60, 3));
				surface.add(round(unit.fromCelsius(s.surfaceTemperatureC()), 1));
				core.add(round(unit.fromCelsius(s.coreTemperatureC()), 1));
			}
			Map<String, Object> p = new LinkedHashMap<>();
			p.put("label", e.saved().getName());
			p.put("colour", e.colour());
			p.put("dash", e.dash());
			p.put("timeMin", t);
			p.put("surface", surface);
			p.put("core", core);
			Double target = e.report().timeToTargetS();
			p.put("targetTimeMin", target == null ? null : round(target / 60, 3));
			plans.add(p);
		}
		Map<String, Object> d = new LinkedHashMap<>();
		d.put("unit", unit.symbol());
		d.put("plans", plans);
		return d;
	}

	private static Double round(double v, int digits) {
		if (!Double.isFinite(v)) {
			return null;
		}
		double f = Math.pow(10, digits);
		return Math.round(v * f) / f;
	}

}
