package com.crustplan.plan;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;

/** Repeat plan views reuse the finished report; the cache stays within its bound. */
class ReportCacheTest {

	@Test
	void shouldServeARepeatPlanFromTheReportAlreadyComputed() {
		PlanService planner = new PlanService();
		FoodCategory potato = FoodCategory.POTATO;
		Composition c = potato.defaultComposition();
		Surface chips = new Surface(potato, c, potato.defaultAsparagineMgPerKg(), potato.defaultSurfaceWaterGPerM2(),
				10, null, 0, 0, potato.defaultInitialTemperatureC());
		HeatSetup fryer = new DeepFryer(175);
		PlanReport first = planner.plan(chips, Product.defaultFor(potato), fryer, Target.stage("golden"), 10, false);
		// equal inputs (new but equal records): the same report object, not a new run
		Surface same = new Surface(potato, c, potato.defaultAsparagineMgPerKg(), potato.defaultSurfaceWaterGPerM2(), 10,
				null, 0, 0, potato.defaultInitialTemperatureC());
		assertThat(
				planner.plan(same, Product.defaultFor(potato), new DeepFryer(175), Target.stage("golden"), 10, false))
			.isSameAs(first);
		// another oil temperature is another plan (the unit is applied when the page
		// words it)
		assertThat(
				planner.plan(chips, Product.defaultFor(potato), new DeepFryer(170), Target.stage("golden"), 10, false))
			.isNotSameAs(first);
	}

	/**
	 * Least recently used goes first (java.util.LinkedHashMap in access order, its
	 * documented LRU use).
	 */
	@Test
	void shouldKeepOnlyTheMostRecentlyUsedReportsUpToItsBound() {
		ReportCache<Integer, String> cache = new ReportCache<>(3);
		AtomicInteger runs = new AtomicInteger();
		for (int k = 0; k < 3; k++) {
			cache.get(k, x -> "report " + x + " run " + runs.incrementAndGet());
		}
		cache.get(0, x -> "again");
		cache.get(3, x -> "report 3 run " + runs.incrementAndGet());
		assertThat(cache.size()).isEqualTo(3);
		assertThat(cache.get(0, x -> "recomputed")).isEqualTo("report 0 run 1");
		assertThat(cache.get(1, x -> "recomputed")).isEqualTo("recomputed");
	}

}
