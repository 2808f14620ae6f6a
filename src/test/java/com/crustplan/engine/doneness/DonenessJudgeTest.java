package com.crustplan.engine.doneness;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;

import org.junit.jupiter.api.Nested;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.acrylamide.AcrylamideFormation;
import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Outcome;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.doneness.FoodCode.Cut;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.message.Argument;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.StatedTemperature;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.TemperatureDifference;

/**
 * The doneness judge on real engine runs, with the published or trade threshold named
 * beside each check, and each suggestion re-checked by a forward run of the engine.
 */
class DonenessJudgeTest {

	static final Surface CHICKEN = Surface.defaults(FoodCategory.POULTRY_SKIN);

	/**
	 * A thick breast, 27 mm: heat now reaches the centre of a 20 mm piece past the Food
	 * Code before its skin is golden, so the pan cases below need a thicker one.
	 */
	static final Surface THICK_CHICKEN = CHICKEN.withThicknessMm(27);

	static final Surface STEAK = Surface.defaults(FoodCategory.MEAT);

	static final Surface FISH = Surface.defaults(FoodCategory.FISH);

	static final Surface BREAD = Surface.defaults(FoodCategory.BREAD);

	static final Surface FRIES = Surface.defaults(FoodCategory.POTATO);

	/** A baguette as a 60 mm slab of lean dough. */
	static final Surface BAGUETTE = BREAD.withThicknessMm(60);

	/**
	 * Dry kitchen air as the oven atmosphere: about 1.6 % steam by volume (25 °C, 50 %
	 * RH).
	 */
	static final double DRY = 1.6;

	static List<DonenessWarning> judge(Surface s, HeatSetup h, Target t) {
		return DonenessJudge.judge(s, h, AcrylamideCook.run(s, h, t), Cut.WHOLE);
	}

	static StepsResult steps(Surface s, Target colour, Double coreC, CookStep... steps) {
		return CookSimulation.runSteps(s, List.of(steps), colour, coreC, CookSettings.defaults(),
				AcrylamideFormation.REACTION);
	}

	static List<String> codes(List<DonenessWarning> w) {
		return w.stream().map(DonenessWarning::code).toList();
	}

	static DonenessWarning only(List<DonenessWarning> w, String code) {
		assertThat(codes(w)).contains(code);
		return w.stream().filter(x -> x.code().equals(code)).findFirst().orElseThrow();
	}

	static Message reason(DonenessWarning w) {
		return (Message) w.message().args().get(0);
	}

	static Message suggestion(DonenessWarning w) {
		return (Message) w.message().args().get(1);
	}

	static double celsius(Argument a) {
		return a instanceof StatedTemperature s ? s.celsius() : ((Temperature) a).celsius();
	}

	@Nested
	class PastJuiciness {

		@Test
		void shouldCallChickenGoldenAtANinetyNineDegreeCoreDry() {
			// skin-on chicken in a dry 200 °C fan oven: golden at about 20 min with the
			// core near 99 °C
			CookResult r = AcrylamideCook.run(CHICKEN, new Oven(200, true, DRY), Target.stage("golden"));
			assertThat(r.coreTemperatureAtTargetC()).isGreaterThan(95);
			DonenessWarning w = only(DonenessJudge.judge(CHICKEN, new Oven(200, true, DRY), r, Cut.WHOLE),
					"core-past-juiciness");
			assertThat(reason(w).code()).isEqualTo("warning.doneness.dry.poultry");
			// poultry breast dries past about 80 °C (common practice)
			assertThat(celsius(reason(w).args().get(2))).isEqualTo(80);
			assertThat(suggestion(w).code()).isEqualTo("suggestion.brown-first");
			// FDA Food Code 2022, 3-401.11(A)(3): finish poultry to 74 °C (165 °F)
			assertThat(suggestion(w).args().get(0)).isEqualTo(StatedTemperature.of(74, 165));
		}

