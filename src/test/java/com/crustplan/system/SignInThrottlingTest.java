package com.crustplan.system;

import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

import com.crustplan.CrustplanTest;

/**
 * Repeated wrong passwords through the real filter chains. Each test runs a fixed number
 * of attempts (no waiting, no timing) from addresses of the documentation range
 * 203.0.113.0/24 (RFC 5737), and forgets the tallies afterwards so no other test is
 * locked out.
 */
@CrustplanTest
class SignInThrottlingTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	SignInThrottle throttle;

	@AfterEach
	void forget() {
		throttle.clear();
	}

	@Test
	void shouldPauseFormSignInAfterFiveWrongPasswordsEvenForTheRightOne() throws Exception {
		for (int i = 0; i < 5; i++) {
			mvc.perform(post("/signin").with(csrf())
				.with(from("203.0.113.10"))
				.param("username", "cook")
				.param("password", "wrong guess " + i)).andExpect(redirectedUrl("/signin?error"));
		}
		// the right password, even from another address: refused until the cooling period
		// is over
		mvc.perform(post("/signin").with(csrf())
			.with(from("203.0.113.11"))
			.param("username", "cook")
			.param("password", "cook-demo")).andExpect(redirectedUrl("/signin?locked=15"));
		mvc.perform(get("/signin").param("locked", "15"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("Too many wrong passwords")))
			.andExpect(content().string(containsString("wait <span>15</span> minutes")));
		// the cook's HTTP Basic is paused too: one account, one tally
		mvc.perform(get("/api/v1/surfaces").with(httpBasic("cook", "cook-demo")).with(from("203.0.113.12")))
			.andExpect(status().isTooManyRequests());
	}

	@Test
	void shouldAnswer429ToAFloodOfWrongBasicCredentialsAndStillServeOtherClients() throws Exception {
		for (int i = 0; i < 20; i++) {
			mvc.perform(get("/api/v1/surfaces").with(httpBasic("nobody-" + i, "guess")).with(from("203.0.113.20")))
				.andExpect(status().isUnauthorized());
		}
		for (int i = 0; i < 5; i++) {
			mvc.perform(get("/api/v1/surfaces").with(httpBasic("nobody-x" + i, "guess")).with(from("203.0.113.20")))
				.andExpect(status().isTooManyRequests())
				.andExpect(header().exists("Retry-After"))
				.andExpect(jsonPath("$.errors[0].field").value("authorization"))
				.andExpect(jsonPath("$.errors[0].message").value(containsString("try again in 15 minute")));
		}
		// the right password from that address waits as well (else the pause would tell a
		// guesser when he is right)
		mvc.perform(get("/api/v1/surfaces").with(httpBasic("chef", "chef-demo")).with(from("203.0.113.20")))
			.andExpect(status().isTooManyRequests());
		// another client is served as usual
		mvc.perform(get("/api/v1/surfaces").with(httpBasic("chef", "chef-demo")).with(from("203.0.113.21")))
			.andExpect(status().isOk());
		mvc.perform(post("/signin").with(csrf())
			.with(from("203.0.113.21"))
			.param("username", "chef")
			.param("password", "chef-demo")).andExpect(redirectedUrl("/"));
	}

	static RequestPostProcessor from(String address) {
		return req -> {
			req.setRemoteAddr(address);
			return req;
		};
	}

}
