package com.crustplan.engine.calibration;

import java.util.List;
import java.util.Locale;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;

import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.RadiantGrill;

/**
 * The dozen kitchen cases the README's "what moved" table is measured on, printed, not
 * asserted (the calibrations and the published checks are asserted elsewhere). Run with
 * {@code mvn test -Dtest=KitchenCases -Dcrustplan.kitchenCases=true}.
 */
@EnabledIfSystemProperty(named = "crustplan.kitchenCases", matches = "true")
class KitchenCases {

	private static final CookSettings SETTINGS = CookSettings.defaults().withHorizonS(4 * 3600).withOutputIntervalS(5);

	record Case(String name, Surface surface, HeatSetup setup, String stage, double doneCoreC) {
	}

	static List<Case> cases() {
		Surface bread = Surface.typical(FoodCategory.BREAD);
		Surface potato = Surface.typical(FoodCategory.POTATO);
		Surface meat = Surface.typical(FoodCategory.MEAT);
		return List.of(
				new Case("bread 80 mm, still oven 200 °C", bread.withThicknessMm(80), new Oven(200, false, 1.6),
						"golden", 96),
				new Case("loaf 80 mm strip (a bâtard), still oven 200 °C",
						bread.withShape(Shape.STRIP).withThicknessMm(80), new Oven(200, false, 1.6), "golden", 96),
				new Case("bread 40 mm, still oven 200 °C", bread.withThicknessMm(40), new Oven(200, false, 1.6),
						"golden", 96),
				new Case("steak 25 mm, pan 230 °C turned 60 s", meat.withThicknessMm(25), new PanContact(230, true, 60),
						"browned", 52),
				new Case("steak 40 mm, pan 230 °C turned 60 s", meat.withThicknessMm(40), new PanContact(230, true, 60),
						"browned", 52),
				new Case("fries 10 mm strip, fryer 175 °C", potato.withShape(Shape.STRIP).withThicknessMm(10),
						new DeepFryer(175), "golden", 95),
				new Case("fries 7 mm strip, fryer 175 °C", potato.withShape(Shape.STRIP).withThicknessMm(7),
						new DeepFryer(175), "golden", 95),
				new Case("fries 10 mm strip, 0.1 % sugar",
						withSugar(potato, 0.1).withShape(Shape.STRIP).withThicknessMm(10), new DeepFryer(175), "golden",
						95),
				new Case("fries 10 mm strip, 1 % sugar",
						withSugar(potato, 1.0).withShape(Shape.STRIP).withThicknessMm(10), new DeepFryer(175), "golden",
						95),
				new Case("fries 10 mm strip, fryer 160 °C", potato.withShape(Shape.STRIP).withThicknessMm(10),
						new DeepFryer(160), "golden", 95),
				new Case("fries 10 mm strip, fryer 190 °C", potato.withShape(Shape.STRIP).withThicknessMm(10),
						new DeepFryer(190), "golden", 95),
				new Case("roast potato 35 mm cube, fan oven 200 °C", potato.withShape(Shape.CUBE).withThicknessMm(35),
						new Oven(200, true, 1.6), "golden", 95),
				new Case("sponge cake 50 mm, still oven 180 °C",
						Surface.typical(FoodCategory.SWEET_DOUGH).withThicknessMm(50), new Oven(180, false, 1.6),
						"golden", 96),
				new Case("chicken skin-on 20 mm, pan 200 °C turned 90 s",
						Surface.typical(FoodCategory.POULTRY_SKIN).withThicknessMm(20), new PanContact(200, true, 90),
						"deep-golden", 74),
				new Case("fish 20 mm, pan 200 °C turned 120 s", Surface.typical(FoodCategory.FISH).withThicknessMm(20),
						new PanContact(200, true, 120), "deep-golden", 63),
				new Case("toast 12 mm, salamander 12 kW/m² turned 120 s", bread.withThicknessMm(12),
						RadiantGrill.fromHeatFlux(12, 120), "golden", 96));
	}

	private static Surface withSugar(Surface s, double pct) {
		// the sugar is traded against starch, so the parts still add up
		Composition c = s.composition();
		return s.withComposition(new Composition(c.waterPct(), c.proteinPct(), c.fatPct(), pct, c.sucrosePct(),
				c.starchPct() - (pct - c.reducingSugarPct()), c.fibrePct(), c.ashPct()));
	}

	@Test
	void print() {
		StringBuilder out = new StringBuilder(
				"\n| case | time to target | core at target | water / oil at target | acrylamide portion / crust | core reaches done at |\n|---|---:|---:|---:|---:|---:|\n");
		for (Case c : cases()) {
			CookResult r;
			try {
				r = AcrylamideCook.run(c.surface(), c.setup(), Target.stage(c.stage()), SETTINGS);
			}
			catch (RuntimeException e) {
				out.append("| ").append(c.name()).append(" | failed: ").append(e.getMessage()).append(" |\n");
				continue;
			}
			StepsResult done = AcrylamideCook.runSteps(c.surface(),
					List.of(CookStep.toCore(c.setup(), c.doneCoreC(), SETTINGS.horizonS())), null, c.doneCoreC(),
					SETTINGS);
			double maxSurface = r.series().stream().mapToDouble(Sample::surfaceTemperatureC).max().orElse(Double.NaN);
			out.append(String.format(Locale.ROOT,
					"| %s, %s | %.1f min | %.1f °C | %.0f %% / %.1f %% | %.0f / %.0f µg/kg | %.0f °C at %.1f min (max surface %.0f °C) |%n",
					c.name(), c.stage(), r.timeToTargetS() / 60, r.coreTemperatureAtTargetC(), r.waterAtTargetPct(),
					r.oilAtTargetPct(), r.portionAcrylamideAtTargetUgPerKg(), r.crustAcrylamideAtTargetUgPerKg(),
					c.doneCoreC(), done.coreReachedAtS() / 60, maxSurface));
		}
		System.out.println(out);
	}

}
