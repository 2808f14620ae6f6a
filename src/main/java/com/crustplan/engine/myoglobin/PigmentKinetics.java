package com.crustplan.engine.myoglobin;

import java.util.List;
import java.util.Optional;

import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.kinetics.ArrheniusRate;
import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.Parameter;

/**
 * How the inside of a muscle food changes colour as it cooks: a first-order loss of the
 * native pigment (red meat's myoglobin; the pink of poultry; the translucency of fish),
 * dN/dt = −k(T)·N with k = f·k0·exp(−Ea/(R·T)), and the colour of the cut face as a path
 * over the fraction denatured, 1 − N. A layer looks cooked (grey-brown, white, opaque)
 * once {@link #COOKED_LOOK} of its pigment is denatured.
 */
public enum PigmentKinetics {

	/** Red meat: raw red → pink → grey-brown. */
	MEAT(new ArrheniusRate(Parameters.BEEF_K0, Parameters.BEEF_EA), Parameters.LOIN_FACTOR,
			ColourPath.of(Evidence.FROM_MEMORY,
					"raw red → pink → grey-brown cut face of beef; L*a*b* anchors from memory",
					new double[][] { { 0, 40, 26, 14 }, { 0.4, 50, 19, 14 }, { 0.8, 54, 9, 15 }, { 1, 53, 8, 15 } })),

	/** Poultry: raw translucent pink → white. */
	POULTRY(new ArrheniusRate(Parameters.POULTRY_K0, Parameters.POULTRY_EA), Parameters.POULTRY_FACTOR,
			ColourPath.of(Evidence.FROM_MEMORY, "raw pink → cooked white of chicken breast; L*a*b* anchors from memory",
					new double[][] { { 0, 52, 8, 6 }, { 0.8, 80, 2, 14 }, { 1, 80, 2, 14 } })),

	/** Fish: translucent → opaque white. */
	FISH(new ArrheniusRate(Parameters.FISH_K0, Parameters.FISH_EA), Parameters.FISH_FACTOR,
			ColourPath.of(Evidence.FROM_MEMORY, "translucent → opaque white fish flesh; L*a*b* anchors from memory",
					new double[][] { { 0, 58, 5, 5 }, { 0.8, 82, 0, 8 }, { 1, 82, 0, 8 } }));

	/**
	 * Share of the pigment denatured at which a layer reads as cooked (grey-brown
	 * through): prediction equations from cooked ground-beef patties put a well-done
	 * appearance at 80 % myoglobin denatured (J Food Sci, "Influence of cooking rate,
	 * endpoint temperature, post-cook hold time, and myoglobin redox state on internal
	 * color development of cooked ground beef patties", read in its abstract; the authors
	 * are not named here because they were not checked). Taken for the white of poultry
	 * and the opacity of fish too (assumption).
	 */
	public static final Parameter COOKED_LOOK = Parameter.published("f_cooked",
			"share of the pigment denatured at which a layer looks cooked", 0.8, "–",
			"80 % myoglobin denatured for a well-done look of ground beef (J Food Sci study of cooking rate, endpoint temperature,"
					+ " post-cook hold time and myoglobin redox state in cooked ground beef patties; read in its abstract, authors not checked);"
					+ " used for poultry white and fish opacity too (assumption)");

	/**
	 * A layer is not stepped where its pigment would lose less than this in an hour: each
	 * kinetics' own temperature for it follows (see {@link #skipBelow()}), about 43 °C
	 * for steak and poultry and 26 °C for fish, whose opacity starts far lower.
	 */
	public static final Parameter NEGLIGIBLE_PER_HOUR = Parameters.NEGLIGIBLE_PER_HOUR;

	private final ArrheniusRate rate;

	private final Parameter factor;

	private final ColourPath colour;

	private final Parameter skipBelow;

	PigmentKinetics(ArrheniusRate rate, Parameter factor, ColourPath colour) {
		this.rate = rate;
		this.factor = factor;
		this.colour = colour;
		// k(T)·1 h = −ln(1 − x): T = Ea / (R·ln(f·k0·1 h / −ln(1 − x)))
		double x = Parameters.NEGLIGIBLE_PER_HOUR.value();
		double k = -Math.log(1 - x / 100) / 3600;
		double t = rate.activationEnergy().value()
				/ (ArrheniusRate.GAS_CONSTANT * Math.log(factor.value() * rate.preExponential().value() / k));
		this.skipBelow = Parameter.derived("T_skip", "layer temperature below which this pigment is not stepped",
				Math.round((t - 273.15) * 10) / 10.0, "°C",
				"from the kinetics above: under " + Math.round(x) + " % denatured in an hour below it");
	}

	/**
	 * The kinetics for a category's inside, or empty where the inside is not judged by
	 * colour.
	 */
	public static Optional<PigmentKinetics> forCategory(FoodCategory category) {
		return switch (category) {
			case MEAT -> Optional.of(MEAT);
			case POULTRY_SKIN -> Optional.of(POULTRY);
			case FISH -> Optional.of(FISH);
			default -> Optional.empty();
		};
	}

