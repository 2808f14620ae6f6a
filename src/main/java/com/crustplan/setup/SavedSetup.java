package com.crustplan.setup;

import java.util.Locale;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Table;

import com.crustplan.engine.heat.GrillKind;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.system.KitchenRecord;
import com.crustplan.system.TemperatureUnit;

/**
 * A piece of the kitchen's equipment at a setting ("Plancha, high"). Never handed to the
 * engine.
 */
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

	/**
	 * Round one's "humidity %" as it was saved, kept by migration V5 so the page can say
	 * what it changed.
	 */
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

	// the pan's or the fryer's body, the defaults filled in (V8); null for the other
	// modes

	@Column(name = "pan_material", length = 40)
	private String panMaterial;

	@Column(name = "pan_mass_kg")
	private Double panMassKg;

	@Column(name = "pan_diameter_cm")
	private Double panDiameterCm;

	@Column(name = "pan_power_kw")
	private Double panPowerKw;

	@Column(name = "pan_control", length = 40)
	private String panControl;

	@Column(name = "pan_cover_pct")
	private Double panCoverPct;

	@Column(name = "fryer_oil_litres")
	private Double fryerOilLitres;

	@Column(name = "fryer_heater_kw")
	private Double fryerHeaterKw;

	@Column(name = "fryer_load_kg")
	private Double fryerLoadKg;

	protected SavedSetup() {
	}

	public static SavedSetup from(SetupForm form) {
		SavedSetup s = new SavedSetup();
		s.update(form);
		return s;
	}

	/**
	 * Only the settings the mode uses are kept, so a list never shows a fryer with a fan.
	 */
	public void update(SetupForm f) {
		HeatMode m = f.heatMode();
		rename(f.name(), f.notes());
		mode = m.key();
		temperatureC = f.temperatureC() == null ? f.toHeatSetup().temperatureC() : f.temperatureC();
		fan = m.usesFan() && Boolean.TRUE.equals(f.fan());
		fatFilm = m.usesFatFilm() ? (f.fatFilm() == null ? HeatSettings.DEFAULT_FAT_FILM : f.fatFilm()) : false;
		steamPct = m.usesSteam() ? f.effectiveSteamPct() : null;
		// saved through the form: the cook has seen the steam share, the round-one
		// reading has done its job
		legacyHumidityPct = null;
		boolean byFlux = m.usesGrill() && f.heatFluxKwPerM2() != null;
		grill = m.usesGrill() ? (f.grill() == null || f.grill().isBlank() ? HeatSettings.DEFAULT_GRILL.key()
				: f.grill().trim().toLowerCase(Locale.ROOT)) : null;
		heatFluxKwPerM2 = byFlux ? f.heatFluxKwPerM2() : null;
		distanceMm = m.usesGrill() && !byFlux ? f.distanceMm() : null;
		if (byFlux) {
			// the column needs a temperature: the element temperature the flux implies at
			// the usual distance
			temperatureC = f.toHeatSetup().temperatureC();
		}
		flipEverySeconds = m.usesFlip()
				? (f.flipEverySeconds() == null ? HeatSettings.DEFAULT_FLIP_EVERY_S : f.flipEverySeconds()) : null;
		updateBody(f.panBody(), f.fryerBody());
	}

	/** Kept as the engine read it, so the list shows the pan or fryer a plan will use. */
	private void updateBody(PanBody pan, FryerBody fryer) {
		panMaterial = pan == null ? null : pan.material().key();
		panMassKg = pan == null ? null : pan.massKg();
		panDiameterCm = pan == null ? null : pan.diameterCm();
		panPowerKw = pan == null ? null : pan.powerKw();
		panControl = pan == null ? null : EquipmentSettings.Control.of(pan.control()).key();
		panCoverPct = pan == null ? null : pan.coverPct();
		fryerOilLitres = fryer == null ? null : fryer.oilLitres();
		fryerHeaterKw = fryer == null ? null : fryer.heaterKw();
		fryerLoadKg = fryer == null ? null : fryer.loadKg();
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

	/**
	 * For a grill: the heat flux at the food, given or worked out from the element
	 * temperature, kW/m².
	 */
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

	public String getPanMaterial() {
		return panMaterial;
	}

	public Double getPanMassKg() {
		return panMassKg;
	}

	public Double getPanDiameterCm() {
		return panDiameterCm;
	}

	public Double getPanPowerKw() {
		return panPowerKw;
	}

	public String getPanControl() {
		return panControl;
	}

	public Double getPanCoverPct() {
		return panCoverPct;
	}

	public Double getFryerOilLitres() {
		return fryerOilLitres;
	}

	public Double getFryerHeaterKw() {
		return fryerHeaterKw;
	}

	public Double getFryerLoadKg() {
		return fryerLoadKg;
	}

	/**
	 * The pan's material and control in words, for the list ("cast iron, heat kept up");
	 * null if none.
	 */
	public String getBodySummary() {
		return EquipmentSettings.summary(this);
	}

}
