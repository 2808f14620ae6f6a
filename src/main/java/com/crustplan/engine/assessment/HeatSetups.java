package com.crustplan.engine.assessment;

import com.crustplan.engine.heat.HeatSetup;

/** The same heat setup at another set temperature: for maps and the lower-temperature suggestion. */
public final class HeatSetups {

	private HeatSetups() {
	}

	public static HeatSetup withTemperature(HeatSetup template, double temperatureC) {
		if (template instanceof HeatSetup.DeepFryer f) {
			return new HeatSetup.DeepFryer(temperatureC, f.body());
		}
		if (template instanceof HeatSetup.Oven o) {
			return new HeatSetup.Oven(temperatureC, o.fan(), o.steamPct());
		}
		if (template instanceof HeatSetup.PanContact p) {
			return new HeatSetup.PanContact(temperatureC, p.fatFilm(), p.flipEverySeconds(), p.body());
		}
		if (template instanceof HeatSetup.RadiantGrill g) {
			return g.withElementTemperature(temperatureC);
		}
		if (template instanceof HeatSetup.Rest) {
			return new HeatSetup.Rest(temperatureC);
		}
		throw new IllegalArgumentException("unknown heat setup " + template);
	}

}