		@Test
		void shouldBringTheChickenCoreIntoTheJuicyRangeWhenBrownedFirstAndFinishedToTheFoodCode() {
			// the suggestion as a forward run: golden in a 200 °C pan, then a 180 °C oven
			// until the centre reads 74 °C
			StepsResult r = steps(THICK_CHICKEN, Target.stage("golden"), 74.0,
					CookStep.toColour(new PanContact(200, true, 60), Target.stage("golden"), 3600),
					CookStep.toCore(new Oven(180, true, DRY), 74.0, 3600));
			assertThat(r.colourReached()).isTrue();
			assertThat(r.coreReached()).isTrue();
			// FDA Food Code 2022 74 °C reached, under the 80 °C juiciness limit (common
			// practice)
			assertThat(DonenessJudge.peakCoreC(r.cook(), r.cook().simulatedS(), Double.NaN)).isBetween(74.0, 80.0);
			assertThat(codes(DonenessJudge.judge(THICK_CHICKEN,
					List.of(CookStep.timed(new PanContact(200, true, 60), 1)), r, Cut.WHOLE)))
				.isEmpty();
		}

		@Test
		void shouldCallASteakBrownedInTheOvenWellPastWellDoneAndFixItBySearingFirst() {
			List<DonenessWarning> w = judge(STEAK, new Oven(200, true, DRY), Target.stage("browned"));
			// whole-muscle meat is well done by about 70 °C (common practice doneness
			// words)
			assertThat(celsius(reason(only(w, "core-past-juiciness")).args().get(2))).isEqualTo(70);
			List<CookStep> searThenOven = List.of(
					CookStep.toColour(new PanContact(220, true, 60), Target.stage("browned"), 3600),
					CookStep.toCore(new Oven(180, true, DRY), 63.0, 3600));
			StepsResult r = CookSimulation.runSteps(STEAK, searThenOven, Target.stage("browned"), 63.0,
					CookSettings.defaults(), AcrylamideFormation.REACTION);
			// browned and at the FDA Food Code 2022 63 °C for whole cuts, not past 70 °C
			assertThat(r.colourReached()).isTrue();
			assertThat(DonenessJudge.judge(STEAK, searThenOven, r, Cut.WHOLE)).isEmpty();
		}

		@Test
		void shouldCallFishGoldenInAHotOvenDry() {
			List<DonenessWarning> w = judge(FISH, new Oven(200, true, DRY), Target.stage("golden"));
			// fish dries past about 65 °C (common practice), above the Food Code's 63 °C
			assertThat(reason(only(w, "core-past-juiciness")).code()).isEqualTo("warning.doneness.dry.fish");
		}

	}

	@Nested
	class BelowTheFoodCode {

		@Test
		void shouldWarnForChickenGoldenInAPanBeforeItsCoreReachesTheFoodCode() {
			List<DonenessWarning> w = judge(THICK_CHICKEN, new PanContact(200, true, 60), Target.stage("golden"));
			DonenessWarning food = only(w, "core-below-food-code");
			assertThat(reason(food).code()).isEqualTo("warning.food-code.poultry");
			// FDA Food Code 2022, 3-401.11(A)(3): 74 °C (165 °F)
			assertThat(reason(food).args().get(2)).isEqualTo(StatedTemperature.of(74, 165));
			assertThat(suggestion(food).code()).isEqualTo("suggestion.lower-or-finish");
			assertThat(suggestion(food).args().get(0)).isEqualTo(TemperatureDifference.kelvin(20));
		}

		@Test
		void shouldReachTheFoodCodeWithoutDryingWhenThePanIsTwentyDegreesLower() {
			// the suggestion's first half as a forward run: 200 → 180 °C
			CookResult hot = AcrylamideCook.run(THICK_CHICKEN, new PanContact(200, true, 60), Target.stage("golden"));
			CookResult lower = AcrylamideCook.run(THICK_CHICKEN, new PanContact(180, true, 60), Target.stage("golden"));
			assertThat(lower.reached()).isTrue();
			// FDA Food Code 2022 poultry 74 °C reached at golden, under the 80 °C
			// juiciness limit
			assertThat(lower.coreTemperatureAtTargetC()).isBetween(74.0, 80.0);
			assertThat(lower.timeToTargetS()).isGreaterThan(hot.timeToTargetS());
			assertThat(DonenessJudge.judge(THICK_CHICKEN, new PanContact(180, true, 60), lower, Cut.WHOLE)).isEmpty();
		}

