package com.crustplan.engine.heat;

import java.util.List;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.Atmosphere;

/** How heat reaches the food: one of four modes, or resting, each a record of what a cook sets. */
public sealed interface HeatSetup
		permits HeatSetup.PanContact, HeatSetup.Oven, HeatSetup.RadiantGrill, HeatSetup.DeepFryer, HeatSetup.Rest {

	Parameter KITCHEN_AIR_C = Parameter.commonPractice("T_room", "kitchen air temperature", 25, "°C", "common practice");

	Parameter NATURAL_CONVECTION = Parameter.commonPractice("h_nat", "natural convection to still kitchen air", 10,
			"W/(m²·K)", "free convection from a small horizontal surface, 5–15 W/m²K (Incropera ch. 9; common practice)");

	Parameter CONTACT_WITH_FAT = Parameter.assumption("h_c,fat", "pan–food contact through a fat film", 300, "W/(m²·K)",
			"lower end of 250–650 W/m²K measured on a pressed contact grill (Zorrilla & Singh ~2000): an unpressed item in a skillet sees less");

	Parameter CONTACT_DRY = Parameter.assumption("h_c,dry", "pan–food contact without fat", 150, "W/(m²·K)",
			"about half the fat-film value: air gaps where the food does not lie flat (assumption)");

	Parameter OVEN_STILL = Parameter.fromMemory("h_still", "convection in a still (deck or conventional) oven", 18,
			"W/(m²·K)", "10–25 W/m²K (Sakin et al. 2009, J Food Eng 94:344; Carson et al. 2006, J Food Eng 72:293; values from memory)");

	Parameter OVEN_FAN = Parameter.fromMemory("h_fan", "convection in a fan oven", 40, "W/(m²·K)",
			"20–60 W/m²K (Sakin et al. 2009; Carson et al. 2006; values from memory)");

	Parameter GRILL_VIEW = Parameter.assumption("F", "share of the food's view taken by the heater", 0.5, "–",
			"a salamander element above a plate, a typical geometry (assumption); gives ≈ 37 kW/m² at 800 °C, within measured grill fluxes up to 54 kW/m²");

	Parameter OIL_QUIET = Parameter.published("h_oil", "oil-side coefficient without boiling", 280, "W/(m²·K)",
			"250–300 W/m²K (Hubbard & Farkas 1999; Mir-Bel, Oria & Salvador 2012, J Food Eng 113:167)");

	Parameter OIL_BUBBLING = Parameter.published("h_oil,boil", "oil-side coefficient with vigorous bubbling", 900, "W/(m²·K)",
			"800–1100 W/m²K, peaks to 2000 (Hubbard & Farkas 1999; Mir-Bel, Oria & Salvador 2012)");

	Parameter OVEN_WALL_EMISSIVITY = Parameter.secondary("ε_wall", "oven walls radiate at the air temperature", 0.9, "–",
			"75–80 % of an industrial oven's flux is radiant (Baik et al. 1999, J Food Sci 64:688)");

	FaceSchedule schedule();

	/** A key for the mode, used in the API and pages. */
	String mode();

	/** The set temperature a cook reads on the dial, °C. */
	double temperatureC();

	List<Message> assumptions();

	static List<Parameter> parameters() {
		return List.of(KITCHEN_AIR_C, NATURAL_CONVECTION, CONTACT_WITH_FAT, CONTACT_DRY, OVEN_STILL, OVEN_FAN, GRILL_VIEW,
				OIL_QUIET, OIL_BUBBLING, OVEN_WALL_EMISSIVITY, Radiation.FOOD_EMISSIVITY, GasExchange.LEWIS_NUMBER);
	}

	private static double kelvin(double c) {
		return c + 273.15;
	}

	private static void range(String field, double v, double min, double max, String why) {
		if (!Double.isFinite(v) || v < min || v > max) {
			throw new InvalidInputException(field, String.format("must be from %.0f to %.0f %s", min, max, why));
		}
	}

	private static GasExchange kitchenAir() {
		double room = kelvin(KITCHEN_AIR_C.value());
		return new GasExchange(Atmosphere.kitchen(room), NATURAL_CONVECTION.value(), room, Message.of("exchange.kitchen-air"));
	}

	private static Quantity coefficient(double wPerM2K) {
		return Quantity.of(wPerM2K, "W/m²K");
	}

	private static Message control(HeatedBody.Control c) {
		return c == HeatedBody.Control.THERMOSTAT ? Message.of("control.kept-up") : Message.of("control.fixed");
	}

	private static Message turning(double flipEverySeconds) {
		return flipEverySeconds > 0 ? Message.of("assumption.turned", Duration.seconds(flipEverySeconds))
				: Message.of("assumption.not-turned");
	}

	/** A pan or griddle: the face down lies on the pan, the face up loses heat and water to kitchen air. */
	record PanContact(double panTemperatureC, boolean fatFilm, double flipEverySeconds, PanBody body) implements HeatSetup {

		/** A pan held at its set temperature whatever the load (a heavy pan on a steady flame). */
		public PanContact(double panTemperatureC, boolean fatFilm, double flipEverySeconds) {
			this(panTemperatureC, fatFilm, flipEverySeconds, null);
		}

		/** The same pan as a body that cools under the load and recovers as its heat allows. */
		public PanContact withBody(PanBody b) {
			return new PanContact(panTemperatureC, fatFilm, flipEverySeconds, b);
		}

		public PanContact {
			range("temperatureC", panTemperatureC, 100, 320, "°C for a pan surface");
			range("flipEverySeconds", flipEverySeconds, 0, 3600, "s (0 for no flip)");
			if (flipEverySeconds > 0 && flipEverySeconds < 10) {
				throw new InvalidInputException("flipEverySeconds", "must be 0 (no flip) or at least 10 s");
			}
		}

		@Override
		public FaceSchedule schedule() {
			double h = fatFilm ? CONTACT_WITH_FAT.value() : CONTACT_DRY.value();
			double set = kelvin(panTemperatureC);
			return FaceSchedule.flipping(new ContactExchange(set, h,
					Message.of("exchange.pan", Temperature.celsius(panTemperatureC), coefficient(h)),
					body == null ? null : body.start(set)), kitchenAir(), flipEverySeconds);
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
					: Message.of("assumption.pan.body", Temperature.celsius(panTemperatureC), Text.of(body.material().label()),
							Quantity.of(body.massKg(), "kg", 1), Quantity.of(body.diameterCm(), "cm"),
							Quantity.of(body.powerKw(), "kW", 1), control(body.control()),
							Quantity.of(body.coverPct(), "%"));
			return List.of(pan,
					Message.of(fatFilm ? "assumption.pan.contact.fat" : "assumption.pan.contact.dry",
							Quantity.of((fatFilm ? CONTACT_WITH_FAT : CONTACT_DRY).value(), "W/m²K", 1)),
					turning(flipEverySeconds),
					Message.of("assumption.pan.upper-face", Temperature.celsius(KITCHEN_AIR_C.value())));
		}

	}

	/**
	 * An oven: both faces in air at the set temperature, walls radiating at it; {@code steamPct} is the
	 * share of steam in the oven atmosphere by volume (0 to 100 %: dry kitchen air is about 1.6 %).
	 */
	record Oven(double airTemperatureC, boolean fan, double steamPct) implements HeatSetup {

		public Oven {
			range("temperatureC", airTemperatureC, 50, 320, "°C for an oven");
			range("steamPct", steamPct, 0, 100, "% steam by volume");
		}

		/** Relative humidity taken at the oven temperature, converted to a steam share (capped at 100 %). */
		public static Oven withRelativeHumidity(double airTemperatureC, boolean fan, double relativeHumidityPct) {
			range("relativeHumidityPct", relativeHumidityPct, 0, 100, "%");
			range("temperatureC", airTemperatureC, 50, 320, "°C for an oven");
			Atmosphere a = Atmosphere.fromRelativeHumidity(kelvin(airTemperatureC), relativeHumidityPct / 100);
			return new Oven(airTemperatureC, fan, Math.max(Atmosphere.KITCHEN_STEAM_FRACTION, a.steamVolumeFraction()) * 100);
		}

		public Atmosphere atmosphere() {
			return new Atmosphere(kelvin(airTemperatureC), Math.max(steamPct / 100, 0));
		}

		@Override
		public FaceSchedule schedule() {
			double h = fan ? OVEN_FAN.value() : OVEN_STILL.value();
			return FaceSchedule.both(new GasExchange(atmosphere(), h, kelvin(airTemperatureC),
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
			return List.of(Message.of(fan ? "assumption.oven.fan" : "assumption.oven.still", coefficient(h())),
					Message.of("assumption.oven.steam", Quantity.of(steamPct, "%", 1),
							Temperature.celsius(WetBulb.temperatureC(atmosphere(), h()))),
					Message.of("assumption.oven.rack"));
		}

		private double h() {
			return fan ? OVEN_FAN.value() : OVEN_STILL.value();
		}

	}

	/** A radiant grill (salamander, broiler) above the food; the lower face rests in kitchen air. */
	record RadiantGrill(double heaterTemperatureC, double flipEverySeconds) implements HeatSetup {

		public RadiantGrill {
			range("temperatureC", heaterTemperatureC, 300, 1200, "°C for a radiant element");
			range("flipEverySeconds", flipEverySeconds, 0, 3600, "s (0 for no flip)");
			if (flipEverySeconds > 0 && flipEverySeconds < 10) {
				throw new InvalidInputException("flipEverySeconds", "must be 0 (no flip) or at least 10 s");
			}
		}

		/** The heater temperature that delivers {@code kwPerM2} to a food surface at 25 °C. */
		public static RadiantGrill fromHeatFlux(double kwPerM2, double flipEverySeconds) {
			range("heatFluxKwPerM2", kwPerM2, 2, 80, "kW/m²");
			double room = kelvin(KITCHEN_AIR_C.value());
			double t4 = kwPerM2 * 1000 / (Radiation.FOOD_EMISSIVITY.value() * Radiation.SIGMA * GRILL_VIEW.value())
					+ Math.pow(room, 4);
			return new RadiantGrill(Math.pow(t4, 0.25) - 273.15, flipEverySeconds);
		}

		/** Radiant flux absorbed by a face at 25 °C, kW/m². */
		public double heatFluxAtRoomKwPerM2() {
			double room = kelvin(KITCHEN_AIR_C.value());
			return Radiation.FOOD_EMISSIVITY.value() * Radiation.SIGMA * GRILL_VIEW.value()
					* (Math.pow(kelvin(heaterTemperatureC), 4) - Math.pow(room, 4)) / 1000;
		}

		@Override
		public FaceSchedule schedule() {
			double room = kelvin(KITCHEN_AIR_C.value());
			double f = GRILL_VIEW.value();
			double radiant = Math.pow(f * Math.pow(kelvin(heaterTemperatureC), 4) + (1 - f) * Math.pow(room, 4), 0.25);
			GasExchange underHeater = new GasExchange(Atmosphere.kitchen(room), NATURAL_CONVECTION.value(), radiant,
					Message.of("exchange.grill", Temperature.celsius(heaterTemperatureC)));
			return FaceSchedule.flipping(underHeater, kitchenAir(), flipEverySeconds);
		}

		@Override
		public String mode() {
			return "grill";
		}

		@Override
		public double temperatureC() {
			return heaterTemperatureC;
		}

		@Override
		public List<Message> assumptions() {
			return List.of(Message.of("assumption.grill.element", Temperature.celsius(heaterTemperatureC),
					Quantity.of(GRILL_VIEW.value() * 100, "%"), Quantity.of(heatFluxAtRoomKwPerM2(), "kW/m²")),
					turning(flipEverySeconds), Message.of("assumption.grill.lower-face"));
		}

	}

	/** A deep fryer: both faces in oil at the set temperature. */
	record DeepFryer(double oilTemperatureC, FryerBody body) implements HeatSetup {

		/** Oil held at its set temperature whatever the load (a fryer that recovers at once). */
		public DeepFryer(double oilTemperatureC) {
			this(oilTemperatureC, null);
		}

		/** The same fryer with its oil as a body the load draws down and the thermostat brings back. */
		public DeepFryer withBody(FryerBody b) {
			return new DeepFryer(oilTemperatureC, b);
		}

		public DeepFryer {
			range("temperatureC", oilTemperatureC, 120, 200, "°C for frying oil (above 200 °C oil smokes and may ignite)");
		}

		@Override
		public FaceSchedule schedule() {
			double set = kelvin(oilTemperatureC);
			return FaceSchedule.both(new OilExchange(set, OIL_QUIET.value(), OIL_BUBBLING.value(),
					body == null ? null : body.start(set)));
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
					: Message.of("assumption.fryer.body", Temperature.celsius(oilTemperatureC), Quantity.of(body.oilLitres(), "L", 1),
							Quantity.of(body.heaterKw(), "kW", 1), Quantity.of(body.loadKg(), "kg", 2));
			return List.of(oil,
					Message.of("assumption.fryer.coefficient", coefficient(OIL_QUIET.value()), coefficient(OIL_BUBBLING.value())),
					Message.of("assumption.fryer.uptake"));
		}

	}

	/**
	 * Resting after cooking: both faces in still kitchen air. The heat already in the outer layers moves
	 * on inwards, so the core keeps rising for a while (carry-over).
	 */
	record Rest(double airTemperatureC) implements HeatSetup {

		public Rest {
			// a cold store to a hot pass: what a resting place in a kitchen can be
			range("temperatureC", airTemperatureC, 0, 45, "°C for resting in kitchen air");
		}

		@Override
		public FaceSchedule schedule() {
			double air = kelvin(airTemperatureC);
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
					coefficient(NATURAL_CONVECTION.value())));
		}

	}

}
