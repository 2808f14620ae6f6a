package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrlPattern;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.engine.assessment.Mitigations;

/**
 * A saved plan can be acted on (re-run, edit, copy) and a change that lowers acrylamide
 * opens the plan with it applied.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class PlanActionsPagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SavedPlanRepository plans;

	@Autowired
	SavedPlanService saved;

	String chips() {
		return String.valueOf(demo.surface("Chips, 10 mm, blanched"));
	}

	String fryer() {
		return String.valueOf(demo.setup("Fryer, chips"));
	}

	long savedChips(String name) throws Exception {
		MvcResult r = mvc
			.perform(post("/plans").with(csrf())
				.param("surfaceId", chips())
				.param("setupId", fryer())
				.param("targetStage", "golden")
				.param("name", name))
			.andExpect(redirectedUrlPattern("/plans/*"))
			.andReturn();
		return Long.parseLong(r.getResponse().getRedirectedUrl().replace("/plans/", ""));
	}

	@Test
	void shouldListSetupTargetTimeCoreAndZone() throws Exception {
		long id = savedChips("List chips");
		SavedPlan p = saved.get(id);
		assertThat(p.getCoreAtTargetC()).isNotNull();
		assertThat(p.getAcrylamideZone()).isIn("low", "elevated", "high");
		mvc.perform(get("/plans"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Core at target")))
			.andExpect(content().string(containsString("class=\"zone-tag")))
			.andExpect(content().string(containsString("Fryer, chips")));
	}

	@Test
	void shouldOfferReRunEditAndCopyOnASavedPlan() throws Exception {
		long id = savedChips("Actions chips");
		mvc.perform(get("/plans/" + id))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"rerun\"")))
			.andExpect(content().string(containsString("/plans/" + id + "/edit")))
			.andExpect(content().string(containsString("/plans/" + id + "/copy")))
			.andExpect(content().string(containsString("/plans/" + id + "/series.csv")))
			// the changes table plans from the saved plan too
			.andExpect(content().string(containsString("Plan with this change")))
			// saved just now: today's model gives the same figures
			.andExpect(content().string(not(containsString("id=\"since-saved\""))));
	}

	@Test
	void shouldSayWhatChangedWhenReRun() throws Exception {
		long id = savedChips("Rerun chips");
		// the plan as if saved by an older model: a minute faster and 5 K cooler at the
		// core
		SavedPlan p = plans.findById(id).orElseThrow();
		double time = p.getTimeToTargetS();
		setField(p, "timeToTargetS", time - 60);
		setField(p, "coreAtTargetC", p.getCoreAtTargetC() - 5);
		plans.save(p);
		mvc.perform(get("/plans/" + id))
			.andExpect(content().string(containsString("id=\"since-saved\"")))
			.andExpect(content()
				.string(containsString("time to target " + com.crustplan.system.Formats.duration(time - 60))));
		mvc.perform(post("/plans/" + id + "/rerun").with(csrf()))
			.andExpect(redirectedUrl("/plans/" + id))
			.andExpect(flash().attribute("message", containsString("→ " + com.crustplan.system.Formats.duration(time))))
			.andExpect(flash().attribute("message", containsString("core at target")));
		assertThat(saved.get(id).getTimeToTargetS()).isEqualTo(time, org.assertj.core.api.Assertions.within(1.0));
	}

	@Test
	void shouldOpenEditAndCopyAsThePlanFormFilledIn() throws Exception {
		long id = savedChips("Edit chips");
		String edit = mvc.perform(get("/plans/" + id + "/edit"))
			.andExpect(status().is3xxRedirection())
			.andReturn()
			.getResponse()
			.getRedirectedUrl();
		assertThat(edit).startsWith("/plan?")
			.contains("surfaceId=" + chips())
			.contains("setupId=" + fryer())
			.contains("targetStage=golden")
			.contains("editing=" + id);
		mvc.perform(get(edit))
			.andExpect(status().isOk())
			.andExpect(model().attributeExists("report", "editing"))
			.andExpect(content().string(containsString("action=\"/plans/" + id + "/edit\"")));
		// saving the edit keeps the plan's id and changes its target
		mvc.perform(post("/plans/" + id + "/edit").with(csrf())
			.param("surfaceId", chips())
			.param("setupId", fryer())
			.param("targetStage", "pale")
			.param("name", "Edit chips, lighter")
			.param("version", String.valueOf(saved.get(id).getVersion()))).andExpect(redirectedUrl("/plans/" + id));
		assertThat(saved.get(id).getName()).isEqualTo("Edit chips, lighter");
		String copy = mvc.perform(get("/plans/" + id + "/copy")).andReturn().getResponse().getRedirectedUrl();
		assertThat(copy).contains("name=Copy%20of%20Edit%20chips").doesNotContain("editing=");
	}

	@Test
	void shouldRefuseAStaleEditKeepingTheForm() throws Exception {
		long id = savedChips("Stale chips");
		mvc.perform(post("/plans/" + id + "/edit").with(csrf())
			.param("surfaceId", chips())
			.param("setupId", fryer())
			.param("targetStage", "golden")
			.param("name", "Stale chips 2")
			.param("version", "99"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Someone else changed this plan")));
		assertThat(saved.get(id).getName()).isEqualTo("Stale chips");
	}

	@Test
	void shouldPlanWithAChangeInOneClickAndNotOfferItAgain() throws Exception {
		String page = mvc
			.perform(get("/plan").param("surfaceId", chips()).param("setupId", fryer()).param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andReturn()
			.getResponse()
			.getContentAsString();
		assertThat(page).contains("Plan with this change").contains("changes=ASPARAGINASE");
		// the demo chips are blanched: blanching and soaking are not offered again
		assertThat(page).doesNotContain("data-code=\"BLANCH\"").doesNotContain("data-code=\"SOAK\"");
		// times as the headline words them, never decimal minutes
		assertThat(page).containsPattern(
				"\\d+\u00a0min\u00a0\\d\\d\u00a0s</span> → <span class=\"nowrap\">\\d+\u00a0min\u00a0\\d\\d\u00a0s");
		mvc.perform(get("/plan").param("surfaceId", chips())
			.param("setupId", fryer())
			.param("targetStage", "golden")
			.param("changes", "ASPARAGINASE"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"applied-changes\"")))
			.andExpect(content().string(containsString("treated with asparaginase")))
			.andExpect(content().string(containsString("id=\"without-changes\"")))
			.andExpect(content().string(not(containsString("data-code=\"ASPARAGINASE\""))));
	}

	@Test
	void shouldRefuseAnUnknownChangeNamingIt() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", chips())
			.param("setupId", fryer())
			.param("targetStage", "golden")
			.param("changes", "FRY_IN_BUTTER"))
			.andExpect(status().isOk())
			.andExpect(model().attributeDoesNotExist("report"))
			.andExpect(content().string(containsString("Changes: &#39;FRY_IN_BUTTER&#39; is not a change")));
	}

	@Test
	void shouldOfferBrowningAdviceNotAnEuMeasureForRoastPotatoes() throws Exception {
		String roast = String.valueOf(demo.surface("Roast potatoes, parboiled with bicarbonate"));
		String oven = String.valueOf(demo.setup("Fan oven, dry, roast finish"));
		mvc.perform(get("/plan").param("surfaceId", roast).param("setupId", oven).param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Browning advice")))
			.andExpect(content().string(containsString("No EU benchmark level applies to this product")))
			// roasted, not fried: no frying words, and parboiled potatoes are not offered
			// blanching
			.andExpect(content().string(not(containsString("before frying"))))
			.andExpect(content().string(not(containsString("data-code=\"BLANCH\""))));
	}

	@Test
	@WithMockUser(username = "cook", roles = "COOK")
	void shouldLeaveEditingAndReRunningToAChef() throws Exception {
		long id = plans.findAll().get(0).getId();
		mvc.perform(get("/plans/" + id + "/edit")).andExpect(status().isForbidden());
		mvc.perform(get("/plans/" + id + "/copy")).andExpect(status().isForbidden());
		mvc.perform(post("/plans/" + id + "/rerun").with(csrf())).andExpect(status().isForbidden());
		// the series is for everyone who may see the plan
		mvc.perform(get("/plans/" + id + "/series.csv")).andExpect(status().isOk());
	}

	@Test
	void everyPlannableChangeHasAWayToApplyIt() {
		assertThat(Mitigations.PLANNABLE).containsAll(List.of("SOAK", "BLANCH", "LOWER_TEMPERATURE"));
	}

	static void setField(Object o, String name, Object value) throws Exception {
		java.lang.reflect.Field f = o.getClass().getDeclaredField(name);
		f.setAccessible(true);
		f.set(o, value);
	}

}
