package com.crustplan.engine.water;

import com.crustplan.engine.kinetics.ArrheniusRate;
import com.crustplan.engine.model.Parameter;

/**
 * Effective moisture diffusivity inside the food, D = D_ref·exp(−Ea/R·(1/T −
 * 1/T_ref))·X²/(X² + X_c²): liquid water moves readily through wet tissue and hardly
 * through a dried crust, as drying studies find the effective diffusivity falling with
 * moisture.
 */
public final class MoistureDiffusivity {

	public static final Parameter REFERENCE = Parameter.assumption("D_ref", "effective moisture diffusivity at 80 °C",
			2e-9, "m²/s",
			"within the 1e-9…1e-8 m²/s of frying and drying studies (e.g. Kassama & Ngadi 2017, 3.65e-9 to 7.42e-9 m²/s in fried chicken)");

	public static final Parameter ACTIVATION_ENERGY = Parameter.published("Ea,D",
			"activation energy of moisture diffusion", 59.5e3, "J/mol",
			"Kassama & Ngadi 2017 (chicken breast, frying 170–190 °C)");

	public static final double REFERENCE_K = 353.15;

	public static final Parameter CRUST_MOISTURE = Parameter.assumption("X_c",
			"moisture at which diffusivity has fallen to half", 0.3, "kg/kg d.b.",
			"our choice: below about 0.3 kg/kg the water left is largely bound and a dry crust seals; "
					+ "drying studies report D_eff falling with moisture (from memory)");

	private MoistureDiffusivity() {
	}

	public static double at(double temperatureK, double moistureDryBasis) {
		double x2 = moistureDryBasis * moistureDryBasis;
		double xc = CRUST_MOISTURE.value();
		return REFERENCE.value()
				* Math
					.exp(-ACTIVATION_ENERGY.value() / ArrheniusRate.GAS_CONSTANT * (1 / temperatureK - 1 / REFERENCE_K))
				* x2 / (x2 + xc * xc);
	}

}
