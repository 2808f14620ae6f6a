package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.LinkedHashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.api.StoredText;
import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.plan.SavedPlanRepository;
import com.crustplan.setup.SetupRepository;
import com.crustplan.surface.SurfaceRepository;

import tools.jackson.databind.json.JsonMapper;

/**
 * Control characters in stored text are refused beside the field, on every way in.
 * PostgreSQL rejects NUL (U+0000) in text columns (PostgreSQL 15 manual, 8.3 "Character
 * Types": "the character with code zero cannot be stored"), so H2 must refuse it too, or
 * a kitchen moving to PostgreSQL meets 500s.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class StoredTextTest {

	static final String NUL = "\u0000";

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SurfaceRepository surfaces;

	@Autowired
	SetupRepository setups;

	@Autowired
	SavedPlanRepository plans;

	@Autowired
	JsonMapper json;

	static MockHttpServletRequestBuilder potato(String... overrides) {
		return potatoTo("/surfaces/new", overrides);
	}

	/**
	 * A valid potato surface form (the category's typical composition, 100 % in all)
	 * posted to {@code url}.
	 */
	static MockHttpServletRequestBuilder potatoTo(String url, String... overrides) {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("name", "Control wedges");
		p.put("category", "potato");
		p.put("waterPct", "79");
		p.put("proteinPct", "2");
		p.put("fatPct", "0.1");
		p.put("reducingSugarPct", "0.4");
		p.put("sucrosePct", "0.2");
		p.put("starchPct", "15.5");
		p.put("fibrePct", "1.8");
		p.put("ashPct", "1");
		p.put("asparagineMgPerKg", "3000");
		p.put("surfaceWaterGPerM2", "20");
		p.put("thicknessMm", "15");
		p.put("bicarbonateGPerKg", "0");
		p.put("acidGPerKg", "0");
		p.put("initialTemperature", "5");
		p.put("temperatureUnit", "C");
		for (int i = 0; i < overrides.length; i += 2) {
			p.put(overrides[i], overrides[i + 1]);
		}
		MockHttpServletRequestBuilder b = post(url).with(csrf());
		p.forEach(b::param);
		return b;
	}

	@Test
	void shouldRefuseANulInTheSurfaceFormsNameNotesAndCategory() throws Exception {
		long before = surfaces.count();
		for (String field : new String[] { "name", "notes", "category" }) {
			String value = field.equals("category") ? "potato" + NUL : "Wedges" + NUL + "x";
			mvc.perform(potato(field, value))
				.andExpect(status().isOk())
				.andExpect(view().name("surface/form"))
				.andExpect(model().attributeHasFieldErrors("form", field))
				.andExpect(content().string(containsString("must not contain control characters")));
		}
		// other controls of Unicode category Cc: BEL, ESC, DEL and a C1 control (U+0085)
		for (String c : new String[] { "\u0007", "\u001b", "\u007f", "\u0085" }) {
			mvc.perform(potato("name", "Wedges " + c)).andExpect(model().attributeHasFieldErrors("form", "name"));
		}
		assertThat(surfaces.count()).isEqualTo(before);
	}

	@Test
	void shouldKeepTabsAndLineBreaksInNotes() throws Exception {
		mvc.perform(potato("name", "Wedges with notes", "notes", "line one\r\nline two\tindented"))
			.andExpect(status().is3xxRedirection());
		assertThat(surfaces.findAll()
			.stream()
			.filter(s -> s.getName().equals("Wedges with notes"))
			.findFirst()
			.orElseThrow()
			.getNotes()).isEqualTo("line one\r\nline two\tindented");
	}

	@Test
	void shouldRefuseANulThroughTheSurfaceApi() throws Exception {
		long before = surfaces.count();
		for (String[] c : new String[][] { { "name", "API wedges" + NUL }, { "notes", "a" + NUL },
				{ "category", "potato" + NUL } }) {
			Map<String, Object> surface = new LinkedHashMap<>();
			surface.put("category", "potato");
			Map<String, Object> body = new LinkedHashMap<>();
			body.put("name", "API wedges");
			body.put("surface", surface);
			if (c[0].equals("category")) {
				surface.put("category", c[1]);
			}
			else {
				body.put(c[0], c[1]);
			}
			String field = c[0].equals("category") ? "surface.category" : c[0];
			mvc.perform(post("/api/v1/surfaces").with(csrf())
				.contentType(MediaType.APPLICATION_JSON)
				.content(json.writeValueAsString(body)))
				.andExpect(status().isBadRequest())
				.andExpect(jsonPath("$.errors[0].field").value(field))
				.andExpect(jsonPath("$.errors[0].message").value(containsString("control characters")));
		}
		assertThat(surfaces.count()).isEqualTo(before);
	}

	@Test
	void shouldRefuseANulInASetupNameAndAPlanName() throws Exception {
		long setupsBefore = setups.count();
		mvc.perform(post("/setups/new").with(csrf())
			.param("name", "Combi" + NUL)
			.param("mode", "oven")
			.param("temperature", "200")
			.param("temperatureUnit", "C")
			.param("notes", "hot" + NUL))
			.andExpect(status().isOk())
			.andExpect(model().attributeHasFieldErrors("form", "name", "notes"));
		assertThat(setups.count()).isEqualTo(setupsBefore);
		long plansBefore = plans.count();
		mvc.perform(post("/plans").with(csrf())
			.param("surfaceId", String.valueOf(demo.surface("Chips, 10 mm, blanched")))
			.param("setupId", String.valueOf(demo.setup("Fryer, chips")))
			.param("targetStage", "golden")
			.param("name", "Friday" + NUL))
			.andExpect(status().isOk())
			.andExpect(model().attributeHasFieldErrors("form", "name"));
		assertThat(plans.count()).isEqualTo(plansBefore);
	}

}
