package com.crustplan.engine.kinetics;

import com.crustplan.engine.model.Parameter;

/** k(T) = k0·exp(−Ea/(R·T)). */
public record ArrheniusRate(Parameter preExponential, Parameter activationEnergy) {

	/** Molar gas constant, J/(mol·K) (CODATA 2018, exact since the 2019 SI). */
	public static final double GAS_CONSTANT = 8.314462618;

	public double at(double temperatureK) {
		return preExponential.value() * Math.exp(-activationEnergy.value() / (GAS_CONSTANT * temperatureK));
	}

}
