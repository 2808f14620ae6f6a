package com.crustplan.engine.doneness;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.message.StatedTemperature;

/**
 * Minimum internal temperatures of the US FDA Food Code 2022, section 3-401.11
 * (A)(1)–(3), with both of the code's own figures, so a °F page shows the code's number
 * rather than a rounded conversion, and the time the core must hold it.
 */
public enum FoodCode {

	/**
	 * 3-401.11 (A)(1)(b): whole cuts of meat, fish, pork and eggs, 63 °C (145 °F) for 15
	 * s.
	 */
	WHOLE_CUT(63, 145, 15),

	/** 3-401.11 (A)(2): comminuted (minced) meat and fish, 68 °C (155 °F) for 17 s. */
	COMMINUTED(68, 155, 17),

	/** 3-401.11 (A)(3): poultry and stuffed foods, 74 °C (165 °F) for under 1 s. */
	POULTRY(74, 165, 1);

	private final double celsius;

	private final double fahrenheit;

	private final double holdS;

	FoodCode(double celsius, double fahrenheit, double holdS) {
		this.celsius = celsius;
		this.fahrenheit = fahrenheit;
		this.holdS = holdS;
	}

	public double celsius() {
		return celsius;
	}

	public double fahrenheit() {
		return fahrenheit;
	}

	/**
	 * The holding time the code pairs with the temperature, s (poultry: "< 1 s", kept as
	 * 1).
	 */
	public double holdS() {
		return holdS;
	}

	/** The code's figure as running text shows it: "74 °C" or "165 °F". */
	public StatedTemperature stated() {
		return StatedTemperature.of(celsius, fahrenheit);
	}

	/** The figure with its °F twin in brackets on a °C page: "74 °C (165 °F)". */
	public StatedTemperature withFahrenheit() {
		return StatedTemperature.withFahrenheit(celsius, fahrenheit);
	}

	/**
	 * The rule for a category, or null where the code sets none for it (bread, potato,
	 * vegetables).
	 */
	public static FoodCode forCategory(FoodCategory category, Cut cut) {
		return switch (category) {
			case POULTRY_SKIN -> POULTRY;
			case MEAT, FISH -> cut == Cut.MINCED ? COMMINUTED : WHOLE_CUT;
			default -> null;
		};
	}

	/** Whether meat or fish is a whole cut or minced (a burger patty, a fish cake). */
	public enum Cut {

		WHOLE, MINCED

	}

}
