package com.crustplan.engine.cook;

import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.input.InvalidInputException;

/**
 * One step of a cook in several steps (sear, oven, rest): a heat setup held until the
 * step's end, which is a time, a surface colour, a core temperature, or whichever of them
 * comes first.
 *
 * @param setup the heat; its flips count from the start of the step
 * @param maxDurationS the longest the step lasts, s
 * @param colour ends the step when face 0 reaches this colour (null: not by colour)
 * @param coreTemperatureC ends the step when the centre reaches this temperature (null:
 * not by core)
 */
public record CookStep(HeatSetup setup, double maxDurationS, Target colour, Double coreTemperatureC) {

	/** The longest one step may last: the longest cook the engine runs. */
	public static final double MAX_DURATION_S = CookSettings.MAX_HORIZON_S;

	public CookStep {
		if (setup == null) {
			throw new InvalidInputException("heat", "each step needs a heat setup");
		}
		if (!(maxDurationS > 0 && maxDurationS <= MAX_DURATION_S)) {
			throw new InvalidInputException("minutes", "a step lasts more than 0 and at most 360 minutes");
		}
		// −20 °C (frozen) to 120 °C: a core holding water does not pass its boiling point
		// by much
		if (coreTemperatureC != null && !(coreTemperatureC > -20 && coreTemperatureC <= 120)) {
			throw new InvalidInputException("coreTemperatureC", "a core target lies above −20 °C and at most 120 °C");
		}
	}

	/** A step of a fixed time. */
	public static CookStep timed(HeatSetup setup, double durationS) {
		return new CookStep(setup, durationS, null, null);
	}

	/** A step that ends when the centre reaches a temperature, or after maxDurationS. */
	public static CookStep toCore(HeatSetup setup, double coreTemperatureC, double maxDurationS) {
		return new CookStep(setup, maxDurationS, null, coreTemperatureC);
	}

	/** A step that ends at a surface colour, or after maxDurationS. */
	public static CookStep toColour(HeatSetup setup, Target colour, double maxDurationS) {
		return new CookStep(setup, maxDurationS, colour, null);
	}

	/** Why a step ended. */
	public enum Ending {

		/** Its time ran out. */
		TIME,
		/** The surface reached the step's colour. */
		COLOUR,
		/** The centre reached the step's core temperature. */
		CORE,
		/** The cook's horizon cut it short. */
		HORIZON

	}

	/** How a step went: when it started and ended, why, and the food at its end. */
	public record Record(int index, double startS, double endS, Ending endedBy, double coreAtEndC, double surfaceAtEndC,
			double surfaceExtentAtEnd) {

		public double durationS() {
			return endS - startS;
		}

	}

}
