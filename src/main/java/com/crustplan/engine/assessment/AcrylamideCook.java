package com.crustplan.engine.assessment;

import java.util.List;

import com.crustplan.engine.acrylamide.AcrylamideFormation;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;

/**
 * A cook with acrylamide formation running in every layer: what plans, maps and
 * mitigations judge.
 */
public final class AcrylamideCook {

	private AcrylamideCook() {
	}

	public static CookResult run(Surface surface, HeatSetup setup, Target target, CookSettings settings) {
		return CookSimulation.run(surface, setup, target, settings, AcrylamideFormation.REACTION);
	}

	public static CookResult run(Surface surface, HeatSetup setup, Target target) {
		return run(surface, setup, target, CookSettings.defaults());
	}

	/**
	 * A cook in steps with acrylamide formation; the colour and core targets may each be
	 * null.
	 */
	public static StepsResult runSteps(Surface surface, List<CookStep> steps, Target colour, Double coreTargetC,
			CookSettings settings) {
		return CookSimulation.runSteps(surface, steps, colour, coreTargetC, settings, AcrylamideFormation.REACTION);
	}

}
