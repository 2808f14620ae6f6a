package com.crustplan.card;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.doneness.DonenessLimits;
import com.crustplan.engine.doneness.FoodCode;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.myoglobin.CentreDoneness;
import com.crustplan.plan.AcrylamideView;
import com.crustplan.plan.LineTimeline;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanStep;
import com.crustplan.plan.SavedPlan;
import com.crustplan.plan.StepsReport.Checkpoint;
import com.crustplan.setup.HeatMode;
import com.crustplan.setup.SetupForm;

/**
 * What a station card shows for a saved plan: the food, the equipment as set, the
 * checkpoints with times, the target colour between its neighbours, the core at the pull
 * against the food code, the acrylamide zone where it matters, and which cautions apply.
 * Temperatures in °C; the page shows both scales.
 *
 * @param thicknessMm the piece's size as entered (thickness, width, edge or diameter)
 * @param shape the piece's shape, which says what the size is
 * @param coreTargetC a plan in steps' core target, °C (null: none)
 * @param offHeatS when the food leaves the heat for good, s from the start (null: never
 * within the plan)
 * @param readyS when a closing rest ends, s (null: no rest after the heat)
 * @param equipment the heated steps in order (a rest is on the timeline only)
 * @param colours the stage before the target, the target, the stage after (either
 * neighbour may be missing at the ends of the category's stages)
 * @param coreAtPullC the predicted core when the food leaves the heat (null: not reached)
 * @param code the food code's minimum for the category, or null where it sets none
 * @param doneAtC where the code sets none, the core at which the food counts as cooked
 * (common practice, {@link DonenessLimits}); null where neither applies
 * @param dryAboveC the core past which the food dries out (common practice,
 * {@link DonenessLimits}); null where none is set
 * @param acrylamide the estimate, only where acrylamide matters
 * ({@link PlanReport#acrylamideMatters()}), else null
 * @param doneness red meat with a cut face: the centre in the trade's words, else null
 * @param centreC the centre's hottest predicted temperature behind that word, °C (null
 * with no word)
 */
