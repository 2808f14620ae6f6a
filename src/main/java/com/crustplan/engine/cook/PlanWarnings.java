package com.crustplan.engine.cook;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import com.crustplan.engine.cook.Warning.Severity;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.model.Parameter;

/** Warnings that follow from a run: safety of the core, hot oil, a surface that cannot brown. */
public final class PlanWarnings {

	/** Above about 200 °C at the surface fats smoke and crusts char (common practice). */
	public static final Parameter SCORCH_SURFACE_C = Parameter.commonPractice("T_scorch", "surface temperature where crusts char and fats smoke",
			200, "°C", "common practice");

	/** A pH rise of more than about 0.8 tastes soapy in meat (common practice). */
	public static final Parameter SOAPY_PH_RISE = Parameter.commonPractice("ΔpH_max", "largest pH rise before bicarbonate tastes soapy", 0.8,
			"–", "common practice");

	private PlanWarnings() {
	}

	public static List<Warning> of(Surface surface, HeatSetup setup, CookResult result) {
		List<Warning> w = new ArrayList<>();
		if (!result.reached()) {
			w.add(new Warning("target-not-reached", Severity.QUALITY, result.explanation()));
		}
		Optional<Parameter> minimum = CoreSafety.minimumFor(surface.category());
		if (minimum.isPresent() && result.reached() && result.coreTemperatureAtTargetC() < minimum.get().value()) {
			w.add(new Warning("core-below-safe-minimum", Severity.SAFETY, String.format(
					"When the surface reaches the target the centre is about %.0f °C, below the %.0f °C usually required for %s (%s). "
							+ "Finish it gently (lower heat, oven, resting) and check the core with a probe thermometer; your local food code decides.",
					result.coreTemperatureAtTargetC(), minimum.get().value(), minimum.get().description(), CoreSafety.CODE_EDITION)));
		}
		if (minimum.isPresent()) {
			w.add(new Warning("probe-the-core", Severity.SAFETY,
					"Browning says nothing about the inside: check the core with a probe thermometer against your local food code."));
		}
		if (setup instanceof HeatSetup.DeepFryer) {
			w.add(new Warning("hot-oil", Severity.SAFETY,
					"Hot oil: lower food in slowly, dry wet food first (water makes hot oil spit and foam), never fill the fryer above its mark, "
							+ "keep a lid or fire blanket at hand and never use water on an oil fire."));
		}
		if (result.maxSurfaceTemperatureC() > SCORCH_SURFACE_C.value()) {
			w.add(new Warning("surface-scorching", Severity.QUALITY, String.format(
					"The surface reaches about %.0f °C: fats smoke and crusts char above about %.0f °C. Turn the heat down or turn the food more often.",
					result.maxSurfaceTemperatureC(), SCORCH_SURFACE_C.value())));
		}
		double rise = surface.ph() - surface.basePh();
		if (rise > SOAPY_PH_RISE.value()) {
			w.add(new Warning("soapy-taste", Severity.QUALITY, String.format(
					"The bicarbonate raises the pH by %.1f: above about %.1f the surface can taste soapy. Use less.", rise,
					SOAPY_PH_RISE.value())));
		}
		if (surface.composition().reducingSugarPct() == 0 && surface.composition().sucrosePct() == 0) {
			w.add(new Warning("no-sugar", Severity.NOTE,
					"No reducing sugar and no sucrose: the surface can barely brown. A brush of milk, honey or a glucose glaze would add reducing sugar."));
		}
		return w;
	}

}
