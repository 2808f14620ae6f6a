package com.crustplan.engine.myoglobin;

import java.util.List;

import com.crustplan.engine.doneness.FoodCode;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.model.Parameter;

/**
 * The centre in the trade's words. Red meat by the hottest the centre got (rare,
 * medium-rare, medium, medium-well, well done, at the core temperatures kitchens probe
 * for); poultry and fish against the food code, since neither is served "rare" by rule.
 */
public enum CentreDoneness {

	/** Below rare: blue, still raw. */
	RAW(null, Bands.RARE_FROM),

	RARE(Bands.RARE_FROM, Bands.RARE_TO),

	MEDIUM_RARE(Bands.MEDIUM_RARE_FROM, Bands.MEDIUM_RARE_TO),

	MEDIUM(Bands.MEDIUM_FROM, Bands.MEDIUM_TO),

	MEDIUM_WELL(Bands.MEDIUM_WELL_FROM, Bands.MEDIUM_WELL_TO),

	WELL(Bands.WELL_FROM, null);

	private final Parameter from;

	private final Parameter to;

	CentreDoneness(Parameter from, Parameter to) {
		this.from = from;
		this.to = to;
	}

	/**
	 * Red meat by its centre's peak, °C: each word from its lower bound up to the next.
	 */
	public static CentreDoneness ofMeat(double peakC) {
		if (peakC >= Bands.WELL_FROM.value()) {
			return WELL;
		}
		if (peakC >= Bands.MEDIUM_WELL_FROM.value()) {
			return MEDIUM_WELL;
		}
		if (peakC >= Bands.MEDIUM_FROM.value()) {
			return MEDIUM;
		}
		if (peakC >= Bands.MEDIUM_RARE_FROM.value()) {
			return MEDIUM_RARE;
		}
		if (peakC >= Bands.RARE_FROM.value()) {
			return RARE;
		}
		return RAW;
	}

	/**
	 * The centre in words: red meat by the trade's doneness, poultry and fish against the
	 * whole-cut or poultry rule of the FDA Food Code 2022, 3-401.11.
	 */
	public static Message describe(FoodCategory category, double centrePeakC) {
		Temperature centre = Temperature.celsius(centrePeakC);
		if (category == FoodCategory.POULTRY_SKIN || category == FoodCategory.FISH) {
			FoodCode code = category == FoodCategory.FISH ? FoodCode.WHOLE_CUT : FoodCode.POULTRY;
			boolean met = centrePeakC >= code.celsius();
			if (category == FoodCategory.FISH) {
				return Message.of(met ? "interior.centre.fish.done" : "interior.centre.fish.under", centre,
						code.stated());
			}
			return Message.of(met ? "interior.centre.poultry.done" : "interior.centre.poultry.under", centre,
					code.stated());
		}
		CentreDoneness d = ofMeat(centrePeakC);
		Temperature from = d.from == null ? null : Temperature.celsius(d.from.value());
		Temperature to = d.to == null ? null : Temperature.celsius(d.to.value());
		return switch (d) {
			case RAW -> Message.of("interior.centre.meat.raw", centre, to);
			case RARE -> Message.of("interior.centre.meat.rare", centre, from, to);
			case MEDIUM_RARE -> Message.of("interior.centre.meat.medium-rare", centre, from, to);
			case MEDIUM -> Message.of("interior.centre.meat.medium", centre, from, to);
			case MEDIUM_WELL -> Message.of("interior.centre.meat.medium-well", centre, from, to);
			case WELL -> Message.of("interior.centre.meat.well", centre, from);
		};
	}

	/** Lower bound of the word's core range, °C (NaN below rare). */
	public double fromC() {
		return from == null ? Double.NaN : from.value();
	}

	/** Upper bound of the word's core range, °C (NaN for well done). */
	public double toC() {
		return to == null ? Double.NaN : to.value();
	}

	public static List<Parameter> parameters() {
		return List.of(Bands.RARE_FROM, Bands.RARE_TO, Bands.MEDIUM_RARE_FROM, Bands.MEDIUM_RARE_TO, Bands.MEDIUM_FROM,
				Bands.MEDIUM_TO, Bands.MEDIUM_WELL_FROM, Bands.MEDIUM_WELL_TO, Bands.WELL_FROM);
	}

	/**
	 * The core temperatures the trade names; the gaps between words go to the lower word.
	 */
	static final class Bands {

		static final Parameter RARE_FROM = band("T_rare", "rare from", 50);

		static final Parameter RARE_TO = band("T_rare,top", "rare up to", 52);

		static final Parameter MEDIUM_RARE_FROM = band("T_medium-rare", "medium-rare from", 55);

		static final Parameter MEDIUM_RARE_TO = band("T_medium-rare,top", "medium-rare up to", 57);

		static final Parameter MEDIUM_FROM = band("T_medium", "medium from", 60);

		static final Parameter MEDIUM_TO = band("T_medium,top", "medium up to", 63);

		static final Parameter MEDIUM_WELL_FROM = band("T_medium-well", "medium-well from", 65);

		static final Parameter MEDIUM_WELL_TO = band("T_medium-well,top", "medium-well up to", 68);

		static final Parameter WELL_FROM = band("T_well", "well done from", 70);

		private static Parameter band(String symbol, String description, double c) {
			return Parameter.commonPractice(symbol, "centre of red meat, " + description, c, "°C",
					"the trade's doneness words by core temperature (common practice)");
		}

		private Bands() {
		}

	}

}
