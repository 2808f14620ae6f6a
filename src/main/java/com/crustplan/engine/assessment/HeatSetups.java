package com.crustplan.engine.assessment;

import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;

/**
 * The same heat setup at another set temperature: for maps and the lower-temperature
 * suggestion.
 */
public final class HeatSetups {

	private HeatSetups() {
	}

	public static HeatSetup withTemperature(HeatSetup template, double temperatureC) {
		if (template instanceof DeepFryer f) {
			return new DeepFryer(temperatureC, f.body());
		}
		if (template instanceof Oven o) {
			return new Oven(temperatureC, o.fan(), o.steamPct());
		}
		if (template instanceof PanContact p) {
			return new PanContact(temperatureC, p.fatFilm(), p.flipEverySeconds(), p.body());
		}
		if (template instanceof RadiantGrill g) {
			return g.withElementTemperature(temperatureC);
		}
		if (template instanceof Rest) {
			return new Rest(temperatureC);
		}
		throw new IllegalArgumentException("unknown heat setup " + template);
	}

}
