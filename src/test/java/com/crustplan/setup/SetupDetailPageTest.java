package com.crustplan.setup;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/** A setup has its own page with a way to plan with it; the list links to it. */
@CrustplanTest
@WithMockUser(username = "cook", roles = "COOK")
class SetupDetailPageTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Test
	void shouldShowASetupWithPlanWithThisSetup() throws Exception {
		long id = demo.setup("Fryer, chips");
		mvc.perform(get("/setups/" + id))
			.andExpect(status().isOk())
			.andExpect(view().name("setup/show"))
			.andExpect(content().string(containsString("Plan with this setup")))
			.andExpect(content().string(containsString("/plan?setupId=" + id)))
			// a cook sees no edit
			.andExpect(content().string(not(containsString("/setups/" + id + "/edit"))));
	}

	@Test
	void shouldLinkEachSetupOnTheListToItsPage() throws Exception {
		long id = demo.setup("Fryer, chips");
		mvc.perform(get("/setups"))
			.andExpect(content().string(containsString("href=\"/setups/" + id + "\"")))
			.andExpect(content().string(containsString("/setups/" + id + ".json")));
	}

	@Test
	void shouldAnswerAMissingSetupWithNotFound() throws Exception {
		mvc.perform(get("/setups/999999")).andExpect(status().isNotFound());
	}

	@Test
	void shouldNotRepeatATemperatureAlreadyInTheSetupsName() throws Exception {
		// "Fryer, chips" has no temperature in its name: the picker adds it once
		String page = mvc.perform(get("/plan")).andReturn().getResponse().getContentAsString();
		org.assertj.core.api.Assertions.assertThat(page).doesNotContainPattern("(\\d+ °C) · \\1");
	}

}
