package com.crustplan.engine.assessment;

import java.util.List;

import com.crustplan.engine.acrylamide.AcrylamideFormation;
import com.crustplan.engine.cook.CookEvent;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.myoglobin.InteriorProfile;
import com.crustplan.engine.myoglobin.InteriorWatch;
import com.crustplan.engine.myoglobin.PigmentKinetics;
import com.crustplan.engine.myoglobin.SurfaceGreying;

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

	/**
	 * A run and the cut face of its inside (null where the category's inside is not
	 * judged by colour: bread, potato, vegetables).
	 */
	public record Inside<R>(R result, InteriorProfile interior, SurfaceGreying.FaceHistory face) {
	}

	/**
	 * As {@link #run(Surface, HeatSetup, Target, CookSettings)}, with the inside's
	 * pigment stepped beside acrylamide for meat, poultry and fish; the cut face is taken
	 * when the target colour is reached (the pull), else at the end of the run.
	 */
	public static Inside<CookResult> runInside(Surface surface, HeatSetup setup, Target target, CookSettings settings) {
		if (PigmentKinetics.forCategory(surface.category()).isEmpty()) {
			return new Inside<>(run(surface, setup, target, settings), null, null);
		}
		InteriorWatch watch = new InteriorWatch(AcrylamideFormation.REACTION);
		CookResult result = CookSimulation.of(surface, setup, settings, watch)
			.on(CookEvent.targetColourReached(target.extentFor(surface.category())), watch)
			.run(target);
		return new Inside<>(result, watch.profile(), watch.faceHistory());
	}

	/**
	 * As {@link #runSteps}, with the inside's pigment for meat, poultry and fish; the cut
	 * face is taken at the end of the last step (after any rest).
	 */
	public static Inside<StepsResult> runStepsInside(Surface surface, List<CookStep> steps, Target colour,
			Double coreTargetC, CookSettings settings) {
		if (PigmentKinetics.forCategory(surface.category()).isEmpty()) {
			return new Inside<>(runSteps(surface, steps, colour, coreTargetC, settings), null, null);
		}
		InteriorWatch watch = new InteriorWatch(AcrylamideFormation.REACTION);
		StepsResult result = CookSimulation.runSteps(surface, steps, colour, coreTargetC, settings, watch);
		return new Inside<>(result, watch.profile(), watch.faceHistory());
	}

}
