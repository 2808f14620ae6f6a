package com.crustplan.engine.myoglobin;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * The inside's pigment against published kinetics and what every cook sees on a cut
 * steak.
 */
class MyoglobinDenaturationTest {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(3600);

	/** Beef chuck: the published rate without the loin factor. */
	private static double chuckMinutesTo(double denatured, double celsius) {
		PigmentKinetics k = PigmentKinetics.MEAT;
		double rate = k.rate().at(celsius + 273.15);
		return -Math.log(1 - denatured) / rate / 60;
	}

	@Test
	@DisplayName("Geileskey et al. 1998 kinetics: 6.5 % denatured in about a minute at 63 °C (chuck, as plotted from the paper's fit)")
	void shouldTakeAboutAMinuteToStartDenaturingAt63() {
		// the secondary source's figure: "at about 63 °C it takes about a minute for a
		// rare
		// state (6.5 PMD)"
		assertThat(chuckMinutesTo(0.065, 63)).isBetween(0.5, 2.0);
	}

	@Test
	@DisplayName("Geileskey et al. 1998 kinetics: 93 % denatured takes more than 30 min at 60 °C (chuck)")
	void shouldTakeOverHalfAnHourToLookWellDoneAt60() {
		assertThat(chuckMinutesTo(0.93, 60)).isGreaterThan(30);
	}

	@Test
	@DisplayName("Geileskey et al. 1998: loin forms the cooked pigment about twice as fast as chuck")
	void shouldRunLoinTwiceAsFastAsChuck() {
		double t = 333.15;
		assertThat(PigmentKinetics.MEAT.rateAt(t) / PigmentKinetics.MEAT.rate().at(t)).isCloseTo(2, within(1e-12));
		// ≈ 300 kJ/mol (abstract): the rate rises about 2.3-fold per 3 K near 60 °C
		double q = PigmentKinetics.MEAT.rateAt(t + 3) / PigmentKinetics.MEAT.rateAt(t);
		assertThat(q).isBetween(2.0, 3.0);
	}

	@Test
	@DisplayName("T_skip: below each pigment's skip temperature an hour denatures under 1 %; steak near 43 °C (Geileskey et al. 1998 kinetics, loin), fish far lower")
	void shouldDenatureNegligiblyBelowTheSkipTemperature() {
		for (PigmentKinetics k : PigmentKinetics.values()) {
			double skipK = k.skipBelow().value() + 273.15;
			assertThat(1 - k.nativeAfter(skipK - 0.1, 3600)).as(k.name()).isLessThan(0.01);
			assertThat(1 - k.nativeAfter(skipK + 1, 3600)).as(k.name()).isGreaterThan(0.01);
		}
		assertThat(PigmentKinetics.MEAT.skipBelow().value()).isBetween(40.0, 45.0);
		// fish opacity starts low: k(55 °C) = 1 /min with Ea 241 kJ/mol is 1 % an hour
		// near
		// 26 °C, so a 40 °C skip would have dropped about 14 % per 10 min
		assertThat(PigmentKinetics.FISH.skipBelow().value()).isBetween(20.0, 30.0);
	}

	@Test
	@DisplayName("Cooked look at 80 % denatured (J Food Sci patty study): the colour path is grey-brown from there on")
	void shouldLookGreyBrownFromEightyPercent() {
		double cooked = PigmentKinetics.COOKED_LOOK.value();
		assertThat(PigmentKinetics.MEAT.colourAt(cooked).a()).isLessThan(10);
		assertThat(PigmentKinetics.MEAT.colourAt(0).a()).isGreaterThan(20);
		// poultry whitens, fish turns opaque: both get lighter
		assertThat(PigmentKinetics.POULTRY.colourAt(1).lightness())
			.isGreaterThan(PigmentKinetics.POULTRY.colourAt(0).lightness() + 20);
		assertThat(PigmentKinetics.FISH.colourAt(1).lightness())
			.isGreaterThan(PigmentKinetics.FISH.colourAt(0).lightness() + 20);
	}

