package com.crustplan.setup;


import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Table;

import com.crustplan.system.KitchenRecord;

/** A piece of the kitchen's equipment at a setting ("Plancha, high"). Never handed to the engine. */
@Entity
@Table(name = "heat_setup")
public class SavedSetup extends KitchenRecord {

	@Column(nullable = false, length = 16)
	private String mode;

	@Column(name = "temperature_c", nullable = false)
	private double temperatureC;

	@Column(nullable = false)
	private boolean fan;

	@Column(name = "fat_film", nullable = false)
	private boolean fatFilm;

	@Column(name = "relative_humidity_pct")
	private Double relativeHumidityPct;

	@Column(name = "flip_every_seconds")
	private Double flipEverySeconds;

	protected SavedSetup() {
	}

	public static SavedSetup from(SetupForm form) {
		SavedSetup s = new SavedSetup();
		s.update(form);
		return s;
	}

	/** Only the settings the mode uses are kept, so a list never shows a fryer with a fan. */
	public void update(SetupForm f) {
		HeatMode m = f.heatMode();
		rename(f.name(), f.notes());
		mode = m.key();
		temperatureC = f.temperatureC();
		fan = m.usesFan() && Boolean.TRUE.equals(f.fan());
		fatFilm = m.usesFatFilm() ? (f.fatFilm() == null ? HeatSettings.DEFAULT_FAT_FILM : f.fatFilm()) : false;
		relativeHumidityPct = m.usesHumidity()
				? (f.relativeHumidityPct() == null ? HeatSettings.DEFAULT_RELATIVE_HUMIDITY_PCT : f.relativeHumidityPct())
				: null;
		flipEverySeconds = m.usesFlip()
				? (f.flipEverySeconds() == null ? HeatSettings.DEFAULT_FLIP_EVERY_S : f.flipEverySeconds()) : null;
	}

	public HeatMode getHeatMode() {
		return HeatMode.byKey(mode).orElse(HeatMode.PAN);
	}

	public String getMode() {
		return mode;
	}

	public double getTemperatureC() {
		return temperatureC;
	}

	public boolean isFan() {
		return fan;
	}

	public boolean isFatFilm() {
		return fatFilm;
	}

	public Double getRelativeHumidityPct() {
		return relativeHumidityPct;
	}

	public Double getFlipEverySeconds() {
		return flipEverySeconds;
	}

}
