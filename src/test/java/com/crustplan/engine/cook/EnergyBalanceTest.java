package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.properties.ThermalProperties;
import com.crustplan.engine.water.Atmosphere;

/**
 * First law over whole runs: the heat that crossed the faces minus the enthalpy the
 * vapour carried off must equal the change of the food's enthalpy, computed here
 * independently from the final state with the Choi &amp; Okos cp integrals
 * (ThermalProperties.enthalpy, checked against Simpson's rule in ChoiOkosPropertiesTest):
 * each node's composition from the category's dry fractions and its moisture, standing
 * water as liquid water. Tolerance 1 % of the heat in (project validation list); the
 * linearisation of the face fluxes and cp taken at the start of each step are first-order
 * in Δt and stay far below it when the balance is kept.
 */
class EnergyBalanceTest {

	private static final double TOLERANCE_SHARE_OF_HEAT_IN = 0.01;

	/**
	 * Enthalpy of the food and the water standing on it relative to 0 °C, J/m² of face.
	 */
	static double foodEnthalpy(Surface surface, double[] temperatureK, double[] moisture, double[] dryMass,
			double[] standingWater, double[] oil) {
		double[] dry = surface.composition().dryMatterFractions();
		double[] fractions = new double[FoodComponent.values().length];
		double h = 0;
		for (int i = 0; i < temperatureK.length; i++) {
			double dryShare = 1 / (1 + moisture[i]);
			fractions[0] = moisture[i] * dryShare;
			for (int j = 0; j < dry.length; j++) {
				fractions[j + 1] = dry[j] * dryShare;
			}
			h += dryMass[i] * (1 + moisture[i]) * ThermalProperties.enthalpy(fractions, temperatureK[i] - 273.15);
		}
		int last = temperatureK.length - 1;
		for (int i = 0; oil != null && i < temperatureK.length; i++) {
			// frying oil taken up, as Choi–Okos fat
			h += oil[i] * FoodComponent.FAT.enthalpy(temperatureK[i] - 273.15);
		}
		h += standingWater[0] * FoodComponent.WATER.enthalpy(temperatureK[0] - 273.15);
		h += standingWater[1] * FoodComponent.WATER.enthalpy(temperatureK[last] - 273.15);
		return h;
	}

	/** Runs the cook and returns (heat in − vapour out − ΔH) / heat in. */
	static double relativeGap(Surface surface, HeatSetup setup, double horizonS) {
		// run on past the target for as long as it takes to cover the whole horizon
		CookSettings settings = CookSettings.defaults()
			.withHorizonS(horizonS)
			.withRunPastTargetFraction(1e6)
			.withRecordSeries(false);
		CookResult result = CookSimulation.run(surface, setup, darkest(surface.category()), settings);
		CookResult.FinalState end = result.finalState();
		int n = end.temperatureK().length;
		// initial state: uniform temperature and moisture, the same dry mass per node
		// (dry matter never moves)
		double[] t0 = new double[n];
		Arrays.fill(t0, surface.initialTemperatureC() + 273.15);
		double[] x0 = new double[n];
		Arrays.fill(x0, surface.composition().moistureDryBasis());
		double film0 = surface.surfaceWaterGPerM2() / 1000;
		double before = foodEnthalpy(surface, t0, x0, end.dryMassKgPerM2(), new double[] { film0, film0 }, null);
		double after = foodEnthalpy(surface, end.temperatureK(), end.moistureDryBasis(), end.dryMassKgPerM2(),
				end.standingWaterKgPerM2(), end.oilKgPerM2());
		EnergyLedger ledger = result.energy();
		assertTrue(ledger.heatInJPerM2() > 0, "heat must flow in");
		assertEquals(horizonS, result.simulatedS(), 1e-6, "the run must cover the horizon");
		return (ledger.netInJPerM2() - (after - before)) / ledger.heatInJPerM2();
	}

	private static Target darkest(FoodCategory category) {
		// the last stage is the darkest
		return Target.stage(category.stages().get(category.stages().size() - 1).key());
	}

	private static void assertBalanced(Surface surface, HeatSetup setup, double horizonS) {
		double gap = relativeGap(surface, setup, horizonS);
		assertEquals(0, gap, TOLERANCE_SHARE_OF_HEAT_IN, String.format("energy gap %.2f %% of heat in", 100 * gap));
	}

	// ---------------------------------------------------------------- whole cooks, each
	// mode

	@Test
	void shouldBalanceEnergyOverAWholePanSear() {
		assertBalanced(Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 60), 900);
	}

	@Test
	void shouldBalanceEnergyOverAWholeSteamOvenBake() {
		assertBalanced(Surface.defaults(FoodCategory.BREAD), new Oven(220, true, 30), 1800);
	}

	@Test
	void shouldBalanceEnergyOverAWholeFry() {
		assertBalanced(Surface.defaults(FoodCategory.POTATO), new DeepFryer(175), 900);
	}

	@Test
	void shouldBalanceEnergyOverAWholeGrill() {
		assertBalanced(Surface.defaults(FoodCategory.FISH), new RadiantGrill(800, 0), 300);
	}

	// ---------------------------------------------------------------- phases that
	// balance today

	@Test
	void shouldBalanceEnergyInASteamOvenThatKeepsTheFaceWet() {
		// 100 % steam at 100 °C condenses on a 40 mm cold steak for 30 min: condensation
		// (negative vapour out)
		// carries nearly all the heat; the faces never dry, so no bare-face evaporation
		// is involved.
		assertBalanced(Surface.defaults(FoodCategory.MEAT).withSurfaceWaterGPerM2(1000).withThicknessMm(40),
				new Oven(100, false, 100), 1800);
	}

	@Test
	void shouldBalanceEnergyWhileStandingWaterEvaporatesInAHotOven() {
		// The constant-rate period: 1.5 kg/m² of standing water on a warm 50 mm piece in
		// a dry 200 °C fan oven
		// for 5 min (the film lasts about 8 min): convection, wall radiation and film
		// evaporation only.
		assertBalanced(Surface.defaults(FoodCategory.MEAT)
			.withSurfaceWaterGPerM2(1500)
			.withThicknessMm(50)
			.withInitialTemperatureC(45), new Oven(200, true, Atmosphere.KITCHEN_STEAM_FRACTION * 100), 300);
	}

	@Test
	void shouldBalanceEnergyWhileAWetFaceBoilsOnAPan() {
		// 2 kg/m² of water boiling off a steak's face on a 220 °C pan for one minute:
		// contact heat and the
		// boiling of standing water at 100 °C.
		assertBalanced(Surface.defaults(FoodCategory.MEAT).withSurfaceWaterGPerM2(2000), new PanContact(220, true, 0),
				60);
	}

	@Test
	void shouldBalanceEnergyWhileAWetFaceBoilsUnderAGrill() {
		assertBalanced(Surface.defaults(FoodCategory.FISH).withSurfaceWaterGPerM2(2000), new RadiantGrill(800, 0), 60);
	}

}
