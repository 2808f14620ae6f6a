package com.crustplan.engine.cook;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Random;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

/**
 * Random surfaces and setups across the whole accepted input range (seeded, so a failure
 * repeats): every run either gives finite temperatures, moisture and colour throughout,
 * or refuses with a field error a cook can act on. No NaN or absurd temperature may reach
 * a page or the API.
 */
class ExtremeInputTest {

	@Test
	void shouldGiveFiniteSeriesOrAClearRefusalForAnyAcceptedInput() {
		Random rnd = new Random(20261202);
		int finished = 0;
		for (int k = 0; k < 80; k++) {
			FoodCategory c = FoodCategory.values()[rnd.nextInt(FoodCategory.values().length)];
			double w = rnd.nextDouble() * 95;
			double rest = 100 - w;
			double p = rnd.nextDouble() * rest * 0.5;
			double f = rnd.nextDouble() * (rest - p) * 0.5;
			double rs = rnd.nextDouble() * (rest - p - f) * 0.3;
			double su = rnd.nextDouble() * (rest - p - f - rs) * 0.3;
			Surface s = new Surface(c, new Composition(w, p, f, rs, su, 0, 0, 0), rnd.nextDouble() * 10_000,
					rnd.nextDouble() * 500, new double[] { 0.5, 1, 5, 20, 80, 200 }[rnd.nextInt(6)], null,
					rnd.nextDouble() * 5, rnd.nextDouble() * 5, -20 + rnd.nextDouble() * 100);
			HeatSetup h = switch (rnd.nextInt(4)) {
				case 0 -> new PanContact(100 + rnd.nextDouble() * 220, rnd.nextBoolean(),
						rnd.nextBoolean() ? 0 : 10 + rnd.nextDouble() * 300);
				case 1 -> new Oven(50 + rnd.nextDouble() * 270, rnd.nextBoolean(), rnd.nextDouble() * 100);
				case 2 -> new RadiantGrill(300 + rnd.nextDouble() * 900, 0);
				default -> new DeepFryer(120 + rnd.nextDouble() * 80);
			};
			Target t = Target.stage(c.stages().get(rnd.nextInt(c.stages().size())).key());
			try {
				CookResult r = CookSimulation.run(s, h, t, CookSettings.defaults().withHorizonS(900));
				assertThat(r.series()).allSatisfy(x -> {
					assertThat(x.surfaceTemperatureC()).isFinite().isBetween(-50.0, 1300.0);
					assertThat(x.coreTemperatureC()).isFinite().isBetween(-50.0, 1300.0);
					assertThat(x.surfaceMoistureDryBasis()).isFinite().isNotNegative();
					assertThat(x.browningExtent()).isBetween(0.0, 1.0);
					assertThat(x.colourHex()).matches("#[0-9a-f]{6}");
				});
				finished++;
			}
			catch (InvalidInputException refused) {
				assertThat(refused.field()).isNotBlank();
				assertThat(refused.reason()).isNotBlank();
			}
		}
		// most of the space is followed; refusals are the extremes (sub-millimetre
		// pieces, flooded faces)
		assertThat(finished).isGreaterThan(60);
	}

}
