package com.crustplan.fuzz;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.validation.BindingResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Random and extreme input to the API and the forms never gives a 500: every answer is a
 * result or a field error. Each test runs a fixed number of cases drawn from a seeded
 * generator ({@link FuzzValues}); a case's name and failure message carry the seed and
 * the case number.
 */
@CrustplanTest
class BadInputProperties {

	@Autowired
	MockMvc mvc;

	@Autowired
	JsonMapper json;

	@Autowired
	DemoData demo;

	/**
	 * A valid request, each value a raw JSON token; horizon 10 min keeps valid runs
	 * short.
	 */
	static Map<String, Map<String, String>> validRequest() {
		Map<String, Map<String, String>> r = new LinkedHashMap<>();
		Map<String, String> s = new LinkedHashMap<>();
		s.put("category", "\"potato\"");
		s.put("product", "\"french-fries\"");
		s.put("waterPct", "78");
		s.put("proteinPct", "2");
		s.put("fatPct", "0.1");
		s.put("reducingSugarPct", "0.3");
		s.put("sucrosePct", "0.2");
		s.put("starchPct", "16.4");
		s.put("fibrePct", "2");
		s.put("ashPct", "1");
		s.put("asparagineMgPerKg", "3000");
		s.put("surfaceWaterGPerM2", "20");
		s.put("thicknessMm", "10");
		s.put("pH", "6.0");
		s.put("bicarbonateGPerKg", "0");
		s.put("acidGPerKg", "0");
		s.put("initialTemperatureC", "5");
		r.put("surface", s);
		Map<String, String> h = new LinkedHashMap<>();
		h.put("mode", "\"fryer\"");
		h.put("temperatureC", "175");
		h.put("fan", "true");
		h.put("relativeHumidityPct", "10");
		h.put("flipEverySeconds", "60");
		r.put("heat", h);
		Map<String, String> t = new LinkedHashMap<>();
		t.put("stage", "\"golden\"");
		r.put("target", t);
		return r;
	}

	static final String ABSENT = "<absent>";

	static String body(Map<String, Map<String, String>> r, String horizon) {
		StringBuilder b = new StringBuilder("{");
		r.forEach((obj, fields) -> {
			if (fields == null) {
				return;
			}
			b.append('"').append(obj).append("\":{");
			StringBuilder f = new StringBuilder();
			fields.forEach((k, v) -> {
				if (!ABSENT.equals(v)) {
					f.append(f.isEmpty() ? "" : ",").append('"').append(k).append("\":").append(v);
				}
			});
			b.append(f).append("},");
		});
		if (!ABSENT.equals(horizon)) {
			b.append("\"horizonMinutes\":").append(horizon);
		}
		else if (b.charAt(b.length() - 1) == ',') {
			b.setLength(b.length() - 1);
		}
		return b.append('}').toString();
	}

	/** Raw JSON tokens (some not JSON at all) from ordinary to hostile. */
	static final List<String> SPECIAL_TOKENS = List.of("NaN", "Infinity", "-Infinity", "\"NaN\"", "\"Infinity\"",
			"\"-Infinity\"", "1e400", "-1e400", "1e-400", "-0", "0", "null", "true", "false", "\"\"", "{}", "[]",
			"[1,2]", "{\"a\":1}", "\"" + "x".repeat(20_000) + "\"", "99999999999999999999999999999",
			"1.7976931348623157E308", "4.9E-324", "\"78\"", "\"potato\"", "\"pan\"", "\"oven\"", "\"grill\"",
			"\"golden\"", "\"\\u0000\"", ABSENT, "01", "+1", ".5", "1.", "--1", "\"<script>\"");

