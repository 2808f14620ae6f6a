package com.crustplan.engine.colour;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;

/**
 * The fish colour strip starts at raw fish, not at a grey: checked on the CIE 1976 L*
 * scale (CIE 15:2004), where L* 50 is mid grey and 100 the reference white.
 */
class FishColourPathTest {

	private final ColourPath fish = FoodCategory.FISH.colourPath();

	@Test
	void rawFishIsLight() {
		// CIE 15:2004: L* above 60 lies on the light side of mid grey (L* 50).
		assertThat(fish.colourAt(0).lightness()).isGreaterThan(60);
	}

	@Test
	void rawFishIsNotANeutralGrey() {
		// Raw fillets read pink to white, with a* ≥ 0 (red side of the CIE a* axis).
		assertThat(fish.colourAt(0).a()).isPositive();
	}

	@Test
	void pathOnlyDarkensFromRaw() {
		double previous = fish.colourAt(0).lightness();
		for (int i = 1; i <= 100; i++) {
			double l = fish.colourAt(i / 100.0).lightness();
			assertThat(l).as("L* at extent %.2f", i / 100.0).isLessThanOrEqualTo(previous);
			previous = l;
		}
	}

	@Test
	void everyNamedStageIsReachedAfterRaw() {
		for (var stage : FoodCategory.FISH.stages()) {
			assertThat(fish.extentAtLightness(stage.lightness())).as(stage.key()).isBetween(0.0, 1.0);
		}
	}

}
