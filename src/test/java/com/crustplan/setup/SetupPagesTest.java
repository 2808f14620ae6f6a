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
		p.put("steamPct", "20");
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
			.andExpect(content().string(containsString("175\u00a0°C")));
	}

	@Test
	void shouldShowTemperaturesInFahrenheitWhenChosen() throws Exception {
		// 175 °C = 347 °F (°F = °C × 9/5 + 32)
		mvc.perform(get("/setups").cookie(new Cookie("crustplan-units", "F")))
			.andExpect(content().string(containsString("347\u00a0°F")));
	}

	@Test
	void shouldCreateEditCopyAndDeleteASetup() throws Exception {
		mvc.perform(get("/setups/new")).andExpect(status().isOk()).andExpect(view().name("setup/form"));
		mvc.perform(oven("/setups/new"))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrl("/setups"))
			.andExpect(flash().attribute("message", containsString("Test combi")));
		SavedSetup s = setups.findAll()
			.stream()
			.filter(x -> x.getName().equals("Test combi"))
			.findFirst()
			.orElseThrow();
		assertThat(s.isFan()).isTrue();
		assertThat(s.getSteamPct()).isEqualTo(20.0);
		mvc.perform(get("/setups/{id}/edit", s.getId())).andExpect(status().isOk());
		mvc.perform(oven("/setups/" + s.getId() + "/edit", "name", "Test combi, steam", "steamPct", "80", "version",
				String.valueOf(s.getVersion())))
			.andExpect(status().is3xxRedirection());
		assertThat(setups.findById(s.getId()).orElseThrow().getSteamPct()).isEqualTo(80.0);
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
		SavedSetup s = setups.findAll()
			.stream()
			.filter(x -> x.getName().equals("Fryer with a fan?"))
			.findFirst()
			.orElseThrow();
		assertThat(s.isFan()).isFalse();
		assertThat(s.getSteamPct()).isNull();
	}

	@Test
	void shouldShowTheDewPointBesideTheSteamShare() throws Exception {
		// 50 % steam: p_v = 50.66 kPa; steam tables (IAPWS-IF97) give 47.39 kPa at 80 °C
		// and 57.87 kPa at
		// 85 °C, so about 81.6 °C: 82 °C, and 81.6 × 9/5 + 32 = 178.9, 179 °F
		mvc.perform(oven("/setups/new", "name", "Half steam", "steamPct", "50")).andExpect(status().is3xxRedirection());
		mvc.perform(get("/setups"))
			.andExpect(content().string(containsString("50\u00a0% steam, dew point 82\u00a0°C")));
		mvc.perform(get("/setups").cookie(new Cookie("crustplan-units", "F")))
			.andExpect(content().string(containsString("50\u00a0% steam, dew point 179\u00a0°F")));
		SavedSetup s = setups.findAll()
			.stream()
			.filter(x -> x.getName().equals("Half steam"))
			.findFirst()
			.orElseThrow();
		mvc.perform(get("/setups/{id}/edit", s.getId()))
			.andExpect(content().string(containsString("Steam in the oven air")))
			.andExpect(content().string(containsString("0 = dry (kitchen air is about 1.6 %), 100 = pure steam")))
			.andExpect(content().string(containsString("82\u00a0°C")));
	}

	@Test
	void shouldReadAnOldHumidityReadingAsTheSteamShareACookMeant() throws Exception {
		// the rule of migration V5: 10 % or less is dry kitchen air (1.6 %), 40 % → 1.6 +
		// 30·98.4/90 = 34.4 %
		mvc.perform(oven("/setups/new", "name", "Old dry", "steamPct", "", "relativeHumidityPct", "10"))
			.andExpect(status().is3xxRedirection());
		mvc.perform(oven("/setups/new", "name", "Old combi", "steamPct", "", "relativeHumidityPct", "40"))
			.andExpect(status().is3xxRedirection());
		assertThat(setups.findAll()
			.stream()
			.filter(x -> x.getName().equals("Old dry"))
			.findFirst()
			.orElseThrow()
			.getSteamPct()).isEqualTo(1.6);
		assertThat(setups.findAll()
			.stream()
			.filter(x -> x.getName().equals("Old combi"))
			.findFirst()
			.orElseThrow()
			.getSteamPct()).isCloseTo(34.4, org.assertj.core.data.Offset.offset(1e-9));
	}

	@Test
	void shouldSaveAGrillByItsHeatFluxOrByElementAndDistance() throws Exception {
		mvc.perform(oven("/setups/new", "name", "Flux grill", "mode", "grill", "temperature", "", "grill", "salamander",
				"heatFluxKwPerM2", "14", "flipEverySeconds", "0"))
			.andExpect(status().is3xxRedirection());
		mvc.perform(oven("/setups/new", "name", "Coals", "mode", "grill", "temperature", "650", "grill", "charcoal",
				"distanceMm", "100", "flipEverySeconds", "90"))
			.andExpect(status().is3xxRedirection());
		SavedSetup flux = setups.findAll()
			.stream()
			.filter(x -> x.getName().equals("Flux grill"))
			.findFirst()
			.orElseThrow();
		assertThat(flux.getHeatFluxKwPerM2()).isEqualTo(14.0);
		assertThat(flux.getGrill()).isEqualTo("salamander");
		SavedSetup coals = setups.findAll().stream().filter(x -> x.getName().equals("Coals")).findFirst().orElseThrow();
		assertThat(coals.getDistanceMm()).isEqualTo(100.0);
		assertThat(coals.getFluxAtFoodKwPerM2()).isBetween(15.0, 30.0);
		mvc.perform(get("/setups"))
			.andExpect(content().string(containsString("14\u00a0kW/m² at the food")))
			.andExpect(content().string(containsString("food 100\u00a0mm below")));
		mvc.perform(get("/setups/{id}/edit", flux.getId()))
			.andExpect(content().string(containsString("Heat flux at the food")));
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
		void shouldNameTheGrillFieldThatIsWrong() throws Exception {
			mvc.perform(oven("/setups/new", "mode", "grill", "grill", "salamander", "heatFluxKwPerM2", "90"))
				.andExpect(model().attributeHasFieldErrors("form", "heatFluxKwPerM2"));
			mvc.perform(oven("/setups/new", "mode", "grill", "grill", "toaster", "temperature", "800"))
				.andExpect(model().attributeHasFieldErrors("form", "grill"))
				.andExpect(content().string(containsString("salamander, broiler or charcoal")));
			mvc.perform(oven("/setups/new", "mode", "grill", "temperature", "", "grill", "salamander"))
				.andExpect(model().attributeHasFieldErrors("form", "temperature"));
			// coals at 1000 °C 30 mm below: σ·0.95·0.7·F·(1273⁴ − 298⁴) with F ≈ 0.98,
			// about 97 kW/m², over 60
			mvc.perform(oven("/setups/new", "mode", "grill", "grill", "charcoal", "temperature", "1000", "distanceMm",
					"30"))
				.andExpect(model().attributeHasFieldErrors("form", "distanceMm"));
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
			mvc.perform(oven("/setups/new", "steamPct", "120"))
				.andExpect(model().attributeHasFieldErrors("form", "steamPct"));
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
