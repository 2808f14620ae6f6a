package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;

import java.io.ByteArrayOutputStream;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;

/**
 * What the server says about itself to any client: redirects, error addresses, privacy
 * headers.
 */
@CrustplanTest
class RedirectsAndHeadersTest {

	@LocalServerPort
	int port;

	@Autowired
	MockMvc mvc;

	/**
	 * A client may send any Host header (RFC 9110 §7.2); the redirect to the sign-in page
	 * must not repeat it, or a poisoned cache or link would send people to another site.
	 * A raw socket, since Java's HTTP client will not send a forged Host.
	 */
	@Test
	void shouldRedirectToTheSignInPageByPathWhateverTheHostHeader() throws Exception {
		String response = raw("GET /surfaces HTTP/1.1\r\nHost: evil.example\r\nConnection: close\r\n\r\n");
		assertThat(response).startsWith("HTTP/1.1 302");
		assertThat(response).containsIgnoringCase("\r\nLocation: /signin\r\n").doesNotContain("evil.example");
	}

	/**
	 * Opened directly, /error has no error to tell of: it is a page that is not there
	 * (404), never "Status 999".
	 */
	@Test
	void shouldAnswerTheErrorAddressOpenedDirectlyWithNotFound() throws Exception {
		HttpClient http = HttpClient.newHttpClient();
		HttpResponse<String> page = http.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + "/error"))
			.header("Accept", "text/html")
			.build(), HttpResponse.BodyHandlers.ofString());
		assertThat(page.statusCode()).isEqualTo(404);
		assertThat(page.body()).contains("There is nothing at this address").doesNotContain("999");
		HttpResponse<String> json = http.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + "/error"))
			.header("Accept", "application/json")
			.build(), HttpResponse.BodyHandlers.ofString());
		assertThat(json.statusCode()).isEqualTo(404);
		assertThat(json.body()).doesNotContain("999");
	}

	/**
	 * W3C Referrer Policy and Permissions Policy, on pages and on the Basic API alike.
	 */
	@Test
	void shouldSendReferrerAndPermissionsPolicies() throws Exception {
		mvc.perform(get("/").with(anonymous()))
			.andExpect(header().string("Referrer-Policy", "strict-origin-when-cross-origin"))
			.andExpect(header().string("Permissions-Policy", containsString("camera=()")));
		mvc.perform(get("/api/v1/surfaces").with(httpBasic("cook", "cook-demo")))
			.andExpect(header().string("Referrer-Policy", "strict-origin-when-cross-origin"))
			.andExpect(header().exists("Permissions-Policy"));
	}

	private String raw(String request) throws Exception {
		try (Socket s = new Socket("localhost", port)) {
			s.setSoTimeout(10_000);
			OutputStream out = s.getOutputStream();
			out.write(request.getBytes(StandardCharsets.US_ASCII));
			out.flush();
			InputStream in = s.getInputStream();
			ByteArrayOutputStream got = new ByteArrayOutputStream();
			in.transferTo(got);
			return got.toString(StandardCharsets.ISO_8859_1);
		}
	}

}
