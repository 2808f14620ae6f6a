package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.assessment.RiskMap;
import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.message.Message;

/**
 * The acrylamide risk map as the page shows it: set temperatures down, times across, each
 * cell the predicted colour with the acrylamide zone of the portion; the first cell at or
 * past the target per row.
 */
public record RiskMapView(String surfaceName, String setupName, Message targetLabel, String product,
		Double benchmarkUgPerKg, List<Double> timesS, List<Row> rows, List<Message> cautions) {

	public record Row(double temperatureC, Double targetTimeS, Double targetPortionUgPerKg, List<Cell> cells) {
	}

	/** {@code zone} is low / elevated / high, or null where no benchmark applies. */
	public record Cell(String hex, String stageLabel, double portionUgPerKg, String zone, boolean target) {
	}

	static RiskMapView of(RiskMap map, ColourPath path, String surfaceName, String setupName) {
		List<Double> times = new ArrayList<>();
		List<Row> rows = new ArrayList<>();
		for (RiskMap.Row r : map.rows()) {
			List<Cell> cells = new ArrayList<>();
			boolean marked = false;
			for (RiskMap.Cell c : r.cells()) {
				if (rows.isEmpty()) {
					times.add(c.timeS());
				}
				boolean target = !marked && r.reachesTarget() && c.timeS() >= r.targetTimeS() - 1e-9;
				marked |= target;
				String zone = switch (c.zone()) {
					case LOW -> "low";
					case ELEVATED -> "elevated";
					case HIGH -> "high";
					default -> null;
				};
				cells.add(new Cell(path.colourAt(c.browningExtent()).hex(), c.stageLabel(), c.portionUgPerKg(), zone,
						target));
			}
			rows.add(new Row(r.temperatureC(), PlanReport.finite(r.targetTimeS()),
					PlanReport.finite(r.targetPortionUgPerKg()), cells));
		}
		return new RiskMapView(surfaceName, setupName, map.targetDescription(), map.product().label(),
				map.benchmarkOrNull() == null ? null : map.benchmarkOrNull().microgramsPerKg(), times, rows,
				map.cautions());
	}

}
