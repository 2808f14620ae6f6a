package com.crustplan.setup;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.hamcrest.Matchers.hasSize;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.LinkedHashMap;
import java.util.Map;

import jakarta.servlet.http.Cookie;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class SetupPagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SetupRepository setups;

	static MockHttpServletRequestBuilder oven(String url, String... overrides) {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("name", "Test combi");
		p.put("mode", "oven");
		p.put("temperature", "180");
		p.put("temperatureUnit", "C");
		p.put("fan", "true");
		p.put("relativeHumidityPct", "20");
		p.put("flipEverySeconds", "");
		p.put("notes", "");
		for (int i = 0; i < overrides.length; i += 2) {
			p.put(overrides[i], overrides[i + 1]);
		}
		MockHttpServletRequestBuilder b = post(url).with(csrf());
		p.forEach(b::param);
		return b;
	}

	@Test
	void shouldListTheDemoKitchensSetupsWithReadableLabels() throws Exception {
		mvc.perform(get("/setups"))
			.andExpect(status().isOk())
			.andExpect(view().name("setup/list"))
			.andExpect(model().attribute("setups", hasSize(greaterThanOrEqualTo(4))))
			.andExpect(content().string(containsString("Deep fryer (oil)")))
			.andExpect(content().string(containsString("175 °C")));
	}

	@Test
	void shouldShowTemperaturesInFahrenheitWhenChosen() throws Exception {
		// 175 °C = 347 °F (°F = °C × 9/5 + 32)
		mvc.perform(get("/setups").cookie(new Cookie("crustplan-units", "F")))
			.andExpect(content().string(containsString("347 °F")));
	}

	@Test
	void shouldCreateEditCopyAndDeleteASetup() throws Exception {
		mvc.perform(get("/setups/new")).andExpect(status().isOk()).andExpect(view().name("setup/form"));
		mvc.perform(oven("/setups/new"))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrl("/setups"))
			.andExpect(flash().attribute("message", containsString("Test combi")));
		SavedSetup s = setups.findAll().stream().filter(x -> x.getName().equals("Test combi")).findFirst().orElseThrow();
		assertThat(s.isFan()).isTrue();
		assertThat(s.getRelativeHumidityPct()).isEqualTo(20.0);
		mvc.perform(get("/setups/{id}/edit", s.getId())).andExpect(status().isOk());
		mvc.perform(oven("/setups/" + s.getId() + "/edit", "name", "Test combi, steam", "relativeHumidityPct", "80",
				"version", String.valueOf(s.getVersion())))
			.andExpect(status().is3xxRedirection());
		assertThat(setups.findById(s.getId()).orElseThrow().getRelativeHumidityPct()).isEqualTo(80.0);
		mvc.perform(get("/setups/{id}/copy", s.getId()))
			.andExpect(content().string(containsString("Copy of Test combi, steam")));
		mvc.perform(get("/setups/{id}/delete", s.getId())).andExpect(view().name("setup/delete"));
		mvc.perform(post("/setups/{id}/delete", s.getId()).with(csrf())).andExpect(redirectedUrl("/setups"));
		assertThat(setups.findById(s.getId())).isEmpty();
	}

	@Test
	void shouldKeepOnlyTheSettingsTheModeUses() throws Exception {
		mvc.perform(oven("/setups/new", "name", "Fryer with a fan?", "mode", "fryer", "temperature", "170"))
			.andExpect(status().is3xxRedirection());
		SavedSetup s = setups.findAll().stream().filter(x -> x.getName().equals("Fryer with a fan?")).findFirst().orElseThrow();
		assertThat(s.isFan()).isFalse();
		assertThat(s.getRelativeHumidityPct()).isNull();
	}

	@Test
	void shouldAnswer404ForAMissingSetup() throws Exception {
		mvc.perform(get("/setups/{id}/edit", 987654)).andExpect(status().isNotFound());
	}

	@Nested
	class BadInput {

		@Test
		void shouldRejectATemperatureOutsideWhatTheModeAllows() throws Exception {
			// the engine's fryer limit: above 200 °C oil smokes and may ignite
			mvc.perform(oven("/setups/new", "mode", "fryer", "temperature", "230"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "temperature"))
				.andExpect(content().string(containsString("200")));
			mvc.perform(oven("/setups/new", "mode", "pan", "temperature", "400"))
				.andExpect(model().attributeHasFieldErrors("form", "temperature"));
		}

		@Test
		void shouldRejectAnUnknownMode() throws Exception {
			mvc.perform(oven("/setups/new", "mode", "microwave"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "mode"));
		}

		@Test
		void shouldRejectAFlipShorterThanTenSeconds() throws Exception {
			mvc.perform(oven("/setups/new", "mode", "pan", "temperature", "200", "flipEverySeconds", "5"))
				.andExpect(model().attributeHasFieldErrors("form", "flipEverySeconds"));
		}

		@Test
		void shouldRejectHumidityOverHundredAndTextForTemperature() throws Exception {
			mvc.perform(oven("/setups/new", "relativeHumidityPct", "120"))
				.andExpect(model().attributeHasFieldErrors("form", "relativeHumidityPct"));
			mvc.perform(oven("/setups/new", "temperature", "hot"))
				.andExpect(model().attributeHasFieldErrorCode("form", "temperature", "typeMismatch"))
				.andExpect(content().string(containsString("must be a number")));
		}

	}

	@Test
	void shouldRefuseACookAChange() throws Exception {
		mvc.perform(oven("/setups/new").with(user("cook").roles("COOK"))).andExpect(status().isForbidden());
		mvc.perform(get("/setups").with(user("cook").roles("COOK"))).andExpect(status().isOk());
	}

}
