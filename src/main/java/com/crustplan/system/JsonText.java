package com.crustplan.system;

import org.springframework.stereotype.Component;

import tools.jackson.databind.json.JsonMapper;

/**
 * JSON for data attributes that page scripts read ({@code @jsonText.write(x)} in
 * templates); Thymeleaf escapes it as an attribute value, so no user text can break out
 * into the page.
 */
@Component("jsonText")
public class JsonText {

	private final JsonMapper json;

	JsonText(JsonMapper json) {
		this.json = json;
	}

	public String write(Object value) {
		return json.writeValueAsString(value);
	}

}
