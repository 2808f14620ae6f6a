package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.assessment.AcrylamideZone;
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

	/**
	 * {@code zone} is low / elevated / high, or null where no benchmark applies. The
	 * target cell holds the plan's own figures at the moment the target is reached
	 * ({@code atS}), not those of the column's time; {@code atS} is that column's time
	 * elsewhere.
	 */
	public record Cell(String hex, String stageLabel, double portionUgPerKg, String zone, String zoneLabel,
			boolean target, double atS) {

		static Cell of(String hex, String stageLabel, double portionUgPerKg, AcrylamideZone z, boolean target,
				double atS) {
			String key = key(z);
			return new Cell(hex, stageLabel, portionUgPerKg, key, key == null ? null : z.label() + ": " + z.meaning(),
					target, atS);
		}

	}

	private static String key(AcrylamideZone z) {
		return switch (z) {
			case LOW -> "low";
			case ELEVATED -> "elevated";
			case HIGH -> "high";
			default -> null;
		};
	}

	/**
	 * @param targetExtent the target's browning extent on the path
	 * @param targetStage what the target is called in a cell's label
	 */
	static RiskMapView of(RiskMap map, ColourPath path, String surfaceName, String setupName, double targetExtent,
			String targetStage) {
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
				if (target) {
					// the cell past the target shows the target's own moment: the plan's
					// time, colour and acrylamide, not the next column's
					double portion = r.targetPortionUgPerKg();
					AcrylamideZone z = map.benchmarkOrNull() == null ? AcrylamideZone.NO_BENCHMARK
							: map.benchmarkOrNull().zoneOf(portion);
					cells.add(
							Cell.of(path.colourAt(targetExtent).hex(), targetStage, portion, z, true, r.targetTimeS()));
				}
				else {
					cells.add(Cell.of(path.colourAt(c.browningExtent()).hex(), c.stageLabel(), c.portionUgPerKg(),
							c.zone(), false, c.timeS()));
				}
			}
			rows.add(new Row(r.temperatureC(), PlanReport.finite(r.targetTimeS()),
					PlanReport.finite(r.targetPortionUgPerKg()), cells));
		}
		return new RiskMapView(surfaceName, setupName, map.targetDescription(), map.product().label(),
				map.benchmarkOrNull() == null ? null : map.benchmarkOrNull().microgramsPerKg(), times, rows,
				map.cautions());
	}

}
