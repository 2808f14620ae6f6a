package com.crustplan.engine.browning;

import com.crustplan.engine.kinetics.ArrheniusRate;

import com.crustplan.engine.model.Parameter;

/**
 * A category's Maillard browning kinetics: first-order approach of the browning extent to
 * 1, dB/dt = k(T)·f_aw·f_pH·f_sugar·f_amino·(1 − B), with k Arrhenius and the factors
 * relative to the conditions under which k was measured or calibrated.
 */
public record BrowningKinetics(ArrheniusRate rate, Parameter referenceWaterActivity, Parameter referencePh,
		Parameter referenceReducingSugarPct, Parameter referenceProteinPct, Parameter reducingSugarOrder) {

	/**
	 * First order in reducing sugar: the default where no category-specific order was
	 * measured.
	 */
	public static final Parameter FIRST_ORDER_IN_SUGAR = Parameter.assumption("n_RS",
			"order of the browning rate in reducing sugar", 1.0, "–",
			"first order, the textbook elementary step (assumption where no order was measured)");

	/** Kinetics first order in reducing sugar. */
	public BrowningKinetics(ArrheniusRate rate, Parameter referenceWaterActivity, Parameter referencePh,
			Parameter referenceReducingSugarPct, Parameter referenceProteinPct) {
		this(rate, referenceWaterActivity, referencePh, referenceReducingSugarPct, referenceProteinPct,
				FIRST_ORDER_IN_SUGAR);
	}

	/**
	 * pH sensitivity β of log10 k: factor 10^(β(pH − pH_ref)). Martins &amp; van Boekel
	 * 2005 (Food Chem 92:437) show log k rising about linearly with pH; the slope here is
	 * an assumption.
	 */
	public static final Parameter PH_SENSITIVITY = Parameter.assumption("β", "rise of log10 k per pH unit", 0.5, "1/pH",
			"order 0.3–1 per pH unit, log-linear form of Martins & van Boekel 2005, Food Chem 92:437");

	/**
	 * Cap on the reactant factor: the first-order dependence on sugar and amino groups is
	 * extrapolated at most this far beyond the reference composition.
	 */
	public static final Parameter REACTANT_FACTOR_CAP = Parameter.assumption("f_max",
			"largest reactant factor relative to the reference composition", 4.0, "–",
			"limit of extrapolation beyond the fitted composition (assumption)");

	public double phFactor(double pH) {
		return Math.pow(10, PH_SENSITIVITY.value() * (pH - referencePh.value()));
	}

	/**
	 * Order n_RS in reducing sugar and first order in amino groups (protein as their
	 * proxy), relative to the reference composition; zero without either reactant.
	 */
	public double reactantFactor(double reducingSugarPct, double proteinPct) {
		double sugar = Math.pow(reducingSugarPct / referenceReducingSugarPct.value(), reducingSugarOrder.value());
		double amino = proteinPct / referenceProteinPct.value();
		return Math.min(REACTANT_FACTOR_CAP.value(), sugar * amino);
	}

}
