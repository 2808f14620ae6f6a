package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;

/** A deep fryer: both faces in oil at the set temperature. */
public record DeepFryer(double oilTemperatureC, FryerBody body) implements HeatSetup {

	/**
	 * Oil held at its set temperature whatever the load (a fryer that recovers at once).
	 */
	public DeepFryer(double oilTemperatureC) {
		this(oilTemperatureC, null);
	}

	/**
	 * The same fryer with its oil as a body the load draws down and the thermostat brings
	 * back.
	 */
	public DeepFryer withBody(FryerBody b) {
		return new DeepFryer(oilTemperatureC, b);
	}

	public DeepFryer {
		SetupParts.range("temperatureC", oilTemperatureC, 120, 200,
				"°C for frying oil (above 200 °C oil smokes and may ignite)");
	}

	@Override
	public FaceSchedule schedule() {
		double set = SetupParts.kelvin(oilTemperatureC);
		return FaceSchedule
			.both(new OilExchange(set, OIL_QUIET.value(), OIL_BUBBLING.value(), body == null ? null : body.start(set)));
	}

	@Override
	public String mode() {
		return "fryer";
	}

	@Override
	public double temperatureC() {
		return oilTemperatureC;
	}

	@Override
	public List<Message> assumptions() {
		Message oil = body == null ? Message.of("assumption.fryer.oil", Temperature.celsius(oilTemperatureC))
				: Message.of("assumption.fryer.body", Temperature.celsius(oilTemperatureC),
						Quantity.of(body.oilLitres(), "L", 1), Quantity.of(body.heaterKw(), "kW", 1),
						Quantity.of(body.loadKg(), "kg", 2));
		return List.of(oil, Message.of("assumption.fryer.coefficient", SetupParts.coefficient(OIL_QUIET.value()),
				SetupParts.coefficient(OIL_BUBBLING.value())), Message.of("assumption.fryer.uptake"));
	}

}
