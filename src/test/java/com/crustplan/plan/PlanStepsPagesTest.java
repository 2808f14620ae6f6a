package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.LinkedHashMap;
import java.util.Map;

import jakarta.servlet.http.Cookie;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * The plan page in steps: rows of setups and rests, the timeline, saving, and the demo
 * kitchen's plans.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class PlanStepsPagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SavedPlanRepository plans;

	MockHttpServletRequestBuilder searOvenRest(MockHttpServletRequestBuilder r, String... overrides) {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("surfaceId", String.valueOf(demo.surface("Sirloin steak, 30 mm, patted dry")));
		p.put("targetStage", "light-sear");
		p.put("coreTarget", "52");
		p.put("temperatureUnit", "C");
		p.put("steps[0].setup", String.valueOf(demo.setup("Plancha, high")));
		p.put("steps[0].minutes", "3");
		p.put("steps[1].setup", String.valueOf(demo.setup("Fan oven, dry, roast finish")));
		p.put("steps[1].core", "52");
		p.put("steps[1].minutes", "40");
		p.put("steps[2].setup", "rest");
		p.put("steps[2].minutes", "5");
		for (int i = 0; i < overrides.length; i += 2) {
			p.put(overrides[i], overrides[i + 1]);
		}
		p.forEach(r::param);
		return r;
	}

	@Test
	void shouldPlanInStepsWithATimelineAndBands() throws Exception {
		mvc.perform(searOvenRest(get("/plan")))
			.andExpect(status().isOk())
			.andExpect(model().attributeExists("report"))
			.andExpect(content().string(containsString("id=\"timeline\"")))
			.andExpect(content().string(containsString("Into the oven at 180\u00a0°C")))
			.andExpect(content().string(containsString("Pull at 52\u00a0°C core")))
			.andExpect(content().string(containsString("Out to rest in 25\u00a0°C air")))
			.andExpect(content().string(containsString("&quot;steps&quot;:[{")))
			// the risk map is for one setup: not offered for a plan in steps
			.andExpect(content().string(not(containsString("id=\"risk-map-link\""))));
	}

	/**
	 * 52 °C is 125.6 °F (°F = °C × 9/5 + 32, NIST SP 811 §B.9); typed in °C, shown in °F
	 * after the switch.
	 */
	@Test
	void shouldKeepTheCoreTemperaturesTypedInCelsiusOnAFahrenheitPage() throws Exception {
		String page = mvc.perform(searOvenRest(get("/plan")).cookie(new Cookie("crustplan-units", "F")))
			.andExpect(status().isOk())
			.andReturn()
			.getResponse()
			.getContentAsString();
		assertThat(page).contains("Pull at 126\u00a0°F core").contains("value=\"125.6\"");
		// the form and the report; the header's °C/°F switch names both units
		assertThat(page.substring(page.indexOf("<h1>Plan a cook</h1>"))).doesNotContain("°C");
	}

	@Test
	void shouldSaveAPlanWithItsStepsAndShowItAgain() throws Exception {
		MvcResult r = mvc.perform(searOvenRest(post("/plans")).with(csrf()).param("name", "Steak in steps, test"))
			.andExpect(status().is3xxRedirection())
			.andReturn();
		long id = Long.parseLong(r.getResponse().getRedirectedUrl().replace("/plans/", ""));
		SavedPlan saved = plans.findById(id).orElseThrow();
		assertThat(saved.getSetupName()).isEqualTo("Plancha, high → Fan oven, dry, roast finish → Rest");
		assertThat(saved.getInputsJson()).contains("\"steps\":[").contains("\"coreTargetC\":52.0");
		mvc.perform(get("/plans/{id}", id))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Pull at 52\u00a0°C core")));
	}

	/**
	 * A plan saved before steps existed has no steps or core target in its JSON: it reads
	 * as one setup.
	 */
	@Test
	void shouldStillShowARoundOnePlan() throws Exception {
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", String.valueOf(demo.surface("Chips, 10 mm, blanched")))
				.param("setupId", String.valueOf(demo.setup("Fryer, chips")))
				.param("targetStage", "golden")
				.param("name", "Round one"))
			.andReturn();
		SavedPlan now = plans.findById(Long.parseLong(r.getResponse().getRedirectedUrl().replace("/plans/", "")))
			.orElseThrow();
		String roundOne = now.getInputsJson().replace(",\"steps\":null", "").replace(",\"coreTargetC\":null", "");
		assertThat(roundOne).doesNotContain("steps").doesNotContain("coreTargetC");
		long old = plans.save(new SavedPlan("Round one, old JSON", "s", "t", "Golden", roundOne, true, 60.0, "chef"))
			.getId();
		mvc.perform(get("/plans/{id}", old))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"time-to-target\"")))
			.andExpect(content().string(not(containsString("id=\"timeline\""))));
	}

	@ParameterizedTest
	@ValueSource(strings = { "Thick steak: sear, oven to 52 °C, rest", "Chips: blanch, rest, finish",
			"Sourdough: steam, then dry bake", "Steak: sear both sides, butter baste" })
	void shouldShowEachDemoPlanInSteps(String name) throws Exception {
		mvc.perform(get("/plans")).andExpect(content().string(containsString(name)));
		mvc.perform(get("/plans/{id}", demo.plan(name)))
			.andExpect(status().isOk())
			.andExpect(content().string(not(containsString("role=\"alert\""))))
			.andExpect(content().string(containsString("id=\"timeline\"")));
	}

	@Test
	void shouldNameABadStepFieldByItsStepNumber() throws Exception {
		mvc.perform(searOvenRest(get("/plan"), "steps[1].minutes", "lots"))
			.andExpect(status().isOk())
			.andExpect(model().attributeDoesNotExist("report"))
			.andExpect(content().string(containsString("Step 2, minutes: must be a number")));
		mvc.perform(searOvenRest(get("/plan"), "steps[2].minutes", "-4"))
			.andExpect(status().isOk())
			.andExpect(model().attributeDoesNotExist("report"))
			.andExpect(content().string(containsString("Step 3 (Rest), minutes:")));
	}

}
