package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.system.MessageText;
import com.crustplan.system.TemperatureUnit;

/**
 * What the plan service adds around the engine's numbers: warnings, cautions, swatches.
 * No Spring.
 */
class PlanServiceTest {

	final PlanService planner = new PlanService();

	/** The report speaks in codes; a page renders them in the cook's unit. */
	/**
	 * The page's wording read with its no-break spaces as spaces (they only keep a figure
	 * on the line of its unit).
	 */
	final MessageText text = new MessageText() {
		@Override
		public String render(com.crustplan.engine.message.Message message, TemperatureUnit unit) {
			return super.render(message, unit).replace('\u00a0', ' ');
		}
	};

	/**
	 * A 60 mm skin-on piece in a 240 °C pan: the skin colours long before the core is
	 * safe.
	 */
	PlanReport thickChicken() {
		Surface s = Surface.defaults(FoodCategory.POULTRY_SKIN).withThicknessMm(60);
		return planner.plan(s, new PanContact(240, true, 0), Target.stage("light-golden"), 30);
	}

	@Test
	void shouldWarnWhenPoultryIsColouredBeforeTheFoodCodeCoreTemperature() {
		PlanReport r = thickChicken();
		assertThat(r.reached()).isTrue();
		assertThat(r.coreTemperatureAtTargetC()).isLessThan(74.0);
		PlanWarning w = r.warnings()
			.stream()
			.filter(x -> x.code().equals("core-below-food-code"))
			.findFirst()
			.orElseThrow();
		// FDA Food Code 2022, 3-401.11(A)(3): poultry 165 °F (74 °C), the code's own °F
		// figure
		assertThat(text.render(w.message(), TemperatureUnit.FAHRENHEIT)).contains("165 °F")
			.contains("FDA Food Code 2022");
		assertThat(text.render(thickChicken().warnings()
			.stream()
			.filter(x -> x.code().equals("core-below-food-code"))
			.findFirst()
			.orElseThrow()
			.message(), TemperatureUnit.CELSIUS)).contains("74 °C");
	}

	@Test
	void shouldCarryTheCautionsThatApplyToTheFood() {
		List<String> c = text.render(thickChicken().cautions(), TemperatureUnit.CELSIUS);
		// acrylamide forms from asparagine and sugars in starchy foods (EFSA CONTAM Panel
		// 2015): no acrylamide caution on chicken
		assertThat(c).noneSatisfy(x -> assertThat(x).contains("Group 2A"));
		assertThat(c).anySatisfy(x -> assertThat(x).contains("probe"));
		// FDA Food Code 2022 3-401.11: 63 °C 15 s whole cuts, 68 °C 17 s minced, 74 °C <
		// 1 s poultry
		assertThat(c).anySatisfy(x -> assertThat(x).contains("2022")
			.contains("63 °C (145 °F) for 15 s")
			.contains("68 °C (155 °F) for 17 s")
			.contains("74 °C (165 °F) for under 1 s"));
		assertThat(c).anySatisfy(x -> assertThat(x).contains("Hot pan"));
		// chips: IARC Group 2A caution, no FDA Food Code 3-401.11 core figures (it sets
		// none for potatoes), the local food code still deferred to
		List<String> chips = text.render(planner
			.plan(Surface.defaults(FoodCategory.POTATO), new DeepFryer(170), Target.stage("light-golden"), 20)
			.cautions(), TemperatureUnit.CELSIUS);
		assertThat(chips).anySatisfy(x -> assertThat(x).contains("Group 2A"));
		assertThat(chips).anySatisfy(x -> assertThat(x).contains("probe"));
		assertThat(chips).noneSatisfy(x -> assertThat(x).contains("FDA Food Code"));
		assertThat(chips).anySatisfy(x -> assertThat(x).contains("local food code and licensed practice"));
		assertThat(chips).noneSatisfy(x -> assertThat(x).contains("Hot pan"));
	}

