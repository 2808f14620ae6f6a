package com.crustplan.engine.acrylamide;

/**
 * The rate constants a formation run uses: the model's defaults, or trial values while
 * fitting.
 *
 * @param formationRateAtRef k_f at 170 °C, kg d.m./(mmol·s)
 * @param formationActivationEnergy Ea,f, J/mol
 * @param eliminationRateAtRef k_e at 180 °C, 1/s
 * @param eliminationActivationEnergy Ea,e, J/mol
 * @param yield acrylamide formed per precursor pair condensed, mol/mol
 */
public record AcrylamideKinetics(double formationRateAtRef, double formationActivationEnergy,
		double eliminationRateAtRef, double eliminationActivationEnergy, double yield) {

	public static final AcrylamideKinetics DEFAULT = new AcrylamideKinetics(AcrylamideModel.FORMATION_RATE.value(),
			AcrylamideModel.FORMATION_EA.value(), AcrylamideModel.ELIMINATION_RATE.value(),
			AcrylamideModel.ELIMINATION_EA.value(), AcrylamideModel.YIELD.value());

	public AcrylamideKinetics {
		if (!(formationRateAtRef >= 0) || !(eliminationRateAtRef >= 0) || !(yield > 0 && yield <= 1)
				|| !Double.isFinite(formationActivationEnergy) || !Double.isFinite(eliminationActivationEnergy)) {
			throw new IllegalArgumentException("rate constants must be finite and non-negative, the yield in (0, 1]");
		}
	}

	public AcrylamideKinetics withFormation(double rateAtRef, double activationEnergy) {
		return new AcrylamideKinetics(rateAtRef, activationEnergy, eliminationRateAtRef, eliminationActivationEnergy,
				yield);
	}

}