	/**
	 * Special tokens, finite numbers, ints and JSON strings in the weights 4 : 3 : 2 : 2.
	 */
	static String token(FuzzValues v) {
		int pick = v.below(11);
		if (pick < 4) {
			return v.oneOf(SPECIAL_TOKENS);
		}
		if (pick < 7) {
			double d = v.anyFiniteDouble();
			return Double.isFinite(d) ? Double.toString(d) : "0";
		}
		if (pick < 9) {
			return String.valueOf(v.anyInt());
		}
		return JsonMapper.shared().writeValueAsString(v.anyString(60));
	}

	static List<String> fields() {
		List<String> all = new ArrayList<>();
		validRequest().forEach((obj, f) -> f.keySet().forEach(k -> all.add(obj + "." + k)));
		all.addAll(List.of("surface", "heat", "target", "horizonMinutes", "target.lightness"));
		return all;
	}

	/**
	 * Two changes to a valid plan request: each a field (or a whole object) and a raw
	 * JSON token.
	 */
	record ApiCase(int n, String field, String token, String second, String secondToken) {

		@Override
		public String toString() {
			return "seed " + FuzzValues.SEED + ", case " + this.n + ": " + this.field + " = "
					+ FuzzValues.shown(this.token) + ", " + this.second + " = " + FuzzValues.shown(this.secondToken);
		}

	}

	static Stream<ApiCase> apiCases() {
		FuzzValues v = new FuzzValues("apiNeverAnswers500");
		List<String> fields = fields();
		return IntStream.range(0, 120)
			.mapToObj(n -> new ApiCase(n, v.oneOf(fields), token(v), v.oneOf(fields), token(v)))
			.toList()
			.stream();
	}