		@Test
		void shouldReachTheFoodCodeWhenAThickPieceIsFinishedInTheOven() {
			// the suggestion's second half: a 60 mm piece coloured in a 240 °C pan, then
			// a 180 °C oven to 74 °C
			Surface thick = CHICKEN.withThicknessMm(60);
			List<DonenessWarning> before = judge(thick, new PanContact(240, true, 0), Target.stage("light-golden"));
			Message s = suggestion(only(before, "core-below-food-code"));
			assertThat(s.args().get(1)).isEqualTo(Temperature.celsius(180));
			List<CookStep> plan = List.of(
					CookStep.toColour(new PanContact(240, true, 0), Target.stage("light-golden"), 3600),
					CookStep.toCore(new Oven(180, true, DRY), 74.0, 3 * 3600));
			StepsResult r = CookSimulation.runSteps(thick, plan, Target.stage("light-golden"), 74.0,
					CookSettings.defaults().withHorizonS(4 * 3600), AcrylamideFormation.REACTION);
			assertThat(r.coreReached()).isTrue();
			assertThat(codes(DonenessJudge.judge(thick, plan, r, Cut.WHOLE))).doesNotContain("core-below-food-code");
		}

		@Test
		void shouldHoldMincedMeatToTheComminutedFigure() {
			// the same run judged as a whole cut and as a burger patty (FDA Food Code
			// 2022: 63 °C whole, 68 °C minced)
			// a thick patty, 19 mm: through the shrinking crust a 13 mm one passes 68 °C
			// before it is browned
			Surface patty = STEAK.withThicknessMm(19);
			HeatSetup pan = new PanContact(220, true, 60);
			CookResult r = AcrylamideCook.run(patty, pan, Target.stage("browned"));
			assertThat(r.coreTemperatureAtTargetC()).isBetween(63.0, 68.0);
			assertThat(codes(DonenessJudge.judge(patty, pan, r, Cut.WHOLE))).doesNotContain("core-below-food-code");
			DonenessWarning w = only(DonenessJudge.judge(patty, pan, r, Cut.MINCED), "core-below-food-code");
			assertThat(reason(w).code()).isEqualTo("warning.food-code.minced");
			assertThat(reason(w).args().get(2)).isEqualTo(StatedTemperature.of(68, 155));
		}

	}

	@Nested
	class BreadAndFries {

		@Test
		void shouldCallABaguetteGoldenWithACoolCrumbRaw() {
			HeatSetup oven = new Oven(230, false, DRY);
			CookResult r = AcrylamideCook.run(BAGUETTE, oven, Target.stage("golden"));
			assertThat(r.reached()).isTrue();
			// golden with the crumb far from baked (evaporation–condensation now warms it
			// to about 70 °C by then)
			assertThat(r.coreTemperatureAtTargetC()).isLessThan(85);
			DonenessWarning w = only(DonenessJudge.judge(BAGUETTE, oven, r, Cut.WHOLE), "crumb-not-baked");
			// lean bread is baked at a crumb of 96–99 °C (bakers' probe, common practice)
			assertThat(celsius(reason(w).args().get(2))).isEqualTo(96);
			assertThat(suggestion(w).code()).isEqualTo("suggestion.bake-lower");
		}

