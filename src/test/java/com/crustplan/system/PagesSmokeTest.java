package com.crustplan.system;

import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;

@CrustplanTest
class PagesSmokeTest {

	@Autowired
	MockMvc mvc;

	@Test
	@WithMockUser(roles = "CHEF")
	void shouldRenderEveryListPage() throws Exception {
		for (String p : new String[] { "/", "/surfaces", "/setups", "/plans", "/plan", "/model", "/signin", "/surfaces/new", "/setups/new", "/surfaces/1", "/surfaces/1/edit", "/plan?surfaceId=4&setupId=6&targetStage=golden" }) {
			mvc.perform(get(p)).andExpect(status().isOk());
		}
	}

}
