package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.water.Atmosphere;

/**
 * Resting after cooking: both faces in still kitchen air. The heat already in the outer
 * layers moves on inwards, so the core keeps rising for a while (carry-over).
 */
public record Rest(double airTemperatureC) implements HeatSetup {

	public Rest {
		// a cold store to a hot pass: what a resting place in a kitchen can be
		SetupParts.range("temperatureC", airTemperatureC, 0, 45, "°C for resting in kitchen air");
	}

	@Override
	public FaceSchedule schedule() {
		double air = SetupParts.kelvin(airTemperatureC);
		return FaceSchedule.both(new GasExchange(Atmosphere.kitchen(air), NATURAL_CONVECTION.value(), air,
				Message.of("exchange.rest", Temperature.celsius(airTemperatureC))));
	}

	@Override
	public String mode() {
		return "rest";
	}

	@Override
	public double temperatureC() {
		return airTemperatureC;
	}

	@Override
	public List<Message> assumptions() {
		return List.of(Message.of("assumption.rest", Temperature.celsius(airTemperatureC),
				SetupParts.coefficient(NATURAL_CONVECTION.value())));
	}

}
