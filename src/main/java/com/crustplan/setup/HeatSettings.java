package com.crustplan.setup;

import com.crustplan.engine.heat.GrillKind;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.input.InvalidInputException;

/**
 * Builds the engine's heat setup from what a cook sets, in °C. Shared by the setup form,
 * saved plans and the JSON API so all three read the settings the same way. Settings a
 * mode does not use are ignored; missing ones take the defaults below.
 */
public final class HeatSettings {

	/** Oiled pan unless told otherwise: how most searing is done (common practice). */
	public static final boolean DEFAULT_FAT_FILM = true;

	/**
	 * Dry oven air when no steam is given: kitchen air drawn in, about 1.6 % steam by
	 * volume.
	 */
	public static final double DEFAULT_STEAM_PCT = HeatSetup.DEFAULT_OVEN_STEAM.value();

	/**
	 * Turned once a minute in a pan or under a grill unless told otherwise (common
	 * practice).
	 */
	public static final double DEFAULT_FLIP_EVERY_S = HeatSetup.DEFAULT_TURN_EVERY.value();

	/**
	 * A grill is a salamander unless told otherwise: the kitchen's usual radiant grill.
	 */
	public static final GrillKind DEFAULT_GRILL = GrillKind.SALAMANDER;

	/**
	 * The old "humidity %" that a cook read off a combi oven: readings at or below this
	 * are its dry, vented range (the moisture the food gives off, no steam added) and
	 * stay dry kitchen air. Assumption: combi ovens show 0 % for hot air with the vent
	 * open (common practice).
	 */
	public static final double LEGACY_DRY_READING_PCT = 10;

	private HeatSettings() {
	}

	/**
	 * The steam share a cook meant by a round-one "humidity %" (as migration V5 converts
	 * saved setups): a combi oven's humidity scale runs from hot air with the vent open
	 * to pure steam, so a reading of up to 10 % is dry kitchen air (1.6 %) and above it
	 * the share rises linearly to 100 % steam at 100: y = 1.6 + (h − 10)·98.4/90.
	 * Relative humidity at the oven temperature, which the old field was read as, made
	 * even 10 % pure steam above about 180 °C.
	 */
	public static double steamPctFromLegacyHumidity(double humidityPct) {
		if (!Double.isFinite(humidityPct) || humidityPct < 0 || humidityPct > 100) {
			throw new InvalidInputException("relativeHumidityPct", "must be from 0 to 100 %");
		}
		if (humidityPct <= LEGACY_DRY_READING_PCT) {
			return DEFAULT_STEAM_PCT;
		}
		return DEFAULT_STEAM_PCT
				+ (humidityPct - LEGACY_DRY_READING_PCT) * (100 - DEFAULT_STEAM_PCT) / (100 - LEGACY_DRY_READING_PCT);
	}

	/**
	 * As set by a cook, every setting optional but the mode (and, except for a grill
	 * given by flux, the temperature).
	 */
	public record Values(Double temperatureC, Boolean fan, Boolean fatFilm, Double steamPct, Double legacyHumidityPct,
			Double flipEverySeconds, String grill, Double heatFluxKwPerM2, Double distanceMm) {
	}

	/**
	 * Round one's settings: {@code relativeHumidityPct} is the old humidity reading,
	 * converted as the migration does.
	 */
	public static HeatSetup toHeatSetup(HeatMode mode, Double temperatureC, Boolean fan, Boolean fatFilm,
			Double relativeHumidityPct, Double flipEverySeconds) {
		return toHeatSetup(mode,
				new Values(temperatureC, fan, fatFilm, null, relativeHumidityPct, flipEverySeconds, null, null, null));
	}

	/**
	 * Throws {@link InvalidInputException} naming the engine field (temperatureC,
	 * steamPct, heatFluxKwPerM2 ...).
	 */
	public static HeatSetup toHeatSetup(HeatMode mode, Values v) {
		if (mode == null) {
			throw new InvalidInputException("mode", "choose pan, oven, grill or fryer");
		}
		double flip = v.flipEverySeconds() == null ? DEFAULT_FLIP_EVERY_S : v.flipEverySeconds();
		if (mode == HeatMode.GRILL) {
			return grill(v, flip);
		}
		if (v.temperatureC() == null) {
			throw new InvalidInputException("temperatureC", "is required");
		}
		double t = v.temperatureC();
		return switch (mode) {
			case PAN -> new PanContact(t, v.fatFilm() == null ? DEFAULT_FAT_FILM : v.fatFilm(), flip);
			case OVEN -> new Oven(t, v.fan() != null && v.fan(), steamPct(v));
			case FRYER -> new DeepFryer(t);
			case GRILL -> throw new IllegalStateException("handled above");
		};
	}

	private static double steamPct(Values v) {
		if (v.steamPct() != null && v.legacyHumidityPct() != null) {
			throw new InvalidInputException("relativeHumidityPct",
					"give the steam share (steamPct) only: relativeHumidityPct is the old field, read only when steamPct is missing");
		}
		if (v.steamPct() != null) {
			return v.steamPct();
		}
		return v.legacyHumidityPct() == null ? DEFAULT_STEAM_PCT : steamPctFromLegacyHumidity(v.legacyHumidityPct());
	}

	private static HeatSetup grill(Values v, double flip) {
		GrillKind kind = DEFAULT_GRILL;
		if (v.grill() != null && !v.grill().isBlank()) {
			kind = GrillKind.byKey(v.grill())
				.orElseThrow(() -> new InvalidInputException("grill",
						"'" + v.grill().trim() + "' is not a kind of grill; use salamander, broiler or charcoal"));
		}
		if (v.heatFluxKwPerM2() != null) {
			if (v.distanceMm() != null) {
				throw new InvalidInputException("distanceMm",
						"give either the heat flux at the food or the element temperature with its distance, not both");
			}
			return RadiantGrill.ofFlux(kind, v.heatFluxKwPerM2(), flip);
		}
		if (v.temperatureC() == null) {
			throw new InvalidInputException("temperatureC",
					"is required for a grill unless the heat flux at the food is given");
		}
		return RadiantGrill.ofElement(kind, v.temperatureC(), v.distanceMm(), flip);
	}

}