public record StationCard(long planId, String planName, String surfaceName, FoodCategory category, double thicknessMm,
		Shape shape, Message target, Double coreTargetC, boolean reached, Double offHeatS, Double readyS,
		List<Equipment> equipment, List<Checkpoint> timeline, List<Colour> colours, Double coreAtPullC, boolean stepped,
		FoodCode code, Double doneAtC, Double dryAboveC, AcrylamideView acrylamide, boolean hotOil, boolean hotPan,
		boolean hotOven, CentreDoneness doneness, Double centreC) {

	public StationCard {
		equipment = List.copyOf(equipment);
		timeline = List.copyOf(timeline);
		colours = List.copyOf(colours);
	}

	/**
	 * One heated step as set: its name, the kind of heat, the dial and what else is set.
	 */
	public record Equipment(String name, String mode, double temperatureC, List<String> details) {
	}

	/**
	 * One colour to hold the food against: the stage's name, sRGB hex, and when the plan
	 * reaches it (null: not within the run).
	 *
	 * @param role "before", "target" or "after"
	 */
	public record Colour(String role, String label, String hex, Double atS) {

		public boolean target() {
			return "target".equals(role);
		}

	}

	/**
	 * A colour reached this close to the pull is reached at the pull: a few of the
	 * engine's time steps (assumption; the card shows whole seconds).
	 */
	static final double SAME_MOMENT_S = 2;

	static StationCard of(SavedPlan saved, PlanInputs inputs, PlanReport report) {
		FoodCategory category = report.category();
		FoodCode code = FoodCode.forCategory(category, FoodCode.Cut.WHOLE);
		double done = DonenessLimits.doneAtC(category, FoodCode.Cut.WHOLE);
		List<Equipment> equipment = equipment(inputs);
		boolean oil = equipment.stream().anyMatch(e -> e.mode().equals(HeatMode.FRYER.label()));
		boolean pan = equipment.stream().anyMatch(e -> e.mode().equals(HeatMode.PAN.label()));
		boolean oven = equipment.stream().anyMatch(e -> e.mode().equals(HeatMode.OVEN.label()));
		return new StationCard(saved.getId(), saved.getName(), saved.getSurfaceName(), category,
				report.surface().thicknessMm(), report.surface().shape(), report.targetLabel(),
				report.stepped() ? report.steps().coreTargetC() : null, report.reached(), offHeatS(report),
				readyS(report), equipment, LineTimeline.of(report, inputs.colourTarget()),
				colours(report, offHeatS(report)), LineTimeline.coreAtPullC(report), report.stepped(), code,
				code == null && Double.isFinite(done) ? done : null, finite(DonenessLimits.dryAboveC(category)),
				report.acrylamideMatters() ? report.acrylamide() : null, oil, pan, oven, doneness(report),
				centreC(report));
	}

	/**
	 * Red meat is served by its centre's doneness; poultry and fish by the food code,
	 * which the card states already.
	 */
	private static CentreDoneness doneness(PlanReport report) {
		Double c = centreC(report);
		return c == null ? null : CentreDoneness.ofMeat(c);
	}

	private static Double centreC(PlanReport report) {
		if (report.category() != FoodCategory.MEAT || !report.hasCutFace()) {
			return null;
		}
		return finite(report.cutFace().profile().centrePeakC());
	}

	/**
	 * Whether the centre's own figure adds anything to the core figure beside it (the
	 * centre coasts on after the pull or a rest; equal when both read the same).
	 */
	public boolean centreFigureDiffers() {
		return centreC != null && (coreAtPullC == null || Math.round(centreC) != Math.round(coreAtPullC));
	}

	/** The trade's word for the centre, as the line says it. */
	public String donenessWord() {
		if (doneness == null) {
			return null;
		}
		return switch (doneness) {
			case RAW -> "blue (raw)";
			case RARE -> "rare";
			case MEDIUM_RARE -> "medium-rare";
			case MEDIUM -> "medium";
			case MEDIUM_WELL -> "medium-well";
			case WELL -> "well done";
		};
	}

	private static Double offHeatS(PlanReport report) {
		if (!report.stepped()) {
			return report.reached() ? report.timeToTargetS() : null;
		}
		Double end = null;
		for (CookStep.Record r : report.steps().records()) {
			if (!(report.steps().steps().get(r.index()).setup() instanceof Rest)) {
				end = r.endS();
			}
		}
		return end;
	}

	private static Double readyS(PlanReport report) {
		if (!report.stepped() || report.steps().records().isEmpty()) {
			return null;
		}
		List<CookStep.Record> records = report.steps().records();
		CookStep.Record last = records.get(records.size() - 1);
		return report.steps().steps().get(last.index()).setup() instanceof Rest ? last.endS() : null;
	}

	/** Whether the predicted core at the pull reaches the code's minimum. */
	public boolean meetsCode() {
		return code != null && coreAtPullC != null && coreAtPullC >= code.celsius();
	}

	public boolean pastDry() {
		return dryAboveC != null && coreAtPullC != null && coreAtPullC > dryAboveC;
	}

	public boolean meetsDone() {
		return doneAtC != null && coreAtPullC != null && coreAtPullC >= doneAtC;
	}

	/** Meat and fish: the minced figure is worth a line, since the card cannot tell. */
	public boolean mincedMatters() {
		return code == FoodCode.WHOLE_CUT;
	}

	public FoodCode minced() {
		return FoodCode.COMMINUTED;
	}

	public Colour targetColour() {
		return colours.stream().filter(Colour::target).findFirst().orElse(null);
	}

	private static List<Equipment> equipment(PlanInputs inputs) {
		List<Equipment> out = new ArrayList<>();
		if (inputs.stepped()) {
			for (PlanStep s : inputs.steps()) {
				if (!s.rest()) {
					out.add(equipment(s.label(), s.setup()));
				}
			}
		}
		else {
			out.add(equipment(inputs.setup().name(), inputs.setup()));
		}
		return out;
	}

	private static Equipment equipment(String name, SetupForm f) {
		HeatMode mode = HeatMode.byKey(f.mode()).orElse(HeatMode.OVEN);
		List<String> details = new ArrayList<>();
		if (mode.usesFlip() && f.flipEverySeconds() != null && f.flipEverySeconds() > 0) {
			details.add("turn every " + seconds(f.flipEverySeconds()));
		}
		if (mode.usesFan()) {
			details.add(Boolean.TRUE.equals(f.fan()) ? "fan on" : "fan off");
		}
		if (mode.usesSteam() && f.steamPct() != null && f.steamPct() >= 5) {
			details.add(Math.round(f.steamPct()) + "\u00a0% steam");
		}
		if (mode.usesFatFilm()) {
			details.add(Boolean.FALSE.equals(f.fatFilm()) ? "dry pan" : "thin film of fat");
		}
		if (mode == HeatMode.GRILL && f.heatFluxKwPerM2() != null) {
			// the temperature shown is the element's, worked out from the measured flux
			details.add(Math.round(f.heatFluxKwPerM2())
					+ "\u00a0kW/m² at the food (element temperature worked out from it)");
		}
		if (mode == HeatMode.GRILL && f.distanceMm() != null) {
			details.add(Math.round(f.distanceMm()) + "\u00a0mm below the element");
		}
		return new Equipment(name, mode.label(), f.toHeatSetup().temperatureC(), details);
	}

	private static String seconds(double s) {
		long r = Math.round(s);
		return r % 60 == 0 ? (r / 60) + "\u00a0min" : r + "\u00a0s";
	}

	/**
	 * The target colour (as predicted at the target time) between the category's stage
	 * before and after it; a plan with no colour target shows the colour it ends at.
	 */
	static List<Colour> colours(PlanReport report, Double offHeatS) {
		CookResult result = report.result();
		ColourPath path = report.category().colourPath();
		List<Sample> series = result.series();
		boolean byColour = Double.isFinite(result.targetExtent());
		double extent = byColour ? result.targetExtent() : result.finalBrowningExtent();
		if (!Double.isFinite(extent)) {
			return List.of();
		}
		// stages within this of the target are the target itself (a stage target's
		// extent is the stage's own)
		double same = 1e-6;
		BrowningStage before = null;
		BrowningStage after = null;
		for (BrowningStage s : report.category().stages()) {
			double e = s.extentOn(path);
			if (e < extent - same) {
				before = s;
			}
			else if (e > extent + same && after == null) {
				after = s;
			}
		}
		List<Colour> out = new ArrayList<>();
		if (before != null) {
			double e = before.extentOn(path);
			out.add(new Colour("before", before.label(), path.colourAt(e).hex(), firstAt(series, e)));
		}
		else {
			out.add(new Colour("before", "Raw", path.colourAt(0).hex(), 0.0));
		}
		String hex = byColour && result.targetColour() != null ? result.targetColour().hex()
				: path.colourAt(extent).hex();
		Double atS = byColour ? finite(result.timeToTargetS()) : null;
		// a step that ends at the colour ends on the next time step: the card gives one
		// time for the one moment
		if (atS != null && offHeatS != null && Math.abs(atS - offHeatS) <= SAME_MOMENT_S) {
			atS = offHeatS;
		}
		// a plan aimed at the core alone shows the colour it ends at, named as such
		out.add(new Colour("target", byColour ? null : "Colour at the end", hex, atS));
		if (after != null) {
			double e = after.extentOn(path);
			out.add(new Colour("after", after.label(), path.colourAt(e).hex(), firstAt(series, e)));
		}
		return out;
	}

	private static Double finite(double v) {
		return Double.isFinite(v) ? v : null;
	}

	private static Double firstAt(List<Sample> series, double extent) {
		for (Sample s : series) {
			if (s.browningExtent() >= extent) {
				return s.timeS();
			}
		}
		return null;
	}

}
