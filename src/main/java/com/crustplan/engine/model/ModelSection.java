package com.crustplan.engine.model;

import java.util.List;

/** A chapter of the model description: its equations and its known limits. */
public record ModelSection(String title, List<Equation> equations, List<String> limits) {

	public ModelSection {
		equations = List.copyOf(equations);
		limits = List.copyOf(limits);
	}

}