	/** First-order rate constant at temperatureK, 1/s. */
	public double rateAt(double temperatureK) {
		return factor.value() * rate.at(temperatureK);
	}

	/** Native share left after holding at temperatureK for seconds, from all native. */
	public double nativeAfter(double temperatureK, double seconds) {
		return Math.exp(-rateAt(temperatureK) * seconds);
	}

	public ArrheniusRate rate() {
		return rate;
	}

	public Parameter factor() {
		return factor;
	}

	/** The cut face's colour over the fraction denatured (0 raw, 1 all denatured). */
	public ColourPath colour() {
		return colour;
	}

	public Lab colourAt(double fractionDenatured) {
		return colour.colourAt(fractionDenatured);
	}

	public List<Parameter> parameters() {
		return List.of(rate.preExponential(), rate.activationEnergy(), factor, skipBelow);
	}

	/**
	 * The layer temperature below which this pigment is not stepped, °C: where it would
	 * lose under {@link #NEGLIGIBLE_PER_HOUR} in an hour.
	 */
	public Parameter skipBelow() {
		return skipBelow;
	}

	/** Kept apart so the enum constants can refer to them. */
	static final class Parameters {

		/**
		 * Geileskey, King, Corte, Pinto & Ledward 1998 (Meat Sci 48:189): loss of
		 * myoglobin solubility in beef is first order; 7.98×10⁴³ min⁻¹ and 290 kJ/mol for
		 * beef chuck as quoted by a secondary source (the abstract gives ≈ 300 kJ/mol for
		 * all beef systems).
		 */
		static final Parameter BEEF_K0 = Parameter.secondary("k0,Mb",
				"pre-exponential factor, myoglobin denaturation in beef chuck", 7.98e43 / 60, "1/s",
				"Geileskey, King, Corte, Pinto & Ledward 1998, Meat Sci 48:189 (7.98×10⁴³ min⁻¹, as quoted by a secondary source)");

		static final Parameter BEEF_EA = Parameter.secondary("Ea,Mb",
				"activation energy, myoglobin denaturation in beef", 290e3, "J/mol",
				"Geileskey et al. 1998, Meat Sci 48:189 (290 kJ/mol quoted by a secondary source; ≈ 300 kJ/mol in the abstract)");

		/**
		 * The pigment denatured about twice as fast in beef longissimus (the steak
		 * muscles) as in chuck and shin of similar pH (Geileskey et al. 1998, abstract).
		 */
		static final Parameter LOIN_FACTOR = Parameter.published("f_loin",
				"rate in beef loin (steak) muscle relative to chuck", 2, "–",
				"Geileskey et al. 1998, Meat Sci 48:189, abstract: about twice as fast in m. longissimus dorsi as in chuck and shin");

		static final Parameter POULTRY_K0 = Parameter.assumption("k0,Mb",
				"pre-exponential factor, poultry pink → white", BEEF_K0.value(), "1/s",
				"the beef myoglobin value (Geileskey et al. 1998); not measured for poultry (assumption)");

		static final Parameter POULTRY_EA = Parameter.assumption("Ea,Mb", "activation energy, poultry pink → white",
				BEEF_EA.value(), "J/mol",
				"the beef value (Geileskey et al. 1998); not measured for poultry (assumption)");

		static final Parameter POULTRY_FACTOR = Parameter.assumption("f_poultry",
				"rate of poultry breast relative to beef chuck", LOIN_FACTOR.value(), "–",
				"taken as beef loin, a fast-twitch muscle like breast (assumption)");

		/**
		 * Myosin's activation energy from DSC of pork (Kajitani, Fukuoka & Sakai 2011,
		 * Japan J Food Eng 12:19): fish opacity is myofibrillar, not myoglobin.
		 */
		static final Parameter FISH_EA = Parameter.assumption("Ea,opaque",
				"activation energy, fish translucent → opaque", 241e3, "J/mol",
				"myosin, 2.41×10² kJ/mol (Kajitani, Fukuoka & Sakai 2011, Japan J Food Eng 12:19, pork DSC); not measured for fish (assumption)");

		/** Temperature at which fish is taken to turn opaque in about a minute. */
		static final double FISH_OPAQUE_K = 55 + 273.15;

		static final Parameter FISH_K0 = Parameter.calibrated("k0,opaque",
				"pre-exponential factor, fish translucent → opaque",
				Math.exp(FISH_EA.value() / (ArrheniusRate.GAS_CONSTANT * FISH_OPAQUE_K)) / 60, "1/s",
				"calibrated to k(55 °C) = 1 /min: white fish turns opaque and flakes at 55–60 °C within about a minute (a claim from memory; PracticeClaimsTest)");

		static final Parameter NEGLIGIBLE_PER_HOUR = Parameter.assumption("x_skip",
				"share denatured in an hour below which a layer is not stepped", 1, "%",
				"negligible beside the 80 % that looks cooked (our choice)");

		static final Parameter FISH_FACTOR = Parameter.assumption("f_fish", "rate factor for fish", 1, "–",
				"no separate factor: the fish rate is set directly by its k(55 °C) (our choice)");

		private Parameters() {
		}

	}

}
