package com.crustplan.engine.model;

import java.util.List;

/**
 * One equation of the model as implemented: a plain-text formula, what it means, and the
 * parameters it uses.
 */
public record Equation(String title, String formula, String explanation, List<Parameter> parameters) {

	public Equation {
		parameters = List.copyOf(parameters);
	}

}
