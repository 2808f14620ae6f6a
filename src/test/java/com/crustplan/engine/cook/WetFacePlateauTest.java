package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.WetBulb;
import com.crustplan.engine.heat.WetBulbReference;
import com.crustplan.engine.water.Atmosphere;
import com.crustplan.engine.water.SaturationPressure;

/**
 * The constant-rate period: while water stands on a face, the face sits near the wet-bulb
 * temperature in oven air and at the boiling point against a hot pan (design note §3; any
 * drying text, e.g. Incropera §6.7 for the wet-bulb balance).
 */
class WetFacePlateauTest {

	private static final CookSettings SETTINGS = CookSettings.defaults()
		.withOutputIntervalS(10)
		.withHorizonS(900)
		.withRunPastTargetFraction(1e6);

	/**
	 * A warm (45 °C), thick (50 mm) piece of meat carrying 1.5 kg/m² of water: little
	 * heat goes inwards.
	 */
	private static final Surface WET_WARM_MEAT = Surface.defaults(FoodCategory.MEAT)
		.withSurfaceWaterGPerM2(1500)
		.withThicknessMm(50)
		.withInitialTemperatureC(45);

	private static List<Sample> run(Surface surface, HeatSetup setup, double horizonS) {
		return CookSimulation.run(surface, setup, Target.stage("charred"), SETTINGS.withHorizonS(horizonS)).series();
	}

	@Test
	void shouldHoldAWetFaceNearTheWetBulbInAnOven() {
		// A fan oven at 200 °C with kitchen-air humidity, and one with 10 % steam; the
		// food starts a little below
		// each plateau so that the face settles within the first minute. The plateau must
		// lie above the
		// convective wet bulb (the walls add radiation) by no more than a few kelvin, and
		// within 1 K of the wet
		// bulb with wall radiation (ε 0.9, walls at the air temperature) solved
		// independently (WetBulbReference).
		// 1 K allows for the little heat conducted into the food, which the steady
		// balance leaves out.
		double[] cases = { Atmosphere.KITCHEN_STEAM_FRACTION * 100, 10 };
		for (double steamPct : cases) {
			Oven oven = new Oven(200, true, steamPct);
			double h = HeatSetup.OVEN_FAN.value();
			double convective = WetBulb.temperatureC(oven.atmosphere(), h);
			double y = steamPct / 100;
			double humidityRatio = 0.621945 * y / (1 - y);
			double radiative = WetBulbReference.vapourDensityWetBulbC(200, humidityRatio, h, 0.9, 200);
			int counted = 0;
			// start 3 K below the plateau so the food takes up little heat once the face
			// has settled
			for (Sample s : run(WET_WARM_MEAT.withInitialTemperatureC(Math.floor(radiative) - 3), oven, 900)) {
				if (s.timeS() >= 60 && s.standingWaterGPerM2() > 0) {
					double ts = s.surfaceTemperatureC();
					assertTrue(ts > convective && ts < convective + 6,
							String.format("%.0f %% steam, t %.0f s: face %.2f °C, wet bulb %.2f °C", steamPct,
									s.timeS(), ts, convective));
					assertTrue(Math.abs(ts - radiative) < 1,
							String.format("%.0f %% steam, t %.0f s: face %.2f °C, radiative wet bulb %.2f °C", steamPct,
									s.timeS(), ts, radiative));
					counted++;
				}
			}
			assertTrue(counted > 20, "the water must stand for a few minutes: " + counted + " samples");
		}
	}

	@Test
	void shouldPinAWetFaceOnAPanAtTheBoilingPoint() {
		// Water boils at 99.97 °C at 101.325 kPa (IAPWS-IF97 saturation temperature); 2
		// kg/m² of water on a
		// steak's face on a 220 °C pan holds the face there until it is gone. Tolerance
		// 0.5 K: the face node
		// is the film plus a thin layer of food, which the step leaves a fraction of a
		// kelvin off.
		double boiling = SaturationPressure.saturationTemperatureK(101_325) - 273.15;
		int counted = 0;
		for (Sample s : run(Surface.defaults(FoodCategory.MEAT).withSurfaceWaterGPerM2(2000),
				new PanContact(220, true, 0), 200)) {
			if (s.timeS() >= 40 && s.standingWaterGPerM2() > 0) {
				assertTrue(Math.abs(s.surfaceTemperatureC() - boiling) < 0.5,
						String.format("t %.0f s: face %.2f °C", s.timeS(), s.surfaceTemperatureC()));
				counted++;
			}
		}
		assertTrue(counted > 10, "samples on the plateau: " + counted);
	}

	@Test
	void shouldNotCoolBelowTheWetBulbWhenTheStandingWaterIsGone() {
		// A face in 200 °C air, fed heat by the air, the walls and the warmer food behind
		// it, cannot fall below
		// the wet-bulb temperature of the air (psychrometrics: the wet bulb is the lowest
		// temperature
		// evaporation can reach; ASHRAE Handbook — Fundamentals, ch. 1). Tolerance 0.5 K.
		Oven oven = new Oven(200, true, Atmosphere.KITCHEN_STEAM_FRACTION * 100);
		double wetBulb = WetBulb.temperatureC(oven.atmosphere(), HeatSetup.OVEN_FAN.value());
		for (Sample s : run(WET_WARM_MEAT, oven, 900)) {
			if (s.timeS() >= 60) {
				assertTrue(s.surfaceTemperatureC() > wetBulb - 0.5, String
					.format("t %.0f s: face %.2f °C, wet bulb %.2f °C", s.timeS(), s.surfaceTemperatureC(), wetBulb));
			}
		}
	}

}
