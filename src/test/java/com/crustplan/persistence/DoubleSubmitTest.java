package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

import com.crustplan.api.StoredText;
import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.plan.SavedPlanRepository;
import com.crustplan.surface.SurfaceRepository;

/**
 * A form sent twice (a double click, a resend) saves one record, and both answers lead to
 * it.
 */
@CrustplanTest
class DoubleSubmitTest {

	static final RequestPostProcessor CHEF = user("chef").roles("CHEF");

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	SurfaceRepository surfaces;

	@Autowired
	SavedPlanRepository plans;

	static String token(MvcResult page) throws Exception {
		Matcher m = Pattern.compile("name=\"formToken\" value=\"([^\"]+)\"")
			.matcher(page.getResponse().getContentAsString());
		assertThat(m.find()).as("the form carries a one-time token").isTrue();
		return m.group(1);
	}

	@Test
	void shouldSaveASurfaceFormSentTwiceOnce() throws Exception {
		String token = token(mvc.perform(get("/surfaces/new").with(CHEF)).andReturn());
		long before = surfaces.count();
		String first = mvc
			.perform(StoredTextTest.potatoTo("/surfaces/new", "name", "Double-click wedges", "formToken", token)
				.with(CHEF))
			.andReturn()
			.getResponse()
			.getRedirectedUrl();
		MvcResult second = mvc
			.perform(StoredTextTest.potatoTo("/surfaces/new", "name", "Double-click wedges", "formToken", token)
				.with(CHEF))
			.andReturn();
		assertThat(second.getResponse().getRedirectedUrl()).isEqualTo(first);
		assertThat(second.getFlashMap().get("message")).asString().contains("sent twice", "saved once");
		assertThat(surfaces.count()).isEqualTo(before + 1);
	}

	/**
	 * Six copies of one form at the same moment: the token's key lets only one save
	 * commit.
	 */
	@Test
	void shouldSaveOnceWhenTheSameFormArrivesConcurrently() throws Exception {
		String token = token(mvc.perform(get("/surfaces/new").with(CHEF)).andReturn());
		long before = surfaces.count();
		Set<String> locations = ConcurrentHashMap.newKeySet();
		Map<Integer, AtomicInteger> statuses = EditCollisionTest.run(6, 6, n -> {
			MvcResult r = mvc
				.perform(StoredTextTest.potatoTo("/surfaces/new", "name", "Six clicks", "formToken", token).with(CHEF))
				.andReturn();
			locations.add(String.valueOf(r.getResponse().getRedirectedUrl()));
			return r.getResponse().getStatus();
		});
		assertThat(statuses.keySet()).as("statuses %s", statuses).containsOnly(302);
		assertThat(locations).hasSize(1);
		assertThat(surfaces.count()).isEqualTo(before + 1);
	}

	@Test
	void shouldSaveAPlanFormSentTwiceOnce() throws Exception {
		String surface = String.valueOf(demo.surface("Chips, 10 mm, blanched"));
		String setup = String.valueOf(demo.setup("Fryer, chips"));
		String token = token(mvc
			.perform(get("/plan").param("surfaceId", surface)
				.param("setupId", setup)
				.param("targetStage", "golden")
				.with(CHEF))
			.andReturn());
		long before = plans.count();
		List<String> urls = new ArrayList<>();
		for (int i = 0; i < 2; i++) {
			MockHttpServletRequestBuilder save = post("/plans").with(csrf())
				.with(CHEF)
				.param("surfaceId", surface)
				.param("setupId", setup)
				.param("targetStage", "golden")
				.param("name", "Saved once")
				.param("formToken", token);
			urls.add(mvc.perform(save).andReturn().getResponse().getRedirectedUrl());
		}
		assertThat(urls.get(0)).startsWith("/plans/").isEqualTo(urls.get(1));
		assertThat(plans.count()).isEqualTo(before + 1);
	}

}
