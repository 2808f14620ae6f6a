package com.crustplan.engine.heat;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.water.Atmosphere;

/**
 * What the heat setups share: unit conversion, range checks worded alike, kitchen air,
 * message parts.
 */
final class SetupParts {

	private SetupParts() {
	}

	static double kelvin(double c) {
		return c + 273.15;
	}

	static void range(String field, double v, double min, double max, String why) {
		if (!Double.isFinite(v) || v < min || v > max) {
			throw new InvalidInputException(field, String.format("must be from %.0f to %.0f %s", min, max, why));
		}
	}

	static GasExchange kitchenAir() {
		double room = kelvin(HeatSetup.KITCHEN_AIR_C.value());
		return new GasExchange(Atmosphere.kitchen(room), HeatSetup.NATURAL_CONVECTION.value(), room,
				Message.of("exchange.kitchen-air"));
	}

	static Quantity coefficient(double wPerM2K) {
		return Quantity.of(wPerM2K, "W/m²K");
	}

	static Message control(HeatedBody.Control c) {
		return c == HeatedBody.Control.THERMOSTAT ? Message.of("control.kept-up") : Message.of("control.fixed");
	}

	static Message turning(double flipEverySeconds) {
		return flipEverySeconds > 0 ? Message.of("assumption.turned", Duration.seconds(flipEverySeconds))
				: Message.of("assumption.not-turned");
	}

}
