package com.crustplan.api;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.httpBasic;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.header;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

import jakarta.servlet.ReadListener;
import jakarta.servlet.ServletContext;
import jakarta.servlet.ServletInputStream;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.HttpHeaders;
import org.springframework.http.MediaType;
import org.springframework.mock.web.MockHttpServletRequest;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

import com.crustplan.CrustplanTest;
import com.crustplan.surface.SurfaceRepository;

/**
 * The API's error contract: RFC 9457 problem details ({@code application/problem+json},
 * members type/title/status/detail/instance, §3.1) carrying the {@code errors: [{field,
 * message}]} list as an extension member (§3.2). Each test reproduces one hostile request
 * from the robustness issue.
 */
@CrustplanTest
class ApiErrorContractTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	SurfaceRepository surfaces;

	static final String CHIPS = """
			{ "surface": { "category": "potato", "waterPct": 78, "proteinPct": 2, "fatPct": 0.1,
			    "reducingSugarPct": 0.3, "sucrosePct": 0.2, "starchPct": 16.4, "fibrePct": 2, "ashPct": 1,
			    "thicknessMm": 10 },
			  "heat": { "mode": "fryer", "temperatureC": 175 },
			  "target": { "stage": "golden" },
			  "horizonMinutes": 10 }""";

	ResultActions plan(String body) throws Exception {
		return mvc
			.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(body));
	}

	static ResultActions isProblem(ResultActions r, int status) throws Exception {
		// RFC 9457 §3: the media type, and the members a client can rely on; "type"
		// absent means about:blank
		return r.andExpect(status().is(status))
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
			.andExpect(jsonPath("$.status").value(status))
			.andExpect(jsonPath("$.title").isNotEmpty())
			.andExpect(jsonPath("$.detail").isNotEmpty())
			.andExpect(jsonPath("$.errors[0].field").isNotEmpty())
			.andExpect(jsonPath("$.errors[0].message").isNotEmpty());
	}

	@Test
	void shouldAnswerEveryBadFieldInOneProblemDetail() throws Exception {
		isProblem(plan(CHIPS.replace("\"waterPct\": 78", "\"waterPct\": \"lots\"")
			.replace("\"mode\": \"fryer\"", "\"mode\": \"microwave\"")), 400)
			// RFC 9457 §4.2.1: with type about:blank the title is the status's reason
			// phrase
			.andExpect(jsonPath("$.type").doesNotExist())
			.andExpect(jsonPath("$.title").value("Bad Request"))
			.andExpect(jsonPath("$.instance").value("/api/v1/plans"))
			.andExpect(jsonPath("$.errors.length()").value(2))
			.andExpect(jsonPath("$.errors[*].field", hasItem("surface.waterPct")))
			.andExpect(jsonPath("$.errors[*].field", hasItem("heat.mode")))
			.andExpect(jsonPath("$.detail", containsString("surface.waterPct must be a number, not text")));
	}

	/**
	 * Reproduces the 500 for a thickness of 309 nines: no decimal point, beyond a
	 * double's 1.8e308.
	 */
	@Test
	void shouldNameTheFieldOfAnIntegerTooLargeForADouble() throws Exception {
		String nines = "9".repeat(309);
		isProblem(plan(CHIPS.replace("\"thicknessMm\": 10", "\"thicknessMm\": " + nines)), 400)
			.andExpect(jsonPath("$.errors[0].field").value("surface.thicknessMm"))
			.andExpect(jsonPath("$.errors[0].message").value("is too large a number"));
		// 308 nines still fit a double (Double.MAX_VALUE ≈ 1.798e308): the engine's own
		// range check answers
		isProblem(plan(CHIPS.replace("\"thicknessMm\": 10", "\"thicknessMm\": " + "9".repeat(308))), 400)
			.andExpect(jsonPath("$.errors[0].field").value("surface.thicknessMm"));
		isProblem(plan(CHIPS.replace("\"horizonMinutes\": 10", "\"horizonMinutes\": 1e999")), 400)
			.andExpect(jsonPath("$.errors[0].field").value("horizonMinutes"));
		// longer than the JSON reader's number limit (1000 digits): still a 400 naming
		// the field
		isProblem(plan(CHIPS.replace("\"thicknessMm\": 10", "\"thicknessMm\": " + "9".repeat(5000))), 400)
			.andExpect(jsonPath("$.errors[0].field").value("surface.thicknessMm"));
		long before = surfaces.count();
		isProblem(mvc.perform(post("/api/v1/surfaces").with(httpBasic("chef", "chef-demo"))
			.contentType(MediaType.APPLICATION_JSON)
			.content("{\"name\":\"x\",\"surface\":{\"category\":\"meat\",\"fatPct\":" + nines + "}}")), 400)
			.andExpect(jsonPath("$.errors[0].field").value("surface.fatPct"));
		assertThat(surfaces.count()).isEqualTo(before);
	}

	/**
	 * Reproduces the heap exhaustion: a body that says it is 200 MB is refused before it
	 * is read.
	 */
	@Test
	void shouldRefuseABodyOverTheLimitWith413BeforeReadingIt() throws Exception {
		CountingBody body = new CountingBody(200L * 1024 * 1024);
		isProblem(mvc.perform(context -> endless(context, body, 200L * 1024 * 1024)), 413)
			.andExpect(jsonPath("$.errors[0].field").value("body"))
			.andExpect(jsonPath("$.errors[0].message", containsString("64 KB")))
			.andExpect(header().string(HttpHeaders.CONNECTION, "close"));
		assertThat(body.read).as("bytes read of a body announced as 200 MB").isZero();
	}

	/**
	 * Without a Content-Length (chunked), the body is read only up to the limit, never
	 * whole.
	 */
	@Test
	void shouldStopReadingAChunkedBodyAtTheLimit() throws Exception {
		CountingBody body = new CountingBody(200L * 1024 * 1024);
		isProblem(mvc.perform(context -> endless(context, body, -1)), 413)
			.andExpect(jsonPath("$.errors[0].field").value("body"));
		// the limit plus at most one read buffer of the JSON reader
		assertThat(body.read).isLessThan(64 * 1024 + 16 * 1024);
	}

	@Test
	void shouldStillReadABodyJustUnderTheLimit() throws Exception {
		String padding = " ".repeat(60 * 1024);
		plan(CHIPS.replace("\"horizonMinutes\"", padding + "\"horizonMinutes\"")).andExpect(status().isOk());
	}

	/**
	 * Reproduces the 415 in the framework's default shape for a charset Java does not
	 * know.
	 */
	@Test
	void shouldAnswerABogusCharsetWithOurProblemDetail() throws Exception {
		isProblem(mvc.perform(post("/api/v1/plans").with(anonymous())
			.header(HttpHeaders.CONTENT_TYPE, "application/json;charset=bogus")
			.content(CHIPS)), 415).andExpect(jsonPath("$.errors[0].field").value("Content-Type"))
			.andExpect(jsonPath("$.errors[0].message", containsString("bogus")));
		isProblem(mvc.perform(post("/api/v1/surfaces").with(httpBasic("chef", "chef-demo"))
			.header(HttpHeaders.CONTENT_TYPE, "application/json;charset=bogus")
			.content("{}")), 415);
	}

	/**
	 * Reproduces the 406 for a browser's Accept header: RFC 9110 §12.5.1 lets the API
	 * disregard it.
	 */
	@Test
	void shouldAnswerJsonWhateverTheAcceptHeaderAsks() throws Exception {
		mvc.perform(post("/api/v1/plans").with(anonymous())
			.accept(MediaType.TEXT_HTML)
			.contentType(MediaType.APPLICATION_JSON)
			.content(CHIPS))
			.andExpect(status().isOk())
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_JSON))
			.andExpect(jsonPath("$.reached").isBoolean());
		mvc.perform(get("/api/v1/categories").with(anonymous()).accept(MediaType.TEXT_HTML))
			.andExpect(status().isOk())
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_JSON));
		isProblem(mvc.perform(post("/api/v1/plans").with(anonymous())
			.accept(MediaType.TEXT_HTML)
			.contentType(MediaType.APPLICATION_JSON)
			.content("[]")), 400).andExpect(jsonPath("$.errors[0].field").value("body"));
	}

	@Test
	void shouldAnswerAnUnknownAddressAndAWrongMethodAsProblems() throws Exception {
		isProblem(mvc.perform(get("/api/v1/nothing-here").with(httpBasic("cook", "cook-demo"))), 404)
			.andExpect(jsonPath("$.errors[0].field").value("path"));
		isProblem(mvc.perform(get("/api/v1/plans").with(httpBasic("cook", "cook-demo"))), 405)
			.andExpect(jsonPath("$.errors[0].field").value("method"))
			// RFC 9110 §15.5.6: a 405 lists the methods the resource does allow
			.andExpect(header().string(HttpHeaders.ALLOW, containsString("POST")));
	}

	@Test
	void shouldAnswerSignInAndRoleRefusalsAsProblems() throws Exception {
		isProblem(mvc.perform(get("/api/v1/surfaces").with(anonymous())), 401)
			.andExpect(jsonPath("$.title").value("Unauthorized"))
			.andExpect(jsonPath("$.errors[0].field").value("authorization"));
		isProblem(mvc.perform(post("/api/v1/surfaces").with(httpBasic("cook", "cook-demo"))
			.contentType(MediaType.APPLICATION_JSON)
			.content("{}")), 403).andExpect(jsonPath("$.errors[0].field").value("authorization"));
	}

	/**
	 * RFC 8259 §4: names within an object SHOULD be unique; a field given twice is not
	 * guessed at.
	 */
	@Test
	void shouldRefuseAFieldGivenTwiceInJson() throws Exception {
		isProblem(plan(CHIPS.replace("\"waterPct\": 78", "\"waterPct\": 1, \"waterPct\": 2")), 400)
			.andExpect(jsonPath("$.errors[0].field").value("body"))
			.andExpect(jsonPath("$.errors[0].message", containsString("waterPct")));
	}

	@Test
	void shouldKeepPageErrorsAsPages() throws Exception {
		// the API's advice hands page errors back: a missing surface is still the 404
		// page
		String type = mvc.perform(get("/surfaces/987654321/edit").with(user("chef").roles("CHEF")))
			.andExpect(status().isNotFound())
			.andReturn()
			.getResponse()
			.getContentType();
		assertThat(type).as("a page's 404 is not a problem detail")
			.satisfiesAnyOf(t -> assertThat(t).isNull(), t -> assertThat(t).doesNotContain("problem"));
	}

	static MockHttpServletRequest endless(ServletContext context, CountingBody body, long announced) {
		MockHttpServletRequest r = new MockHttpServletRequest(context, "POST", "/api/v1/plans") {
			@Override
			public ServletInputStream getInputStream() {
				return body;
			}

			@Override
			public long getContentLengthLong() {
				return announced;
			}

			@Override
			public int getContentLength() {
				return announced > Integer.MAX_VALUE ? -1 : (int) announced;
			}
		};
		r.setContentType(MediaType.APPLICATION_JSON_VALUE);
		return r;
	}

	/**
	 * A JSON body of a notes string that goes on for {@code size} bytes, produced as it
	 * is read.
	 */
	static final class CountingBody extends ServletInputStream {

		private final InputStream head = new ByteArrayInputStream(
				"{\"surface\":{\"category\":\"potato\",\"notes\":\"".getBytes(StandardCharsets.UTF_8));

		private final long size;

		long read;

		CountingBody(long size) {
			this.size = size;
		}

		@Override
		public int read() throws IOException {
			if (this.read >= this.size) {
				return -1;
			}
			this.read++;
			int b = this.head.read();
			return b >= 0 ? b : 'x';
		}

		@Override
		public boolean isFinished() {
			return this.read >= this.size;
		}

		@Override
		public boolean isReady() {
			return true;
		}

		@Override
		public void setReadListener(ReadListener listener) {
		}

	}

}