		@Test
		void shouldBringTheCrumbCloserToBakedWhenBakedCoolerAndFlatter() {
			// the suggestion as forward runs: 40 K cooler raises the crumb at golden; a
			// flatter piece as well
			double hot = AcrylamideCook.run(BAGUETTE, new Oven(230, false, DRY), Target.stage("golden"))
				.coreTemperatureAtTargetC();
			double cooler = AcrylamideCook.run(BAGUETTE, new Oven(190, false, DRY), Target.stage("golden"))
				.coreTemperatureAtTargetC();
			double flatter = AcrylamideCook
				.run(BREAD.withThicknessMm(20), new Oven(190, false, DRY), Target.stage("golden"))
				.coreTemperatureAtTargetC();
			assertThat(cooler).isGreaterThan(hot);
			// a 20 mm piece at 190 °C is baked through (≥ 96 °C, bakers' probe) when
			// golden
			assertThat(flatter).isGreaterThanOrEqualTo(96);
		}

		@Test
		void shouldCallAFryColouredBeforeItsCentreBoilsSoftAndFixItAtOneSeventyFive() {
			// a 16 mm chip: with pores that fill with oil and a shrinking crust a 10 mm
			// one is cooked through when golden even at 190 °C, and since the potato k0
			// was
			// recalibrated on strips (golden in 6–8 min) a 14 mm one too
			Surface chunky = FRIES.withThicknessMm(16);
			List<DonenessWarning> w = judge(chunky, new DeepFryer(190), Target.stage("golden"));
			DonenessWarning soft = only(w, "centre-not-cooked");
			// a cooked centre sits at its boiling point, ≈ 100 °C (taken as 98 °C at the
			// centre node)
			assertThat(celsius(reason(soft).args().get(2))).isEqualTo(98);
			// Regulation (EU) 2017/2158, Annex II: fry potato products below 175 °C
			assertThat(suggestion(soft).args().get(0)).isEqualTo(Temperature.celsius(175));
			assertThat(codes(judge(chunky, new DeepFryer(175), Target.stage("golden")))).isEmpty();
		}

		@Test
		void shouldCallAThickFrySoftAndFixItByCuttingItToHalf() {
			Surface thick = FRIES.withThicknessMm(20);
			DonenessWarning soft = only(judge(thick, new DeepFryer(175), Target.stage("golden")), "centre-not-cooked");
			// half the thickness heats about four times sooner (Fourier number t·α/L²)
			assertThat(suggestion(soft).args().get(1)).isEqualTo(Quantity.of(10, "mm"));
			assertThat(codes(judge(FRIES.withThicknessMm(10), new DeepFryer(175), Target.stage("golden")))).isEmpty();
		}

	}

	@Nested
	class CoreLongBeforeColour {

		@Test
		void shouldSayWhenAThinBreadIsBakedLongBeforeItColoursAndBringThemCloserWhenHotter() {
			// a 12 mm flatbread in a 170 °C oven: the crumb passes 96 °C (bakers' probe)
			// at about 10 min, golden only at 38
			Surface flat = BREAD.withThicknessMm(12);
			HeatSetup cool = new Oven(170, false, DRY);
			CookResult r = AcrylamideCook.run(flat, cool, Target.stage("golden"));
			DonenessWarning late = only(DonenessJudge.judge(flat, cool, r, Cut.WHOLE), "colour-after-core");
			assertThat(suggestion(late).code()).isEqualTo("suggestion.hotter");
			assertThat(suggestion(late).args().get(0)).isEqualTo(TemperatureDifference.kelvin(30));
			// the suggestion as a forward run: 30 K hotter brings the colour and the
			// baked crumb closer together
			CookResult hotter = AcrylamideCook.run(flat, new Oven(200, false, DRY), Target.stage("golden"));
			double gapCool = r.timeToTargetS() - DonenessJudge.firstReachedS(r.series(), 96, r.timeToTargetS());
			double gapHot = hotter.timeToTargetS()
					- DonenessJudge.firstReachedS(hotter.series(), 96, hotter.timeToTargetS());
			// closer by a clear margin (a third or more of the gap)
			assertThat(gapHot).isLessThan(gapCool * 2 / 3);
		}

	}

	@Nested
	class Thresholds {

