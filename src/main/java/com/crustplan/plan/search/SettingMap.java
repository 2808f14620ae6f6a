package com.crustplan.plan.search;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.crustplan.engine.assessment.HeatSetups;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.assessment.RiskMap;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.input.InvalidInputException;

/**
 * A grid of settings × times: one {@link RiskMap} per oven steam share (one row per set
 * temperature each), rows in the range's order.
 */
final class SettingMap {

	/**
	 * Most time columns: a grid a tablet shows without scrolling sideways (readability).
	 */
	static final int MAX_COLUMNS = 40;

	private SettingMap() {
	}

	/** One row: its setting and the risk map's row at it. */
	record Row(HeatSetup setup, RiskMap.Row row) {
	}

	/**
	 * @param target null: no target line; the runs go on to the end of the map whatever
	 * colour they reach
	 */
	static List<Row> compute(Surface surface, Product product, HeatSetup template, SettingRange range, Target target,
			double stepS, double maxS) {
		if (maxS / stepS > MAX_COLUMNS + 1e-9) {
			throw new InvalidInputException("stepMinutes",
					"at most " + MAX_COLUMNS + " time steps per map after the start (this one has "
							+ (int) Math.ceil(maxS / stepS) + "): use a longer stepMinutes or fewer minutes");
		}
		double[] temperatures = range.temperaturesC().stream().mapToDouble(Double::doubleValue).toArray();
		// a map without a target runs to its end: the darkest stage stands in and is
		// then not shown
		Target driver = target != null ? target
				: Target.stage(surface.category().stages().get(surface.category().stages().size() - 1).key());
		Map<Double, RiskMap> bySteam = new LinkedHashMap<>();
		List<Double> steams = range.steamPcts().isEmpty() ? List.of(Double.NaN) : range.steamPcts();
		for (double steam : steams) {
			HeatSetup t = Double.isNaN(steam) ? template
					: new Oven(((Oven) template).airTemperatureC(), ((Oven) template).fan(), steam);
			bySteam.put(steam,
					RiskMap.compute(surface, product, t, driver, temperatures, stepS, maxS, CookSettings.defaults()));
		}
		List<Row> rows = new ArrayList<>();
		for (int i = 0; i < temperatures.length; i++) {
			for (double steam : steams) {
				HeatSetup at = HeatSetups.withTemperature(template, temperatures[i]);
				if (!Double.isNaN(steam)) {
					at = new Oven(temperatures[i], ((Oven) template).fan(), steam);
				}
				rows.add(new Row(at, bySteam.get(steam).rows().get(i)));
			}
		}
		return rows;
	}

}
