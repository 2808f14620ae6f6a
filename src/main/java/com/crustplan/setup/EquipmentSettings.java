package com.crustplan.setup;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

import com.crustplan.engine.heat.FryerBody;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.heat.PanBody;
import com.crustplan.engine.heat.PanMaterial;
import com.crustplan.engine.input.InvalidInputException;

/**
 * The pan's or fryer's body from what a cook sets: a missing value takes the engine's
 * default for a typical line pan or fryer ({@link PanBody#DEFAULT},
 * {@link FryerBody#DEFAULT}). Shared by the setup form, saved plans and the JSON API. The
 * engine checks the ranges and names the field (massKg, diameterCm, powerKw, coverPct,
 * oilLitres, heaterKw, loadKg; material and control here).
 */
public final class EquipmentSettings {

	/** How the heat is controlled, in the words the form and the API use. */
	public enum Control {

		KEPT_UP("thermostat", "Heat kept up (thermostat)", HeatedBody.Control.THERMOSTAT),
		FIXED("fixed-input", "Flame left as set", HeatedBody.Control.FIXED_INPUT);

		private final String key;

		private final String label;

		private final HeatedBody.Control engine;

		Control(String key, String label, HeatedBody.Control engine) {
			this.key = key;
			this.label = label;
			this.engine = engine;
		}

		public String key() {
			return key;
		}

		public String label() {
			return label;
		}

		static Optional<Control> byKey(String key) {
			return Arrays.stream(values()).filter(c -> c.key.equalsIgnoreCase(key.trim())).findFirst();
		}

		static Control of(HeatedBody.Control c) {
			return c == HeatedBody.Control.THERMOSTAT ? KEPT_UP : FIXED;
		}

	}

	public static final String DEFAULT_MATERIAL = PanBody.DEFAULT.material().key();

	public static final String DEFAULT_CONTROL = Control.of(PanBody.DEFAULT.control()).key();

	private EquipmentSettings() {
	}

	public static List<PanMaterial> materials() {
		return List.of(PanMaterial.values());
	}

	public static List<Control> controls() {
		return List.of(Control.values());
	}

	/** A pan's body; each value left out is the default's. */
	public static PanBody pan(String material, Double massKg, Double diameterCm, Double powerKw, String control,
			Double coverPct) {
		PanBody d = PanBody.DEFAULT;
		return new PanBody(material(material), or(massKg, d.massKg()), or(diameterCm, d.diameterCm()),
				or(powerKw, d.powerKw()), control(control), or(coverPct, d.coverPct()));
	}

	/** A fryer's body; each value left out is the default's. */
	public static FryerBody fryer(Double oilLitres, Double heaterKw, Double loadKg) {
		FryerBody d = FryerBody.DEFAULT;
		return new FryerBody(or(oilLitres, d.oilLitres()), or(heaterKw, d.heaterKw()), or(loadKg, d.loadKg()));
	}

	/**
	 * The setup with the pan's or the fryer's body; other modes have none and come back
	 * as they are.
	 */
	public static HeatSetup withBody(HeatSetup setup, PanBody pan, FryerBody fryer) {
		if (setup instanceof PanContact p && pan != null) {
			return p.withBody(pan);
		}
		if (setup instanceof DeepFryer f && fryer != null) {
			return f.withBody(fryer);
		}
		return setup;
	}

	/**
	 * The body in a line for the setup list: "cast iron, 2.3 kg, 28 cm, 2.5 kW, heat kept
	 * up, 50 % covered".
	 */
	private static final String NBSP = "\u00a0";

	static String summary(SavedSetup s) {
		if (s.getHeatMode() == HeatMode.PAN && s.getPanMassKg() != null) {
			String material = Arrays.stream(PanMaterial.values())
				.filter(m -> m.key().equals(s.getPanMaterial()))
				.map(PanMaterial::label)
				.findFirst()
				.orElse(s.getPanMaterial());
			String control = s.getPanControl() == null ? ""
					: Control.byKey(s.getPanControl())
						.map(c -> c == Control.KEPT_UP ? "heat kept up" : "flame left as set")
						.orElse(s.getPanControl());
			// no-break spaces: a figure keeps its unit on its line
			return material + ", " + plain(s.getPanMassKg()) + NBSP + "kg, " + plain(s.getPanDiameterCm()) + NBSP
					+ "cm, " + plain(s.getPanPowerKw()) + NBSP + "kW, " + control + ", " + plain(s.getPanCoverPct())
					+ NBSP + "% covered";
		}
		if (s.getHeatMode() == HeatMode.FRYER && s.getFryerOilLitres() != null) {
			return plain(s.getFryerOilLitres()) + NBSP + "L oil, " + plain(s.getFryerHeaterKw()) + NBSP + "kW heater, "
					+ plain(s.getFryerLoadKg()) + NBSP + "kg per batch";
		}
		return null;
	}

	private static String plain(Double v) {
		if (v == null) {
			return "–";
		}
		return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
	}

	static PanMaterial material(String key) {
		if (key == null || key.isBlank()) {
			return PanBody.DEFAULT.material();
		}
		return Arrays.stream(PanMaterial.values())
			.filter(m -> m.key().equalsIgnoreCase(key.trim()))
			.findFirst()
			.orElseThrow(() -> new InvalidInputException("material",
					"'" + key.trim() + "' is not a pan material; use " + keys(PanMaterial.values())));
	}

	static HeatedBody.Control control(String key) {
		if (key == null || key.isBlank()) {
			return PanBody.DEFAULT.control();
		}
		return Control.byKey(key)
			.map(c -> c.engine)
			.orElseThrow(() -> new InvalidInputException("control", "'" + key.trim()
					+ "' is not a control; use thermostat (heat kept up) or fixed-input (flame left as set)"));
	}

	private static String keys(PanMaterial[] all) {
		return String.join(", ", Arrays.stream(all).map(PanMaterial::key).toList());
	}

	private static double or(Double v, double fallback) {
		return v == null ? fallback : v;
	}

}
