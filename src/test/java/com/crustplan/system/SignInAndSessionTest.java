package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.redirectedUrl;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.net.CookieManager;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;

/**
 * Form sign-in against the stored BCrypt hashes, sessions kept in the database, sign-out.
 */
@CrustplanTest
class SignInAndSessionTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	JdbcTemplate jdbc;

	@LocalServerPort
	int port;

	/**
	 * Over real HTTP: MockMvc keeps its own mock session and would not show the session
	 * cookie.
	 */
	@Test
	void shouldSignInWithTheDemoChefAndKeepTheSessionInTheDatabase() throws Exception {
		HttpClient http = HttpClient.newBuilder()
			.cookieHandler(new CookieManager())
			.followRedirects(HttpClient.Redirect.NEVER)
			.build();
		String page = http
			.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + "/signin")).build(),
					HttpResponse.BodyHandlers.ofString())
			.body();
		Matcher m = Pattern.compile("name=\"_csrf\" value=\"([^\"]+)\"").matcher(page);
		assertThat(m.find()).isTrue();
		String form = "username=chef&password=chef-demo&_csrf=" + URLEncoder.encode(m.group(1), StandardCharsets.UTF_8);
		HttpResponse<String> r = http.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + "/signin"))
			.header("Content-Type", "application/x-www-form-urlencoded")
			.POST(HttpRequest.BodyPublishers.ofString(form))
			.build(), HttpResponse.BodyHandlers.ofString());
		assertThat(r.statusCode()).isEqualTo(302);
		assertThat(r.headers().firstValue("Location").orElse("")).endsWith("/");
		String cookie = r.headers()
			.allValues("Set-Cookie")
			.stream()
			.filter(c -> c.startsWith("CRUSTPLAN_SESSION="))
			.findFirst()
			.orElseThrow();
		assertThat(cookie).contains("HttpOnly").contains("SameSite=Lax");
		// the session lives in the database, where every instance behind a load balancer
		// finds it
		Integer sessions = jdbc.queryForObject("SELECT COUNT(*) FROM spring_session WHERE principal_name = 'chef'",
				Integer.class);
		assertThat(sessions).isPositive();
	}

	@Test
	void shouldRefuseAWrongPassword() throws Exception {
		mvc.perform(post("/signin").with(csrf()).param("username", "chef").param("password", "chef-demo!"))
			.andExpect(redirectedUrl("/signin?error"));
		mvc.perform(post("/signin").with(csrf()).param("username", "nobody").param("password", "x"))
			.andExpect(redirectedUrl("/signin?error"));
	}

	@Test
	void shouldRefuseASignInWithoutTheCsrfToken() throws Exception {
		mvc.perform(post("/signin").param("username", "chef").param("password", "chef-demo"))
			.andExpect(status().isForbidden());
	}

	@Test
	void shouldSignOut() throws Exception {
		mvc.perform(post("/signout").with(csrf()).with(user("chef").roles("CHEF")))
			.andExpect(redirectedUrl("/signin?signedout"));
	}

}
