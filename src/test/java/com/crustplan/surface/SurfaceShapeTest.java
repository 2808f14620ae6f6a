package com.crustplan.surface;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

import com.crustplan.CrustplanTest;

/**
 * The shape of a surface through the form, the pages and both APIs: saved, shown with the
 * size named as the shape reads it, defaulted from the product or the category, and an
 * unknown shape refused naming the field and the allowed values.
 */
@CrustplanTest
class SurfaceShapeTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	SurfaceRepository surfaces;

	@Nested
	@WithMockUser(username = "chef", roles = "CHEF")
	class Form {

		@Test
		void shouldOfferTheShapesWithTheCategorysUsualOneChosen() throws Exception {
			mvc.perform(get("/surfaces/new").param("category", "potato"))
				.andExpect(status().isOk())
				.andExpect(content().string(containsString("Long strip (fries, wedges, sausage)")))
				.andExpect(content().string(containsString("Chunk or cube (roast potatoes)")))
				.andExpect(content().string(containsString("how heat reaches the middle")));
		}

		@Test
		void shouldSaveTheShapeAndShowTheSizeByItsName() throws Exception {
			MvcResult r = mvc
				.perform(SurfacePagesTest.potato("/surfaces/new", "name", "Cubed roasties", "shape", "cube",
						"thicknessMm", "35"))
				.andExpect(status().is3xxRedirection())
				.andReturn();
			String location = r.getResponse().getRedirectedUrl();
			long id = Long.parseLong(location.replace("/surfaces/", ""));
			assertThat(surfaces.findById(id).orElseThrow().getShape()).isEqualTo("cube");
			mvc.perform(get(location))
				.andExpect(status().isOk())
				.andExpect(content().string(containsString("Chunk or cube (roast potatoes)")))
				.andExpect(content().string(containsString("<dt>Edge</dt>")));
			mvc.perform(get("/surfaces")).andExpect(content().string(containsString("35\u00a0mm cube")));
			mvc.perform(get(location + "/edit"))
				.andExpect(status().isOk())
				.andExpect(content()
					.string(containsString("<option value=\"cube\" data-size=\"Edge\" selected=\"selected\"")));
		}

		@Test
		void shouldRefuseAShapeItDoesNotKnowOnTheField() throws Exception {
			long before = surfaces.count();
			mvc.perform(SurfacePagesTest.potato("/surfaces/new", "shape", "hexagon"))
				.andExpect(status().isOk())
				.andExpect(view().name("surface/form"))
				.andExpect(model().attributeHasFieldErrors("form", "shape"))
				.andExpect(content().string(containsString("not a shape; use one of [slab, strip, cube, ball]")));
			assertThat(surfaces.count()).isEqualTo(before);
		}

	}

	@Nested
	class Api {

		@Test
		void shouldSaveTheShapeSentAndDefaultItFromTheProduct() throws Exception {
			mvc.perform(post("/api/v1/surfaces").contentType(MediaType.APPLICATION_JSON)
				.content(
						"""
								{ "name": "API balls", "surface": { "category": "meat", "shape": "ball", "thicknessMm": 40 } }""")
				.with(httpBasic("chef", "chef-demo")))
				.andExpect(status().isCreated())
				.andExpect(jsonPath("$.shape").value("ball"));
			mvc.perform(post("/api/v1/surfaces").contentType(MediaType.APPLICATION_JSON)
				.content("""
						{ "name": "API roasties", "surface": { "category": "potato", "product": "roast-potato" } }""")
				.with(httpBasic("chef", "chef-demo")))
				.andExpect(status().isCreated())
				.andExpect(jsonPath("$.shape").value("cube"));
			mvc.perform(post("/api/v1/surfaces").contentType(MediaType.APPLICATION_JSON)
				.content("""
						{ "name": "API chips", "surface": { "category": "potato" } }""")
				.with(httpBasic("chef", "chef-demo")))
				.andExpect(status().isCreated())
				.andExpect(jsonPath("$.shape").value("strip"));
			mvc.perform(post("/api/v1/surfaces").contentType(MediaType.APPLICATION_JSON).content("""
					{ "name": "API steak", "surface": { "category": "meat" } }""").with(httpBasic("chef", "chef-demo")))
				.andExpect(status().isCreated())
				.andExpect(jsonPath("$.shape").value("slab"));
		}

		@Test
		void shouldRefuseAnUnknownShapeNamingTheFieldAndTheShapes() throws Exception {
			long before = surfaces.count();
			mvc.perform(post("/api/v1/surfaces").contentType(MediaType.APPLICATION_JSON)
				.content("""
						{ "name": "x", "surface": { "category": "potato", "shape": "hexagon" } }""")
				.with(httpBasic("chef", "chef-demo")))
				.andExpect(status().isBadRequest())
				.andExpect(jsonPath("$.errors[0].field").value("surface.shape"))
				.andExpect(jsonPath("$.errors[0].message").value(containsString("[slab, strip, cube, ball]")));
			assertThat(surfaces.count()).isEqualTo(before);
			mvc.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content("""
					{ "surface": { "category": "potato", "shape": 7 }, "heat": { "mode": "fryer", "temperatureC": 175 },
					  "target": { "stage": "golden" } }"""))
				.andExpect(status().isBadRequest())
				.andExpect(jsonPath("$.errors[*].field", hasItem("surface.shape")));
		}

		@Test
		void shouldPlanAStripAsAStripAndSayWhatItAssumed() throws Exception {
			mvc.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content("""
					{ "surface": { "category": "potato", "shape": "strip", "thicknessMm": 10 },
					  "heat": { "mode": "fryer", "temperatureC": 175 }, "target": { "stage": "golden" } }"""))
				.andExpect(status().isOk())
				.andExpect(jsonPath("$.reached").value(true))
				.andExpect(content().string(containsString("taken as the round strip (cylinder)")));
		}

		@Test
		void shouldListEachCategorysAndProductsUsualShape() throws Exception {
			mvc.perform(get("/api/v1/categories").with(anonymous()))
				.andExpect(status().isOk())
				.andExpect(jsonPath("$[?(@.key=='potato')].defaults.shape").value("strip"))
				.andExpect(jsonPath("$[?(@.key=='meat')].defaults.shape").value("slab"));
		}

	}

}
