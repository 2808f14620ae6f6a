package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import jakarta.servlet.http.Cookie;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class PlanPagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SavedPlanRepository plans;

	String chips() {
		return String.valueOf(demo.surface("Chips, 10 mm, blanched"));
	}

	String fryer() {
		return String.valueOf(demo.setup("Fryer, chips"));
	}

	@Test
	void shouldShowThePickerWithoutAPlan() throws Exception {
		mvc.perform(get("/plan"))
			.andExpect(status().isOk())
			.andExpect(view().name("plan/plan"))
			.andExpect(model().attributeDoesNotExist("report"))
			.andExpect(content().string(containsString("Chips, 10 mm, blanched")));
	}

	@Test
	void shouldComputeAPlanWithChartsSwatchesAndCautions() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andExpect(model().attributeExists("report", "chartJson"))
			.andExpect(content().string(containsString("id=\"time-to-target\"")))
			.andExpect(content().string(containsString("data-plan=")))
			.andExpect(content().string(containsString("class=\"swatch\"")))
			// the cautions that apply to chips: IARC group and hot oil; the FDA Food Code
			// 2022 core figures (3-401.11) are for meat, poultry and fish, so chips defer
			// to the local code without them (they were shown on every plan before)
			.andExpect(content().string(containsString("Group 2A")))
			.andExpect(content().string(not(containsString("FDA Food Code 2022"))))
			.andExpect(content().string(containsString("local food code and licensed practice")))
			.andExpect(content().string(containsString("Hot oil")))
			// the acrylamide section: the estimate where the engine gives one, otherwise
			// it says so
			.andExpect(content().string(org.hamcrest.Matchers.anyOf(containsString("Estimate not available"),
					containsString("µg/kg</dd>"))));
	}

	@Test
	void shouldShowTheWholeReportInFahrenheitWithoutACelsiusFigure() throws Exception {
		// the demo's 175 °C fryer: the below-175 °C measure of Regulation (EU) 2017/2158,
		// Annex II, and the
		// FDA Food Code figures in the cautions are all shown in °F (°F = °C × 9/5 + 32,
		// NIST SP 811 §B.9)
		String page = mvc
			.perform(get("/plan").param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.cookie(new Cookie("crustplan-units", "F")))
			.andExpect(status().isOk())
			.andReturn()
			.getResponse()
			.getContentAsString()
			.replace('\u00a0', ' ');
		String report = page.substring(page.indexOf("id=\"report\""));
		assertThat(report).contains("°F", "347 °F").doesNotContain("°C");
	}

	@Test
	void shouldShowTheFoodCodeCautionForSteakInItsOwnFahrenheitFiguresWithoutAnAcrylamideCaution() throws Exception {
		// FDA Food Code 2022, 3-401.11: the code's own °F figures (155 °F for minced, not
		// 154 °F converted from 68 °C); acrylamide forms in starchy foods (EFSA CONTAM
		// Panel 2015), not in a steak
		String page = mvc
			.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Sirloin steak, 30 mm, patted dry")))
				.param("setupId", String.valueOf(demo.setup("Plancha, high")))
				.param("targetStage", "browned")
				.cookie(new Cookie("crustplan-units", "F")))
			.andExpect(status().isOk())
			.andReturn()
			.getResponse()
			.getContentAsString()
			.replace('\u00a0', ' ');
		String report = page.substring(page.indexOf("id=\"report\""));
		assertThat(report).contains("145 °F for 15 s", "155 °F for 17 s", "FDA Food Code 2022", "Hot pan")
			.doesNotContain("°C", "154 °F", "Group 2A", "Hot oil");
	}

	@Test
	void shouldDrawTheRiskMapWhoseCellsAreSingleRuns() throws Exception {
		// the fryer rows run 150–190 °C (the common frying range) plus the setup's own
		// temperature
		RiskMapView map = (RiskMapView) mvc
			.perform(get("/plan/risk-map").param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andExpect(view().name("plan/risk"))
			// Commission Regulation (EU) 2017/2158, Annex IV: French fries 500 µg/kg
			.andExpect(content().string(containsString("500\u00a0µg/kg")))
			.andExpect(content().string(containsString("risk-target")))
			.andExpect(content().string(containsString("IARC")))
			.andReturn()
			.getModelAndView()
			.getModel()
			.get("map");
		assertThat(map.rows()).hasSizeGreaterThanOrEqualTo(9);
		assertThat(map.rows()).allSatisfy(r -> assertThat(r.cells()).hasSize(map.timesS().size()));
		// hotter oil reaches the colour sooner (each row is its own run)
		assertThat(map.rows().get(map.rows().size() - 1).targetTimeS()).isLessThan(map.rows().get(0).targetTimeS());
	}

	@Test
	void shouldShowTheWaterAndTheFryingOilInTheChipsAtTheTarget() throws Exception {
		// oil follows the water a fry loses (Gamble, Rice & Selman 1987): a fried chip
		// reports both, g per 100 g
		mvc.perform(get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetStage", "golden"))
			.andExpect(content().string(containsString("id=\"water-at-target\"")))
			.andExpect(content().string(containsString("Water in the whole piece at the target:")))
			.andExpect(content().string(containsString("Frying oil taken up by the target:")))
			// the basis of both figures: the piece's shape and size, and the fried piece
			.andExpect(content().string(containsString("g per 100 g of the fried piece")))
			.andExpect(content().string(containsString("strip, 10\u00a0mm wide")))
			// the fryer's assumptions no longer say oil uptake is not modelled
			.andExpect(content().string(not(containsString("Oil taken up by the crust is not modelled"))));
	}

	@Test
	void shouldSayARoastPotatoIsACube() throws Exception {
		mvc.perform(get("/plan")
			.param("surfaceId", String.valueOf(demo.surface("Roast potatoes, parboiled with bicarbonate")))
			.param("setupId", String.valueOf(demo.setup("Combi oven, dry fan")))
			.param("targetStage", "golden")).andExpect(content().string(containsString("cube, 35\u00a0mm edge")));
	}

	@Test
	void shouldLinkThePlanToItsRiskMap() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetStage", "golden"))
			.andExpect(content().string(containsString("/plan/risk-map?surfaceId=")));
	}

	@Test
	void shouldAskForASurfaceAndSetupBeforeDrawingARiskMap() throws Exception {
		mvc.perform(get("/plan/risk-map"))
			.andExpect(status().isOk())
			.andExpect(view().name("plan/plan"))
			.andExpect(content().string(containsString("choose a surface and a setup first")));
	}

	@Test
	void shouldShowDonenessWarningsOnThePlanPage() throws Exception {
		// the demo chicken thigh in the demo's combi oven: golden with the core at the
		// boil, past the 80 °C at
		// which poultry dries (common practice)
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Chicken thigh, skin on")))
			.param("setupId", String.valueOf(demo.setup("Combi oven, dry fan")))
			.param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("data-code=\"core-past-juiciness\"")))
			.andExpect(content().string(containsString("poultry breast dries past about 80\u00a0°C")));
	}

	@Test
	void shouldSayTheTurningDefaultBesideTheField() throws Exception {
		mvc.perform(get("/setups/new"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("new setups turn every 60 s")));
	}

	@Test
	void shouldPlanToALightnessTarget() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetLightness", "64"))
			.andExpect(status().isOk())
			.andExpect(model().attributeExists("report"))
			.andExpect(content().string(containsString("L* 64")));
	}

	@Test
	void shouldSaveAPlanAndOpenItLater() throws Exception {
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.param("horizonMinutes", "30")
				.param("name", "Friday chips"))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrlPattern("/plans/*"))
			.andExpect(flash().attribute("message", containsString("Friday chips")))
			.andReturn();
		mvc.perform(get(r.getResponse().getRedirectedUrl()))
			.andExpect(status().isOk())
			.andExpect(view().name("plan/show"))
			.andExpect(content().string(containsString("Friday chips")))
			.andExpect(content().string(containsString("data-plan=")));
		mvc.perform(get("/plans"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Friday chips")));
	}

	@Test
	void shouldDeleteASavedPlanAfterConfirmation() throws Exception {
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.param("name", "Plan to delete"))
			.andReturn();
		String url = r.getResponse().getRedirectedUrl();
		long id = Long.parseLong(url.substring(url.lastIndexOf('/') + 1));
		mvc.perform(get("/plans/{id}/delete", id)).andExpect(view().name("plan/delete"));
		mvc.perform(post("/plans/{id}/delete", id).with(csrf())).andExpect(status().is3xxRedirection());
		assertThat(plans.findById(id)).isEmpty();
		mvc.perform(get("/plans/{id}", id)).andExpect(status().isNotFound());
	}

	@Test
	void shouldShowASavedPlanTheModelNoLongerAcceptsWithoutFailing() throws Exception {
		long unreadable = plans.save(new SavedPlan("Unreadable", "s", "t", "Golden", "{not json", true, 60.0, "chef"))
			.getId();
		mvc.perform(get("/plans/{id}", unreadable))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("cannot be read")));
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.param("name", "Soon too thick"))
			.andReturn();
		SavedPlan good = plans.findById(Long.parseLong(r.getResponse().getRedirectedUrl().replace("/plans/", "")))
			.orElseThrow();
		// the same inputs with a thickness beyond the model's 200 mm
		String json = good.getInputsJson().replace("\"thicknessMm\":10.0", "\"thicknessMm\":500.0");
		assertThat(json).contains("500.0");
		long stale = plans.save(new SavedPlan("Too thick", "s", "t", "Golden", json, true, 60.0, "chef")).getId();
		mvc.perform(get("/plans/{id}", stale))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("thicknessMm: must be a number from 0.5 to 200")));
	}

	@Nested
	class BadInput {

		@Test
		void shouldRejectAStageOfAnotherCategory() throws Exception {
			mvc.perform(
					get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetStage", "mahogany"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "targetStage"))
				.andExpect(model().attributeDoesNotExist("report"));
		}

		@Test
		void shouldRejectALightnessOutsideTheScale() throws Exception {
			mvc.perform(
					get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetLightness", "150"))
				.andExpect(model().attributeHasFieldErrors("form", "targetLightness"));
			mvc.perform(
					get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetLightness", "NaN"))
				.andExpect(model().attributeHasFieldErrorCode("form", "targetLightness", "typeMismatch"));
		}

		@Test
		void shouldRejectAMissingSurfaceAndAnUnreadableId() throws Exception {
			mvc.perform(
					get("/plan").param("surfaceId", "987654").param("setupId", fryer()).param("targetStage", "golden"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "surfaceId"));
			mvc.perform(get("/plan").param("surfaceId", "abc").param("setupId", fryer()))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrorCode("form", "surfaceId", "typeMismatch"));
		}

		@Test
		void shouldAimANoTargetPlanAtTheCategorysMiddleStageAndRejectABlankPlanName() throws Exception {
			// kitchen words first: no target given means the category's usual stage
			// (golden for chips), not an L* to enter
			mvc.perform(get("/plan").param("surfaceId", chips()).param("setupId", fryer()))
				.andExpect(model().attribute("defaultStage", "Golden"))
				.andExpect(model().attributeExists("report"));
			mvc.perform(post("/plans").with(csrf())
				.param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.param("name", ""))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "name"))
				.andExpect(content().string(containsString("give the plan a name")));
		}

		@Test
		void shouldRejectAHorizonOverSixHours() throws Exception {
			mvc.perform(get("/plan").param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.param("horizonMinutes", "1000")).andExpect(model().attributeHasFieldErrors("form", "horizonMinutes"));
		}

	}

	@Test
	void shouldLetACookPlanButNotSave() throws Exception {
		mvc.perform(get("/plan").with(user("cook").roles("COOK"))
			.param("surfaceId", chips())
			.param("setupId", fryer())
			.param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andExpect(content().string(not(containsString("Save this plan"))));
		mvc.perform(post("/plans").with(csrf())
			.with(user("cook").roles("COOK"))
			.param("surfaceId", chips())
			.param("setupId", fryer())
			.param("targetStage", "golden")
			.param("name", "cook's plan")).andExpect(status().isForbidden());
	}

}
