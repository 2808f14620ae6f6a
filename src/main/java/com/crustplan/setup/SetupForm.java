package com.crustplan.setup;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.Size;

import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.GrillKind;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.water.Atmosphere;
import com.crustplan.system.TemperatureUnit;

/**
 * A named heat setup as a cook enters it; {@code temperature} is in
 * {@code temperatureUnit}. The temperature range depends on the mode, so the engine
 * checks it in {@link #toHeatSetup()}. {@code steamPct} is the steam share of the oven
 * atmosphere by volume (dry kitchen air ≈ 1.6 %, pure steam 100 %).
 * {@code relativeHumidityPct} is round one's "humidity %", still read (converted as
 * migration V5 converts saved setups) from old saved plans, demo files and API clients
 * for one version. A grill is its kind and either {@code heatFluxKwPerM2} at the food or
 * the element {@code temperature} with {@code distanceMm} (empty: the kind's usual
 * distance).
 */
public record SetupForm(
		@NotBlank(message = "give the setup a name") @Size(max = 80, message = "at most 80 characters") String name,
		@NotBlank(message = "choose pan, oven, grill or fryer") String mode, Double temperature, String temperatureUnit,
		Boolean fan, Boolean fatFilm,
		@DecimalMin(value = "0", message = "must be 0 to 100 % steam") @DecimalMax(value = "100",
				message = "must be 0 to 100 % steam") Double steamPct,
		@DecimalMin(value = "0", message = "must be 0 to 100 %") @DecimalMax(value = "100",
				message = "must be 0 to 100 %") Double relativeHumidityPct,
		@DecimalMin(value = "0", message = "must be 0 (no flip) to 3600 s") @DecimalMax(value = "3600",
				message = "must be 0 (no flip) to 3600 s") Double flipEverySeconds,
		String grill,
		@DecimalMin(value = "1", message = "must be 1 to 60 kW/m²") @DecimalMax(value = "60",
				message = "must be 1 to 60 kW/m²") Double heatFluxKwPerM2,
		@DecimalMin(value = "30", message = "must be 30 to 400 mm") @DecimalMax(value = "400",
				message = "must be 30 to 400 mm") Double distanceMm,
		@Size(max = 1000, message = "at most 1000 characters") String notes,
		// the pan's and the fryer's body (EquipmentSettings); left out, each takes the
		// default
		@Size(max = 40, message = "at most 40 characters") String panMaterial, Double panMassKg, Double panDiameterCm,
		Double panPowerKw, @Size(max = 40, message = "at most 40 characters") String panControl, Double panCoverPct,
		Double fryerOilLitres, Double fryerHeaterKw, Double fryerLoadKg) {

	/**
	 * A setup without the equipment's body given: a pan or fryer gets the default one.
	 */
	public SetupForm(String name, String mode, Double temperature, String temperatureUnit, Boolean fan, Boolean fatFilm,
			Double steamPct, Double relativeHumidityPct, Double flipEverySeconds, String grill, Double heatFluxKwPerM2,
			Double distanceMm, String notes) {
		this(name, mode, temperature, temperatureUnit, fan, fatFilm, steamPct, relativeHumidityPct, flipEverySeconds,
				grill, heatFluxKwPerM2, distanceMm, notes, null, null, null, null, null, null, null, null, null);
	}

	public static SetupForm blank(TemperatureUnit unit) {
		PanBody p = PanBody.DEFAULT;
		FryerBody f = FryerBody.DEFAULT;
		return new SetupForm("", HeatMode.PAN.key(), round1(unit.fromCelsius(220)), unit.code(), false,
				HeatSettings.DEFAULT_FAT_FILM, HeatSettings.DEFAULT_STEAM_PCT, null, HeatSettings.DEFAULT_FLIP_EVERY_S,
				HeatSettings.DEFAULT_GRILL.key(), null, null, null, EquipmentSettings.DEFAULT_MATERIAL, p.massKg(),
				p.diameterCm(), p.powerKw(), EquipmentSettings.DEFAULT_CONTROL, p.coverPct(), f.oilLitres(),
				f.heaterKw(), f.loadKg());
	}

	public static SetupForm of(SavedSetup s, TemperatureUnit unit) {
		return new SetupForm(s.getName(), s.getMode(), round1(unit.fromCelsius(s.getTemperatureC())), unit.code(),
				s.isFan(), s.isFatFilm(), s.getSteamPct(), null, s.getFlipEverySeconds(), s.getGrill(),
				s.getHeatFluxKwPerM2(), s.getDistanceMm(), s.getNotes(), s.getPanMaterial(), s.getPanMassKg(),
				s.getPanDiameterCm(), s.getPanPowerKw(), s.getPanControl(), s.getPanCoverPct(), s.getFryerOilLitres(),
				s.getFryerHeaterKw(), s.getFryerLoadKg());
	}

	public SetupForm inUnit(TemperatureUnit unit) {
		Double c = temperatureC();
		return new SetupForm(name, mode, c == null ? null : round1(unit.fromCelsius(c)), unit.code(), fan, fatFilm,
				steamPct, relativeHumidityPct, flipEverySeconds, grill, heatFluxKwPerM2, distanceMm, notes, panMaterial,
				panMassKg, panDiameterCm, panPowerKw, panControl, panCoverPct, fryerOilLitres, fryerHeaterKw,
				fryerLoadKg);
	}

	/**
	 * Blank body values shown as the defaults, so switching a setup to pan or fryer
	 * starts from them.
	 */
	public SetupForm withBodyDefaults() {
		SetupForm d = blank(unit());
		return new SetupForm(name, mode, temperature, temperatureUnit, fan, fatFilm, steamPct, relativeHumidityPct,
				flipEverySeconds, grill, heatFluxKwPerM2, distanceMm, notes, or(panMaterial, d.panMaterial),
				or(panMassKg, d.panMassKg), or(panDiameterCm, d.panDiameterCm), or(panPowerKw, d.panPowerKw),
				or(panControl, d.panControl), or(panCoverPct, d.panCoverPct), or(fryerOilLitres, d.fryerOilLitres),
				or(fryerHeaterKw, d.fryerHeaterKw), or(fryerLoadKg, d.fryerLoadKg));
	}

	private static <T> T or(T v, T fallback) {
		return v == null || (v instanceof String t && t.isBlank()) ? fallback : v;
	}

	/** The same setup set to another temperature, kept in this form's unit. */
	public SetupForm withTemperatureC(double c) {
		return new SetupForm(name, mode, round1(unit().fromCelsius(c)), temperatureUnit, fan, fatFilm, steamPct,
				relativeHumidityPct, flipEverySeconds, grill, heatFluxKwPerM2, distanceMm, notes, panMaterial,
				panMassKg, panDiameterCm, panPowerKw, panControl, panCoverPct, fryerOilLitres, fryerHeaterKw,
				fryerLoadKg);
	}

	public SetupForm withName(String newName) {
		return new SetupForm(newName, mode, temperature, temperatureUnit, fan, fatFilm, steamPct, relativeHumidityPct,
				flipEverySeconds, grill, heatFluxKwPerM2, distanceMm, notes, panMaterial, panMassKg, panDiameterCm,
				panPowerKw, panControl, panCoverPct, fryerOilLitres, fryerHeaterKw, fryerLoadKg);
	}

	public TemperatureUnit unit() {
		return TemperatureUnit.fromCode(temperatureUnit);
	}

	public Double temperatureC() {
		return temperature == null ? null : unit().toCelsius(temperature);
	}

	public HeatMode heatMode() {
		return HeatMode.byKey(mode).orElse(null);
	}

	/**
	 * The steam share the oven will use: the new field, else the old reading converted,
	 * else dry kitchen air.
	 */
	public double effectiveSteamPct() {
		if (steamPct != null) {
			return steamPct;
		}
		return relativeHumidityPct == null ? HeatSettings.DEFAULT_STEAM_PCT
				: HeatSettings.steamPctFromLegacyHumidity(relativeHumidityPct);
	}

	/** Dew point of the oven atmosphere, °C (for the note beside the steam share). */
	public Double dewPointC() {
		try {
			return dewPointC(effectiveSteamPct());
		}
		catch (RuntimeException e) {
			return null;
		}
	}

	public static double dewPointC(double steamPct) {
		return new Atmosphere(373.15, Math.min(Math.max(steamPct, 0), 100) / 100).dewPointK() - 273.15;
	}

	/**
	 * Dew points at whole per cent of steam, 0–100, in a unit: the form's note follows
	 * the field as one types.
	 */
	public static String dewPointTable(TemperatureUnit unit) {
		StringBuilder t = new StringBuilder();
		for (int i = 0; i <= 100; i++) {
			t.append(i == 0 ? "" : ",").append(round1(unit.fromCelsius(dewPointC(i))));
		}
		return t.toString();
	}

	public static Map<String, String> grillKinds() {
		Map<String, String> m = new LinkedHashMap<>();
		Arrays.stream(GrillKind.values()).forEach(k -> m.put(k.key(), k.label()));
		return m;
	}

	public HeatSetup toHeatSetup() {
		HeatMode m = HeatMode.byKey(mode)
			.orElseThrow(() -> new InvalidInputException("mode", "choose pan, oven, grill or fryer"));
		HeatSetup base = HeatSettings.toHeatSetup(m, new HeatSettings.Values(temperatureC(), fan, fatFilm, steamPct,
				relativeHumidityPct, flipEverySeconds, grill, heatFluxKwPerM2, distanceMm));
		return EquipmentSettings.withBody(base, panBody(), fryerBody());
	}

	/**
	 * The pan's body for a pan setup (defaults for what is left out); null for other
	 * modes.
	 */
	public PanBody panBody() {
		return heatMode() == HeatMode.PAN
				? EquipmentSettings.pan(panMaterial, panMassKg, panDiameterCm, panPowerKw, panControl, panCoverPct)
				: null;
	}

	/**
	 * The fryer's body for a fryer setup (defaults for what is left out); null for other
	 * modes.
	 */
	public FryerBody fryerBody() {
		return heatMode() == HeatMode.FRYER ? EquipmentSettings.fryer(fryerOilLitres, fryerHeaterKw, fryerLoadKg)
				: null;
	}

	public static String formField(String engineField) {
		return switch (engineField) {
			case "temperatureC" -> "temperature";
			// the equipment's body
			case "material" -> "panMaterial";
			case "massKg" -> "panMassKg";
			case "diameterCm" -> "panDiameterCm";
			case "powerKw" -> "panPowerKw";
			case "control" -> "panControl";
			case "coverPct" -> "panCoverPct";
			case "oilLitres" -> "fryerOilLitres";
			case "heaterKw" -> "fryerHeaterKw";
			case "loadKg" -> "fryerLoadKg";
			default -> engineField;
		};
	}

	private static double round1(double v) {
		return Math.round(v * 10) / 10.0;
	}

}
