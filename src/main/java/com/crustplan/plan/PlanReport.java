package com.crustplan.plan;

import java.util.List;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.message.Message;

/** Everything a plan page or the API shows, computed once by {@link PlanService}. */
public record PlanReport(Surface surface, HeatSetup setup, Message targetLabel, double horizonMinutes,
		CookResult result, List<PlanWarning> warnings, List<Message> cautions, AcrylamideView acrylamide,
		List<Swatch> swatches) {

	public FoodCategory category() {
		return surface.category();
	}

	public boolean reached() {
		return result.reached();
	}

	/** Seconds to the target colour, or null when it is not reached. */
	public Double timeToTargetS() {
		return finite(result.timeToTargetS());
	}

	public Double coreTemperatureAtTargetC() {
		return finite(result.coreTemperatureAtTargetC());
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
