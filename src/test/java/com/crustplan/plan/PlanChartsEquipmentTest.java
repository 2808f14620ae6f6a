package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;

import com.jayway.jsonpath.JsonPath;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * The plan page's temperature chart gets the pan's or the oil's line where the heat has a
 * body.
 */
@CrustplanTest
@WithMockUser(username = "chef", roles = "CHEF")
class PlanChartsEquipmentTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	String chartJson(String surface, String setup, String stage) throws Exception {
		return (String) mvc
			.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface(surface)))
				.param("setupId", String.valueOf(demo.setup(setup)))
				.param("targetStage", stage))
			.andExpect(status().isOk())
			.andReturn()
			.getModelAndView()
			.getModel()
			.get("chartJson");
	}

	@Test
	void shouldDrawTheOilDrawnDownByTheDemoFryersLoad() throws Exception {
		String d = chartJson("Chips, 10 mm, blanched", "Fryer, chips", "golden");
		assertThat(JsonPath.<String>read(d, "$.heatSourceLabel")).isEqualTo("Oil");
		List<Double> oil = JsonPath.read(d, "$.heatSourceTemperature");
		assertThat(oil).hasSameSizeAs(JsonPath.<List<Double>>read(d, "$.timeMin"));
		// preheated to the set 175 °C; a cold basket can only take heat out of the oil
		// (energy balance)
		assertThat(oil.get(0)).isEqualTo(175.0);
		assertThat(oil.stream().mapToDouble(Double::doubleValue).min().orElseThrow()).isLessThan(175.0);
		// the assumptions say what load was assumed: the demo fryer's 8 L, 3.2 kW, 0.5 kg
		String page = mvc
			.perform(get("/plan").param("surfaceId", String.valueOf(demo.surface("Chips, 10 mm, blanched")))
				.param("setupId", String.valueOf(demo.setup("Fryer, chips")))
				.param("targetStage", "golden"))
			.andReturn()
			.getResponse()
			.getContentAsString();
		assertThat(page).contains("of food per batch drawing it down")
			.contains("8.0\u00a0L of oil, a 3.2\u00a0kW heater")
			.contains("0.50\u00a0kg of food per batch");
	}

	@Test
	void shouldDrawAFarSideOnlyForASlabHeatedFromOneFace() throws Exception {
		// a steak on a plancha: the face up is far cooler than the face down
		assertThat(chartJson("Sirloin steak, 30 mm, patted dry", "Plancha, high", "browned"))
			.contains("otherFaceTemperature");
		// a strip in a fryer is heated all round: no far side to draw
		assertThat(chartJson("Chips, 10 mm, blanched", "Fryer, chips", "golden"))
			.doesNotContain("otherFaceTemperature");
	}

	@Test
	void shouldDrawNoHeatSourceLineForAnOven() throws Exception {
		String d = chartJson("Chips, 10 mm, blanched", "Combi oven, dry fan", "golden");
		assertThat(d).doesNotContain("heatSourceTemperature");
	}

}
