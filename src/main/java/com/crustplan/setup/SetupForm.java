package com.crustplan.setup;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.system.TemperatureUnit;

/**
 * A named heat setup as a cook enters it; {@code temperature} is in {@code temperatureUnit}. The
 * temperature range depends on the mode, so the engine checks it in {@link #toHeatSetup()}.
 */
public record SetupForm(
		@NotBlank(message = "give the setup a name") @Size(max = 80, message = "at most 80 characters") String name,
		@NotBlank(message = "choose pan, oven, grill or fryer") String mode,
		@NotNull(message = "required") Double temperature,
		String temperatureUnit,
		Boolean fan,
		Boolean fatFilm,
		@DecimalMin(value = "0", message = "must be 0 to 100 %") @DecimalMax(value = "100", message = "must be 0 to 100 %") Double relativeHumidityPct,
		@DecimalMin(value = "0", message = "must be 0 (no flip) to 3600 s") @DecimalMax(value = "3600", message = "must be 0 (no flip) to 3600 s") Double flipEverySeconds,
		@Size(max = 1000, message = "at most 1000 characters") String notes,
		// the pan's and the fryer's body (EquipmentSettings); left out, each takes the default
		@Size(max = 40, message = "at most 40 characters") String panMaterial, Double panMassKg, Double panDiameterCm,
		Double panPowerKw, @Size(max = 40, message = "at most 40 characters") String panControl, Double panCoverPct,
		Double fryerOilLitres, Double fryerHeaterKw, Double fryerLoadKg) {

	/** A setup without the equipment's body given: a pan or fryer gets the default one. */
	public SetupForm(String name, String mode, Double temperature, String temperatureUnit, Boolean fan,
			Boolean fatFilm, Double relativeHumidityPct, Double flipEverySeconds, String notes) {
		this(name, mode, temperature, temperatureUnit, fan, fatFilm, relativeHumidityPct, flipEverySeconds, notes,
				null, null, null, null, null, null, null, null, null);
	}

	public static SetupForm blank(TemperatureUnit unit) {
		PanBody p = PanBody.DEFAULT;
		FryerBody f = FryerBody.DEFAULT;
		return new SetupForm("", HeatMode.PAN.key(), round1(unit.fromCelsius(220)), unit.code(), false,
				HeatSettings.DEFAULT_FAT_FILM, HeatSettings.DEFAULT_RELATIVE_HUMIDITY_PCT, HeatSettings.DEFAULT_FLIP_EVERY_S,
				null, EquipmentSettings.DEFAULT_MATERIAL, p.massKg(), p.diameterCm(), p.powerKw(),
				EquipmentSettings.DEFAULT_CONTROL, p.coverPct(), f.oilLitres(), f.heaterKw(), f.loadKg());
	}

	public static SetupForm of(SavedSetup s, TemperatureUnit unit) {
		return new SetupForm(s.getName(), s.getMode(), round1(unit.fromCelsius(s.getTemperatureC())), unit.code(),
				s.isFan(), s.isFatFilm(), s.getRelativeHumidityPct(), s.getFlipEverySeconds(), s.getNotes(),
				s.getPanMaterial(), s.getPanMassKg(), s.getPanDiameterCm(), s.getPanPowerKw(), s.getPanControl(),
				s.getPanCoverPct(), s.getFryerOilLitres(), s.getFryerHeaterKw(), s.getFryerLoadKg());
	}

	public SetupForm inUnit(TemperatureUnit unit) {
		Double c = temperatureC();
		return new SetupForm(name, mode, c == null ? null : round1(unit.fromCelsius(c)), unit.code(), fan, fatFilm,
				relativeHumidityPct, flipEverySeconds, notes, panMaterial, panMassKg, panDiameterCm, panPowerKw,
				panControl, panCoverPct, fryerOilLitres, fryerHeaterKw, fryerLoadKg);
	}

	/** Blank body values shown as the defaults, so switching a setup to pan or fryer starts from them. */
	public SetupForm withBodyDefaults() {
		SetupForm d = blank(unit());
		return new SetupForm(name, mode, temperature, temperatureUnit, fan, fatFilm, relativeHumidityPct,
				flipEverySeconds, notes, or(panMaterial, d.panMaterial), or(panMassKg, d.panMassKg),
				or(panDiameterCm, d.panDiameterCm), or(panPowerKw, d.panPowerKw), or(panControl, d.panControl),
				or(panCoverPct, d.panCoverPct), or(fryerOilLitres, d.fryerOilLitres), or(fryerHeaterKw, d.fryerHeaterKw),
				or(fryerLoadKg, d.fryerLoadKg));
	}

	private static <T> T or(T v, T fallback) {
		return v == null || (v instanceof String t && t.isBlank()) ? fallback : v;
	}

	public SetupForm withName(String newName) {
		return new SetupForm(newName, mode, temperature, temperatureUnit, fan, fatFilm, relativeHumidityPct,
				flipEverySeconds, notes, panMaterial, panMassKg, panDiameterCm, panPowerKw, panControl, panCoverPct,
				fryerOilLitres, fryerHeaterKw, fryerLoadKg);
	}

	public TemperatureUnit unit() {
		return TemperatureUnit.fromCode(temperatureUnit);
	}

	public Double temperatureC() {
		return unit().toCelsius(temperature);
	}

	public HeatMode heatMode() {
		return HeatMode.byKey(mode).orElse(null);
	}

	public HeatSetup toHeatSetup() {
		HeatMode m = HeatMode.byKey(mode).orElseThrow(() -> new InvalidInputException("mode", "choose pan, oven, grill or fryer"));
		HeatSetup base = HeatSettings.toHeatSetup(m, temperatureC(), fan, fatFilm, relativeHumidityPct, flipEverySeconds);
		return EquipmentSettings.withBody(base, panBody(), fryerBody());
	}

	/** The pan's body for a pan setup (defaults for what is left out); null for other modes. */
	public PanBody panBody() {
		return heatMode() == HeatMode.PAN ? EquipmentSettings.pan(panMaterial, panMassKg, panDiameterCm, panPowerKw,
				panControl, panCoverPct) : null;
	}

	/** The fryer's body for a fryer setup (defaults for what is left out); null for other modes. */
	public FryerBody fryerBody() {
		return heatMode() == HeatMode.FRYER ? EquipmentSettings.fryer(fryerOilLitres, fryerHeaterKw, fryerLoadKg) : null;
	}

	public static String formField(String engineField) {
		return switch (engineField) {
			case "temperatureC" -> "temperature";
			case "steamPct" -> "relativeHumidityPct";
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
