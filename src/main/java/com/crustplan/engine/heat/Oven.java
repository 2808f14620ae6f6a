package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.water.Atmosphere;

/**
 * An oven: both faces in air at the set temperature, walls radiating at it;
 * {@code steamPct} is the share of steam in the oven atmosphere by volume (0 to 100 %:
 * dry kitchen air is about 1.6 %).
 */
public record Oven(double airTemperatureC, boolean fan, double steamPct) implements HeatSetup {

	public Oven {
		SetupParts.range("temperatureC", airTemperatureC, 50, 320, "°C for an oven");
		SetupParts.range("steamPct", steamPct, 0, 100, "% steam by volume");
	}

	/**
	 * Relative humidity taken at the oven temperature, converted to a steam share (capped
	 * at 100 %).
	 */
	public static Oven withRelativeHumidity(double airTemperatureC, boolean fan, double relativeHumidityPct) {
		SetupParts.range("relativeHumidityPct", relativeHumidityPct, 0, 100, "%");
		SetupParts.range("temperatureC", airTemperatureC, 50, 320, "°C for an oven");
		Atmosphere a = Atmosphere.fromRelativeHumidity(SetupParts.kelvin(airTemperatureC), relativeHumidityPct / 100);
		return new Oven(airTemperatureC, fan,
				Math.max(Atmosphere.KITCHEN_STEAM_FRACTION, a.steamVolumeFraction()) * 100);
	}

	public Atmosphere atmosphere() {
		return new Atmosphere(SetupParts.kelvin(airTemperatureC), Math.max(steamPct / 100, 0));
	}

	/**
	 * Dew point of the oven atmosphere, °C: a face below it gains water by condensation.
	 */
	public double dewPointC() {
		return atmosphere().dewPointK() - 273.15;
	}

	@Override
	public FaceSchedule schedule() {
		double h = fan ? OVEN_FAN.value() : OVEN_STILL.value();
		return FaceSchedule.both(new GasExchange(atmosphere(), h, SetupParts.kelvin(airTemperatureC),
				Message.of(fan ? "exchange.oven.fan" : "exchange.oven.still", Temperature.celsius(airTemperatureC),
						Quantity.of(steamPct, "%"))));
	}

	@Override
	public String mode() {
		return "oven";
	}

	@Override
	public double temperatureC() {
		return airTemperatureC;
	}

	@Override
	public List<Message> assumptions() {
		return List.of(Message.of(fan ? "assumption.oven.fan" : "assumption.oven.still", SetupParts.coefficient(h())),
				Message.of("assumption.oven.steam", Quantity.of(steamPct, "%", 1), Temperature.celsius(dewPointC()),
						Temperature.celsius(WetBulb.temperatureC(atmosphere(), h()))),
				Message.of("assumption.oven.rack"));
	}

	private double h() {
		return fan ? OVEN_FAN.value() : OVEN_STILL.value();
	}

}
