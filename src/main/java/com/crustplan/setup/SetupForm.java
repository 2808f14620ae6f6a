package com.crustplan.setup;

import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.heat.HeatSetup;
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
		@Size(max = 1000, message = "at most 1000 characters") String notes) {

	public static SetupForm blank(TemperatureUnit unit) {
		return new SetupForm("", HeatMode.PAN.key(), round1(unit.fromCelsius(220)), unit.code(), false,
				HeatSettings.DEFAULT_FAT_FILM, HeatSettings.DEFAULT_RELATIVE_HUMIDITY_PCT, HeatSettings.DEFAULT_FLIP_EVERY_S,
				null);
	}

	public static SetupForm of(SavedSetup s, TemperatureUnit unit) {
		return new SetupForm(s.getName(), s.getMode(), round1(unit.fromCelsius(s.getTemperatureC())), unit.code(),
				s.isFan(), s.isFatFilm(), s.getRelativeHumidityPct(), s.getFlipEverySeconds(), s.getNotes());
	}

	public SetupForm inUnit(TemperatureUnit unit) {
		Double c = temperatureC();
		return new SetupForm(name, mode, c == null ? null : round1(unit.fromCelsius(c)), unit.code(), fan, fatFilm,
				relativeHumidityPct, flipEverySeconds, notes);
	}

	public SetupForm withName(String newName) {
		return new SetupForm(newName, mode, temperature, temperatureUnit, fan, fatFilm, relativeHumidityPct,
				flipEverySeconds, notes);
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
		return HeatSettings.toHeatSetup(m, temperatureC(), fan, fatFilm, relativeHumidityPct, flipEverySeconds);
	}

	public static String formField(String engineField) {
		return switch (engineField) {
			case "temperatureC" -> "temperature";
			case "steamPct" -> "relativeHumidityPct";
			default -> engineField;
		};
	}

	private static double round1(double v) {
		return Math.round(v * 10) / 10.0;
	}

}
