package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.lessThan;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

import com.crustplan.CrustplanTest;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * The plans API with {@code steps}: a sear–oven–rest plan, one step against one setup,
 * bad step fields.
 */
@CrustplanTest
class PlanStepsApiTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	JsonMapper json;

	/**
	 * A 30 mm steak: 3 min in a 240 °C pan turned each minute, a 180 °C fan oven to 52 °C
	 * core, 5 min rest.
	 */
	static final String SEAR_OVEN_REST = """
			{ "surface": { "category": "meat", "thicknessMm": 30, "initialTemperatureC": 5 },
			  "steps": [
			    { "heat": { "mode": "pan", "temperatureC": 240, "flipEverySeconds": 60 }, "minutes": 3 },
			    { "heat": { "mode": "oven", "temperatureC": 180, "fan": true, "relativeHumidityPct": 0.2 },
			      "coreTemperatureC": 52, "minutes": 40 },
			    { "heat": { "mode": "rest" }, "minutes": 5 } ],
			  "target": { "stage": "browned", "coreTemperatureC": 52 },
			  "horizonMinutes": 60 }""";

	ResultActions plan(String body) throws Exception {
		return mvc
			.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(body));
	}

	@Test
	void shouldPlanSearOvenRestStepByStep() throws Exception {
		plan(SEAR_OVEN_REST).andExpect(status().isOk())
			.andExpect(jsonPath("$.steps", hasSize(3)))
			.andExpect(jsonPath("$.steps[0].endedBy").value("time"))
			.andExpect(jsonPath("$.steps[0].endS").value(closeTo(180, 1e-6)))
			.andExpect(jsonPath("$.steps[1].mode").value("oven"))
			.andExpect(jsonPath("$.steps[1].endedBy").value("core"))
			// the step ends on the time step that crosses 52 °C: within a kelvin of it
			.andExpect(jsonPath("$.steps[1].coreAtEndC").value(closeTo(52.5, 0.5)))
			.andExpect(jsonPath("$.steps[2].mode").value("rest"))
			.andExpect(jsonPath("$.steps[2].endS").value(closeTo(jsonStepEnd() + 300, 1e-6)))
			// carry-over: the core goes on rising after the pull (a few kelvin for a
			// thick cut, common kitchen experience)
			.andExpect(jsonPath("$.steps[2].coreAtEndC").value(greaterThan(52.0)))
			.andExpect(jsonPath("$.coreTargetC").value(52.0))
			.andExpect(jsonPath("$.coreTargetReachedS").value(greaterThan(180.0)))
			.andExpect(jsonPath("$.targets.text").isNotEmpty())
			.andExpect(jsonPath("$.timeline[*].kind", hasItem("flip")))
			.andExpect(jsonPath("$.timeline[*].kind", hasItem("probe")))
			.andExpect(jsonPath("$.timeline[*].text", hasItem("Into the oven at 180 °C")))
			.andExpect(jsonPath("$.timeline[*].text", hasItem("Pull at 52 °C core")))
			.andExpect(jsonPath("$.timeline[*].text", hasItem("Out to rest in 25 °C air")));
	}

	private double stepEnd = Double.NaN;

	private double jsonStepEnd() throws Exception {
		if (Double.isNaN(stepEnd)) {
			String out = plan(SEAR_OVEN_REST).andReturn().getResponse().getContentAsString();
			stepEnd = json.readTree(out).get("steps").get(1).get("endS").doubleValue();
		}
		return stepEnd;
	}

	@Test
	void shouldAimAtTheCoreAloneAndSayTheCrustDidNotComeFirst() throws Exception {
		plan("""
				{ "surface": { "category": "meat", "thicknessMm": 30 },
				  "steps": [ { "heat": { "mode": "oven", "temperatureC": 120, "fan": true, "relativeHumidityPct": 0.5 },
				               "coreTemperatureC": 55, "minutes": 90 } ],
				  "target": { "coreTemperatureC": 55 }, "horizonMinutes": 90 }""").andExpect(status().isOk())
			.andExpect(jsonPath("$.reached").value(true))
			.andExpect(jsonPath("$.target").value("core 55 °C"))
			.andExpect(jsonPath("$.timeToTargetS").value(greaterThan(600.0)));
	}

	/**
	 * Today's body and the same cook as one step: the same time to the target colour (the
	 * engine's boundary conservation, CookStepsTest), and today's answer carries none of
	 * the step fields.
	 */
	@Test
	void shouldAnswerOneStepAsTheOneSetupPlan() throws Exception {
		String heat = "{ \"mode\": \"fryer\", \"temperatureC\": 175 }";
		String surface = "{ \"category\": \"potato\", \"thicknessMm\": 10, \"initialTemperatureC\": 5 }";
		JsonNode one = read(plan("{ \"surface\": " + surface + ", \"heat\": " + heat
				+ ", \"target\": { \"stage\": \"golden\" }, \"horizonMinutes\": 30 }"));
		JsonNode stepped = read(plan("{ \"surface\": " + surface + ", \"steps\": [ { \"heat\": " + heat
				+ ", \"minutes\": 30 } ], \"target\": { \"stage\": \"golden\" }, \"horizonMinutes\": 30 }"));
		assertThat(one.get("reached").booleanValue()).isTrue();
		assertThat(stepped.get("timeToTargetS").doubleValue()).isEqualTo(one.get("timeToTargetS").doubleValue());
		assertThat(stepped.get("coreTemperatureAtTargetC").doubleValue())
			.isEqualTo(one.get("coreTemperatureAtTargetC").doubleValue());
		assertThat(stepped.get("acrylamide").get("crustUgPerKg").doubleValue())
			.isEqualTo(one.get("acrylamide").get("crustUgPerKg").doubleValue());
		for (String f : new String[] { "steps", "coreTargetC", "coreTargetReachedS", "targets", "timeline" }) {
			assertThat(one.has(f)).as(f).isFalse();
			assertThat(stepped.has(f) || f.equals("coreTargetC") || f.equals("coreTargetReachedS")).as(f).isTrue();
		}
	}

	JsonNode read(ResultActions r) throws Exception {
		r.andExpect(status().isOk());
		return json.readTree(r.andReturn().getResponse().getContentAsString());
	}

	@ParameterizedTest(name = "{1}")
	@CsvSource(delimiter = '|', value = { "\"minutes\": 5 }|\"minutes\": -1 }|steps[2].minutes",
			"\"minutes\": 5 }|\"minutes\": 400 }|steps[2].minutes",
			"\"minutes\": 5 }|\"minutes\": \"five\" }|steps[2].minutes",
			"\"minutes\": 5 }|\"stage\": \"golden\" }|steps[2].stage",
			"\"minutes\": 5 }|\"coreTemperatureC\": 300 }|steps[2].coreTemperatureC",
			"{ \"mode\": \"rest\" }, \"minutes\": 5|1, \"minutes\": 5|steps[2].heat",
			"{ \"mode\": \"rest\" }, \"minutes\": 5|{ \"mode\": \"rest\", \"temperatureC\": 90 }, \"minutes\": 5|steps[2].heat.temperatureC",
			"\"temperatureC\": 240|\"temperatureC\": 400|steps[0].heat.temperatureC",
			"\"mode\": \"oven\"|\"mode\": \"kiln\"|steps[1].heat.mode",
			"\"coreTemperatureC\": 52, \"minutes\": 40|\"fan\": true|steps[1]",
			"\"stage\": \"browned\", \"coreTemperatureC\": 52|\"coreTemperatureC\": 200|target.coreTemperatureC",
			"\"stage\": \"browned\", \"coreTemperatureC\": 52|\"stage\": \"toast\"|target.stage",
			"\"horizonMinutes\": 60|\"horizonMinutes\": 60, \"heat\": { \"mode\": \"pan\", \"temperatureC\": 200 }|heat" })
	void shouldNameTheBadStepFieldByItsJsonPath(String from, String to, String field) throws Exception {
		String body = SEAR_OVEN_REST.replace(from, to);
		assertThat(body).isNotEqualTo(SEAR_OVEN_REST);
		plan(body).andExpect(status().isBadRequest())
			.andExpect(jsonPath("$.errors[*].field", hasItem(field)))
			.andExpect(jsonPath("$.errors[0].message").isNotEmpty());
	}

	@Test
	void shouldRefuseNoStepsAndTooMany() throws Exception {
		plan(SEAR_OVEN_REST.replaceAll("(?s)\"steps\": \\[.*\\],\\s*\"target\"", "\"steps\": [], \"target\""))
			.andExpect(status().isBadRequest())
			.andExpect(jsonPath("$.errors[*].field", hasItem("steps")));
		String rest = "{ \"heat\": { \"mode\": \"rest\" }, \"minutes\": 1 }";
		plan(SEAR_OVEN_REST.replaceAll("(?s)\"steps\": \\[.*\\],\\s*\"target\"",
				"\"steps\": [" + String.join(",", java.util.Collections.nCopies(13, rest)) + "], \"target\""))
			.andExpect(status().isBadRequest())
			.andExpect(jsonPath("$.errors[*].field", hasItem("steps")))
			.andExpect(jsonPath("$.errors.length()").value(lessThan(2)));
	}

}
