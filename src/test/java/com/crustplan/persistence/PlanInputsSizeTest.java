package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.SavedPlan;
import com.crustplan.plan.SavedPlanRepository;
import com.crustplan.plan.SavedPlanService;
import com.crustplan.setup.SetupForm;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.system.TemperatureUnit;

/**
 * A plan's inputs are stored as JSON, where a control character is escaped as six
 * characters ({@code \u0001}, RFC 8259 section 7). Older records may hold such characters
 * (they were accepted before the stored-text check), so saving a plan of them at every
 * text field's longest must fit.
 */
@CrustplanTest
class PlanInputsSizeTest {

	@Autowired
	PlanService planner;

	@Autowired
	SavedPlanService saved;

	@Autowired
	SavedPlanRepository plans;

	@Test
	void shouldSaveAPlanWhoseNotesAndNamesAreAllControlCharacters() {
		String name = "\u0001".repeat(80);
		String notes = "\u0001".repeat(1000);
		SurfaceForm surface = SurfaceForm.defaults(FoodCategory.POTATO, name, TemperatureUnit.CELSIUS);
		surface = new SurfaceForm(surface.name(), surface.category(), surface.product(), surface.waterPct(),
				surface.proteinPct(), surface.fatPct(), surface.reducingSugarPct(), surface.sucrosePct(),
				surface.starchPct(), surface.fibrePct(), surface.ashPct(), surface.asparagineMgPerKg(),
				surface.surfaceWaterGPerM2(), surface.thicknessMm(), surface.ph(), surface.bicarbonateGPerKg(),
				surface.acidGPerKg(), surface.initialTemperature(), surface.temperatureUnit(), notes, surface.shape(),
				surface.pretreatment());
		SetupForm setup = new SetupForm(name, "fryer", 175.0, "C", false, false, null, null, null, null, null, null,
				notes);
		PlanInputs inputs = new PlanInputs(surface, setup, "golden", null, 10);
		PlanReport report = planner.plan(surface.toSurface(), surface.toProduct(), setup.toHeatSetup(),
				Target.stage("golden"), 10, false);
		SavedPlan plan = saved.save("Escapes", "surface", "setup", inputs, report, "chef");
		String stored = plans.findById(plan.getId()).orElseThrow().getInputsJson();
		// each escaped character is six long: 2 × 80 + 2 × 1000 of them, more than the
		// old 8000 column
		assertThat(stored.length()).isGreaterThan(6 * (2 * 80 + 2 * 1000));
		PlanInputs back = saved.inputs(plans.findById(plan.getId()).orElseThrow());
		assertThat(back.surface().notes()).isEqualTo(notes);
		assertThat(back.setup().name()).isEqualTo(name);
	}

}
