package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.offset;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

import com.jayway.jsonpath.JsonPath;

import com.crustplan.CrustplanTest;

/**
 * The API's optional pan and fryer bodies: accepted, named when wrong, and no change
 * without them.
 */
@CrustplanTest
class PlanApiEquipmentTest {

	static final String CHIPS = PlanApiTest.CHIPS;

	static final String FRYER = "\"heat\": { \"mode\": \"fryer\", \"temperatureC\": 175 }";

	static String withHeat(String heat) {
		return CHIPS.replace(FRYER, "\"heat\": " + heat);
	}

	@Autowired
	MockMvc mvc;

	ResultActions plan(String body) throws Exception {
		return mvc
			.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(body));
	}

	String answer(String body) throws Exception {
		return plan(body).andExpect(status().isOk()).andReturn().getResponse().getContentAsString();
	}

	@Test
	void shouldAnswerExactlyAsBeforeWithoutABody() throws Exception {
		String plain = answer(CHIPS);
		assertThat(plain).doesNotContain("heatSourceTemperatureC");
		assertThat(answer(withHeat("{ \"mode\": \"fryer\", \"temperatureC\": 175, \"fryer\": null }")))
			.isEqualTo(plain);
		assertThat(answer(withHeat("{ \"mode\": \"pan\", \"temperatureC\": 200 }")))
			.doesNotContain("heatSourceTemperatureC");
	}

	@Test
	void shouldDrawTheOilDownWithTheLoadAndSlowTheFry() throws Exception {
		String plain = answer(CHIPS);
		String loaded = answer(withHeat(
				"{ \"mode\": \"fryer\", \"temperatureC\": 175, \"fryer\": { \"oilLitres\": 8, \"heaterKw\": 3.2, \"loadKg\": 0.5 } }"));
		List<Double> oil = JsonPath.read(loaded, "$.series.heatSourceTemperatureC");
		List<Double> times = JsonPath.read(loaded, "$.series.timeS");
		assertThat(oil).hasSameSizeAs(times);
		// preheated to the set temperature when the basket goes in
		assertThat(oil.get(0)).isCloseTo(175.0, offset(0.5));
		// energy conservation: the cold load can only take heat out of the oil, so the
		// oil falls below its
		// set point and the food, in cooler oil, browns no sooner than in oil held at 175
		// °C
		assertThat(oil.stream().mapToDouble(Double::doubleValue).min().orElseThrow()).isLessThan(174.0);
		double held = JsonPath.<Double>read(plain, "$.timeToTargetS");
		double drawn = JsonPath.<Double>read(loaded, "$.timeToTargetS");
		assertThat(drawn).isGreaterThan(held);
		assertThat(loaded).contains("of food per batch drawing it down");
	}

	@Test
	void shouldTakeAPanWithDefaultsForWhatIsLeftOut() throws Exception {
		String full = answer(
				withHeat("{ \"mode\": \"pan\", \"temperatureC\": 200, \"pan\": { \"material\": \"cast-iron\", "
						+ "\"massKg\": 2.3, \"diameterCm\": 28, \"powerKw\": 2.5, \"control\": \"thermostat\", \"coverPct\": 50 } }"));
		String empty = answer(withHeat("{ \"mode\": \"pan\", \"temperatureC\": 200, \"pan\": { } }"));
		// the values given are PanBody.DEFAULT's, so an empty pan object gives the same
		// answer
		assertThat(empty).isEqualTo(full);
		List<Double> pan = JsonPath.read(full, "$.series.heatSourceTemperatureC");
		assertThat(pan.get(0)).isCloseTo(200.0, offset(0.5));
		String fixed = answer(withHeat(
				"{ \"mode\": \"pan\", \"temperatureC\": 200, \"pan\": { \"control\": \"fixed-input\", \"massKg\": 1.2 } }"));
		List<Double> lighter = JsonPath.read(fixed, "$.series.heatSourceTemperatureC");
		// a lighter pan on a flame that is not turned up falls further (m·c·ΔT = heat
		// drawn)
		assertThat(lighter.stream().mapToDouble(Double::doubleValue).min().orElseThrow())
			.isLessThan(pan.stream().mapToDouble(Double::doubleValue).min().orElseThrow());
	}

	@Nested
	class BadBodies {

		void rejects(String heat, String field) throws Exception {
			plan(withHeat(heat)).andExpect(status().isBadRequest())
				.andExpect(jsonPath("$.errors[*].field", hasItem(field)))
				.andExpect(jsonPath("$.errors[*].field", not(hasItem("heat"))));
		}

		@ParameterizedTest
		@CsvSource(delimiter = '|',
				value = { "\"massKg\": 0.1|heat.pan.massKg", "\"massKg\": \"heavy\"|heat.pan.massKg",
						"\"diameterCm\": 500|heat.pan.diameterCm", "\"powerKw\": 0|heat.pan.powerKw",
						"\"coverPct\": 120|heat.pan.coverPct", "\"material\": \"copper\"|heat.pan.material",
						"\"control\": \"by-hand\"|heat.pan.control", "\"material\": 7|heat.pan.material" })
		void shouldNameTheWrongPanField(String value, String field) throws Exception {
			rejects("{ \"mode\": \"pan\", \"temperatureC\": 200, \"pan\": { " + value + " } }", field);
		}

		@ParameterizedTest
		@CsvSource(delimiter = '|',
				value = { "\"oilLitres\": 0.2|heat.fryer.oilLitres", "\"heaterKw\": 99|heat.fryer.heaterKw",
						"\"loadKg\": 20|heat.fryer.loadKg", "\"loadKg\": [1]|heat.fryer.loadKg" })
		void shouldNameTheWrongFryerField(String value, String field) throws Exception {
			rejects("{ \"mode\": \"fryer\", \"temperatureC\": 175, \"fryer\": { " + value + " } }", field);
		}

		@Test
		void shouldRefuseABodyForAnotherModeOrOfTheWrongKind() throws Exception {
			rejects("{ \"mode\": \"pan\", \"temperatureC\": 200, \"fryer\": { } }", "heat.fryer");
			rejects("{ \"mode\": \"oven\", \"temperatureC\": 200, \"pan\": { } }", "heat.pan");
			rejects("{ \"mode\": \"pan\", \"temperatureC\": 200, \"pan\": 3 }", "heat.pan");
		}

		@Test
		void shouldNameABadTemperatureAndABadBodyTogether() throws Exception {
			plan(withHeat("{ \"mode\": \"fryer\", \"temperatureC\": 250, \"fryer\": { \"loadKg\": 20 } }"))
				.andExpect(status().isBadRequest())
				.andExpect(jsonPath("$.errors[*].field", hasItem("heat.temperatureC")))
				.andExpect(jsonPath("$.errors[*].field", hasItem("heat.fryer.loadKg")));
		}

	}

}
