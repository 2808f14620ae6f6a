package com.crustplan.plan;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;

/**
 * Everything a plan page or the API shows, computed once by {@link PlanService}. A plan
 * in steps carries its {@link StepsReport} ({@code setup} is then the first step's); a
 * one-setup plan has none.
 */
public record PlanReport(Surface surface, HeatSetup setup, Message targetLabel, double horizonMinutes,
		CookResult result, List<PlanWarning> warnings, List<Message> cautions, AcrylamideView acrylamide,
		List<Swatch> swatches, StepsReport steps, CutFace cutFace) {

	/** A one-setup plan. */
	public PlanReport(Surface surface, HeatSetup setup, Message targetLabel, double horizonMinutes, CookResult result,
			List<PlanWarning> warnings, List<Message> cautions, AcrylamideView acrylamide, List<Swatch> swatches) {
		this(surface, setup, targetLabel, horizonMinutes, result, warnings, cautions, acrylamide, swatches, null, null);
	}

	/** A plan without a cut face (a category whose inside is not judged by colour). */
	public PlanReport(Surface surface, HeatSetup setup, Message targetLabel, double horizonMinutes, CookResult result,
			List<PlanWarning> warnings, List<Message> cautions, AcrylamideView acrylamide, List<Swatch> swatches,
			StepsReport steps) {
		this(surface, setup, targetLabel, horizonMinutes, result, warnings, cautions, acrylamide, swatches, steps,
				null);
	}

	/** Whether the plan draws the cut face of the piece (meat, poultry, fish). */
	public boolean hasCutFace() {
		return cutFace != null;
	}

	public boolean stepped() {
		return steps != null;
	}

	/** A plan in steps aimed at a core temperature only: its target is the core's. */
	private boolean coreOnly() {
		return steps != null && Double.isNaN(result.targetExtent());
	}

	public FoodCategory category() {
		return surface.category();
	}

	/**
	 * Acrylamide forms from asparagine and sugars in starchy foods (EFSA CONTAM Panel
	 * 2015 opinion); muscle foods carry too little asparagine for the card to say
	 * anything. Shown for starchy categories and wherever a benchmark level applies.
	 */
	public boolean acrylamideMatters() {
		return acrylamideMatters(category(), acrylamide != null && acrylamide.benchmarkUgPerKg() != null);
	}

	/** The same rule for a food not yet planned (searches, maps). */
	public static boolean acrylamideMatters(FoodCategory category, boolean hasBenchmark) {
		return STARCHY.contains(category) || hasBenchmark;
	}

	/**
	 * Whether the category is a starchy food, where acrylamide forms whatever its
	 * product.
	 */
	public static boolean starchy(FoodCategory c) {
		return STARCHY.contains(c);
	}

	/**
	 * Whether an EU benchmark level applies: the changes are then EU measures, else
	 * browning advice.
	 */
	public boolean hasBenchmark() {
		return acrylamide != null && acrylamide.benchmarkUgPerKg() != null;
	}

	private static final Set<FoodCategory> STARCHY = EnumSet.of(FoodCategory.POTATO, FoodCategory.BREAD,
			FoodCategory.SWEET_DOUGH, FoodCategory.VEGETABLE);

	public boolean reached() {
		return coreOnly() ? steps.result().coreReached() : result.reached();
	}

	/**
	 * Seconds to the target colour (to the core target where that is the only one), or
	 * null when not reached.
	 */
	public Double timeToTargetS() {
		return coreOnly() ? steps.coreTargetReachedS() : finite(result.timeToTargetS());
	}

	public Double coreTemperatureAtTargetC() {
		return finite(result.coreTemperatureAtTargetC());
	}

	/**
	 * Water in the whole piece at the target, g per 100 g, or null where not recorded.
	 */
	public Double waterAtTargetPct() {
		return finite(result.waterAtTargetPct());
	}

	/**
	 * Frying oil in the whole piece at the target, g per 100 g (0 where nothing was
	 * fried), or null where not recorded.
	 */
	public Double oilAtTargetPct() {
		return finite(result.oilAtTargetPct());
	}

	/**
	 * Water in the whole piece at the target, worded; null where the target was not
	 * reached.
	 */
	public Message waterAtTarget() {
		Double pct = finite(result.waterAtTargetPct());
		return pct == null ? null : Message.of("report.water-at-target", PlainNumber.of(pct, 0));
	}

	/**
	 * Frying oil the piece has taken up by the target, worded; null where it took up none
	 * (not fried) or the target was not reached.
	 */
	public Message oilAtTarget() {
		Double pct = finite(result.oilAtTargetPct());
		return pct == null || pct < 0.05 ? null : Message.of("report.oil-at-target", PlainNumber.of(pct, 1));
	}

	public String targetHex() {
		return result.targetColour() == null ? null : result.targetColour().hex();
	}

	public Double targetLightness() {
		return result.targetColour() == null ? null : finite(result.targetColour().lightness());
	}

	static Double finite(double v) {
		return Double.isFinite(v) ? v : null;
	}

}
