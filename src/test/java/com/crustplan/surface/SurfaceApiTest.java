package com.crustplan.surface;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.nullValue;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.CrustplanTest;

/**
 * JSON API v1 for saved surfaces. API clients sign in with HTTP Basic as the demo
 * kitchen's chef and cook (demo/DemoKitchenLoader); a browser session still needs its
 * CSRF token to write.
 */
@CrustplanTest
class SurfaceApiTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	SurfaceRepository surfaces;

	/**
	 * Potato slices for chips: the composition is the potato category's typical one,
	 * which sums to 100 %; thickness and notes are our own test values.
	 */
	static final String WEDGES = """
			{ "name": "API wedges", "notes": "skin on, blanched",
			  "surface": { "category": "potato", "product": "french-fries", "waterPct": 79, "proteinPct": 2,
			    "fatPct": 0.1, "reducingSugarPct": 0.4, "sucrosePct": 0.2, "starchPct": 15.5, "fibrePct": 1.8,
			    "ashPct": 1, "asparagineMgPerKg": 3000, "surfaceWaterGPerM2": 20, "thicknessMm": 12.5,
			    "pH": 6.0, "bicarbonateGPerKg": 0, "acidGPerKg": 0.5, "initialTemperatureC": 4 } }""";

	static MockHttpServletRequestBuilder save(String body) {
		return post("/api/v1/surfaces").contentType(MediaType.APPLICATION_JSON).content(body);
	}

	@Test
	void shouldSaveForAChefAndAnswer201WithTheLocationOfTheRecord() throws Exception {
		long before = surfaces.count();
		MvcResult r = mvc.perform(save(WEDGES).with(httpBasic("chef", "chef-demo")))
			.andExpect(status().isCreated())
			.andExpect(header().string("Location", org.hamcrest.Matchers.matchesPattern("/api/v1/surfaces/\\d+")))
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_JSON))
			.andExpect(jsonPath("$.name").value("API wedges"))
			.andExpect(jsonPath("$.category").value("potato"))
			.andExpect(jsonPath("$.product").value("french-fries"))
			.andExpect(jsonPath("$.starchPct").value(15.5))
			.andExpect(jsonPath("$.thicknessMm").value(12.5))
			.andExpect(jsonPath("$.pH").value(6.0))
			.andExpect(jsonPath("$.acidGPerKg").value(0.5))
			.andExpect(jsonPath("$.initialTemperatureC").value(4.0))
			.andExpect(jsonPath("$.notes").value("skin on, blanched"))
			.andReturn();
		assertThat(surfaces.count()).isEqualTo(before + 1);
		String location = r.getResponse().getHeader("Location");
		long id = Long.parseLong(location.substring(location.lastIndexOf('/') + 1));
		SavedSurface stored = surfaces.findById(id).orElseThrow();
		assertThat(stored.getName()).isEqualTo("API wedges");
		assertThat(stored.getWaterPct()).isEqualTo(79.0);
		assertThat(stored.getAsparagineMgPerKg()).isEqualTo(3000.0);

		// any signed-in user reads it back, and finds it in the list
		mvc.perform(get(location).with(httpBasic("cook", "cook-demo")))
			.andExpect(status().isOk())
			.andExpect(jsonPath("$.id").value(id))
			.andExpect(jsonPath("$.surfaceWaterGPerM2").value(20.0));
		mvc.perform(get("/api/v1/surfaces").with(httpBasic("cook", "cook-demo")))
			.andExpect(status().isOk())
			.andExpect(jsonPath("$[*].name", hasItem("API wedges")))
			.andExpect(jsonPath("$[?(@.id==" + id + ")].category").value("potato"));
	}

	@Test
	void shouldFillLeftOutFieldsFromTheCategoryDefaultsAndKeepTheUsualProduct() throws Exception {
		mvc.perform(save("""
				{ "name": "API plain steak", "surface": { "category": "meat" } }""")
			.with(httpBasic("chef", "chef-demo")))
			.andExpect(status().isCreated())
			.andExpect(jsonPath("$.product").value(nullValue()))
			.andExpect(jsonPath("$.pH").value(nullValue()))
			.andExpect(jsonPath("$.notes").value(nullValue()));
	}

	@ParameterizedTest(name = "{0} -> {1}")
	@CsvSource(delimiter = '|', value = {
			// potato's composition with starch 16.5 instead of 15.5: the parts add up to
			// 101 %
			"'{\"name\":\"x\",\"surface\":{\"category\":\"potato\",\"waterPct\":79,\"proteinPct\":2,\"fatPct\":0.1,\"reducingSugarPct\":0.4,\"sucrosePct\":0.2,\"starchPct\":16.5,\"fibrePct\":1.8,\"ashPct\":1}}'|surface.composition|more than 100",
			"'{\"name\":\"x\",\"surface\":{\"category\":\"meat\",\"waterPct\":120}}'|surface.waterPct|0 to 100",
			"'{\"name\":\"x\",\"surface\":{\"category\":\"meat\",\"waterPct\":\"NaN\"}}'|surface.waterPct|NaN",
			"'{\"name\":\"x\",\"surface\":{\"category\":\"meat\",\"waterPct\":NaN}}'|body|malformed JSON",
			"'{\"name\":\"x\",\"surface\":{\"category\":\"meat\"'|body|malformed JSON",
			"'{\"surface\":{\"category\":\"meat\"}}'|name|required",
			"'{\"name\":\"  \",\"surface\":{\"category\":\"meat\"}}'|name|required",
			"'{\"name\":\"x\"}'|surface|required",
			"'{\"name\":\"x\",\"surface\":{\"category\":\"meat\",\"pH\":12}}'|surface.pH|",
			"'{\"name\":\"x\",\"surface\":{\"category\":\"lava\"}}'|surface.category|not a category",
			"'[1,2]'|body|JSON object", "''|body|name and surface" })
	void shouldAnswerFieldErrorsAndSaveNothingForBadBodies(String body, String field, String message) throws Exception {
		long before = surfaces.count();
		mvc.perform(save(body).with(httpBasic("chef", "chef-demo")))
			.andExpect(status().isBadRequest())
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
			.andExpect(jsonPath("$.errors[0].field").value(field))
			.andExpect(jsonPath("$.errors[0].message").value(containsString(message == null ? "" : message)));
		assertThat(surfaces.count()).isEqualTo(before);
	}

	@Test
	void shouldNameEveryBadFieldAtOnce() throws Exception {
		mvc.perform(save("""
				{ "name": 5, "notes": true, "surface": { "category": "meat", "fatPct": "lots", "thicknessMm": [] } }""")
			.with(httpBasic("chef", "chef-demo")))
			.andExpect(status().isBadRequest())
			.andExpect(jsonPath("$.errors[*].field", hasItem("name")))
			.andExpect(jsonPath("$.errors[*].field", hasItem("notes")))
			.andExpect(jsonPath("$.errors[*].field", hasItem("surface.fatPct")))
			.andExpect(jsonPath("$.errors[*].field", hasItem("surface.thicknessMm")));
	}

	@Test
	void shouldAnswer401InJsonWithoutOrWithWrongCredentials() throws Exception {
		mvc.perform(save(WEDGES).with(anonymous()))
			.andExpect(status().isUnauthorized())
			.andExpect(jsonPath("$.errors[0].field").value("authorization"));
		mvc.perform(save(WEDGES).with(httpBasic("chef", "not-the-password")))
			.andExpect(status().isUnauthorized())
			.andExpect(jsonPath("$.errors[0].field").value("authorization"));
		mvc.perform(get("/api/v1/surfaces").with(anonymous())).andExpect(status().isUnauthorized());
		mvc.perform(get("/api/v1/surfaces/1").with(anonymous())).andExpect(status().isUnauthorized());
	}

	@Test
	void shouldAnswer403InJsonForACook() throws Exception {
		long before = surfaces.count();
		mvc.perform(save(WEDGES).with(httpBasic("cook", "cook-demo")))
			.andExpect(status().isForbidden())
			.andExpect(jsonPath("$.errors[0].field").value("authorization"));
		assertThat(surfaces.count()).isEqualTo(before);
	}

	@Test
	void shouldAnswer404InJsonForAMissingSurface() throws Exception {
		mvc.perform(get("/api/v1/surfaces/987654321").with(httpBasic("cook", "cook-demo")))
			.andExpect(status().isNotFound())
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
			.andExpect(jsonPath("$.errors[0].field").value("id"))
			.andExpect(jsonPath("$.errors[0].message").value(containsString("987654321")));
		mvc.perform(get("/api/v1/surfaces/twelve").with(httpBasic("cook", "cook-demo")))
			.andExpect(status().isBadRequest())
			.andExpect(jsonPath("$.errors[0].field").value("id"));
	}

	/**
	 * A browser's signed-in session is no way around CSRF: only Basic requests skip the
	 * token.
	 */
	@Test
	void shouldStillAskASessionForItsCsrfToken() throws Exception {
		long before = surfaces.count();
		mvc.perform(save(WEDGES).with(user("chef").roles("CHEF")))
			.andExpect(status().isForbidden())
			.andExpect(jsonPath("$.errors[0].message").value(containsString("CSRF token")));
		assertThat(surfaces.count()).isEqualTo(before);
		mvc.perform(save(WEDGES).with(user("chef").roles("CHEF")).with(csrf())).andExpect(status().isCreated());
	}

}
