package com.crustplan.system;

import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.stereotype.Controller;
import org.springframework.web.bind.annotation.PostMapping;
import org.springframework.web.bind.annotation.RequestParam;

/** Switches °C/°F and returns to the page the cook was on. */
@Controller
class UnitController {

	@PostMapping("/units")
	String switchUnits(@RequestParam(name = "unit", required = false) String unit,
			@RequestParam(name = "back", required = false) String back, HttpServletRequest request,
			HttpServletResponse response) {
		UnitPreference.remember(response, TemperatureUnit.fromCode(unit), request.isSecure());
		return "redirect:" + safeLocalPath(back);
	}

	/**
	 * Only paths on this site, so the switch cannot be used to send someone elsewhere.
	 */
	static String safeLocalPath(String back) {
		if (back == null || !back.startsWith("/") || back.startsWith("//") || back.contains("\\")
				|| back.chars().anyMatch(ch -> ch < 0x20)) {
			return "/";
		}
		return back;
	}

}