	@Test
	@DisplayName("A steak steamed for 30 min (core ≈ 98 °C) is grey-brown right through and well done, not raw red")
	void shouldDrawASteamedSteakCookedGrey() {
		Surface steak = Surface.defaults(FoodCategory.MEAT);
		AcrylamideCook.Inside<StepsResult> run = AcrylamideCook.runStepsInside(steak,
				List.of(CookStep.timed(new Oven(100, true, 100), 1800)), null, null, SETTINGS);
		InteriorProfile p = run.interior();
		assertThat(p.centrePeakC()).isGreaterThan(95);
		assertThat(p.cookedThrough()).isTrue();
		assertThat(p.centre().code()).isEqualTo("interior.centre.meat.well");
		assertThat(p.band().code()).isEqualTo("interior.through.meat");
		for (InteriorProfile.Layer l : p.layers()) {
			assertThat(l.denatured()).isGreaterThan(0.99);
			assertThat(l.colour().a()).as("a* at %s mm", l.depthMm()).isLessThan(10);
		}
		// a wet steamed face has no dried crust
		assertThat(p.crustMm()[0]).isZero();
	}

	@Test
	@DisplayName("Seared steak: a grey band under each crust, red-pink centre; the band grows with time in the pan")
	void shouldGrowTheGreyBandWithTime() {
		Surface steak = Surface.defaults(FoodCategory.MEAT);
		PanContact pan = new PanContact(230, true, 60);
		double previous = -1;
		for (double minutes : new double[] { 3, 6, 9 }) {
			InteriorProfile p = AcrylamideCook
				.runStepsInside(steak, List.of(CookStep.timed(pan, minutes * 60)), null, null, SETTINGS)
				.interior();
			double band = p.bandMm()[0];
			assertThat(band).as("band after %s min", minutes).isGreaterThan(previous);
			previous = band;
		}
		assertThat(previous).isLessThan(12.5);
	}

	@Test
	@DisplayName("Medium-rare steak in the trade's words: a 25 mm steak taken to browned shows a centre word and a band")
	void shouldNameTheCentreOfASearedSteak() {
		AcrylamideCook.Inside<CookResult> run = AcrylamideCook.runInside(Surface.defaults(FoodCategory.MEAT),
				new PanContact(230, true, 60), Target.stage("browned"), SETTINGS);
		InteriorProfile p = run.interior();
		assertThat(p.atS()).isCloseTo(run.result().timeToTargetS(), within(1.0));
		assertThat(p.centre().code()).startsWith("interior.centre.meat.");
		assertThat(p.bandMm()[0]).isPositive();
		System.out.printf(
				"steak browned at %.0f s: centre %.1f °C, %.2f denatured, band %.2f / %.2f mm, crust %.2f mm%n",
				p.atS(), p.centrePeakC(), p.centreDenatured(), p.bandMm()[0], p.bandMm()[1], p.crustMm()[0]);
	}

	@Test
	@DisplayName("Trade doneness words by core temperature (common practice)")
	void shouldNameTheTradeWords() {
		assertThat(CentreDoneness.ofMeat(45)).isEqualTo(CentreDoneness.RAW);
		assertThat(CentreDoneness.ofMeat(51)).isEqualTo(CentreDoneness.RARE);
		assertThat(CentreDoneness.ofMeat(56)).isEqualTo(CentreDoneness.MEDIUM_RARE);
		assertThat(CentreDoneness.ofMeat(62)).isEqualTo(CentreDoneness.MEDIUM);
		assertThat(CentreDoneness.ofMeat(66)).isEqualTo(CentreDoneness.MEDIUM_WELL);
		assertThat(CentreDoneness.ofMeat(72)).isEqualTo(CentreDoneness.WELL);
	}