	@ParameterizedTest(name = "{0}")
	@MethodSource("apiCases")
	void apiNeverAnswers500(ApiCase c) throws Exception {
		Map<String, Map<String, String>> r = validRequest();
		String horizon = "10";
		for (String[] change : new String[][] { { c.field(), c.token() }, { c.second(), c.secondToken() } }) {
			String f = change[0];
			String v = change[1];
			if (f.equals("horizonMinutes")) {
				horizon = v;
			}
			else if (!f.contains(".")) {
				r.put(f, ABSENT.equals(v) ? null : r.get(f));
			}
			else {
				String[] p = f.split("\\.");
				if (r.get(p[0]) != null) {
					r.get(p[0]).put(p[1], v);
				}
			}
		}
		String body = body(r, horizon);
		MvcResult res = mvc
			.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(body))
			.andReturn();
		int status = res.getResponse().getStatus();
		assertThat(status).as("%s: status for %s", c, body.length() > 300 ? body.substring(0, 300) : body)
			.isIn(200, 400);
		JsonNode answer = json.readTree(res.getResponse().getContentAsString());
		if (status == 400) {
			assertThat(answer.get("errors").isArray()).as("%s: errors is a list", c).isTrue();
			assertThat(answer.get("errors").size()).as("%s: errors listed", c).isPositive();
			for (JsonNode e : answer.get("errors")) {
				assertThat(e.get("field").asString()).as("%s: error field", c).isNotBlank();
				assertThat(e.get("message").asString()).as("%s: error message", c).isNotBlank();
			}
		}
		else {
			assertThat(answer.get("reached").isBoolean()).as("%s: reached", c).isTrue();
		}
	}

	/** Text a cook might type, or paste, or a browser might send. */
	static final List<String> SPECIAL_TYPED = List.of("", " ", "NaN", "nan", "Infinity", "-Infinity", "1e999", "-1e999",
			"1e-999", "12,5", "12.5.3", "0x1p3", "1_000", "١٢", "½", "-0", "+5", "5 °C", "abc", "x".repeat(5000),
			"<script>alert(1)</script>", "%00", "\u0000", "'; DROP TABLE surface; --", "9".repeat(400));

	/** Special text, finite numbers and any text, one third each. */
	static String typed(FuzzValues v) {
		return switch (v.below(3)) {
			case 0 -> v.oneOf(SPECIAL_TYPED);
			case 1 -> Double.toString(v.anyFiniteDouble());
			default -> v.anyString(100);
		};
	}

	static final List<String> SURFACE_FIELDS = List.of("name", "category", "product", "waterPct", "proteinPct",
			"fatPct", "reducingSugarPct", "sucrosePct", "starchPct", "fibrePct", "ashPct", "asparagineMgPerKg",
			"surfaceWaterGPerM2", "thicknessMm", "ph", "bicarbonateGPerKg", "acidGPerKg", "initialTemperature",
			"temperatureUnit", "notes");

	static final List<String> PLAN_PARAMS = List.of("surfaceId", "setupId", "targetStage", "targetLightness",
			"horizonMinutes");

	/** One form field or request parameter set to typed text. */
	record TypedCase(int n, String field, String value) {

		@Override
		public String toString() {
			return "seed " + FuzzValues.SEED + ", case " + this.n + ": " + this.field + " = "
					+ FuzzValues.shown(this.value);
		}

	}

	static Stream<TypedCase> typedCases(String method, List<String> fields, int count) {
		FuzzValues v = new FuzzValues(method);
		return IntStream.range(0, count).mapToObj(n -> new TypedCase(n, v.oneOf(fields), typed(v))).toList().stream();
	}

	static Stream<TypedCase> surfaceFormCases() {
		return typedCases("surfaceFormNeverAnswers500", SURFACE_FIELDS, 120);
	}

	@ParameterizedTest(name = "{0}")
	@MethodSource("surfaceFormCases")
	void surfaceFormNeverAnswers500(TypedCase c) throws Exception {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("name", "Fuzzed surface");
		p.put("category", "fish");
		p.put("waterPct", "76");
		p.put("proteinPct", "20");
		p.put("fatPct", "2.5");
		p.put("reducingSugarPct", "0.05");
		p.put("sucrosePct", "0");
		p.put("starchPct", "0");
		p.put("fibrePct", "0");
		p.put("ashPct", "1.3");
		p.put("asparagineMgPerKg", "20");
		p.put("surfaceWaterGPerM2", "10");
		p.put("thicknessMm", "20");
		p.put("ph", "");
		p.put("bicarbonateGPerKg", "0");
		p.put("acidGPerKg", "0");
		p.put("initialTemperature", "3");
		p.put("temperatureUnit", "C");
		p.put("notes", "");
		p.put(c.field(), c.value());
		MockHttpServletRequestBuilder req = post("/surfaces/new").with(csrf()).with(user("chef").roles("CHEF"));
		p.forEach(req::param);
		MvcResult res = mvc.perform(req).andReturn();
		int status = res.getResponse().getStatus();
		assertThat(status).as("%s", c).isIn(200, 302);
		if (status == 200) {
			BindingResult errors = (BindingResult) res.getModelAndView()
				.getModel()
				.get(BindingResult.MODEL_KEY_PREFIX + "form");
			assertThat(errors.hasErrors()).as("%s: a re-rendered form says why", c).isTrue();
		}
	}

	static Stream<TypedCase> planPageCases() {
		return typedCases("planPageNeverAnswers500", PLAN_PARAMS, 80);
	}

	@ParameterizedTest(name = "{0}")
	@MethodSource("planPageCases")
	void planPageNeverAnswers500(TypedCase c) throws Exception {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("surfaceId", String.valueOf(demo.surface("Hake fillet, skin side")));
		p.put("setupId", String.valueOf(demo.setup("Plancha, high")));
		p.put("targetStage", "golden");
		p.put("targetLightness", "");
		p.put("horizonMinutes", "10");
		p.put(c.field(), c.value());
		MockHttpServletRequestBuilder req = get("/plan").with(user("cook").roles("COOK"));
		p.forEach(req::param);
		assertThat(mvc.perform(req).andReturn().getResponse().getStatus()).as("%s", c).isEqualTo(200);
	}

}
