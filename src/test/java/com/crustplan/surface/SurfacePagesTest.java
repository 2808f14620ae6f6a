package com.crustplan.surface;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.greaterThanOrEqualTo;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.flash;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.model;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
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
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class SurfacePagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SurfaceRepository surfaces;

	/**
	 * A valid potato surface (the category's typical composition, which sums to 100 %),
	 * with some fields replaced: {@code overrides} are name/value pairs.
	 */
	static MockHttpServletRequestBuilder potato(String url, String... overrides) {
		java.util.Map<String, String> p = new java.util.LinkedHashMap<>();
		p.put("name", "Test wedges");
		p.put("category", "potato");
		p.put("product", "");
		p.put("waterPct", "79");
		p.put("proteinPct", "2");
		p.put("fatPct", "0.1");
		p.put("reducingSugarPct", "0.4");
		p.put("sucrosePct", "0.2");
		p.put("starchPct", "15.5");
		p.put("fibrePct", "1.8");
		p.put("ashPct", "1");
		p.put("asparagineMgPerKg", "3000");
		p.put("surfaceWaterGPerM2", "20");
		p.put("thicknessMm", "15");
		p.put("ph", "");
		p.put("bicarbonateGPerKg", "0");
		p.put("acidGPerKg", "0");
		p.put("initialTemperature", "5");
		p.put("temperatureUnit", "C");
		p.put("notes", "");
		for (int i = 0; i < overrides.length; i += 2) {
			p.put(overrides[i], overrides[i + 1]);
		}
		MockHttpServletRequestBuilder b = post(url).with(csrf());
		p.forEach(b::param);
		return b;
	}

	@Test
	void shouldListTheDemoKitchensSurfaces() throws Exception {
		mvc.perform(get("/surfaces"))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/list"))
			.andExpect(model().attribute("surfaces", hasSize(greaterThanOrEqualTo(8))))
			.andExpect(content().string(containsString("Roast potatoes, parboiled with bicarbonate")))
			// labels, not enum names
			.andExpect(content().string(containsString("Poultry, skin on")));
	}

	@Test
	void shouldOfferCategoryDefaultsOnANewForm() throws Exception {
		mvc.perform(get("/surfaces/new").param("category", "bread"))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/form"))
			.andExpect(model().attribute("form", org.hamcrest.Matchers.hasToString(containsString("category=bread"))))
			.andExpect(content().string(containsString("value=\"43\"")))
			.andExpect(content().string(containsString("data-defaults")));
	}

	@Test
	void shouldCreateASurfaceAndRedirectWithAMessage() throws Exception {
		MvcResult r = mvc.perform(potato("/surfaces/new"))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrlPattern("/surfaces/*"))
			.andExpect(flash().attribute("message", containsString("Test wedges")))
			.andReturn();
		String location = r.getResponse().getRedirectedUrl();
		mvc.perform(get(location))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/show"))
			// potato's typical pH 5.8 (FDA approximate pH of foods) with no additions
			.andExpect(content().string(containsString("5.8")));
	}

	@Test
	void shouldShowComputedPhAndRemainderOnEdit() throws Exception {
		long id = demo.surface("Roast potatoes, parboiled with bicarbonate");
		mvc.perform(get("/surfaces/{id}/edit", id))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/form"))
			.andExpect(model().attribute("derived", org.hamcrest.Matchers.hasToString(containsString("ph=6.99"))))
			.andExpect(content().string(containsString("Computed pH after additions")));
	}

	@Test
	void shouldUpdateASurface() throws Exception {
		long id = surfaces.save(SavedSurface.from(SurfaceForm.defaults(com.crustplan.engine.food.FoodCategory.FISH,
				"Edit me", com.crustplan.system.TemperatureUnit.CELSIUS)))
			.getId();
		mvc.perform(potato("/surfaces/" + id + "/edit", "name", "Edited wedges", "version",
				String.valueOf(surfaces.findById(id).orElseThrow().getVersion())))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrl("/surfaces/" + id))
			.andExpect(flash().attribute("message", containsString("Edited wedges")));
		assertThat(surfaces.findById(id).orElseThrow().getName()).isEqualTo("Edited wedges");
		assertThat(surfaces.findById(id).orElseThrow().getCategory()).isEqualTo("potato");
	}

	@Test
	void shouldPrefillACopyAndSaveItAsANewSurface() throws Exception {
		long id = demo.surface("Hake fillet, skin side");
		mvc.perform(get("/surfaces/{id}/copy", id))
			.andExpect(status().isOk())
			.andExpect(model().attribute("action", "/surfaces/new"))
			.andExpect(content().string(containsString("Copy of Hake fillet, skin side")));
	}

	@Test
	void shouldAskBeforeDeletingAndThenDelete() throws Exception {
		long id = surfaces.save(SavedSurface.from(SurfaceForm.defaults(com.crustplan.engine.food.FoodCategory.MEAT,
				"Delete me", com.crustplan.system.TemperatureUnit.CELSIUS)))
			.getId();
		mvc.perform(get("/surfaces/{id}/delete", id))
			.andExpect(status().isOk())
			.andExpect(view().name("surface/delete"))
			.andExpect(content().string(containsString("Delete me")));
		mvc.perform(post("/surfaces/{id}/delete", id).with(csrf()))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrl("/surfaces"))
			.andExpect(flash().attribute("message", containsString("deleted")));
		assertThat(surfaces.findById(id)).isEmpty();
		mvc.perform(get("/surfaces/{id}", id)).andExpect(status().isNotFound());
	}

	@Test
	void shouldAnswer404ForAMissingSurface() throws Exception {
		mvc.perform(get("/surfaces/{id}", 987654)).andExpect(status().isNotFound());
		mvc.perform(get("/surfaces/{id}/edit", 987654)).andExpect(status().isNotFound());
		mvc.perform(post("/surfaces/{id}/delete", 987654).with(csrf())).andExpect(status().isNotFound());
	}

	@Test
	void shouldShowAndAcceptFahrenheitWhenChosen() throws Exception {
		Cookie f = new Cookie("crustplan-units", "F");
		// 5 °C = 41 °F by the definition of the Fahrenheit scale (°F = °C × 9/5 + 32)
		mvc.perform(get("/surfaces/new").param("category", "meat").cookie(f))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("value=\"41\"")))
			.andExpect(content().string(containsString("°F")));
		MvcResult r = mvc
			.perform(potato("/surfaces/new", "name", "Fahrenheit wedges", "initialTemperature", "41", "temperatureUnit",
					"F")
				.cookie(f))
			.andExpect(status().is3xxRedirection())
			.andReturn();
		long id = Long.parseLong(r.getResponse().getRedirectedUrl().replace("/surfaces/", ""));
		// exact in binary floating point to well under 1e-9 °C
		assertThat(surfaces.findById(id).orElseThrow().getInitialTemperatureC()).isCloseTo(5.0,
				org.assertj.core.data.Offset.offset(1e-9));
	}

	@Nested
	class BadInput {

		@Test
		void shouldRejectACompositionOverHundredPercent() throws Exception {
			mvc.perform(potato("/surfaces/new", "starchPct", "40"))
				.andExpect(status().isOk())
				.andExpect(view().name("surface/form"))
				.andExpect(model().attributeHasErrors("form"))
				.andExpect(content().string(containsString("more than 100 %")));
		}

		@Test
		void shouldRejectANegativeWaterContent() throws Exception {
			mvc.perform(potato("/surfaces/new", "waterPct", "-3"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "waterPct"));
		}

		@Test
		void shouldRejectThicknessOutsideTheModel() throws Exception {
			mvc.perform(potato("/surfaces/new", "thicknessMm", "0"))
				.andExpect(model().attributeHasFieldErrors("form", "thicknessMm"));
			mvc.perform(potato("/surfaces/new", "thicknessMm", "250"))
				.andExpect(model().attributeHasFieldErrors("form", "thicknessMm"));
		}

		@Test
		void shouldRejectTextNanAndInfinityAsNumbers() throws Exception {
			for (String bad : new String[] { "abc", "NaN", "Infinity", "-Infinity", "1e999", "12abc", "0x10" }) {
				mvc.perform(potato("/surfaces/new", "fatPct", bad))
					.andExpect(status().isOk())
					.andExpect(model().attributeHasFieldErrorCode("form", "fatPct", "typeMismatch"));
			}
		}

		@Test
		void shouldRejectAnUnknownCategoryAndABlankName() throws Exception {
			mvc.perform(potato("/surfaces/new", "category", "unicorn", "name", " "))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "name"));
			mvc.perform(potato("/surfaces/new", "category", "unicorn"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "category"));
		}

		@Test
		void shouldRejectAProductOfAnotherCategory() throws Exception {
			mvc.perform(potato("/surfaces/new", "product", "biscuits"))
				.andExpect(status().isOk())
				.andExpect(model().attributeHasFieldErrors("form", "product"));
		}

		@Test
		void shouldRejectAPhOutsideTwoToTen() throws Exception {
			mvc.perform(potato("/surfaces/new", "ph", "11")).andExpect(model().attributeHasFieldErrors("form", "ph"));
		}

		@Test
		void shouldRejectAStartingTemperatureOutsideTheModelInFahrenheitWithTheCelsiusLimit() throws Exception {
			// 200 °F = 93.3 °C, above the engine's 80 °C limit for a starting temperature
			mvc.perform(potato("/surfaces/new", "initialTemperature", "200", "temperatureUnit", "F"))
				.andExpect(model().attributeHasFieldErrors("form", "initialTemperature"))
				.andExpect(content().string(containsString("you entered 93 °C")));
		}

		@Test
		void shouldRejectAMissingRequiredValue() throws Exception {
			mvc.perform(potato("/surfaces/new", "ashPct", ""))
				.andExpect(model().attributeHasFieldErrorCode("form", "ashPct", "NotNull"));
		}

		@Test
		void shouldKeepTheOldRecordWhenAnEditFails() throws Exception {
			long id = demo.surface("Sourdough loaf");
			mvc.perform(potato("/surfaces/" + id + "/edit", "waterPct", "120"))
				.andExpect(status().isOk())
				.andExpect(view().name("surface/form"));
			assertThat(surfaces.findById(id).orElseThrow().getName()).isEqualTo("Sourdough loaf");
		}

	}

	@Nested
	class Roles {

		@Test
		void shouldSendStrangersToTheSignInPage() throws Exception {
			mvc.perform(get("/surfaces")
				.with(org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors
					.anonymous()))
				.andExpect(status().is3xxRedirection())
				.andExpect(redirectedUrl("/signin"));
		}

		@Test
		void shouldLetACookReadButNotWrite() throws Exception {
			mvc.perform(get("/surfaces").with(user("cook").roles("COOK"))).andExpect(status().isOk());
			mvc.perform(potato("/surfaces/new").with(user("cook").roles("COOK"))).andExpect(status().isForbidden());
			long id = demo.surface("Sourdough loaf");
			mvc.perform(post("/surfaces/{id}/delete", id).with(csrf()).with(user("cook").roles("COOK")))
				.andExpect(status().isForbidden());
			assertThat(surfaces.findById(id)).isPresent();
		}

		@Test
		void shouldRefuseAWriteWithoutTheCsrfToken() throws Exception {
			mvc.perform(post("/surfaces/new").param("name", "x")).andExpect(status().isForbidden());
		}

	}

}
