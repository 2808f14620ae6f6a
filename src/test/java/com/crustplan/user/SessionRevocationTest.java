package com.crustplan.user;

import static org.assertj.core.api.Assertions.assertThat;

import java.net.CookieManager;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.Base64;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.jdbc.core.JdbcTemplate;

import com.crustplan.CrustplanTest;

/**
 * Over real HTTP, with the session cookie and CSRF token a browser would hold: a chef
 * whom an administrator demotes or disables cannot write with the old session on the very
 * next request. (The case: a chef set to cook and disabled kept saving surfaces
 * through the API.)
 */
@CrustplanTest
class SessionRevocationTest {

	/**
	 * A surface the API accepts (the potato category's typical composition, see
	 * SurfaceApiTest).
	 */
	static final String SURFACE = """
			{ "name": "Revocation wedges", "surface": { "category": "potato", "product": "french-fries",
			  "waterPct": 79, "proteinPct": 2, "fatPct": 0.1, "reducingSugarPct": 0.4, "sucrosePct": 0.2,
			  "starchPct": 15.5, "fibrePct": 1.8, "ashPct": 1, "asparagineMgPerKg": 3000,
			  "surfaceWaterGPerM2": 20, "thicknessMm": 12.5, "pH": 6.0, "bicarbonateGPerKg": 0,
			  "acidGPerKg": 0.5, "initialTemperatureC": 4 } }""";

	static final String PASSWORD = "a line chef passphrase";

	@LocalServerPort
	int port;

	@Autowired
	UserService users;

	@Autowired
	JdbcTemplate jdbc;

	@Test
	void shouldEndTheSessionsOfAChefDemotedToCook() throws Exception {
		UserAccount chef = users.create(new UserForm("demoted-chef", "CHEF", PASSWORD, true));
		Browser b = signIn("demoted-chef");
		assertThat(b.postSurface()).isEqualTo(201);
		users.update(chef.getId(), new UserForm("demoted-chef", "COOK", "", true));
		// the old session is gone: no sign-in, so 401 (RFC 9110 §15.5.2)
		assertThat(b.postSurface()).isIn(401, 403);
		assertThat(sessionsOf("demoted-chef")).isZero();
		// signed in again they are a cook, who may not write (403)
		assertThat(signIn("demoted-chef").postSurface()).isEqualTo(403);
		// and an API client with the account's Basic credentials is a cook from the next
		// request on
		assertThat(basicPost("demoted-chef")).isEqualTo(403);
	}

	@Test
	void shouldEndTheSessionsOfADisabledChef() throws Exception {
		UserAccount chef = users.create(new UserForm("disabled-chef", "CHEF", PASSWORD, true));
		Browser b = signIn("disabled-chef");
		Browser second = signIn("disabled-chef");
		assertThat(b.postSurface()).isEqualTo(201);
		assertThat(basicPost("disabled-chef")).isEqualTo(201);
		users.update(chef.getId(), new UserForm("disabled-chef", "CHEF", "", false));
		assertThat(b.postSurface()).isIn(401, 403);
		assertThat(second.postSurface()).isIn(401, 403);
		assertThat(basicPost("disabled-chef")).isEqualTo(401);
		assertThat(sessionsOf("disabled-chef")).isZero();
	}

	@Test
	void shouldKeepTheSessionWhenNothingAboutTheAccountChanges() throws Exception {
		UserAccount chef = users.create(new UserForm("steady-chef", "CHEF", PASSWORD, true));
		Browser b = signIn("steady-chef");
		users.update(chef.getId(), new UserForm("steady-chef", "CHEF", "", true));
		assertThat(b.postSurface()).isEqualTo(201);
	}

	private int sessionsOf(String name) {
		return jdbc.queryForObject("SELECT COUNT(*) FROM spring_session WHERE principal_name = ?", Integer.class, name);
	}

	private int basicPost(String name) throws Exception {
		String auth = Base64.getEncoder().encodeToString((name + ":" + PASSWORD).getBytes(StandardCharsets.UTF_8));
		return HttpClient.newHttpClient()
			.send(HttpRequest.newBuilder(uri("/api/v1/surfaces"))
				.header("Authorization", "Basic " + auth)
				.header("Content-Type", "application/json")
				.POST(HttpRequest.BodyPublishers.ofString(SURFACE))
				.build(), HttpResponse.BodyHandlers.discarding())
			.statusCode();
	}

	private Browser signIn(String name) throws Exception {
		Browser b = new Browser();
		String form = "username=" + name + "&password=" + URLEncoder.encode(PASSWORD, StandardCharsets.UTF_8)
				+ "&_csrf=" + URLEncoder.encode(b.token("/signin"), StandardCharsets.UTF_8);
		HttpResponse<String> r = b.http.send(HttpRequest.newBuilder(uri("/signin"))
			.header("Content-Type", "application/x-www-form-urlencoded")
			.POST(HttpRequest.BodyPublishers.ofString(form))
			.build(), HttpResponse.BodyHandlers.ofString());
		assertThat(r.statusCode()).isEqualTo(302);
		assertThat(r.headers().firstValue("Location").orElse("")).isEqualTo("/");
		// the token of the signed-in session, as the surface form carries it
		b.csrf = b.token("/surfaces/new");
		return b;
	}

	private URI uri(String path) {
		return URI.create("http://localhost:" + port + path);
	}

	/** One browser: its own cookies, redirects not followed. */
	private class Browser {

		final HttpClient http = HttpClient.newBuilder()
			.cookieHandler(new CookieManager())
			.followRedirects(HttpClient.Redirect.NEVER)
			.build();

		String csrf;

		String token(String page) throws Exception {
			String body = http.send(HttpRequest.newBuilder(uri(page)).build(), HttpResponse.BodyHandlers.ofString())
				.body();
			Matcher m = Pattern.compile("name=\"_csrf\" value=\"([^\"]+)\"").matcher(body);
			assertThat(m.find()).as("a CSRF token on " + page).isTrue();
			return m.group(1);
		}

		int postSurface() throws Exception {
			return http
				.send(HttpRequest.newBuilder(uri("/api/v1/surfaces"))
					.header("Content-Type", "application/json")
					.header("X-CSRF-TOKEN", csrf)
					.POST(HttpRequest.BodyPublishers.ofString(SURFACE))
					.build(), HttpResponse.BodyHandlers.discarding())
				.statusCode();
		}

	}

}
