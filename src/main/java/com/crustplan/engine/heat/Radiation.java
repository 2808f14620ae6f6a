package com.crustplan.engine.heat;

import com.crustplan.engine.model.Parameter;

final class Radiation {

	/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018, exact). */
	static final double SIGMA = 5.670374419e-8;

	static final Parameter FOOD_EMISSIVITY = Parameter.secondary("ε", "emissivity of a food surface", 0.9, "–",
			"moist foods ≈ 0.9 (quoted for oven heat transfer studies)");

	private Radiation() {
	}

}
