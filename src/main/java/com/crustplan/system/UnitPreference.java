package com.crustplan.system;

import org.springframework.stereotype.Controller;
import jakarta.servlet.http.Cookie;
import jakarta.servlet.http.HttpServletRequest;
import jakarta.servlet.http.HttpServletResponse;

import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ModelAttribute;

/**
 * The °C/°F choice, remembered in a cookie so it holds across sessions and signed-out
 * pages; every page gets it as the model attribute {@code units}.
 */
@ControllerAdvice(annotations = Controller.class)
public class UnitPreference {

	static final String COOKIE = "crustplan-units";

	/** A year: the choice belongs to the device, like a kitchen thermometer's setting. */
	private static final int COOKIE_MAX_AGE_S = 365 * 24 * 3600;

	public static TemperatureUnit of(HttpServletRequest request) {
		Cookie[] cookies = request.getCookies();
		if (cookies != null) {
			for (Cookie c : cookies) {
				if (COOKIE.equals(c.getName())) {
					return TemperatureUnit.fromCode(c.getValue());
				}
			}
		}
		return TemperatureUnit.CELSIUS;
	}

	static void remember(HttpServletResponse response, TemperatureUnit unit, boolean secure) {
		Cookie c = new Cookie(COOKIE, unit.code());
		c.setPath("/");
		c.setMaxAge(COOKIE_MAX_AGE_S);
		c.setHttpOnly(true);
		c.setSecure(secure);
		c.setAttribute("SameSite", "Lax");
		response.addCookie(c);
	}

	@ModelAttribute("units")
	TemperatureUnit units(HttpServletRequest request) {
		return of(request);
	}

	/**
	 * Where the °C/°F switch returns to: this page, for GET requests; the list pages
	 * otherwise.
	 */
	@ModelAttribute("currentPath")
	String currentPath(HttpServletRequest request) {
		String path = request.getRequestURI().substring(request.getContextPath().length());
		if (!"GET".equals(request.getMethod())) {
			return "/";
		}
		String q = request.getQueryString();
		return q == null ? path : path + "?" + q;
	}

}
