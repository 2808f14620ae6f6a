package com.crustplan.engine.food;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.message.Message;

/**
 * The surface page's warning when asparagine or reducing sugar is far from the category's
 * typical value.
 */
class TypicalValuesTest {

	@Test
	void aRedMeatSurfaceSwitchedToPotatoKeepingItsAsparagineIsFlagged() {
		// 50 mg/kg is red meat's default; potato's is about 3000
		Surface s = Surface.defaults(FoodCategory.POTATO).withAsparagineMgPerKg(50);
		List<Message> m = TypicalValues.check(s);
		assertEquals(List.of("surface.asparagine-far-below"), m.stream().map(Message::code).toList());
	}

	@Test
	void theHighestRetailPotatoAsparagineIsNotFlagged() {
		// retail potatoes reach about 58 mmol/kg ≈ 7.7 g/kg free asparagine (Vivanti,
		// Finotti & Friedman 2006, J Food Sci): within the category's spread
		Surface s = Surface.defaults(FoodCategory.POTATO).withAsparagineMgPerKg(7700);
		assertTrue(TypicalValues.check(s).isEmpty());
	}

	@Test
	void everyCategorysDefaultsAreTypical() {
		for (FoodCategory c : FoodCategory.values()) {
			assertTrue(TypicalValues.check(Surface.defaults(c)).isEmpty(), c.key());
		}
	}

	@Test
	void aHighSugarLotIsFlaggedAbove() {
		// five times the default reducing sugar, as cold storage can make of a lot
		// (cold-induced sweetening raises glucose and fructose several-fold; from memory)
		Surface s = Surface.defaults(FoodCategory.POTATO);
		Composition c = s.composition();
		double sweet = 5 * c.reducingSugarPct();
		// the extra sugar comes from starch, so the parts still add up
		Surface lot = s.withComposition(new Composition(c.waterPct(), c.proteinPct(), c.fatPct(), sweet, c.sucrosePct(),
				c.starchPct() - (sweet - c.reducingSugarPct()), c.fibrePct(), c.ashPct()));
		assertEquals("surface.sugar-far-above", TypicalValues.check(lot).get(0).code());
	}

}
