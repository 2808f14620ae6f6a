package com.crustplan.surface;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.engine.food.FoodCategory;

/**
 * Switching a surface's category refills its composition (the server's refill button, for
 * pages without script), and the surface page warns when asparagine or sugar is far from
 * the category's typical value.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class SurfaceCategorySwitchTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SurfaceService surfaces;

	@Test
	void shouldRefillFromTheNewCategoryWithoutSaving() throws Exception {
		long before = surfaces.count();
		// a red-meat surface switched to potato, still carrying meat's 50 mg/kg
		MvcResult r = mvc
			.perform(SurfacePagesTest.potato("/surfaces/new", "asparagineMgPerKg", "50", "waterPct", "72", "proteinPct",
					"21", "fatPct", "5", "reducingSugarPct", "0.1", "starchPct", "0", "sucrosePct", "0", "fibrePct",
					"0", "ashPct", "1.1", "product", "meat", "refill", "category"))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/form"))
			.andExpect(content().string(containsString("Filled in the typical values of")))
			.andReturn();
		SurfaceForm form = (SurfaceForm) r.getModelAndView().getModel().get("form");
		assertThat(form.asparagineMgPerKg()).isEqualTo(FoodCategory.POTATO.defaultAsparagineMgPerKg());
		assertThat(form.waterPct()).isEqualTo(FoodCategory.POTATO.defaultComposition().waterPct());
		assertThat(form.name()).isEqualTo("Test wedges");
		// meat is not a potato product: back to the category's usual one
		assertThat(form.product()).isEmpty();
		assertThat(surfaces.count()).isEqualTo(before);
	}

	@Test
	void shouldWarnOnTheFormWhenAsparagineIsFarFromTheCategory() throws Exception {
		mvc.perform(SurfacePagesTest.potato("/surfaces/new", "asparagineMgPerKg", "50", "name", ""))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"atypical\"")))
			.andExpect(content().string(containsString("Free asparagine 50\u00a0mg/kg is far below")));
	}

	@Test
	void shouldWarnOnTheSurfacePageAndKeepThePretreatment() throws Exception {
		MvcResult r = mvc
			.perform(SurfacePagesTest.potato("/surfaces/new", "asparagineMgPerKg", "50", "pretreatment", "blanched"))
			.andExpect(status().is3xxRedirection())
			.andReturn();
		mvc.perform(get(r.getResponse().getRedirectedUrl()))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"atypical\"")))
			.andExpect(content().string(containsString("blanched or parboiled in hot water</span> before cooking")));
	}

	@Test
	void shouldNotWarnForTypicalValues() throws Exception {
		mvc.perform(get("/surfaces/" + demo.surface("Chips, 10 mm, blanched")))
			.andExpect(status().isOk())
			.andExpect(content().string(not(containsString("id=\"atypical\""))));
	}

	@Test
	void shouldKeepThePretreatmentSentThroughTheApi() throws Exception {
		String blanched = SurfaceApiTest.WEDGES.replace("\"notes\": \"skin on, blanched\",",
				"\"notes\": \"skin on\", \"pretreatment\": \"blanched\",");
		mvc.perform(SurfaceApiTest.save(blanched)
			.with(org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors
				.httpBasic("chef", "chef-demo")))
			.andExpect(status().isCreated())
			.andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath("$.pretreatment")
				.value("blanched"));
		mvc.perform(SurfaceApiTest.save(blanched.replace("\"blanched\",", "\"fried\","))
			.with(org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors
				.httpBasic("chef", "chef-demo")))
			.andExpect(status().isBadRequest())
			.andExpect(org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath("$.errors[0].field")
				.value("pretreatment"));
	}

	@Test
	void shouldRefuseAnUnknownPretreatmentNamingTheField() throws Exception {
		mvc.perform(SurfacePagesTest.potato("/surfaces/new", "pretreatment", "fried twice"))
			.andExpect(status().isOk())
			.andExpect(model().attributeHasFieldErrors("form", "pretreatment"));
	}

}
