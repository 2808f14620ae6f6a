package com.crustplan.setup;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.heat.HeatSetup;

/**
 * Builds the engine's heat setup from what a cook sets, in °C. Shared by the setup form, saved plans
 * and the JSON API so all three read the settings the same way. Settings a mode does not use are
 * ignored; missing ones take the defaults below.
 */
public final class HeatSettings {

	/** Oiled pan unless told otherwise: how most searing is done (common practice). */
	public static final boolean DEFAULT_FAT_FILM = true;

	/** Dry oven air when no humidity is given: 10 % RH, a vented oven (common practice). */
	public static final double DEFAULT_RELATIVE_HUMIDITY_PCT = 10;

	/** Turned once a minute in a pan or under a grill unless told otherwise (common practice). */
	public static final double DEFAULT_FLIP_EVERY_S = 60;

	private HeatSettings() {
	}

	/** Throws {@link InvalidInputException} naming the engine field (temperatureC, flipEverySeconds ...). */
	public static HeatSetup toHeatSetup(HeatMode mode, Double temperatureC, Boolean fan, Boolean fatFilm,
			Double relativeHumidityPct, Double flipEverySeconds) {
		if (mode == null) {
			throw new InvalidInputException("mode", "choose pan, oven, grill or fryer");
		}
		if (temperatureC == null) {
			throw new InvalidInputException("temperatureC", "is required");
		}
		double t = temperatureC;
		double flip = flipEverySeconds == null ? DEFAULT_FLIP_EVERY_S : flipEverySeconds;
		return switch (mode) {
			case PAN -> new HeatSetup.PanContact(t, fatFilm == null ? DEFAULT_FAT_FILM : fatFilm, flip);
			case OVEN -> HeatSetup.Oven.withRelativeHumidity(t, fan != null && fan,
					relativeHumidityPct == null ? DEFAULT_RELATIVE_HUMIDITY_PCT : relativeHumidityPct);
			case GRILL -> new HeatSetup.RadiantGrill(t, flip);
			case FRYER -> new HeatSetup.DeepFryer(t);
		};
	}

}
