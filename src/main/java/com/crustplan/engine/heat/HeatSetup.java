package com.crustplan.engine.heat;

import java.util.ArrayList;
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

/**
 * How heat reaches the food: one of four modes, or resting, each a record of what a cook
 * sets.
 */
public sealed interface HeatSetup permits PanContact, Oven, RadiantGrill, DeepFryer, Rest {

	Parameter KITCHEN_AIR_C = Parameter.commonPractice("T_room", "kitchen air temperature", 25, "°C",
			"common practice");

	Parameter NATURAL_CONVECTION = Parameter.commonPractice("h_nat", "natural convection to still kitchen air", 10,
			"W/(m²·K)",
			"free convection from a small horizontal surface, 5–15 W/m²K (Incropera ch. 9; common practice)");

	Parameter CONTACT_WITH_FAT = Parameter.assumption("h_c,fat", "pan–food contact through a fat film", 300, "W/(m²·K)",
			"lower end of 250–650 W/m²K measured on a pressed contact grill (Zorrilla & Singh ~2000): an unpressed item in a skillet sees less");

	Parameter CONTACT_DRY = Parameter.assumption("h_c,dry", "pan–food contact without fat", 150, "W/(m²·K)",
			"about half the fat-film value: air gaps where the food does not lie flat (assumption)");

	Parameter OVEN_STILL = Parameter.fromMemory("h_still", "convection in a still (deck or conventional) oven", 18,
			"W/(m²·K)",
			"10–25 W/m²K (Sakin et al. 2009, J Food Eng 94:344; Carson et al. 2006, J Food Eng 72:293; values from memory)");

	Parameter OVEN_FAN = Parameter.fromMemory("h_fan", "convection in a fan oven", 40, "W/(m²·K)",
			"20–60 W/m²K (Sakin et al. 2009; Carson et al. 2006; values from memory)");

	Parameter OIL_QUIET = Parameter.published("h_oil", "oil-side coefficient without boiling", 280, "W/(m²·K)",
			"250–300 W/m²K (Hubbard & Farkas 1999; Mir-Bel, Oria & Salvador 2012, J Food Eng 113:167)");

	Parameter OIL_BUBBLING = Parameter.published("h_oil,boil", "oil-side coefficient with vigorous bubbling", 900,
			"W/(m²·K)", "800–1100 W/m²K, peaks to 2000 (Hubbard & Farkas 1999; Mir-Bel, Oria & Salvador 2012)");

	Parameter OVEN_WALL_EMISSIVITY = Parameter.secondary("ε_wall", "oven walls radiate at the air temperature", 0.9,
			"–",
			"ε ≈ 0.9 for oven walls as quoted in oven heat-transfer studies; why it matters: 75–80 % of an industrial oven's flux is radiant (Baik et al. 1999, J Food Sci 64:688)");

	/**
	 * An oven with no steam given holds kitchen air drawn in: the food's own vapour,
	 * which raises the steam share of a loaded oven, is not counted.
	 */
	Parameter DEFAULT_OVEN_STEAM = Parameter.assumption("y_oven",
			"steam share of the oven atmosphere when none is given",
			Math.round(Atmosphere.KITCHEN_STEAM_FRACTION * 1000) / 10.0, "%",
			"kitchen air (25 °C, 50 % RH) drawn in; the load's own vapour is not counted (assumption)");

	Parameter DEFAULT_TURN_EVERY = Parameter.commonPractice("Δt_turn",
			"turning interval in a pan or under a grill when none is given", 60, "s",
			"turned once a minute (common practice)");

	FaceSchedule schedule();

	/** A key for the mode, used in the API and pages. */
	String mode();

	/** The set temperature a cook reads on the dial, °C. */
	double temperatureC();

	List<Message> assumptions();

	/**
	 * The hottest surface the cook follows, °C: it stops there and says so (no limit
	 * unless a mode sets one).
	 */
	default double surfaceLimitC() {
		return Double.POSITIVE_INFINITY;
	}

	/**
	 * The pan's and fryer's defaults and the materials a pan can be made of, for the
	 * model catalogue.
	 */
	static List<Parameter> equipmentParameters() {
		List<Parameter> p = new ArrayList<>(PanBody.parameters());
		for (PanMaterial m : PanMaterial.values()) {
			p.add(m.specificHeat());
			p.add(m.emissivity());
		}
		p.addAll(FryerBody.parameters());
		p.add(HeatedBody.THERMOSTAT_BAND);
		return List.copyOf(p);
	}

	static List<Parameter> parameters() {
		return List.of(KITCHEN_AIR_C, NATURAL_CONVECTION, CONTACT_WITH_FAT, CONTACT_DRY, OVEN_STILL, OVEN_FAN,
				GrillKind.FOOD_RADIUS, OIL_QUIET, OIL_BUBBLING, OVEN_WALL_EMISSIVITY, Radiation.FOOD_EMISSIVITY,
				GasExchange.LEWIS_NUMBER, RadiantGrill.CHAR_SURFACE, DEFAULT_OVEN_STEAM, DEFAULT_TURN_EVERY);
	}

}
