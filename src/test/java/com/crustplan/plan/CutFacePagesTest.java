package com.crustplan.plan;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.not;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.anonymous;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.content;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.jsonPath;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.http.MediaType;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * The cut face on the plan page: drawn for meat, poultry and fish, not for bread or
 * fries; the API carries the profile, band depth and centre.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class CutFacePagesTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@ParameterizedTest
	@CsvSource({ "'Sirloin steak, 30 mm, patted dry', 'Plancha, high', browned",
			"'Chicken thigh, skin on', 'Combi oven, dry fan', golden",
			"'Hake fillet, skin side', 'Combi oven, dry fan', golden" })
	void shouldDrawTheCutFaceForMuscleFoods(String surface, String setup, String stage) throws Exception {
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface(surface)))
			.param("setupId", String.valueOf(demo.setup(setup)))
			.param("targetStage", stage))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"cut-face-drawing\"")))
			.andExpect(content().string(containsString("<svg")))
			.andExpect(content().string(containsString("Centre at ")));
	}

	@ParameterizedTest
	@CsvSource({ "'Chips, 10 mm, blanched', 'Fryer, chips', golden", "'Sourdough loaf', 'Deck oven, bread', golden" })
	void shouldNotDrawACutFaceForBreadOrFries(String surface, String setup, String stage) throws Exception {
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface(surface)))
			.param("setupId", String.valueOf(demo.setup(setup)))
			.param("targetStage", stage))
			.andExpect(status().isOk())
			.andExpect(content().string(not(containsString("cut-face-drawing"))));
	}

	/**
	 * A cook compares the drawing with a cut steak: the drawing has a key to its three
	 * colours, and a slab's crust and band are given per face, each named.
	 */
	@Test
	void shouldKeyTheDrawingAndNameTheFacesOfASlab() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Sirloin steak, 30 mm, patted dry")))
			.param("setupId", String.valueOf(demo.setup("Plancha, high")))
			.param("targetStage", "browned"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("id=\"cut-face-key\"")))
			.andExpect(content().string(containsString("> centre</li>")))
			.andExpect(content().string(containsString("Crust (upper / lower face)")))
			.andExpect(content().string(containsString("Cooked band (upper / lower face)")))
			.andExpect(content().string(containsString("slab, 30\u00a0mm thick")));
	}

	/**
	 * The demo skillet never turns the food: the face up meets only kitchen air and has
	 * no band, which the sentence and the figures say rather than "0.0 mm".
	 */
	@Test
	void shouldSayTheFaceThatNeverSawTheHeatHasNoBand() throws Exception {
		mvc.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Sirloin steak, 30 mm, patted dry")))
			.param("setupId", String.valueOf(demo.setup("Cast-iron skillet, medium-high")))
			.param("targetStage", "browned"))
			.andExpect(status().isOk())
			.andExpect(content().string(containsString("deep under the seared face; none under the other face")))
			.andExpect(content().string(not(containsString("0.0\u00a0mm under"))))
			.andExpect(content().string(
					org.hamcrest.Matchers.matchesPattern("(?s).*id=\"cut-face-band\">[0-9.]+\u00a0mm / none</dd>.*")));
	}

	@Test
	void shouldCarryTheInteriorInTheApiAnswerForASteamedSteak() throws Exception {
		String steamed = """
				{ "surface": { "category": "meat", "thicknessMm": 25 },
				  "steps": [ { "heat": { "mode": "oven", "temperatureC": 100, "fan": true, "steamPct": 100 },
				               "minutes": 30 } ],
				  "target": { "coreTemperatureC": 95 },
				  "horizonMinutes": 40 }""";
		mvc.perform(post("/api/v1/plans").with(anonymous()).contentType(MediaType.APPLICATION_JSON).content(steamed))
			.andExpect(status().isOk())
			.andExpect(jsonPath("$.interior.cookedThrough").value(true))
			.andExpect(jsonPath("$.interior.centreCode").value("interior.centre.meat.well"))
			.andExpect(jsonPath("$.interior.centrePeakTemperatureC").value(greaterThan(95.0)))
			.andExpect(jsonPath("$.interior.profile.length()").value(greaterThan(10)))
			.andExpect(jsonPath("$.interior.band").value(containsString("right through")));
	}

	@Test
	void shouldLeaveTheInteriorOutForFries() throws Exception {
		mvc.perform(post("/api/v1/plans").with(anonymous())
			.contentType(MediaType.APPLICATION_JSON)
			.content(PlanApiTest.CHIPS)).andExpect(status().isOk()).andExpect(jsonPath("$.interior").doesNotExist());
	}

}
