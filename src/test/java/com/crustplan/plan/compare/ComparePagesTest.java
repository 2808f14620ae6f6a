package com.crustplan.plan.compare;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import java.util.regex.Pattern;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.SavedPlanService;
import com.crustplan.system.Formats;

@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class ComparePagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SavedPlanService saved;

	@Autowired
	PlanService planner;

	long at175;

	long at180;

	long save(String setup, String name) throws Exception {
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", String.valueOf(demo.surface("Chips, 10 mm, blanched")))
				.param("setupId", String.valueOf(demo.setup(setup)))
				.param("targetStage", "golden")
				.param("horizonMinutes", "30")
				.param("name", name))
			.andReturn();
		String url = r.getResponse().getRedirectedUrl();
		return Long.parseLong(url.substring(url.lastIndexOf('/') + 1));
	}

	@BeforeEach
	void plans() throws Exception {
		at175 = save("Fryer, chips", "Chips at 175");
		at180 = save("Fryer, finishing", "Chips at 180");
	}

	/**
	 * No decimal minutes anywhere: times read as "m min s s" (the "7.7 → 10.7").
	 */
	static final Pattern DECIMAL_MINUTES = Pattern.compile("\\d+\\.\\d+\\s*(min|→)");

	@Test
	void shouldCompareTwoPlansWithDifferencesInWordsAgainstTheFirst() throws Exception {
		MvcResult r = mvc.perform(get("/plans/compare").param("ids", at175 + "," + at180))
			.andExpect(status().isOk())
			.andExpect(view().name("plan/compare"))
			.andExpect(model().attributeExists("comparison", "chartJson"))
			.andExpect(content().string(containsString("Chips at 175")))
			.andExpect(content().string(containsString("Chips at 180")))
			.andExpect(content().string(containsString("Against the EU benchmark")))
			.andExpect(content().string(containsString("id=\"chart-compare-core\"")))
			.andReturn();
		String html = r.getResponse().getContentAsString();
		assertThat(DECIMAL_MINUTES.matcher(html).find()).as("decimal minutes on the page").isFalse();
		Comparison c = (Comparison) r.getModelAndView().getModel().get("comparison");
		assertThat(c.entries()).hasSize(2);
		// the words say what the two plans' own figures say: hotter oil, sooner golden
		double t175 = c.entries().get(0).report().timeToTargetS();
		double t180 = c.entries().get(1).report().timeToTargetS();
		assertThat(t180).isLessThan(t175);
		String diff = c.entries().get(1).difference();
		assertThat(diff).startsWith(Formats.duration(t175 - t180) + " sooner")
			.containsPattern("\\d+ % (more|less) acrylamide|about the same acrylamide");
		assertThat(html).contains(diff);
		assertThat((String) r.getModelAndView().getModel().get("chartJson")).contains("Chips at 175")
			.contains("\"core\"");
	}

	/**
	 * In °F the core difference is a difference: 1 K = 1.8 °F (NIST SP 811, §B.9), not a
	 * converted temperature; the first plan is the reference, so the order turns "sooner"
	 * into "later".
	 */
	@Test
	void shouldSayTheDifferencesInFahrenheitAndAgainstWhicheverPlanIsFirst() throws Exception {
		MvcResult r = mvc
			.perform(get("/plans/compare").param("ids", at180 + "," + at175)
				.cookie(new jakarta.servlet.http.Cookie("crustplan-units", "F")))
			.andExpect(status().isOk())
			.andReturn();
		Comparison c = (Comparison) r.getModelAndView().getModel().get("comparison");
		String diff = c.entries().get(1).difference();
		double dt = c.entries().get(1).report().timeToTargetS() - c.entries().get(0).report().timeToTargetS();
		assertThat(diff).startsWith(Formats.duration(dt) + " later").doesNotContain("°C");
		double dc = c.entries().get(1).report().coreTemperatureAtTargetC()
				- c.entries().get(0).report().coreTemperatureAtTargetC();
		if (Math.abs(dc) >= CompareService.SAME_CORE_K) {
			assertThat(diff).contains("core " + Formats.number(Math.abs(dc) * 1.8, 0) + "\u00a0°F");
		}
		assertThat(r.getResponse().getContentAsString()).contains("°F").doesNotContain(" °C<");
	}

	@Test
	void shouldTakeTheListsCheckboxesAsRepeatedIds() throws Exception {
		mvc.perform(get("/plans/compare").param("ids", String.valueOf(at180), String.valueOf(at175)))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Differences are said against the first")));
	}

	@Test
	void shouldOfferCheckboxesAndACompareButtonOnTheSavedPlansList() throws Exception {
		mvc.perform(get("/plans"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"compare-form\"")))
			.andExpect(content().string(containsString("name=\"ids\" form=\"compare-form\" value=\"" + at175 + "\"")));
	}

	/**
	 * A steak and chips: acrylamide is the chips' concern only (EFSA CONTAM Panel 2015:
	 * it forms in starchy foods), so the steak's column says so instead of a zero.
	 */
	@Test
	void shouldSayAcrylamideIsNoConcernForTheMeatOfAMixedComparison() throws Exception {
		long steak = demo.plan("Thick steak: sear, oven to 52 °C, rest");
		mvc.perform(get("/plans/compare").param("ids", steak + "," + at175))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("not a concern here")))
			.andExpect(content().string(not(containsString("Exception"))));
	}

	@Nested
	class Refused {

		@Test
		void shouldAskForTwoToFourPlans() throws Exception {
			mvc.perform(get("/plans/compare").param("ids", String.valueOf(at175)))
				.andExpect(status().isBadRequest())
				.andExpect(
						content().string(containsString("Choose 2 to 4 different saved plans to compare (1 chosen)")));
			mvc.perform(get("/plans/compare"))
				.andExpect(status().isBadRequest())
				.andExpect(content().string(containsString("Choose 2 to 4 saved plans")));
			mvc.perform(get("/plans/compare").param("ids", "1,2,3,4,5"))
				.andExpect(status().isBadRequest())
				.andExpect(content().string(containsString("(5 chosen)")));
			// the same plan twice is one plan
			mvc.perform(get("/plans/compare").param("ids", at175 + "," + at175))
				.andExpect(status().isBadRequest())
				.andExpect(content().string(containsString("(1 chosen)")));
		}

		/**
		 * The one kitchen of an installation holds every plan: an id of another kitchen
		 * is an unknown id here.
		 */
		@Test
		void shouldNameUnknownPlansAndNonNumbers() throws Exception {
			mvc.perform(get("/plans/compare").param("ids", at175 + ",987654"))
				.andExpect(status().isBadRequest())
				.andExpect(content().string(containsString("There is no saved plan number 987654 in this kitchen")));
			mvc.perform(get("/plans/compare").param("ids", at175 + ",chips"))
				.andExpect(status().isBadRequest())
				.andExpect(content().string(containsString("is not a plan number")));
		}

	}

}
