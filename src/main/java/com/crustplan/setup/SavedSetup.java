package com.crustplan.setup;

import java.util.Locale;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Table;

import com.crustplan.engine.heat.GrillKind;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.system.KitchenRecord;
import com.crustplan.system.TemperatureUnit;

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

	@Column(name = "steam_pct")
	private Double steamPct;

	/** Round one's "humidity %" as it was saved, kept by migration V5 so the page can say what it changed. */
	@Column(name = "relative_humidity_pct")
	private Double legacyHumidityPct;

	@Column(name = "grill_kind", length = 16)
	private String grill;

	@Column(name = "heat_flux_kw_per_m2")
	private Double heatFluxKwPerM2;

	@Column(name = "distance_mm")
	private Double distanceMm;

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
		temperatureC = f.temperatureC() == null ? f.toHeatSetup().temperatureC() : f.temperatureC();
		fan = m.usesFan() && Boolean.TRUE.equals(f.fan());
		fatFilm = m.usesFatFilm() ? (f.fatFilm() == null ? HeatSettings.DEFAULT_FAT_FILM : f.fatFilm()) : false;
		steamPct = m.usesSteam() ? f.effectiveSteamPct() : null;
		// saved through the form: the cook has seen the steam share, the round-one reading has done its job
		legacyHumidityPct = null;
		boolean byFlux = m.usesGrill() && f.heatFluxKwPerM2() != null;
		grill = m.usesGrill() ? (f.grill() == null || f.grill().isBlank() ? HeatSettings.DEFAULT_GRILL.key()
				: f.grill().trim().toLowerCase(Locale.ROOT)) : null;
		heatFluxKwPerM2 = byFlux ? f.heatFluxKwPerM2() : null;
		distanceMm = m.usesGrill() && !byFlux ? f.distanceMm() : null;
		if (byFlux) {
			// the column needs a temperature: the element temperature the flux implies at the usual distance
			temperatureC = f.toHeatSetup().temperatureC();
		}
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

	public Double getSteamPct() {
		return steamPct;
	}

	/** Dew point of the saved oven atmosphere, °C, or null for other modes. */
	public Double getDewPointC() {
		return steamPct == null ? null : SetupForm.dewPointC(steamPct);
	}

	public Double getLegacyHumidityPct() {
		return legacyHumidityPct;
	}

	public String getGrill() {
		return grill;
	}

	public String getGrillLabel() {
		return GrillKind.byKey(grill).map(GrillKind::label).orElse(null);
	}

	public Double getHeatFluxKwPerM2() {
		return heatFluxKwPerM2;
	}

	public Double getDistanceMm() {
		return distanceMm;
	}

	/** For a grill: the heat flux at the food, given or worked out from the element temperature, kW/m². */
	public Double getFluxAtFoodKwPerM2() {
		return grillSetup() == null ? null : grillSetup().heatFluxKwPerM2();
	}

	/** For a grill: the distance given, or the kind's usual one, mm. */
	public Double getEffectiveDistanceMm() {
		return grillSetup() == null ? null : grillSetup().distanceMm();
	}

	private RadiantGrill grillSetup() {
		if (getHeatMode() != HeatMode.GRILL) {
			return null;
		}
		try {
			return (RadiantGrill) SetupForm.of(this, TemperatureUnit.CELSIUS).toHeatSetup();
		}
		catch (InvalidInputException e) {
			return null;
		}
	}

	public Double getFlipEverySeconds() {
		return flipEverySeconds;
	}

}
