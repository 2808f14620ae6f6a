package com.crustplan.bench;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.PanContact;

/**
 * The plans the benchmarks and tables run: the two everyday cooks a kitchen plans most.
 */
final class Plans {

	/**
	 * A 25 mm steak (the meat defaults) in an oiled pan at 220 °C, not turned, to a
	 * browned crust.
	 */
	static final Surface STEAK = Surface.defaults(FoodCategory.MEAT);

	static final HeatSetup PAN_220 = new PanContact(220, true, 0);

	static final Target BROWNED = Target.stage("browned");

	/** 10 mm chips (the potato defaults) in oil at 175 °C, to golden. */
	static final Surface CHIPS = Surface.defaults(FoodCategory.POTATO);

	/**
	 * Chips as the app cooks them: 10 mm square strips (the slab above keeps the old
	 * case).
	 */
	static final Surface CHIPS_STRIP = Surface.typical(FoodCategory.POTATO);

	static final HeatSetup FRYER_175 = new DeepFryer(175);

	static final Target GOLDEN = Target.stage("golden");

	/** The fryer temperatures of the risk map: 30 from 150 to 195 °C. */
	static final int MAP_POINTS = 30;

	static final double MAP_FROM_C = 150;

	static final double MAP_TO_C = 195;

	private Plans() {
	}

	static CookResult steak(CookSettings settings) {
		return AcrylamideCook.run(STEAK, PAN_220, BROWNED, settings);
	}

	static CookResult chips(CookSettings settings) {
		return AcrylamideCook.run(CHIPS, FRYER_175, GOLDEN, settings);
	}

	static CookResult chipsStrip(CookSettings settings) {
		return AcrylamideCook.run(CHIPS_STRIP, FRYER_175, GOLDEN, settings);
	}

	static double mapTemperatureC(int i) {
		return MAP_FROM_C + (MAP_TO_C - MAP_FROM_C) * i / (MAP_POINTS - 1);
	}

	/**
	 * The engine part of a risk map without RiskMap's columns and acrylamide: 30 runs of
	 * the chips over the fryer temperatures, summaries only (no series), each stopping a
	 * quarter past its target.
	 */
	static double[] fryerMapTimesToTarget() {
		return fryerMapTimesToTarget(CookSettings.defaults().withRecordSeries(false));
	}

	static double[] fryerMapTimesToTarget(CookSettings summary) {
		double[] times = new double[MAP_POINTS];
		for (int i = 0; i < MAP_POINTS; i++) {
			times[i] = mapPoint(i, summary);
		}
		return times;
	}

	static double mapPoint(int i, CookSettings summary) {
		return AcrylamideCook.run(CHIPS, new DeepFryer(mapTemperatureC(i)), GOLDEN, summary).timeToTargetS();
	}

}
