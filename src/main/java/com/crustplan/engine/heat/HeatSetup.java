package com.crustplan.engine.heat;

import java.util.List;
import java.util.Locale;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
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

	/** The hottest surface the cook follows, °C: it stops there and says so (no limit unless a mode sets one). */
	default double surfaceLimitC() {
		return Double.POSITIVE_INFINITY;
	}

	static List<Parameter> parameters() {
		return List.of(KITCHEN_AIR_C, NATURAL_CONVECTION, CONTACT_WITH_FAT, CONTACT_DRY, OVEN_STILL, OVEN_FAN, GrillKind.FOOD_RADIUS,
				OIL_QUIET, OIL_BUBBLING, OVEN_WALL_EMISSIVITY, Radiation.FOOD_EMISSIVITY, GasExchange.LEWIS_NUMBER,
				RadiantGrill.CHAR_SURFACE);
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

		/** Dew point of the oven atmosphere, °C: a face below it gains water by condensation. */
		public double dewPointC() {
			return atmosphere().dewPointK() - 273.15;
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
					Message.of("assumption.oven.steam", Quantity.of(steamPct, "%", 1), Temperature.celsius(dewPointC()),
							Temperature.celsius(WetBulb.temperatureC(atmosphere(), h()))),
					Message.of("assumption.oven.rack"));
		}

		private double h() {
			return fan ? OVEN_FAN.value() : OVEN_STILL.value();
		}

	}

	/**
	 * A radiant grill: a salamander or broiler above the food, or coals below it; the other face rests in
	 * kitchen air. What reaches the food is {@code heatFluxKwPerM2}: what a black radiometer at 25 °C reads
	 * where the food sits. A cook gives it directly (measured, or a published figure for the grill), or
	 * gives the element temperature and distance, from which the flux follows through the view factor of
	 * {@link GrillKind}. {@code heaterTemperatureC} is the element temperature given or implied;
	 * {@code fluxGiven} says which the cook gave. The cook stops where the surface passes
	 * {@link #CHAR_SURFACE}: the browning rates are not fitted beyond it.
	 */
	record RadiantGrill(GrillKind kind, double heaterTemperatureC, double distanceMm, double heatFluxKwPerM2,
			boolean fluxGiven, double flipEverySeconds) implements HeatSetup {

		/**
		 * The hottest surface the browning rates are used at: bread crust rates were fitted on bakes with
		 * crust surfaces up to about 200–250 °C (Zanoni, Peri & Bruno 1995, from memory), the meat, poultry
		 * and potato rates are calibrated on pans and oil at 175–230 °C; above it a surface pyrolyses
		 * (chars) rather than browns (from memory).
		 */
		public static final Parameter CHAR_SURFACE = Parameter.fromMemory("T_char",
				"highest surface temperature the browning rates are used at", 250, "°C",
				"upper end of the fitted and calibrated surface temperatures; beyond it the surface chars (from memory)");

		public RadiantGrill {
			if (kind == null) {
				throw new InvalidInputException("grill", "choose salamander, broiler or charcoal");
			}
			range("temperatureC", heaterTemperatureC, 300, 1200, "°C for a radiant element");
			range("distanceMm", distanceMm, 30, 400, "mm from the heater to the food");
			range("heatFluxKwPerM2", heatFluxKwPerM2, 1, 60,
					"kW/m² at the food (a salamander gives about 10–20; 54 is the highest measured under a grill)");
			range("flipEverySeconds", flipEverySeconds, 0, 3600, "s (0 for no flip)");
			if (flipEverySeconds > 0 && flipEverySeconds < 10) {
				throw new InvalidInputException("flipEverySeconds", "must be 0 (no flip) or at least 10 s");
			}
		}

		/** A salamander's element at a temperature, the food at the usual distance (the form of round one). */
		public RadiantGrill(double heaterTemperatureC, double flipEverySeconds) {
			this(ofElement(GrillKind.SALAMANDER, heaterTemperatureC, null, flipEverySeconds));
		}

		private RadiantGrill(RadiantGrill g) {
			this(g.kind, g.heaterTemperatureC, g.distanceMm, g.heatFluxKwPerM2, g.fluxGiven, g.flipEverySeconds);
		}

		/** An element temperature and distance (null for the kind's usual distance): the flux from the view factor. */
		public static RadiantGrill ofElement(GrillKind kind, double elementTemperatureC, Double distanceMm,
				double flipEverySeconds) {
			GrillKind k = kind == null ? GrillKind.SALAMANDER : kind;
			double l = distanceMm == null ? k.defaultDistanceMm() : distanceMm;
			range("temperatureC", elementTemperatureC, 300, 1200, "°C for a radiant element");
			range("distanceMm", l, 30, 400, "mm from the heater to the food");
			double q = k.heatFluxWPerM2(elementTemperatureC, l, kelvin(KITCHEN_AIR_C.value())) / 1000;
			if (q > 60) {
				throw new InvalidInputException("distanceMm", String.format(Locale.ROOT,
						"puts the food so close to a %.0f °C element that it gets %.0f kW/m²: more than 60 kW/m², beyond any measured grill",
						elementTemperatureC, q));
			}
			return new RadiantGrill(k, elementTemperatureC, l, Math.max(q, 1), false, flipEverySeconds);
		}

		/** A heat flux at the food, kW/m²: the element temperature is implied at the kind's usual distance. */
		public static RadiantGrill ofFlux(GrillKind kind, double kwPerM2, double flipEverySeconds) {
			GrillKind k = kind == null ? GrillKind.SALAMANDER : kind;
			range("heatFluxKwPerM2", kwPerM2, 1, 60,
					"kW/m² at the food (a salamander gives about 10–20; 54 is the highest measured under a grill)");
			double l = k.defaultDistanceMm();
			double t = k.elementTemperatureC(kwPerM2 * 1000, l, kelvin(KITCHEN_AIR_C.value()));
			return new RadiantGrill(k, Math.min(Math.max(t, 300), 1200), l, kwPerM2, true, flipEverySeconds);
		}

		/** A salamander giving {@code kwPerM2} at the food. */
		public static RadiantGrill fromHeatFlux(double kwPerM2, double flipEverySeconds) {
			return ofFlux(GrillKind.SALAMANDER, kwPerM2, flipEverySeconds);
		}

		/** The same grill and food position with the element at another temperature. */
		public RadiantGrill withElementTemperature(double elementTemperatureC) {
			return ofElement(kind, elementTemperatureC, distanceMm, flipEverySeconds);
		}

		/** Mean view factor from the food face to the heater face (coaxial parallel discs). */
		public double viewFactor() {
			return kind.viewFactor(distanceMm);
		}

		/** Radiant flux absorbed by a face at 25 °C, kW/m². */
		public double heatFluxAtRoomKwPerM2() {
			return Radiation.FOOD_EMISSIVITY.value() * heatFluxKwPerM2;
		}

		/**
		 * The food sees irradiation G = q + σ·T_room⁴ (the radiometer's reading plus what a body at room
		 * temperature gets back), i.e. surroundings at T_r = (q/σ + T_room⁴)^¼; it absorbs ε·G and emits
		 * ε·σ·T_s⁴.
		 */
		@Override
		public FaceSchedule schedule() {
			double room = kelvin(KITCHEN_AIR_C.value());
			double radiant = Math.pow(heatFluxKwPerM2 * 1000 / Radiation.SIGMA + Math.pow(room, 4), 0.25);
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
		public double surfaceLimitC() {
			return CHAR_SURFACE.value();
		}

		@Override
		public List<Message> assumptions() {
			Message source = fluxGiven
					? Message.of("assumption.grill.flux", Text.of(kind.label()), Quantity.of(heatFluxKwPerM2, "kW/m²", 1),
							Temperature.celsius(heaterTemperatureC))
					: Message.of("assumption.grill.element", Temperature.celsius(heaterTemperatureC),
							Quantity.of(viewFactor() * kind.glowingShare() * 100, "%"),
							Quantity.of(heatFluxAtRoomKwPerM2(), "kW/m²"));
			return List.of(source,
					Message.of("assumption.grill.geometry", Text.of(kind.label()), Quantity.of(distanceMm, "mm"),
							PlainNumber.of(viewFactor(), 2), Quantity.of(kind.glowingShare() * 100, "%")),
					Message.of("assumption.grill.surface-limit", Temperature.celsius(CHAR_SURFACE.value())),
					turning(flipEverySeconds),
					Message.of(kind == GrillKind.CHARCOAL ? "assumption.grill.upper-face" : "assumption.grill.lower-face"));
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
