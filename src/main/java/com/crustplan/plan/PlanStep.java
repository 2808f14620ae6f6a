package com.crustplan.plan;

import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.setup.SetupForm;

/**
 * One step of a saved plan, copied like the plan's other inputs (°C): a saved setup's
 * values, or a rest in kitchen air when {@code setup} is null, and how the step ends:
 * after {@code minutes}, at a colour (a stage or an L*), at a core temperature, whichever
 * comes first. Stored inside {@link PlanInputs}.
 *
 * @param setupName the setup's name when the plan was made (for the timeline and lists)
 * @param restAirC the air a rest step stands in, °C (null: the kitchen air of the model)
 */
public record PlanStep(SetupForm setup, String setupName, Double restAirC, Double minutes, String stage,
		Double lightness, Double coreTemperatureC) {

	public boolean rest() {
		return setup == null;
	}

	/** The step's colour end, or null when it has none. */
	public Target colour() {
		boolean hasStage = stage != null && !stage.isBlank();
		if (hasStage && lightness != null) {
			throw new InvalidInputException("stage", "give either a stage or a lightness (L*), not both");
		}
		return hasStage ? Target.stage(stage.trim()) : lightness == null ? null : Target.lightness(lightness);
	}

	/** Whether the step says when it ends. */
	public boolean hasEnd() {
		return minutes != null || (stage != null && !stage.isBlank()) || lightness != null || coreTemperatureC != null;
	}

	/**
	 * The engine's step; a step without minutes runs to its colour or core, at most
	 * {@code horizonMinutes}.
	 */
	public CookStep toCookStep(double horizonMinutes) {
		if (!hasEnd()) {
			throw new InvalidInputException("minutes",
					"say when the step ends: minutes, a colour or a core temperature");
		}
		HeatSetup heat = rest() ? new Rest(restAirC == null ? HeatSetup.KITCHEN_AIR_C.value() : restAirC)
				: setup.toHeatSetup();
		double maxS = (minutes == null ? horizonMinutes : minutes) * 60;
		return new CookStep(heat, maxS, colour(), coreTemperatureC);
	}

	/** What the step is called on the page: the setup's name, or "Rest". */
	public String label() {
		return rest() ? "Rest" : setupName != null ? setupName : setup.name();
	}

}