		/**
		 * A two-sample cook whose centre reaches {@code coreC} when the colour is reached
		 * at 600 s.
		 */
		CookResult cook(double coreC) {
			Lab lab = new Lab(60, 10, 30);
			List<Sample> series = List.of(new Sample(0, 20, 20, 5, 1, 1, 0, 0, lab, 0, 0, Double.NaN),
					new Sample(600, 150, 30, coreC, 0.5, 0.2, 0, 0.5, lab, 0, 0, Double.NaN));
			double[] one = { 0 };
			return new CookResult(Outcome.REACHED, Outcome.REACHED.explanation(), 600, 0.5, lab, 6, coreC, 0, 0, 150,
					0.5, 600, series, List.of(), null, new CookResult.FinalState(one, one, one, one, one));
		}

		List<String> judged(FoodCategory c, double coreC, Cut cut) {
			return codes(DonenessJudge.judge(Surface.defaults(c), new PanContact(200, true, 60), cook(coreC), cut));
		}

		@Test
		void shouldDrawTheFoodCodeLinesAtTheCodesOwnFigures() {
			// FDA Food Code 2022, 3-401.11: poultry 74 °C, whole cuts 63 °C, comminuted
			// 68 °C
			assertThat(judged(FoodCategory.POULTRY_SKIN, 73.9, Cut.WHOLE)).containsExactly("core-below-food-code");
			assertThat(judged(FoodCategory.POULTRY_SKIN, 74.0, Cut.WHOLE)).isEmpty();
			assertThat(judged(FoodCategory.MEAT, 62.9, Cut.WHOLE)).containsExactly("core-below-food-code");
			assertThat(judged(FoodCategory.MEAT, 63.0, Cut.WHOLE)).isEmpty();
			assertThat(judged(FoodCategory.MEAT, 67.9, Cut.MINCED)).containsExactly("core-below-food-code");
			assertThat(judged(FoodCategory.MEAT, 68.0, Cut.MINCED)).isEmpty();
			assertThat(judged(FoodCategory.FISH, 62.9, Cut.WHOLE)).containsExactly("core-below-food-code");
		}

		@Test
		void shouldDrawTheJuicinessAndBakedLinesAtTheTradesFigures() {
			// common practice: meat well done ≈ 70 °C, poultry breast dry past ≈ 80 °C,
			// fish past ≈ 65 °C
			assertThat(judged(FoodCategory.MEAT, 70.0, Cut.WHOLE)).isEmpty();
			assertThat(judged(FoodCategory.MEAT, 70.1, Cut.WHOLE)).containsExactly("core-past-juiciness");
			assertThat(judged(FoodCategory.POULTRY_SKIN, 80.1, Cut.WHOLE)).containsExactly("core-past-juiciness");
			assertThat(judged(FoodCategory.FISH, 65.1, Cut.WHOLE)).containsExactly("core-past-juiciness");
			// bakers' probe: lean bread 96–99 °C, enriched dough 88–93 °C
			assertThat(judged(FoodCategory.BREAD, 95.9, Cut.WHOLE)).containsExactly("crumb-not-baked");
			assertThat(judged(FoodCategory.BREAD, 96.0, Cut.WHOLE)).isEmpty();
			assertThat(judged(FoodCategory.SWEET_DOUGH, 89.9, Cut.WHOLE)).containsExactly("crumb-not-baked");
			// vegetables: no doneness line is drawn
			assertThat(judged(FoodCategory.VEGETABLE, 30, Cut.WHOLE)).isEmpty();
		}

		@Test
		void shouldJudgeNothingWhenTheColourIsNotReached() {
			CookResult r = AcrylamideCook.run(STEAK, new Oven(60, false, DRY), Target.stage("browned"),
					CookSettings.defaults().withHorizonS(600));
			assertThat(r.reached()).isFalse();
			assertThat(DonenessJudge.judge(STEAK, new Oven(60, false, DRY), r, Cut.WHOLE)).isEmpty();
		}

	}

}
