package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.get;
import static org.springframework.test.web.servlet.result.MockMvcResultMatchers.status;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.security.test.context.support.WithMockUser;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.MvcResult;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.system.Formats;

/**
 * The risk map reads at a glance: the zone is a mark on its own band, named in a legend;
 * the outlined cell holds the plan's own moment; the target time sits beside the set
 * temperature, ahead of the time columns.
 */
@CrustplanTest
@WithMockUser(username = "cook", roles = "COOK")
class RiskMapReadingTest {

	@Autowired
	MockMvc mvc;

	@Autowired
	DemoData demo;

	@Autowired
	PlanService planner;

	@Test
	void shouldShowThePlansOwnTimeAndFigureInTheTargetCellAndTheTargetColumnFirst() throws Exception {
		String chips = String.valueOf(demo.surface("Chips, 10 mm, blanched"));
		String fryer = String.valueOf(demo.setup("Fryer, chips"));
		MvcResult r = mvc.perform(
				get("/plan/risk-map").param("surfaceId", chips).param("setupId", fryer).param("targetStage", "golden"))
			.andExpect(status().isOk())
			.andReturn();
		RiskMapView map = (RiskMapView) r.getModelAndView().getModel().get("map");
		String html = r.getResponse().getContentAsString();
		// the plan itself: the demo fryer at 175 °C
		MvcResult plan = mvc
			.perform(get("/plan").param("surfaceId", chips).param("setupId", fryer).param("targetStage", "golden"))
			.andReturn();
		PlanReport report = (PlanReport) plan.getModelAndView().getModel().get("report");
		RiskMapView.Row own = map.rows()
			.stream()
			.filter(x -> x.temperatureC() == report.setup().temperatureC())
			.findFirst()
			.orElseThrow();
		RiskMapView.Cell target = own.cells().stream().filter(RiskMapView.Cell::target).findFirst().orElseThrow();
		// the same moment as the plan page's headline, to the second
		assertThat(Formats.duration(target.atS())).isEqualTo(Formats.duration(report.timeToTargetS()));
		assertThat(target.portionUgPerKg()).isEqualTo(own.targetPortionUgPerKg());
		assertThat(Math.round(target.portionUgPerKg())).isEqualTo(Math.round(report.acrylamide().portionUgPerKg()));
		assertThat(html).contains(">" + new Formats().clock(target.atS()) + "<");
		// "Target reached" comes before the first time column
		assertThat(html.indexOf("Target reached")).isLessThan(html.indexOf("class=\"num risk-time\""));
		// zones named in a legend; no bare "!!" on food-coloured cells
		assertThat(html).contains("risk-legend", "Well below", "Over the benchmark").doesNotContain(">!!<", ">!<");
	}

}
