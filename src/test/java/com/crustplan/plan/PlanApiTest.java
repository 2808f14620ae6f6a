package com.crustplan.plan;

import static org.hamcrest.Matchers.anyOf;
import static org.hamcrest.Matchers.both;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasSize;
import static org.hamcrest.Matchers.lessThan;
import static org.hamcrest.Matchers.nullValue;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.ResultActions;

import com.crustplan.CrustplanTest;

/** JSON API v1, called without signing in (it computes and saves nothing). */
@CrustplanTest
class PlanApiTest {

	@Autowired
	MockMvc mvc;

	/**
	 * The request body of the issue, potato chips in a 175 °C fryer, with starch 16.4 %
	 * instead of 17 %: the example adds up to 100.6 %, which the engine rightly
	 * refuses.
	 */
	static final String CHIPS = """
			{ "surface": { "category": "potato", "waterPct": 78, "proteinPct": 2, "fatPct": 0.1,
			    "reducingSugarPct": 0.3, "sucrosePct": 0.2, "starchPct": 16.4, "fibrePct": 2, "ashPct": 1,
			    "asparagineMgPerKg": 3000, "surfaceWaterGPerM2": 20, "thicknessMm": 10,
			    "pH": 6.0, "bicarbonateGPerKg": 0, "acidGPerKg": 0, "initialTemperatureC": 5 },
			  "heat": { "mode": "fryer", "temperatureC": 175 },
			  "target": { "stage": "golden" },
			  "horizonMinutes": 30 }""";

