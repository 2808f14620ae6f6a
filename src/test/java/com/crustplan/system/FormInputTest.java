package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.LinkedHashMap;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.CrustplanTest;
import com.crustplan.setup.SetupRepository;
import com.crustplan.surface.SurfaceRepository;

/**
 * Page forms given what no browser form sends: each test reproduces one case of the
 * robustness issue.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class FormInputTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	SurfaceRepository surfaces;

	@Autowired
	SetupRepository setups;

	/**
	 * Potato with the category's typical composition (sums to 100 %); our own test values
	 * otherwise.
	 */
	static MockHttpServletRequestBuilder potato() {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("name", "Repeated-field wedges");
		p.put("category", "potato");
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
		MockHttpServletRequestBuilder b = post("/surfaces/new").with(csrf());
		p.forEach(b::param);
		return b;
	}

	/**
	 * Reproduces {@code waterPct=1&waterPct=2} being joined to "1,2" and saved as 1.2 %.
	 */
	@Test
	void shouldRefuseAFieldSentTwiceInsteadOfJoiningIt() throws Exception {
		long before = surfaces.count();
		mvc.perform(potato().param("waterPct", "1", "2"))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/form"))
			.andExpect(model().attributeHasFieldErrorCode("form", "waterPct", "repeated"))
			.andExpect(content().string(containsString("was sent more than once; give one value")));
		assertThat(surfaces.count()).isEqualTo(before);
		// text fields too: "a,b" would otherwise be saved as the name
		mvc.perform(potato().param("waterPct", "79").param("name", "a", "b"))
			.andExpect(model().attributeHasFieldErrorCode("form", "name", "repeated"));
		assertThat(surfaces.count()).isEqualTo(before);
	}

	/**
	 * Reproduces {@code fan=maybe} re-rendering the setup form with no message anywhere.
	 */
	@Test
	void shouldShowWhyAnUnreadableCheckboxValueWasRefused() throws Exception {
		long before = setups.count();
		mvc.perform(post("/setups/new").with(csrf())
			.param("name", "Combi with a doubtful fan")
			.param("mode", "oven")
			.param("temperature", "180")
			.param("temperatureUnit", "C")
			.param("fan", "maybe")
			.param("relativeHumidityPct", "20"))
			.andExpect(status().isOk())
			.andExpect(view().name("setup/form"))
			.andExpect(model().attributeHasFieldErrorCode("form", "fan", "typeMismatch"))
			// messages.properties: typeMismatch.java.lang.Boolean, shown under the
			// checkbox
			.andExpect(content().string(containsString("must be yes or no")));
		assertThat(setups.count()).isEqualTo(before);
	}

}
