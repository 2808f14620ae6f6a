package com.crustplan.engine.cook;

import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.properties.FoodComponent;

/**
 * Frying oil entering the pores a layer opens as it loses water: oil in proportion to the
 * water lost, the relation the frying literature measures (Gamble, Rice &amp; Selman
 * 1987, Int J Food Sci Technol 22:233: oil uptake and moisture loss of fried potato
 * slices both linear in √t and tied to each other; stained oil found where water had
 * left). While a face is in oil, each layer holds r·(water it has lost) and never gives
 * oil back. Much of a fry's oil is known to enter as it leaves the fryer; taking it all
 * in during frying overstates the oil in the pores while frying (their conductivity) a
 * little.
 */
public final class OilUptake {

	public static final Parameter OIL_PER_WATER_LOST = Parameter.calibrated("r_oil",
			"frying oil taken up per kg of water lost", 0.1, "kg/kg",
			"a finished fry of about 40 % water and 10–15 % oil (common practice; McGee, On Food and Cooking) "
					+ "made from a raw potato of 79 % water: 0.28 kg oil per 2.9 kg water lost per kg of dry matter");

	private static final double RATIO = OIL_PER_WATER_LOST.value();

	private OilUptake() {
	}

	/**
	 * Tops each layer's oil up to r·(water lost); the oil arrives at the layer's
	 * temperature and its enthalpy is counted in the ledger.
	 */
	static void step(CookState s, EnergyAccount account) {
		for (int i = 0; i < s.size(); i++) {
			double target = RATIO * Math.max(0, s.initialMoisture - s.moisture[i]) * s.dryMass[i];
			double gain = target - s.oil[i];
			if (gain > 0) {
				s.oil[i] = target;
				account.oilIn(gain * FoodComponent.FAT.enthalpy(s.temperature[i] - 273.15));
			}
		}
	}

}
