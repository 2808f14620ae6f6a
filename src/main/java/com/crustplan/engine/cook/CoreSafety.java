package com.crustplan.engine.cook;

import java.util.Optional;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.model.Parameter;

/**
 * Minimum internal cooking temperatures a category is usually held to (US FDA Food Code 2022, §3-401.11).
 * Browning says nothing about the inside: the figure is a reminder to probe, and the local food code
 * decides.
 */
public final class CoreSafety {

	public static final Parameter WHOLE_CUTS = Parameter.secondary("T_core,whole", "whole cuts of meat, pork and fish", 63, "°C",
			"US FDA Food Code 2022, §3-401.11: 63 °C (145 °F) for 15 s");

	public static final Parameter COMMINUTED = Parameter.secondary("T_core,minced", "minced (comminuted) meat and fish", 68, "°C",
			"US FDA Food Code 2022, §3-401.11: 68 °C (155 °F) for 17 s");

	public static final Parameter POULTRY = Parameter.secondary("T_core,poultry", "poultry, stuffed foods", 74, "°C",
			"US FDA Food Code 2022, §3-401.11: 74 °C (165 °F) for < 1 s");

	public static final String CODE_EDITION = "US FDA Food Code 2022, §3-401.11";

	private CoreSafety() {
	}

	/** The usual minimum for a category; empty where the category has none (plant foods, doughs). */
	public static Optional<Parameter> minimumFor(FoodCategory category) {
		return switch (category) {
			case MEAT, FISH -> Optional.of(WHOLE_CUTS);
			case POULTRY_SKIN -> Optional.of(POULTRY);
			default -> Optional.empty();
		};
	}

}
