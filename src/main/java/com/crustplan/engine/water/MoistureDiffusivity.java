package com.crustplan.engine.water;

import com.crustplan.engine.kinetics.ArrheniusRate;
import com.crustplan.engine.model.Parameter;

/**
 * Effective moisture diffusivity of liquid water inside the food, D =
 * D_ref·exp(−Ea/R·(1/T − 1/T_ref))·X²/(X² + X_c²): liquid water moves readily through wet
 * tissue and hardly through a dried crust, as drying studies find the effective
 * diffusivity falling with moisture. Vapour formed at an evaporation front inside the
 * food leaves at once (see local boiling), so in a fryer most of a strip's water leaves
 * by the receding front, the moving-boundary view of frying (Farkas, Singh &amp; Rumsey
 * 1996, J Food Eng 29; from memory), and this diffusivity carries the liquid that feeds
 * it. Each food category carries its own set; {@link #DEFAULT} serves the categories
 * without one.
 */
public final class MoistureDiffusivity {

	public static final Parameter REFERENCE = Parameter.assumption("D_ref", "effective moisture diffusivity at 80 °C",
			2e-9, "m²/s",
			"within the 1e-9…1e-8 m²/s of frying and drying studies (e.g. Kassama & Ngadi 2017, 3.65e-9 to 7.42e-9 m²/s in fried chicken); not measured on these foods");

	public static final Parameter ACTIVATION_ENERGY = Parameter.assumption("Ea,D",
			"activation energy of moisture diffusion", 59.5e3, "J/mol",
			"measured on chicken breast fried at 170–190 °C (Kassama & Ngadi 2017, Food Nutr J 2:127); applied to the other categories without a measurement of their own (assumption)");

	public static final double REFERENCE_K = 353.15;

	public static final Parameter CRUST_MOISTURE = Parameter.assumption("X_c",
			"moisture at which diffusivity has fallen to half", 0.3, "kg/kg d.b.",
			"our choice: below about 0.3 kg/kg the water left is largely bound and a dry crust seals; "
					+ "drying studies report D_eff falling with moisture (from memory)");

	/** The set for categories without a diffusivity of their own. */
	public static final MoistureDiffusivity DEFAULT = new MoistureDiffusivity(REFERENCE, REFERENCE_K, ACTIVATION_ENERGY,
			CRUST_MOISTURE);

	private final Parameter reference;

	private final double referenceK;

	private final Parameter activationEnergy;

	private final Parameter crustMoisture;

	private final double dRef;

	private final double eaOverR;

	private final double xc2;

	public MoistureDiffusivity(Parameter reference, double referenceK, Parameter activationEnergy,
			Parameter crustMoisture) {
		this.reference = reference;
		this.referenceK = referenceK;
		this.activationEnergy = activationEnergy;
		this.crustMoisture = crustMoisture;
		this.dRef = reference.value();
		this.eaOverR = activationEnergy.value() / ArrheniusRate.GAS_CONSTANT;
		this.xc2 = crustMoisture.value() * crustMoisture.value();
	}

	/** D in m²/s at a temperature (K) and moisture (kg/kg d.b.). */
	public double at(double temperatureK, double moistureDryBasis) {
		double x2 = moistureDryBasis * moistureDryBasis;
		return dRef * Math.exp(-eaOverR * (1 / temperatureK - 1 / referenceK)) * x2 / (x2 + xc2);
	}

	public Parameter reference() {
		return reference;
	}

	/** Temperature at which {@link #reference()} is given, K. */
	public double referenceK() {
		return referenceK;
	}

	public Parameter activationEnergy() {
		return activationEnergy;
	}

	public Parameter crustMoisture() {
		return crustMoisture;
	}

}