	@Test
	void shouldNotGiveAZeroBandToTheFaceOfAnUnturnedSteakThatNeverSawTheHeat() {
		// a steak never turned in the pan: the face up meets only kitchen air, so it has
		// no grey band; the sentence says so instead of "0.0 mm under the lower one"
		PlanReport r = planner.plan(Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 0),
				Target.stage("browned"), 30);
		assertThat(r.cutFace().profile().band().code()).isEqualTo("interior.band.meat.one-face");
		assertThat(text.celsius(r.cutFace().profile().band())).doesNotContain("0.0 mm")
			.contains("none under the other face");
		// turned every minute, both faces have one
		PlanReport turned = planner.plan(Surface.defaults(FoodCategory.MEAT), new PanContact(220, true, 60),
				Target.stage("browned"), 30);
		assertThat(turned.cutFace().profile().band().code()).isIn("interior.band.meat", "interior.band.meat.even");
	}

	@Test
	void shouldCautionAboutHotOilOnlyForTheFryer() {
		Surface chips = Surface.defaults(FoodCategory.POTATO);
		PlanReport fried = planner.plan(chips, new DeepFryer(170), Target.stage("light-golden"), 20);
		assertThat(text.celsius(fried.cautions())).anySatisfy(x -> assertThat(x).startsWith("Hot oil"));
		assertThat(text.celsius(thickChicken().cautions())).noneSatisfy(x -> assertThat(x).startsWith("Hot oil"));
	}

	@Test
	void shouldMarkExactlyOneTargetSwatchInTimeOrder() {
		PlanReport r = thickChicken();
		List<Swatch> s = r.swatches();
		assertThat(s).hasSizeBetween(5, PlanService.SWATCHES);
		assertThat(s.stream().filter(Swatch::target)).hasSize(1);
		for (int i = 1; i < s.size(); i++) {
			assertThat(s.get(i).timeS()).isGreaterThan(s.get(i - 1).timeS());
		}
		Swatch t = s.stream().filter(Swatch::target).findFirst().orElseThrow();
		// the marked swatch is the sample nearest the target time: within one output
		// interval (5 s)
		assertThat(Math.abs(t.timeS() - r.timeToTargetS())).isLessThanOrEqualTo(5.0);
		assertThat(t.hex()).matches("#[0-9a-fA-F]{6}");
	}

	@Test
	void shouldRefuseAHorizonOutsideOneMinuteToSixHours() {
		Surface s = Surface.defaults(FoodCategory.MEAT);
		HeatSetup pan = new PanContact(220, true, 60);
		assertThatThrownBy(() -> planner.plan(s, pan, Target.stage("browned"), 0))
			.isInstanceOf(InvalidInputException.class)
			.extracting(e -> ((InvalidInputException) e).field())
			.isEqualTo("horizonMinutes");
		assertThatThrownBy(() -> planner.plan(s, pan, Target.stage("browned"), 361))
			.isInstanceOf(InvalidInputException.class);
	}

	@Test
	void shouldShowAnAcrylamideEstimateExactlyWhenTheEngineGivesOne() {
		// the engine's acrylamide fields are NaN until its acrylamide model is in; then
		// the page shows them
		PlanReport r = thickChicken();
		assertThat(r.acrylamide().available()).isEqualTo(Double.isFinite(r.result().crustAcrylamideAtTargetUgPerKg())
				|| Double.isFinite(r.result().portionAcrylamideAtTargetUgPerKg()));
	}

	@Test
	void shouldWarnWhenChickenIsGoldenWithADryCoreAndSayHowToAvoidIt() {
		// skin-on chicken in a dry 200 °C fan oven: golden with the core near 99 °C, past
		// the 80 °C at which
		// poultry breast dries (common practice); the plan used to say "Warnings: none"
		PlanReport r = planner.plan(Surface.defaults(FoodCategory.POULTRY_SKIN), new Oven(200, true, 1.6),
				Target.stage("golden"), 60);
		PlanWarning w = r.warnings()
			.stream()
			.filter(x -> x.code().equals("core-past-juiciness"))
			.findFirst()
			.orElseThrow();
		String f = text.render(w.message(), TemperatureUnit.FAHRENHEIT);
		// 80 °C = 176 °F; FDA Food Code 2022 poultry 165 °F, the code's own figure
		assertThat(f).contains("176 °F").contains("165 °F").contains("Brown it first").doesNotContain("°C");
	}

	@Test
	void shouldWarnWhenABaguetteIsGoldenOverARawCrumb() {
		// a 60 mm lean loaf golden in a 230 °C deck oven while the crumb is near 22 °C;
		// baked is 96 °C (bakers' probe)
		PlanReport r = planner.plan(Surface.defaults(FoodCategory.BREAD).withThicknessMm(60), new Oven(230, false, 1.6),
				Target.stage("golden"), 60);
		PlanWarning w = r.warnings().stream().filter(x -> x.code().equals("crumb-not-baked")).findFirst().orElseThrow();
		// a difference worded in the page's scale, as a baker reads it (40 K of
		// difference is 40 °C and 72 °F, NIST SP 811 §B.9), not in kelvin
		assertThat(text.render(w.message(), TemperatureUnit.CELSIUS)).contains("96 °C")
			.contains("Bake about 40 °C cooler")
			.doesNotContain(" K ");
		assertThat(text.render(w.message(), TemperatureUnit.FAHRENHEIT)).contains("Bake about 72 °F cooler");
	}

}
