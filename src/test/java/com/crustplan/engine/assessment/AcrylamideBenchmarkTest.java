package com.crustplan.engine.assessment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.Map;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;

/**
 * The benchmark table against Commission Regulation (EU) 2017/2158, Annex IV (µg/kg). The
 * expected values are typed in here from the Annex table, independently of the enum; they
 * are exact, so the tolerance is zero.
 */
class AcrylamideBenchmarkTest {

	private static final Map<BenchmarkLevel, Double> ANNEX_IV = new EnumMap<>(BenchmarkLevel.class);

	static {
		ANNEX_IV.put(BenchmarkLevel.FRENCH_FRIES, 500.0);
		ANNEX_IV.put(BenchmarkLevel.POTATO_CRISPS, 750.0);
		ANNEX_IV.put(BenchmarkLevel.SOFT_BREAD_WHEAT, 50.0);
		ANNEX_IV.put(BenchmarkLevel.SOFT_BREAD_OTHER, 100.0);
		ANNEX_IV.put(BenchmarkLevel.BREAKFAST_CEREALS_BRAN_WHOLEGRAIN, 300.0);
		ANNEX_IV.put(BenchmarkLevel.BREAKFAST_CEREALS_WHEAT_RYE, 300.0);
		ANNEX_IV.put(BenchmarkLevel.BREAKFAST_CEREALS_MAIZE_OAT_SPELT_BARLEY_RICE, 150.0);
		ANNEX_IV.put(BenchmarkLevel.BISCUITS_AND_WAFERS, 350.0);
		ANNEX_IV.put(BenchmarkLevel.CRACKERS, 400.0);
		ANNEX_IV.put(BenchmarkLevel.CRISPBREAD, 350.0);
		ANNEX_IV.put(BenchmarkLevel.GINGERBREAD, 800.0);
		ANNEX_IV.put(BenchmarkLevel.SIMILAR_FINE_BAKERY, 300.0);
		ANNEX_IV.put(BenchmarkLevel.ROAST_COFFEE, 400.0);
		ANNEX_IV.put(BenchmarkLevel.INSTANT_COFFEE, 850.0);
		ANNEX_IV.put(BenchmarkLevel.COFFEE_SUBSTITUTES_CEREALS, 500.0);
		ANNEX_IV.put(BenchmarkLevel.COFFEE_SUBSTITUTES_CHICORY, 4000.0);
		ANNEX_IV.put(BenchmarkLevel.BABY_FOODS_CEREAL_BASED, 40.0);
		ANNEX_IV.put(BenchmarkLevel.BABY_BISCUITS_AND_RUSKS, 150.0);
	}

	@Test
	void everyBenchmarkEqualsAnnexIv() {
		// Regulation (EU) 2017/2158 Annex IV; exact values, tolerance 0
		assertEquals(ANNEX_IV.keySet(), java.util.EnumSet.allOf(BenchmarkLevel.class),
				"every row of the table is checked");
		for (BenchmarkLevel b : BenchmarkLevel.values()) {
			assertEquals(ANNEX_IV.get(b), b.microgramsPerKg(), 0.0, b.name());
		}
	}

	@Test
	void categoriesMapToTheirProducts() {
		// Annex IV product rows; bread defaults to wheat-based soft bread, sweet dough to
		// biscuits
		assertEquals(500, Product.defaultFor(FoodCategory.POTATO).benchmark().orElseThrow().microgramsPerKg(), 0.0);
		assertEquals(750, Product.forSurface(FoodCategory.POTATO, "crisps").benchmark().orElseThrow().microgramsPerKg(),
				0.0);
		assertTrue(Product.forSurface(FoodCategory.POTATO, "roast-potato").benchmark().isEmpty());
		assertEquals(50, Product.defaultFor(FoodCategory.BREAD).benchmark().orElseThrow().microgramsPerKg(), 0.0);
		assertEquals(100,
				Product.forSurface(FoodCategory.BREAD, "other-bread").benchmark().orElseThrow().microgramsPerKg(), 0.0);
		assertEquals(350, Product.defaultFor(FoodCategory.SWEET_DOUGH).benchmark().orElseThrow().microgramsPerKg(),
				0.0);
		assertEquals(800,
				Product.forSurface(FoodCategory.SWEET_DOUGH, "gingerbread").benchmark().orElseThrow().microgramsPerKg(),
				0.0);
		for (FoodCategory c : new FoodCategory[] { FoodCategory.MEAT, FoodCategory.POULTRY_SKIN, FoodCategory.FISH,
				FoodCategory.VEGETABLE }) {
			Product p = Product.defaultFor(c);
			assertTrue(p.benchmark().isEmpty(), c + ": Annex IV sets no benchmark");
			assertTrue(p.noBenchmarkReason().orElseThrow().contains("no benchmark"), c.name());
		}
		for (FoodCategory c : FoodCategory.values()) {
			assertEquals(c, Product.defaultFor(c).category(), "each category has exactly one default product");
		}
	}

	@Test
	void unknownProductKeyNamesTheField() {
		InvalidInputException e = assertThrows(InvalidInputException.class,
				() -> Product.forSurface(FoodCategory.POTATO, "gingerbread"));
		assertEquals("product", e.field());
		assertTrue(e.reason().contains("french-fries"), e.reason());
	}

	@Test
	void zonesSplitAtHalfTheBenchmarkAndTheBenchmark() {
		// our zone definition: low < B/2 ≤ elevated ≤ B < high
		BenchmarkLevel fries = BenchmarkLevel.FRENCH_FRIES;
		assertEquals(AcrylamideZone.LOW, fries.zoneOf(249.9));
		assertEquals(AcrylamideZone.ELEVATED, fries.zoneOf(250));
		assertEquals(AcrylamideZone.ELEVATED, fries.zoneOf(500));
		assertEquals(AcrylamideZone.HIGH, fries.zoneOf(500.1));
		assertEquals(AcrylamideZone.NOT_ESTIMATED, fries.zoneOf(Double.NaN));
	}

}