	ResultActions plan(String body) throws Exception {
		return mvc
			.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(body));
	}

	@Test
	void shouldListCategoriesWithDefaultsAndStagesWithoutSignIn() throws Exception {
		mvc.perform(get("/api/v1/categories").with(anonymous()))
			.andExpect(status().isOk())
			.andExpect(jsonPath("$", hasSize(7)))
			.andExpect(jsonPath("$[*].key", hasItem("poultry-skin")))
			.andExpect(jsonPath("$[?(@.key=='potato')].defaults.waterPct").value(79.0))
			.andExpect(jsonPath("$[?(@.key=='potato')].stages[*].key", hasItem("golden")));
	}

	@Test
	void shouldComputeAPlanWithoutSavingOrSigningIn() throws Exception {
		plan(CHIPS).andExpect(status().isOk())
			.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_JSON))
			.andExpect(jsonPath("$.reached").value(true))
			.andExpect(jsonPath("$.timeToTargetS").value(greaterThan(0.0)))
			// pH given as 6.0 with no additions stays 6.0
			.andExpect(jsonPath("$.pH").value(6.0))
			.andExpect(jsonPath("$.series.timeS.length()").value(greaterThan(10)))
			.andExpect(jsonPath("$.series.colorHex[0]").value(org.hamcrest.Matchers.matchesPattern("#[0-9a-fA-F]{6}")))
			// potato without a named product is benchmarked as French fries: 500 µg/kg
			// (Reg. (EU) 2017/2158, Annex IV)
			.andExpect(jsonPath("$.acrylamide.benchmarkUgPerKg").value(500.0))
			.andExpect(jsonPath("$.assumptions.length()").value(greaterThan(0)))
			.andExpect(jsonPath("$.cautions[*]", hasItem(containsString("Hot oil"))));
	}

	@Test
	void shouldFillOptionalFieldsFromTheCategoryDefaults() throws Exception {
		plan("""
				{ "surface": { "category": "meat" }, "heat": { "mode": "pan", "temperatureC": 220 },
				  "target": { "stage": "browned" } }""").andExpect(status().isOk())
			// the meat category's typical pH is 5.6 (beef 5.5–5.8, food pH tables)
			.andExpect(jsonPath("$.pH").value(5.6));
	}

	@Test
	void shouldWarnWhenFryingPotatoAt175OrAbove() throws Exception {
		plan(CHIPS.replace("\"temperatureC\": 175", "\"temperatureC\": 190")).andExpect(status().isOk())
			// Commission Regulation (EU) 2017/2158, Annex II: fry potato products below
			// 175 °C
			.andExpect(jsonPath("$.warnings[*].code", hasItem("frying-at-175-or-above")));
	}

	@Test
	void shouldWarnThatChickenGoldenInADryOvenHasADryCore() throws Exception {
		plan("""
				{ "surface": { "category": "poultry-skin" },
				  "heat": { "mode": "oven", "temperatureC": 200, "fan": true, "relativeHumidityPct": 0 },
				  "target": { "stage": "golden" } }""").andExpect(status().isOk())
			// poultry breast dries past about 80 °C (common practice); the core here
			// nears 99 °C
			.andExpect(jsonPath("$.warnings[*].code", hasItem("core-past-juiciness")))
			.andExpect(jsonPath("$.warnings[*].message", hasItem(containsString("80 °C"))));
	}

	@Test
	void shouldEstimateAcrylamideAgainstTheFrenchFriesBenchmark() throws Exception {
		plan(CHIPS.replace("\"category\": \"potato\"", "\"category\": \"potato\", \"product\": \"french-fries\"")
			.replaceFirst("\\}\\s*$", ", \"mitigations\": true }")).andExpect(status().isOk())
			// Commission Regulation (EU) 2017/2158, Annex IV: French fries (ready-to-eat)
			// 500 µg/kg
			.andExpect(jsonPath("$.acrylamide.benchmarkUgPerKg").value(500.0))
			.andExpect(jsonPath("$.acrylamide.zone").value(org.hamcrest.Matchers.oneOf("low", "elevated", "high")))
			.andExpect(jsonPath("$.acrylamide.portionUgPerKg").value(greaterThan(0.0)))
			.andExpect(jsonPath("$.acrylamide.mitigations.length()").value(greaterThan(0)));
	}

	@Test
	void shouldGiveNoBenchmarkForMeat() throws Exception {
		plan("""
				{ "surface": { "category": "meat" }, "heat": { "mode": "pan", "temperatureC": 220 },
				  "target": { "stage": "browned" }, "mitigations": false }""").andExpect(status().isOk())
			// the regulation sets no benchmark for meat
			.andExpect(jsonPath("$.acrylamide.benchmarkUgPerKg").value(nullValue()))
			.andExpect(jsonPath("$.acrylamide.zone").value(nullValue()))
			.andExpect(jsonPath("$.acrylamide.mitigations.length()").value(0));
	}

	/**
	 * Water and frying oil in the whole piece at the target, g per 100 g. Common
	 * practice: a finished fry holds about 40 % water and 10–15 % oil; the bounds are
	 * wide on purpose (this checks that the API reports the engine's figures in their
	 * unit, the engine's own tests hold the physics).
	 */
	@Nested
	class WaterAndOilAtTheTarget {

		static final String FRIES = """
				{ "surface": { "category": "potato", "product": "french-fries", "thicknessMm": 10 },
				  "heat": { "mode": "fryer", "temperatureC": 175 },
				  "target": { "stage": "golden" } }""";

		@Test
		void shouldReportWaterAndOilOfAGoldenFry() throws Exception {
			plan(FRIES).andExpect(status().isOk())
				.andExpect(jsonPath("$.reached").value(true))
				.andExpect(jsonPath("$.waterAtTargetPct").value(both(greaterThan(20.0)).and(lessThan(60.0))))
				.andExpect(jsonPath("$.oilAtTargetPct").value(both(greaterThan(5.0)).and(lessThan(25.0))));
		}

		@Test
		void shouldReportThemForAFryInSteps() throws Exception {
			// blanch at 140 °C, rest, finish at 180 °C to golden (the two-stage fry of
			// common practice)
			plan("""
					{ "surface": { "category": "potato", "product": "french-fries", "thicknessMm": 10 },
					  "steps": [
					    { "heat": { "mode": "fryer", "temperatureC": 140 }, "minutes": 5 },
					    { "heat": { "mode": "rest" }, "minutes": 10 },
					    { "heat": { "mode": "fryer", "temperatureC": 180 }, "stage": "golden", "minutes": 10 } ],
					  "target": { "stage": "golden" } }""").andExpect(status().isOk())
				.andExpect(jsonPath("$.steps", hasSize(3)))
				.andExpect(jsonPath("$.waterAtTargetPct").value(both(greaterThan(20.0)).and(lessThan(60.0))))
				.andExpect(jsonPath("$.oilAtTargetPct").value(both(greaterThan(5.0)).and(lessThan(25.0))));
		}

		@Test
		void shouldReportNoOilForASearedSteak() throws Exception {
			// a pan sear takes up no frying oil; raw beef is about 70-75 % water (food
			// composition tables) and a seared steak keeps most of it
			plan("""
					{ "surface": { "category": "meat", "thicknessMm": 25 },
					  "heat": { "mode": "pan", "temperatureC": 230, "flipEverySeconds": 60 },
					  "target": { "stage": "browned" } }""").andExpect(status().isOk())
				.andExpect(jsonPath("$.oilAtTargetPct").value(anyOf(nullValue(), closeTo(0.0, 1e-9))))
				.andExpect(jsonPath("$.waterAtTargetPct").value(both(greaterThan(55.0)).and(lessThan(76.0))));
		}

		@Test
		void shouldGiveNullWhereTheTargetIsNotReached() throws Exception {
			plan(CHIPS.replace("\"horizonMinutes\": 30", "\"horizonMinutes\": 1")).andExpect(status().isOk())
				.andExpect(jsonPath("$.reached").value(false))
				.andExpect(jsonPath("$.waterAtTargetPct").value(nullValue()))
				.andExpect(jsonPath("$.oilAtTargetPct").value(nullValue()));
		}

	}

	static String oven(String heatFields) {
		return """
				{ "surface": { "category": "poultry-skin" },
				  "heat": { "mode": "oven", "temperatureC": 200, "fan": true, %s },
				  "target": { "stage": "golden" }, "mitigations": false }""".formatted(heatFields);
	}

	@Test
	void shouldTakeTheSteamShareAndSayItsDewPoint() throws Exception {
		// 20 % steam: p_v = 20.27 kPa; steam tables (IAPWS-IF97) give 19.95 kPa at 60 °C,
		// so about 60 °C
		plan(oven("\"steamPct\": 20")).andExpect(status().isOk())
			.andExpect(jsonPath("$.deprecations").doesNotExist()) // only answers to the
																	// old field carry the
																	// list
			.andExpect(
					jsonPath("$.assumptions[*]", hasItem(containsString("20.0 % steam by volume: dew point 60 °C"))));
	}

	@Test
	void shouldStillReadTheOldHumidityFieldAsTheMigrationDoesAndSaySo() throws Exception {
		// the V5 rule: a "dry fan, 10 %" reading is dry kitchen air, 1.6 % steam (dew
		// point 14 °C: p_v =
		// 1.58 kPa, saturation at 13.8 °C in the steam tables), not the pure steam RH at
		// 200 °C made of it
		plan(oven("\"relativeHumidityPct\": 10")).andExpect(status().isOk())
			.andExpect(jsonPath("$.deprecations[0]", containsString("heat.relativeHumidityPct is deprecated")))
			.andExpect(jsonPath("$.deprecations[0]", containsString("heat.steamPct")))
			.andExpect(jsonPath("$.assumptions[*]", hasItem(containsString("1.6 % steam by volume: dew point 14 °C"))));
		// 80 → 1.6 + 70·98.4/90 = 78.1 % steam
		plan(oven("\"relativeHumidityPct\": 80")).andExpect(status().isOk())
			.andExpect(jsonPath("$.assumptions[*]", hasItem(containsString("78.1 % steam by volume"))));
	}

	@Test
	void shouldTakeAGrillByHeatFluxOrByElementAndDistanceAndTodaysFields() throws Exception {
		String toast = """
				{ "surface": { "category": "bread", "thicknessMm": 12 }, "heat": { "mode": "grill", %s },
				  "target": { "stage": "golden" }, "mitigations": false }""";
		plan(toast.formatted("\"grill\": \"salamander\", \"heatFluxKwPerM2\": 10, \"flipEverySeconds\": 0"))
			.andExpect(status().isOk())
			.andExpect(jsonPath("$.reached").value(true))
			.andExpect(jsonPath("$.assumptions[*]", hasItem(containsString("10.0 kW/m² at the food"))));
		plan(toast.formatted("\"grill\": \"broiler\", \"temperatureC\": 800, \"distanceMm\": 100"))
			.andExpect(status().isOk())
			.andExpect(jsonPath("$.assumptions[*]", hasItem(containsString("food 100 mm from the heater"))));
		// round one's body: an element temperature and a flip interval
		plan(toast.formatted("\"temperatureC\": 800, \"flipEverySeconds\": 0")).andExpect(status().isOk())
			.andExpect(jsonPath("$.assumptions[*]",
					hasItem(containsString("The cook stops if the surface passes 250 °C"))));
	}

	@Test
	void shouldStopAndWarnWhereTheSurfaceWouldChar() throws Exception {
		// 40 kW/m² on a 12 mm slice: the surface passes 250 °C well before the slice is
		// dark
		plan("""
				{ "surface": { "category": "bread", "thicknessMm": 12 },
				  "heat": { "mode": "grill", "heatFluxKwPerM2": 40, "flipEverySeconds": 0 },
				  "target": { "stage": "dark" }, "mitigations": false }""").andExpect(status().isOk())
			.andExpect(jsonPath("$.reached").value(false))
			.andExpect(jsonPath("$.warnings[*].code", hasItem("surface-limit")))
			.andExpect(jsonPath("$.warnings[*].message", hasItem(containsString("The surface passes 250 °C"))));
	}

	@Nested
	class BadInput {

		@Test
		void shouldNameTheOvenAndGrillFieldsThatAreWrong() throws Exception {
			rejects(oven("\"steamPct\": 120"), "heat.steamPct");
			rejects(oven("\"relativeHumidityPct\": -5"), "heat.relativeHumidityPct");
			rejects(oven("\"steamPct\": 20, \"relativeHumidityPct\": 10"), "heat.relativeHumidityPct");
			rejects(CHIPS.replace("\"mode\": \"fryer\", \"temperatureC\": 175",
					"\"mode\": \"grill\", \"heatFluxKwPerM2\": 90"), "heat.heatFluxKwPerM2");
			rejects(CHIPS.replace("\"mode\": \"fryer\", \"temperatureC\": 175",
					"\"mode\": \"grill\", \"grill\": \"toaster\", \"temperatureC\": 800"), "heat.grill");
			rejects(CHIPS.replace("\"mode\": \"fryer\", \"temperatureC\": 175",
					"\"mode\": \"grill\", \"temperatureC\": 800, \"distanceMm\": 5"), "heat.distanceMm");
			rejects(CHIPS.replace("\"mode\": \"fryer\", \"temperatureC\": 175",
					"\"mode\": \"grill\", \"grill\": \"salamander\""), "heat.temperatureC");
		}

		void rejects(String body, String field) throws Exception {
			plan(body).andExpect(status().isBadRequest())
				.andExpect(content().contentTypeCompatibleWith(MediaType.APPLICATION_PROBLEM_JSON))
				.andExpect(jsonPath("$.errors[*].field", hasItem(field)))
				.andExpect(jsonPath("$.errors[0].message").isNotEmpty());
		}

		@Test
		void shouldRejectACompositionOverHundredPercent() throws Exception {
			rejects(CHIPS.replace("\"starchPct\": 16.4", "\"starchPct\": 40"), "surface.composition");
		}

		@Test
		void shouldRejectANegativeValue() throws Exception {
			rejects(CHIPS.replace("\"waterPct\": 78", "\"waterPct\": -1"), "surface.waterPct");
		}

		@ParameterizedTest
		@CsvSource({ "0", "250", "-5" })
		void shouldRejectAThicknessOutsideTheModel(String mm) throws Exception {
			rejects(CHIPS.replace("\"thicknessMm\": 10", "\"thicknessMm\": " + mm), "surface.thicknessMm");
		}

		@ParameterizedTest
		@CsvSource({ "fryer, 250", "oven, 400", "pan, 50", "grill, 100" })
		void shouldRejectATemperatureOutsideWhatTheModeAllows(String mode, String t) throws Exception {
			rejects(CHIPS.replace("\"mode\": \"fryer\", \"temperatureC\": 175",
					"\"mode\": \"" + mode + "\", \"temperatureC\": " + t), "heat.temperatureC");
		}

		@Test
		void shouldRejectAProductOfAnotherCategory() throws Exception {
			rejects(CHIPS.replace("\"category\": \"potato\"", "\"category\": \"potato\", \"product\": \"biscuits\""),
					"surface.product");
			rejects(CHIPS.replace("\"category\": \"potato\"", "\"category\": \"potato\", \"product\": 7"),
					"surface.product");
		}

		@Test
		void shouldRejectAnUnknownModeCategoryAndStage() throws Exception {
			rejects(CHIPS.replace("\"fryer\"", "\"microwave\""), "heat.mode");
			rejects(CHIPS.replace("\"potato\"", "\"unicorn\""), "surface.category");
			rejects(CHIPS.replace("\"golden\"", "\"mahogany\""), "target.stage");
		}

		@Test
		void shouldRejectMalformedJson() throws Exception {
			rejects(CHIPS.substring(0, 40), "body");
			rejects("not json at all", "body");
			rejects("", "body");
			rejects("[1, 2, 3]", "body");
			rejects("null", "body");
		}

		@ParameterizedTest
		@CsvSource(delimiter = '|',
				value = { "NaN|surface.waterPct", "Infinity|surface.waterPct", "-Infinity|surface.waterPct",
						"\"NaN\"|surface.waterPct", "\"Infinity\"|surface.waterPct", "1e400|surface.waterPct",
						"\"78\"|surface.waterPct", "true|surface.waterPct", "{}|surface.waterPct",
						"[78]|surface.waterPct" })
		void shouldRejectNonFiniteAndWronglyTypedNumbers(String value, String field) throws Exception {
			String body = CHIPS.replace("\"waterPct\": 78", "\"waterPct\": " + value);
			if (value.equals("NaN") || value.contains("Infinity") && !value.startsWith("\"")) {
				// bare NaN and Infinity are not JSON (RFC 8259): the body itself is
				// malformed
				rejects(body, "body");
			}
			else {
				rejects(body, field);
			}
		}

		@Test
		void shouldRejectMissingObjectsAndTargets() throws Exception {
			rejects("{ \"heat\": { \"mode\": \"pan\", \"temperatureC\": 200 }, \"target\": { \"lightness\": 60 } }",
					"surface");
			rejects(CHIPS.replace("\"heat\": { \"mode\": \"fryer\", \"temperatureC\": 175 },", ""), "heat");
			rejects(CHIPS.replace("{ \"stage\": \"golden\" }", "{ }"), "target");
			rejects(CHIPS.replace("{ \"stage\": \"golden\" }", "{ \"stage\": \"golden\", \"lightness\": 60 }"),
					"target");
			rejects(CHIPS.replace("{ \"stage\": \"golden\" }", "\"golden\""), "target");
		}

		@Test
		void shouldRejectALightnessThePathNeverReachesAndAHorizonOverSixHours() throws Exception {
			rejects(CHIPS.replace("{ \"stage\": \"golden\" }", "{ \"lightness\": 5 }"), "target.lightness");
			rejects(CHIPS.replace("\"horizonMinutes\": 30", "\"horizonMinutes\": 999"), "horizonMinutes");
		}

		@Test
		void shouldRejectBadTypesInTheHeatSettings() throws Exception {
			rejects(CHIPS.replace("\"temperatureC\": 175", "\"temperatureC\": 175, \"fan\": \"yes\""), "heat.fan");
			rejects(CHIPS.replace("\"mode\": \"fryer\"", "\"mode\": 3"), "heat.mode");
			rejects(CHIPS.replace("\"potato\"", "\"" + "x".repeat(5000) + "\""), "surface.category");
		}

	}

	@Test
	void shouldAnswerOtherApiCallsWithoutSignInAs401Json() throws Exception {
		mvc.perform(get("/api/v1/plans").with(anonymous()))
			.andExpect(status().isUnauthorized())
			.andExpect(jsonPath("$.errors[0].field").value("authorization"));
	}

}
