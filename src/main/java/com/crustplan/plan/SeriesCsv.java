package com.crustplan.plan;

import java.util.Locale;

import com.crustplan.engine.cook.Sample;
import com.crustplan.system.TemperatureUnit;

/**
 * A plan's series as CSV (RFC 4180: comma-separated, CRLF line ends, a header row): one
 * row per output time, temperatures in the cook's unit, the unit in each column's name.
 * Empty cells where a value does not exist (no pan or oil body, no estimate).
 */
final class SeriesCsv {

	private SeriesCsv() {
	}

	static String of(PlanReport report, TemperatureUnit unit) {
		String u = unit == TemperatureUnit.FAHRENHEIT ? "F" : "C";
		StringBuilder b = new StringBuilder();
		b.append(String.join(",", "time_s", "surface_temperature_" + u, "far_side_temperature_" + u,
				"core_temperature_" + u, "heat_source_temperature_" + u, "surface_water_activity",
				"surface_moisture_dry_basis", "standing_water_g_per_m2", "browning_extent", "lightness_L", "colour_hex",
				"crust_acrylamide_ug_per_kg", "portion_acrylamide_ug_per_kg"))
			.append("\r\n");
		for (Sample s : report.result().series()) {
			b.append(String.join(",", num(s.timeS(), 1), temp(s.surfaceTemperatureC(), unit),
					temp(s.otherFaceTemperatureC(), unit), temp(s.coreTemperatureC(), unit),
					temp(s.heatSourceTemperatureC(), unit), num(s.surfaceWaterActivity(), 4),
					num(s.surfaceMoistureDryBasis(), 4), num(s.standingWaterGPerM2(), 2), num(s.browningExtent(), 4),
					num(s.colour().lightness(), 2), s.colourHex(), num(s.crustAcrylamideUgPerKg(), 1),
					num(s.portionAcrylamideUgPerKg(), 1)))
				.append("\r\n");
		}
		return b.toString();
	}

	private static String temp(double c, TemperatureUnit unit) {
		return num(unit.fromCelsius(c), 2);
	}

	private static String num(double v, int digits) {
		return Double.isFinite(v) ? String.format(Locale.ROOT, "%." + digits + "f", v) : "";
	}

}
