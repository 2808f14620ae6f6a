package com.crustplan.engine.heat;

import java.util.List;
import java.util.Locale;

import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.Atmosphere;

/**
 * A radiant grill: a salamander or broiler above the food, or coals below it; the other
 * face rests in kitchen air. What reaches the food is {@code heatFluxKwPerM2}: what a
 * black radiometer at 25 °C reads where the food sits. A cook gives it directly
 * (measured, or a published figure for the grill), or gives the element temperature and
 * distance, from which the flux follows through the view factor of {@link GrillKind}.
 * {@code heaterTemperatureC} is the element temperature given or implied;
 * {@code fluxGiven} says which the cook gave. The cook stops where the surface passes
 * {@link #CHAR_SURFACE}: the browning rates are not fitted beyond it.
 */
public record RadiantGrill(GrillKind kind, double heaterTemperatureC, double distanceMm, double heatFluxKwPerM2,
		boolean fluxGiven, double flipEverySeconds) implements HeatSetup {

	/**
	 * The hottest surface the browning rates are used at: bread crust rates were fitted
	 * on bakes with crust surfaces up to about 200–250 °C (Zanoni, Peri & Bruno 1995,
	 * from memory), the meat, poultry and potato rates are calibrated on pans and oil at
	 * 175–230 °C; above it a surface pyrolyses (chars) rather than browns (from memory).
	 */
	public static final Parameter CHAR_SURFACE = Parameter.fromMemory("T_char",
			"highest surface temperature the browning rates are used at", 250, "°C",
			"upper end of the fitted and calibrated surface temperatures; beyond it the surface chars (from memory)");

	public RadiantGrill {
		if (kind == null) {
			throw new InvalidInputException("grill", "choose salamander, broiler or charcoal");
		}
		SetupParts.range("temperatureC", heaterTemperatureC, 300, 1200, "°C for a radiant element");
		SetupParts.range("distanceMm", distanceMm, 30, 400, "mm from the heater to the food");
		SetupParts.range("heatFluxKwPerM2", heatFluxKwPerM2, 1, 60,
				"kW/m² at the food (a salamander gives about 10–20; 54 is the highest measured under a grill)");
		SetupParts.range("flipEverySeconds", flipEverySeconds, 0, 3600, "s (0 for no flip)");
		if (flipEverySeconds > 0 && flipEverySeconds < 10) {
			throw new InvalidInputException("flipEverySeconds", "must be 0 (no flip) or at least 10 s");
		}
	}

	/**
	 * A salamander's element at a temperature, the food at the usual distance (the form
	 * of round one).
	 */
	public RadiantGrill(double heaterTemperatureC, double flipEverySeconds) {
		this(ofElement(GrillKind.SALAMANDER, heaterTemperatureC, null, flipEverySeconds));
	}

	private RadiantGrill(RadiantGrill g) {
		this(g.kind, g.heaterTemperatureC, g.distanceMm, g.heatFluxKwPerM2, g.fluxGiven, g.flipEverySeconds);
	}

	/**
	 * An element temperature and distance (null for the kind's usual distance): the flux
	 * from the view factor.
	 */
	public static RadiantGrill ofElement(GrillKind kind, double elementTemperatureC, Double distanceMm,
			double flipEverySeconds) {
		GrillKind k = kind == null ? GrillKind.SALAMANDER : kind;
		double l = distanceMm == null ? k.defaultDistanceMm() : distanceMm;
		SetupParts.range("temperatureC", elementTemperatureC, 300, 1200, "°C for a radiant element");
		SetupParts.range("distanceMm", l, 30, 400, "mm from the heater to the food");
		double q = k.heatFluxWPerM2(elementTemperatureC, l, SetupParts.kelvin(KITCHEN_AIR_C.value())) / 1000;
		if (q > 60) {
			throw new InvalidInputException("distanceMm", String.format(Locale.ROOT,
					"puts the food so close to a %.0f °C element that it gets %.0f kW/m²: more than 60 kW/m², beyond any measured grill",
					elementTemperatureC, q));
		}
		return new RadiantGrill(k, elementTemperatureC, l, Math.max(q, 1), false, flipEverySeconds);
	}

	/**
	 * A heat flux at the food, kW/m²: the element temperature is implied at the kind's
	 * usual distance.
	 */
	public static RadiantGrill ofFlux(GrillKind kind, double kwPerM2, double flipEverySeconds) {
		GrillKind k = kind == null ? GrillKind.SALAMANDER : kind;
		SetupParts.range("heatFluxKwPerM2", kwPerM2, 1, 60,
				"kW/m² at the food (a salamander gives about 10–20; 54 is the highest measured under a grill)");
		double l = k.defaultDistanceMm();
		double t = k.elementTemperatureC(kwPerM2 * 1000, l, SetupParts.kelvin(KITCHEN_AIR_C.value()));
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

	/**
	 * Mean view factor from the food face to the heater face (coaxial parallel discs).
	 */
	public double viewFactor() {
		return kind.viewFactor(distanceMm);
	}

	/** Radiant flux absorbed by a face at 25 °C, kW/m². */
	public double heatFluxAtRoomKwPerM2() {
		return Radiation.FOOD_EMISSIVITY.value() * heatFluxKwPerM2;
	}

	/**
	 * The food sees irradiation G = q + σ·T_room⁴ (the radiometer's reading plus what a
	 * body at room temperature gets back), i.e. surroundings at T_r = (q/σ + T_room⁴)^¼;
	 * it absorbs ε·G and emits ε·σ·T_s⁴.
	 */
	@Override
	public FaceSchedule schedule() {
		double room = SetupParts.kelvin(KITCHEN_AIR_C.value());
		double radiant = Math.pow(heatFluxKwPerM2 * 1000 / Radiation.SIGMA + Math.pow(room, 4), 0.25);
		GasExchange underHeater = new GasExchange(Atmosphere.kitchen(room), NATURAL_CONVECTION.value(), radiant,
				Message.of("exchange.grill", Temperature.celsius(heaterTemperatureC)));
		return FaceSchedule.flipping(underHeater, SetupParts.kitchenAir(), flipEverySeconds);
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
				SetupParts.turning(flipEverySeconds),
				Message.of(kind == GrillKind.CHARCOAL ? "assumption.grill.upper-face" : "assumption.grill.lower-face"));
	}

}
