package com.crustplan.plan.search;

import static org.assertj.core.api.Assertions.assertThat;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.oneOf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.heat.DeepFryer;

import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanService;

import tools.jackson.databind.json.JsonMapper;

/**
 * {@code POST /api/v1/maps}: a settings × time grid; each row's target time is the one a
 * plan at that setting gives.
 */
@CrustplanTest
class SettingMapApiTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	PlanService planner;

	@Autowired
	JsonMapper json;

	ResultActions map(String body) throws Exception {
		return mvc
			.perform(post("/api/v1/maps").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(body));
	}

	@Test
	@SuppressWarnings("unchecked")
	void shouldAnswerAGridOfStageCoreAndZoneWhoseTargetLineMatchesThePlans() throws Exception {
		String body = map("""
				{ "surface": %s, "heat": { "mode": "fryer" }, "range": { "fromC": 160, "toC": 180, "stepC": 10 },
				  "target": { "stage": "golden" }, "minutes": 10, "stepMinutes": 1 }"""
			.formatted(SettingSearchApiTest.CHIPS)).andExpect(status().isOk())
			.andExpect(jsonPath("$.rows.length()").value(3))
			.andExpect(jsonPath("$.timesS.length()").value(11))
			.andExpect(jsonPath("$.cells").value(33))
			.andExpect(jsonPath("$.benchmarkUgPerKg").value(500.0))
			.andExpect(jsonPath("$.rows[0].cells[10].stage").isNotEmpty())
			.andExpect(jsonPath("$.rows[0].cells[10].coreC").isNumber())
			// nothing has formed in raw food; after 10 min the zone is one of the three
			// bands
			.andExpect(jsonPath("$.rows[0].cells[0].zone").value("low"))
			.andExpect(jsonPath("$.rows[0].cells[10].zone").value(oneOf("low", "elevated", "high")))
			.andReturn()
			.getResponse()
			.getContentAsString();
		Map<String, Object> m = json.readValue(body, Map.class);
		for (Map<String, Object> row : (List<Map<String, Object>>) m.get("rows")) {
			double t = ((Number) ((Map<String, Object>) row.get("setting")).get("temperatureC")).doubleValue();
			PlanReport r = planner.plan(SettingSearchApiTest.CHIPS_SURFACE, Product.defaultFor(FoodCategory.POTATO),
					new DeepFryer(t), Target.stage("golden"), 10, false);
			assertThat(((Number) row.get("targetReachedS")).doubleValue()).as("target line at %s °C", t)
				.isCloseTo(r.timeToTargetS(), org.assertj.core.data.Offset.offset(1.0));
		}
	}

	@Test
	void shouldMapOvenSteamSharesAsRowsWithoutATarget() throws Exception {
		map("""
				{ "surface": { "category": "bread" }, "heat": { "mode": "oven", "fan": false },
				  "range": { "fromC": 200, "toC": 220, "stepC": 20, "steamPct": [2, 40] }, "minutes": 12, "stepMinutes": 2 }""")
			.andExpect(status().isOk())
			.andExpect(jsonPath("$.rows.length()").value(4))
			.andExpect(jsonPath("$.rows[1].setting.steamPct").value(40.0))
			.andExpect(jsonPath("$.rows[0].targetReachedS").doesNotExist())
			.andExpect(jsonPath("$.target").doesNotExist());
		// the oven itself is the plans API's: steam above 100 % is refused on the field
		SettingSearchApiTest.isProblem(map("""
				{ "surface": { "category": "bread" }, "heat": { "mode": "oven" },
				  "range": { "fromC": 200, "toC": 220, "stepC": 20, "steamPct": [120] } }"""), 400)
			.andExpect(jsonPath("$.errors[0].field").value("range.steamPct"));
	}

	/** A grill map without a temperature takes the usual element range, 500–1000 °C. */
	@Test
	void shouldMapAGrillOverItsUsualElementRange() throws Exception {
		map("""
				{ "surface": { "category": "meat", "thicknessMm": 15 }, "heat": { "mode": "grill" },
				  "minutes": 10, "stepMinutes": 2 }""").andExpect(status().isOk())
			.andExpect(jsonPath("$.rows.length()").value(11))
			.andExpect(jsonPath("$.rows[0].setting.temperatureC").value(500.0))
			.andExpect(jsonPath("$.rows[0].cells[0].zone").doesNotExist());
	}

	@Test
	void shouldBoundTheGridAndSaySo() throws Exception {
		SettingSearchApiTest.isProblem(
				map("""
						{ "surface": { "category": "potato" }, "heat": { "mode": "fryer" }, "minutes": 60, "stepMinutes": 0.5 }"""),
				400)
			.andExpect(jsonPath("$.errors[0].field").value("stepMinutes"))
			.andExpect(jsonPath("$.errors[0].message", containsString("at most 40 time steps")));
		SettingSearchApiTest.isProblem(
				map("""
						{ "surface": { "category": "potato" }, "heat": { "mode": "pan" }, "range": { "fromC": 100, "toC": 300, "stepC": 10 } }"""),
				400)
			.andExpect(jsonPath("$.errors[0].field").value("range"))
			.andExpect(jsonPath("$.errors[0].message", containsString("at most 15")));
		SettingSearchApiTest.isProblem(map("""
				{ "heat": { "mode": "grill", "heatFluxKwPerM2": 14 }, "target": { "coreTemperatureC": 60 } }"""), 400)
			.andExpect(jsonPath("$.errors[*].field", hasItem("surface")))
			.andExpect(jsonPath("$.errors[*].field", hasItem("heat.heatFluxKwPerM2")))
			.andExpect(jsonPath("$.errors[*].field", hasItem("target.coreTemperatureC")));
	}

}
