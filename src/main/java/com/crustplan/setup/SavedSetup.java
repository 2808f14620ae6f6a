package com.crustplan.setup;

import java.time.Instant;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

/** A piece of the kitchen's equipment at a setting ("Plancha, high"). Never handed to the engine. */
@Entity
@Table(name = "heat_setup")
public class SavedSetup {

	@Id
	@GeneratedValue(strategy = GenerationType.IDENTITY)
	private Long id;

	@Version
	private int version;

	@Column(nullable = false, length = 80)
	private String name;

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

	@Column(length = 1000)
	private String notes;

	@Column(name = "created_at", nullable = false)
	private Instant createdAt;

	@Column(name = "updated_at", nullable = false)
	private Instant updatedAt;

	protected SavedSetup() {
	}

	public static SavedSetup from(SetupForm form) {
		SavedSetup s = new SavedSetup();
		s.createdAt = Instant.now();
		s.update(form);
		return s;
	}

	/** Only the settings the mode uses are kept, so a list never shows a fryer with a fan. */
	public void update(SetupForm f) {
		HeatMode m = f.heatMode();
		name = f.name().trim();
		mode = m.key();
		temperatureC = f.temperatureC();
		fan = m.usesFan() && Boolean.TRUE.equals(f.fan());
		fatFilm = m.usesFatFilm() ? (f.fatFilm() == null ? HeatSettings.DEFAULT_FAT_FILM : f.fatFilm()) : false;
		relativeHumidityPct = m.usesHumidity()
				? (f.relativeHumidityPct() == null ? HeatSettings.DEFAULT_RELATIVE_HUMIDITY_PCT : f.relativeHumidityPct())
				: null;
		flipEverySeconds = m.usesFlip()
				? (f.flipEverySeconds() == null ? HeatSettings.DEFAULT_FLIP_EVERY_S : f.flipEverySeconds()) : null;
		notes = f.notes() == null || f.notes().isBlank() ? null : f.notes().trim();
		updatedAt = Instant.now();
	}

	public HeatMode getHeatMode() {
		return HeatMode.byKey(mode).orElse(HeatMode.PAN);
	}

	public Long getId() {
		return id;
	}

	public String getName() {
		return name;
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

	public String getNotes() {
		return notes;
	}

}
