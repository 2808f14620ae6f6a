package com.crustplan.fuzz;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.BeforeContainer;

import org.springframework.context.ApplicationContext;
import org.springframework.http.MediaType;
import org.springframework.test.context.TestContextManager;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;
import org.springframework.test.web.servlet.request.MockHttpServletRequestBuilder;
import org.springframework.validation.BindingResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Random and extreme input to the API and the forms never gives a 500: every answer is a result or
 * a field error. jqwik runs outside Spring's JUnit extension, so the shared test context is fetched
 * through Spring's TestContextManager (same configuration, so the same cached context).
 */
@CrustplanTest
class BadInputProperties {

	static MockMvc mvc;

	static JsonMapper json;

	static DemoData demo;

	@BeforeContainer
	static void context() throws Exception {
		ApplicationContext ctx = new TestContextManager(BadInputProperties.class).getTestContext()
			.getApplicationContext();
		mvc = ctx.getBean(MockMvc.class);
		json = ctx.getBean(JsonMapper.class);
		demo = ctx.getBean(DemoData.class);
	}

	/** A valid request, each value a raw JSON token; horizon 10 min keeps valid runs short. */
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
	@Provide
	Arbitrary<String> tokens() {
		Arbitrary<String> special = Arbitraries.of("NaN", "Infinity", "-Infinity", "\"NaN\"", "\"Infinity\"",
				"\"-Infinity\"", "1e400", "-1e400", "1e-400", "-0", "0", "null", "true", "false", "\"\"", "{}", "[]",
				"[1,2]", "{\"a\":1}", "\"" + "x".repeat(20_000) + "\"", "99999999999999999999999999999", "1.7976931348623157E308",
				"4.9E-324", "\"78\"", "\"potato\"", "\"pan\"", "\"oven\"", "\"grill\"", "\"golden\"", "\"\\u0000\"",
				ABSENT, "01", "+1", ".5", "1.", "--1", "\"<script>\"");
		Arbitrary<String> numbers = Arbitraries.doubles().map(d -> Double.isFinite(d) ? Double.toString(d) : "0");
		Arbitrary<String> ints = Arbitraries.integers().map(String::valueOf);
		Arbitrary<String> texts = Arbitraries.strings().ofMaxLength(60).map(s -> json.writeValueAsString(s));
		return Arbitraries.frequencyOf(net.jqwik.api.Tuple.of(4, special), net.jqwik.api.Tuple.of(3, numbers),
				net.jqwik.api.Tuple.of(2, ints), net.jqwik.api.Tuple.of(2, texts));
	}

	@Provide
	Arbitrary<String> fields() {
		List<String> all = new java.util.ArrayList<>();
		validRequest().forEach((obj, f) -> f.keySet().forEach(k -> all.add(obj + "." + k)));
		all.addAll(List.of("surface", "heat", "target", "horizonMinutes", "target.lightness"));
		return Arbitraries.of(all);
	}

	@Property(tries = 120)
	void apiNeverAnswers500(@ForAll("fields") String field, @ForAll("tokens") String token,
			@ForAll("fields") String second, @ForAll("tokens") String secondToken) throws Exception {
		Map<String, Map<String, String>> r = validRequest();
		String horizon = "10";
		for (String[] change : new String[][] { { field, token }, { second, secondToken } }) {
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
		MvcResult res = mvc.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON)
			.content(body)).andReturn();
		int status = res.getResponse().getStatus();
		assertThat(status).as("status for %s", body.length() > 300 ? body.substring(0, 300) : body).isIn(200, 400);
		JsonNode answer = json.readTree(res.getResponse().getContentAsString());
		if (status == 400) {
			assertThat(answer.get("errors").isArray()).isTrue();
			assertThat(answer.get("errors").size()).isPositive();
			for (JsonNode e : answer.get("errors")) {
				assertThat(e.get("field").asString()).isNotBlank();
				assertThat(e.get("message").asString()).isNotBlank();
			}
		}
		else {
			assertThat(answer.get("reached").isBoolean()).isTrue();
		}
	}

	/** Text a cook might type, or paste, or a browser might send. */
	@Provide
	Arbitrary<String> typed() {
		Arbitrary<String> special = Arbitraries.of("", " ", "NaN", "nan", "Infinity", "-Infinity", "1e999", "-1e999",
				"1e-999", "12,5", "12.5.3", "0x1p3", "1_000", "١٢", "½", "-0", "+5", "5 °C", "abc", "x".repeat(5000),
				"<script>alert(1)</script>", "%00", "\u0000", "'; DROP TABLE surface; --", "9".repeat(400));
		Arbitrary<String> numbers = Arbitraries.doubles().map(d -> Double.toString(d));
		Arbitrary<String> texts = Arbitraries.strings().ofMaxLength(100);
		return Arbitraries.oneOf(special, numbers, texts);
	}

	@Provide
	Arbitrary<String> surfaceFields() {
		return Arbitraries.of("name", "category", "product", "waterPct", "proteinPct", "fatPct", "reducingSugarPct", "sucrosePct",
				"starchPct", "fibrePct", "ashPct", "asparagineMgPerKg", "surfaceWaterGPerM2", "thicknessMm", "ph",
				"bicarbonateGPerKg", "acidGPerKg", "initialTemperature", "temperatureUnit", "notes");
	}

	@Property(tries = 120)
	void surfaceFormNeverAnswers500(@ForAll("surfaceFields") String field, @ForAll("typed") String value)
			throws Exception {
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
		p.put(field, value);
		MockHttpServletRequestBuilder req = post("/surfaces/new").with(csrf()).with(user("chef").roles("CHEF"));
		p.forEach(req::param);
		MvcResult res = mvc.perform(req).andReturn();
		int status = res.getResponse().getStatus();
		assertThat(status).as("%s = %s", field, value.length() > 80 ? value.substring(0, 80) : value).isIn(200, 302);
		if (status == 200) {
			BindingResult errors = (BindingResult) res.getModelAndView().getModel()
				.get(BindingResult.MODEL_KEY_PREFIX + "form");
			assertThat(errors.hasErrors()).as("a re-rendered form says why").isTrue();
		}
	}

	@Property(tries = 80)
	void planPageNeverAnswers500(@ForAll("planParams") String param, @ForAll("typed") String value)
			throws Exception {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("surfaceId", String.valueOf(demo.surface("Hake fillet, skin side")));
		p.put("setupId", String.valueOf(demo.setup("Plancha, high")));
		p.put("targetStage", "golden");
		p.put("targetLightness", "");
		p.put("horizonMinutes", "10");
		p.put(param, value);
		MockHttpServletRequestBuilder req = get("/plan").with(user("cook").roles("COOK"));
		p.forEach(req::param);
		assertThat(mvc.perform(req).andReturn().getResponse().getStatus()).isEqualTo(200);
	}

	@Provide
	Arbitrary<String> planParams() {
		return Arbitraries.of("surfaceId", "setupId", "targetStage", "targetLightness", "horizonMinutes");
	}

}
