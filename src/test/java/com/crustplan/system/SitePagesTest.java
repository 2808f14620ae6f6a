package com.crustplan.system;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.cookie;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.view;

import jakarta.servlet.RequestDispatcher;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.heat.HeatSetup;

/**
 * The pages around the kitchen data: welcome, sign-in, model, unit switch, error pages.
 */
@CrustplanTest
class SitePagesTest {

	@Autowired
	MockMvc mvc;

	@Test
	void shouldShowTheWelcomePageToAnyone() throws Exception {
		mvc.perform(get("/").with(anonymous())).andExpect(status().isOk()).andExpect(view().name("system/welcome"));
	}

	@Test
	void shouldShowTheDemoAccountsPlainlyLabelledAsADemo() throws Exception {
		mvc.perform(get("/signin").with(anonymous()))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("This is a demo")))
			.andExpect(content().string(containsString("chef-demo")))
			.andExpect(content().string(containsString("name=\"_csrf\"")));
	}

	@Test
	void shouldListTheModelParametersFromTheEnginesOwnConstants() throws Exception {
		mvc.perform(get("/model").with(anonymous()))
			.andExpect(status().isOk())
			.andExpect(view().name("model/model"))
			// a source string read from the engine, not typed into the page
			.andExpect(content().string(containsString("Hubbard &amp; Farkas 1999")))
			.andExpect(content().string(containsString(HeatSetup.OIL_QUIET.unit())))
			.andExpect(content().string(containsString("Zanoni, Peri &amp; Bruno 1995")))
			.andExpect(content().string(not(containsString("COMMON_PRACTICE"))));
	}

	@Test
	void shouldRememberTheTemperatureUnitInACookieAndReturnToThePage() throws Exception {
		mvc.perform(post("/units").with(csrf()).with(anonymous()).param("unit", "F").param("back", "/model"))
			.andExpect(status().is3xxRedirection())
			.andExpect(redirectedUrl("/model"))
			.andExpect(cookie().value(UnitPreference.COOKIE, "F"))
			.andExpect(cookie().maxAge(UnitPreference.COOKIE, 365 * 24 * 3600));
	}

	@Test
	void shouldNotRedirectTheUnitSwitchToAnotherSite() throws Exception {
		for (String back : new String[] { "//evil.example", "https://evil.example/", "/\\evil",
				"javascript:alert(1)" }) {
			mvc.perform(post("/units").with(csrf()).with(anonymous()).param("unit", "C").param("back", back))
				.andExpect(redirectedUrl("/"));
		}
	}

	@Test
	void shouldRenderTheNotFoundPageWithoutInternals() throws Exception {
		mvc.perform(get("/error").with(anonymous())
			.requestAttr(RequestDispatcher.ERROR_STATUS_CODE, 404)
			.requestAttr(RequestDispatcher.ERROR_REQUEST_URI, "/surfaces/999")
			.accept(org.springframework.http.MediaType.TEXT_HTML))
			.andExpect(status().isNotFound())
			.andExpect(content().string(containsString("There is nothing at this address")));
	}

	@Test
	void shouldRenderTheGeneralErrorPageWithoutAStackTrace() throws Exception {
		mvc.perform(get("/error").with(anonymous())
			.requestAttr(RequestDispatcher.ERROR_STATUS_CODE, 500)
			.requestAttr(RequestDispatcher.ERROR_EXCEPTION, new IllegalStateException("secret internals"))
			.accept(org.springframework.http.MediaType.TEXT_HTML))
			.andExpect(status().isInternalServerError())
			.andExpect(content().string(containsString("Nothing you saved is lost")))
			.andExpect(content().string(not(containsString("secret internals"))))
			.andExpect(content().string(not(containsString("at com.crustplan"))));
	}

	@Test
	void shouldAnswerHealthChecksWithoutSignIn() throws Exception {
		mvc.perform(get("/actuator/health").with(anonymous()))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("UP")));
	}

}
