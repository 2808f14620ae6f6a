package com.crustplan.plan;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * The acrylamide card and risk map appear only where acrylamide matters: starchy foods
 * (EFSA CONTAM Panel 2015 opinion on acrylamide in food) or a product with a benchmark
 * level of Regulation (EU) 2017/2158, Annex IV.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class AcrylamideCardPagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Test
	void meatPlanHasNoAcrylamideCardNorRiskMap() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Sirloin steak, 30 mm, patted dry")))
			.param("setupId", String.valueOf(demo.setup("Plancha, high")))
			.param("targetStage", "browned"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"time-to-target\"")))
			.andExpect(content().string(not(containsString("id=\"acrylamide\""))))
			.andExpect(content().string(not(containsString("id=\"risk-map-link\""))));
	}

	@Test
	void chipsPlanHasTheAcrylamideCard() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Chips, 10 mm, blanched")))
			.param("setupId", String.valueOf(demo.setup("Fryer, chips")))
			.param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"acrylamide\"")))
			.andExpect(content().string(containsString("id=\"risk-map-link\"")));
	}

}