	@Test
	@DisplayName("Poultry and fish are judged against the FDA Food Code 2022, 3-401.11, never as rare")
	void shouldJudgePoultryAndFishAgainstTheFoodCode() {
		assertThat(CentreDoneness.describe(FoodCategory.POULTRY_SKIN, 70).code())
			.isEqualTo("interior.centre.poultry.under");
		assertThat(CentreDoneness.describe(FoodCategory.POULTRY_SKIN, 75).code())
			.isEqualTo("interior.centre.poultry.done");
		assertThat(CentreDoneness.describe(FoodCategory.FISH, 60).code()).isEqualTo("interior.centre.fish.under");
		assertThat(CentreDoneness.describe(FoodCategory.FISH, 64).code()).isEqualTo("interior.centre.fish.done");
	}

	@Test
	@DisplayName("The steamed steak's surface is drawn grey, not raw red, though it never browned")
	void shouldDrawASteamedFaceGrey() {
		AcrylamideCook.Inside<StepsResult> run = AcrylamideCook.runStepsInside(Surface.defaults(FoodCategory.MEAT),
				List.of(CookStep.timed(new Oven(100, true, 100), 1800)), null, null, SETTINGS);
		double end = run.result().cook().simulatedS();
		double extent = run.result().cook().finalBrowningExtent();
		assertThat(extent).isLessThan(0.02);
		var face = SurfaceGreying.colour(FoodCategory.MEAT, extent, run.face().at(end));
		assertThat(face.a()).isLessThan(12);
		// raw red at the start: a* well above
		assertThat(SurfaceGreying.colour(FoodCategory.MEAT, 0, run.face().at(0)).a()).isGreaterThan(20);
	}

	@Test
	@DisplayName("Hunt, Sørheim & Slinde 1999 (J Food Sci 64:847): patties red inside at 55 °C, browner at 65 and 75 °C")
	void shouldBrownPattiesProgressivelyWithEndpointTemperature() {
		Surface patty = Surface.defaults(FoodCategory.MEAT).withThicknessMm(13);
		PanContact pan = new PanContact(200, true, 60);
		double previousA = Double.POSITIVE_INFINITY;
		for (double endpoint : new double[] { 55, 65, 75 }) {
			InteriorProfile p = AcrylamideCook
				.runStepsInside(patty, List.of(CookStep.toCore(pan, endpoint, 1800)), null, null, SETTINGS)
				.interior();
			double a = PigmentKinetics.MEAT.colourAt(p.centreDenatured()).a();
			if (endpoint == 55) {
				// red and undercooked-looking (deoxymyoglobin patties in the study)
				assertThat(a).isGreaterThan(20);
			}
			assertThat(a).as("centre a* at %s °C", endpoint).isLessThan(previousA);
			previousA = a;
		}
	}

	@Test
	@DisplayName("A round piece (strip or ball) has one surface and its centre at the radius: one band, measured inwards")
	void shouldMeasureARoundPieceFromItsSurface() {
		Grid grid = new Grid(0.010, 21, Grid.DEFAULT_CLUSTERING, 2);
		Surface ball = Surface.defaults(FoodCategory.MEAT);
		MyoglobinDenaturation pigment = new MyoglobinDenaturation(ball, grid);
		// hot outside 3 mm at 90 °C, the rest at 20 °C, held a minute
		Layers layers = new Layers() {

			@Override
			public Grid grid() {
				return grid;
			}

			@Override
			public int size() {
				return grid.size();
			}

			@Override
			public double temperatureK(int i) {
				return (grid.position(i) < 0.003 ? 90 : 20) + 273.15;
			}

			@Override
			public double moisture(int i) {
				return 2.5;
			}

			@Override
			public double waterActivity(int i) {
				return 1;
			}

			@Override
			public double dryMass(int i) {
				return grid.width(i);
			}

			@Override
			public double timeS() {
				return 60;
			}

		};
		for (int k = 0; k < 60; k++) {
			pigment.step(layers, 1);
		}
		InteriorProfile p = pigment.profile();
		assertThat(p.slab()).isFalse();
		assertThat(p.bandMm()[1]).isNaN();
		assertThat(p.bandMm()[0]).isBetween(2.5, 3.5);
		assertThat(p.cookedThrough()).isFalse();
		assertThat(p.centrePeakC()).isCloseTo(20, within(1e-9));
		assertThat(p.band().code()).isEqualTo("interior.band.meat.even");
	}

}
