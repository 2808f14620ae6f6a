package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;

/**
 * A pan or griddle: the face down lies on the pan, the face up loses heat and water to
 * kitchen air.
 */
public record PanContact(double panTemperatureC, boolean fatFilm, double flipEverySeconds,
		PanBody body) implements HeatSetup {

	/**
	 * A pan held at its set temperature whatever the load (a heavy pan on a steady
	 * flame).
	 */
	public PanContact(double panTemperatureC, boolean fatFilm, double flipEverySeconds) {
		this(panTemperatureC, fatFilm, flipEverySeconds, null);
	}

	/**
	 * The same pan as a body that cools under the load and recovers as its heat allows.
	 */
	public PanContact withBody(PanBody b) {
		return new PanContact(panTemperatureC, fatFilm, flipEverySeconds, b);
	}

	public PanContact {
		SetupParts.range("temperatureC", panTemperatureC, 100, 320, "°C for a pan surface");
		SetupParts.range("flipEverySeconds", flipEverySeconds, 0, 3600, "s (0 for no flip)");
		if (flipEverySeconds > 0 && flipEverySeconds < 10) {
			throw new InvalidInputException("flipEverySeconds", "must be 0 (no flip) or at least 10 s");
		}
	}

	@Override
	public FaceSchedule schedule() {
		double h = fatFilm ? CONTACT_WITH_FAT.value() : CONTACT_DRY.value();
		double set = SetupParts.kelvin(panTemperatureC);
		return FaceSchedule.flipping(new ContactExchange(set, h,
				Message.of("exchange.pan", Temperature.celsius(panTemperatureC), SetupParts.coefficient(h)),
				body == null ? null : body.start(set)), SetupParts.kitchenAir(), flipEverySeconds);
	}

	@Override
	public String mode() {
		return "pan";
	}

	@Override
	public double temperatureC() {
		return panTemperatureC;
	}

	@Override
	public List<Message> assumptions() {
		// the contact value keeps the one decimal it has always been shown with
		Message pan = body == null ? Message.of("assumption.pan.held", Temperature.celsius(panTemperatureC))
				: Message.of("assumption.pan.body", Temperature.celsius(panTemperatureC),
						Text.of(body.material().label()), Quantity.of(body.massKg(), "kg", 1),
						Quantity.of(body.diameterCm(), "cm"), Quantity.of(body.powerKw(), "kW", 1),
						SetupParts.control(body.control()), Quantity.of(body.coverPct(), "%"));
		return List.of(pan,
				Message.of(fatFilm ? "assumption.pan.contact.fat" : "assumption.pan.contact.dry",
						Quantity.of((fatFilm ? CONTACT_WITH_FAT : CONTACT_DRY).value(), "W/m²K", 1)),
				SetupParts.turning(flipEverySeconds),
				Message.of("assumption.pan.upper-face", Temperature.celsius(KITCHEN_AIR_C.value())));
	}

}
