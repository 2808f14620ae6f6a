package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.system.MessageText;
import com.crustplan.system.TemperatureUnit;

/**
 * A plan in steps as the line reads it: checkpoints in time order, in the cook's unit. No
 * Spring.
 */
class PlanStepsServiceTest {

	final PlanService planner = new PlanService();

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

	static final Surface STEAK = Surface.defaults(FoodCategory.MEAT).withThicknessMm(30).withInitialTemperatureC(5);

	/** Sear 3 min turned every 90 s, a 180 °C fan oven to 52 °C core, 5 min rest. */
	PlanReport searOvenRest() {
		return searOvenRest(Target.stage("browned"));
	}

	PlanReport searOvenRest(Target colour) {
		List<CookStep> steps = List.of(CookStep.timed(new PanContact(240, true, 90), 180),
				CookStep.toCore(new Oven(180, true, 2), 52, 2400), CookStep.timed(new Rest(22), 300));
		return planner.planSteps(STEAK, Product.defaultFor(FoodCategory.MEAT), steps, List.of("Pan", "Oven", "Rest"),
				colour, 52.0, 60);
	}

	List<String> lines(PlanReport r, TemperatureUnit unit) {
		return r.steps()
			.timeline()
			.stream()
			.map(c -> Math.round(c.timeS()) + " " + c.kind() + " " + text.render(c.text(), unit))
			.toList();
	}

	@Test
	void shouldGiveTheLineItsCheckpointsInTimeOrder() {
		PlanReport r = searOvenRest();
		List<StepsReport.Checkpoint> t = r.steps().timeline();
		for (int i = 1; i < t.size(); i++) {
			assertThat(t.get(i).timeS()).isGreaterThanOrEqualTo(t.get(i - 1).timeS());
		}
		List<String> c = lines(r, TemperatureUnit.CELSIUS);
		double pullS = r.steps().records().get(1).endS();
		// the flip 90 s into the sear; the oven at the end of the sear, 3 min in
		assertThat(c).contains("0 step Into the pan at 240 °C", "90 flip Flip", "180 step Into the oven at 180 °C",
				Math.round(pullS) + " pull Pull at 52 °C core", Math.round(pullS) + " step Out to rest in 22 °C air");
		// a probe reading 5 K before the pull, inside the oven step
		StepsReport.Checkpoint probe = t.stream().filter(x -> x.kind().equals("probe")).findFirst().orElseThrow();
		assertThat(probe.timeS()).isBetween(180.0, pullS);
		// carry-over during the rest: the core rises after the pull (a thick steak gains
		// a few kelvin, kitchen experience)
		assertThat(r.steps().records().get(2).coreAtEndC()).isGreaterThan(53);
		assertThat(t.get(t.size() - 1).kind()).isEqualTo("end");
		assertThat(t.get(t.size() - 1).timeS()).isEqualTo(pullS + 300);
	}

	/**
	 * °F = °C × 9/5 + 32 (NIST SP 811, §B.9): 52 °C is 125.6 °F, shown as 126 °F; 240 °C
	 * is 464 °F.
	 */
	@Test
	void shouldSpeakInTheCooksUnit() {
		List<String> f = lines(searOvenRest(), TemperatureUnit.FAHRENHEIT);
		assertThat(f).anyMatch(l -> l.endsWith("Pull at 126 °F core"))
			.anyMatch(l -> l.endsWith("Into the pan at 464 °F"));
		assertThat(String.join("\n", f)).doesNotContain("°C");
	}

	@Test
	void shouldSayWhichTargetCameFirstAndByHowMuch() {
		// grey: 90 s a side at 240 °C no longer reaches a light sear once the drying
		// crust
		// shrinks instead of insulating (the face cools faster between flips)
		PlanReport r = searOvenRest(Target.stage("grey"));
		StepsReport s = r.steps();
		assertThat(s.coreTargetReachedS()).isNotNull();
		assertThat(r.reached()).isTrue();
		double lead = r.timeToTargetS() - s.coreTargetReachedS();
		assertThat(s.firstTarget()).isEqualTo(lead <= 0 ? "colour" : "core");
		assertThat(s.firstTargetLeadS()).isEqualTo(Math.abs(lead));
		assertThat(text.celsius(s.targetOrder())).contains("before").contains("52 °C");
		// a browned crust is not reached by this sear: the plan says so rather than
		// pretending
		PlanReport browned = searOvenRest();
		assertThat(browned.steps().firstTarget()).isNull();
		assertThat(text.celsius(browned.steps().targetOrder()))
			.isEqualTo("The core reaches 52 °C; the crust never reaches browned crust in this plan.");
		assertThat(browned.warnings()).anyMatch(w -> w.code().equals("target-not-reached"));
	}

	/**
	 * A steak pulled at 52 °C is below the whole-cut figure of FDA Food Code 2022,
	 * 3-401.11 (63 °C): said so.
	 */
	@Test
	void shouldWarnOnThePlansPeakCoreBelowTheFoodCode() {
		assertThat(searOvenRest().warnings()).anyMatch(w -> w.code().equals("core-below-food-code"));
	}

	@Test
	void shouldListManyFlipsAsOneLine() {
		PlanReport r = planner.planSteps(STEAK, Product.defaultFor(FoodCategory.MEAT),
				List.of(CookStep.timed(new PanContact(200, true, 30), 600)), List.of("Pan"), null, 50.0, 30);
		assertThat(lines(r, TemperatureUnit.CELSIUS)).contains("30 flip Flip every 30 s (19 flips in this step)");
		assertThat(r.targetLabel().code()).isEqualTo("target.core");
	}

	@Test
	void shouldRefuseAPlanWithNoTargetAndAStepStageOfAnotherCategory() {
		List<CookStep> pan = List.of(CookStep.timed(new PanContact(200, true, 0), 60));
		InvalidInputException none = assertThrows(InvalidInputException.class, () -> planner.planSteps(STEAK,
				Product.defaultFor(FoodCategory.MEAT), pan, List.of("Pan"), null, null, 30));
		assertThat(none.field()).isEqualTo("target");
		InvalidInputException stage = assertThrows(InvalidInputException.class,
				() -> planner.planSteps(STEAK, Product.defaultFor(FoodCategory.MEAT),
						List.of(CookStep.toColour(new PanContact(200, true, 0), Target.stage("golden"), 60)),
						List.of("Pan"), null, 50.0, 30));
		assertThat(stage.field()).isEqualTo("steps[0].stage");
	}

}
