package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.heat.PanBody;

/**
 * Pans and fryers with a body: what a load draws from them, checked against energy
 * balances.
 */
class EquipmentLoadTest {

	private static final Surface STEAKS = Surface.defaults(FoodCategory.MEAT).withThicknessMm(25);

	private static double panAfter(List<Sample> series, double s) {
		return series.stream()
			.filter(x -> Math.abs(x.timeS() - s) < 1e-6)
			.findFirst()
			.orElseThrow()
			.heatSourceTemperatureC();
	}

	/**
	 * Two cold 25 mm steaks covering half a 2.3 kg cast-iron pan at 230 °C draw about 76
	 * kJ in the first 2 min; with no reserve of heat the pan falls about 70 K (derived:
	 * 76 kJ / (2.3 kg × 420 J/kg·K), less what the flame still gives). A cook who turns
	 * the flame up keeps it within a few kelvin.
	 */
	@Test
	void crowdedPanOnAFixedFlameFallsTensOfKelvinAndAKeptUpOneHolds() {
		CookSettings s = CookSettings.defaults().withOutputIntervalS(30).withHorizonS(240);
		Target never = Target.stage("charred");
		HeatSetup fixed = new PanContact(230, true, 60)
			.withBody(PanBody.DEFAULT.withControl(HeatedBody.Control.FIXED_INPUT));
		HeatSetup keptUp = new PanContact(230, true, 60).withBody(PanBody.DEFAULT);
		double fixedAt2Min = panAfter(CookSimulation.run(STEAKS, fixed, never, s).series(), 120);
		double keptAt2Min = panAfter(CookSimulation.run(STEAKS, keptUp, never, s).series(), 120);
		assertTrue(230 - fixedAt2Min > 40 && 230 - fixedAt2Min < 110, "fixed flame: " + fixedAt2Min);
		assertTrue(230 - keptAt2Min < 10, "flame kept up: " + keptAt2Min);
	}

	/**
	 * Energy balance of oil plus food over a fry: heat from the element = oil's sensible
	 * heat + heat to the food + losses, and the heat the oil gave equals what the food's
	 * two faces took in.
	 */
	@Test
	void fryerEnergyBalancesWithTheFood() {
		Surface frozenFries = Surface.defaults(FoodCategory.POTATO).withInitialTemperatureC(-18);
		HeatSetup fryer = new DeepFryer(175).withBody(FryerBody.DEFAULT);
		CookSimulation sim = CookSimulation.of(frozenFries, fryer, CookSettings.defaults(), LayerReaction.NONE);
		CookResult r = sim.run(Target.stage("golden"));
		HeatedBody oil = sim.heatSourceBody();
		double stored = oil.heatCapacity() * (oil.temperatureK() - oil.setK());
		assertEquals(oil.inputJ(), stored + oil.toFoodJ() + oil.lossJ(), 1e-9 * oil.inputJ());
		assertEquals(r.energy().heatInJPerM2() * oil.foodAreaPerFaceM2(), oil.toFoodJ(), 1e-9 * oil.toFoodJ());
		double lowest = r.series().stream().mapToDouble(Sample::heatSourceTemperatureC).min().orElseThrow();
		assertTrue(lowest < 175 && lowest > 150, "the basket draws the oil down, the thermostat holds it: " + lowest);
		assertTrue(r.series().get(r.series().size() - 1).heatSourceTemperatureC() > lowest, "and it recovers");
	}

	/** A held pan is the old model: a body is only there when the setup has one. */
	@Test
	void aSetupWithoutABodyKeepsItsSetTemperature() {
		CookResult r = CookSimulation.run(STEAKS, new PanContact(230, true, 60), Target.stage("browned"));
		assertTrue(r.series().stream().allMatch(x -> Double.isNaN(x.heatSourceTemperatureC())));
	}

}
