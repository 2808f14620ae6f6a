package com.crustplan.engine.cook;

/** Whether the target was reached, and if not, why. */
public enum Outcome {

	REACHED("The target colour is reached."),
	NO_REACTANTS("No reducing sugar, amino groups or sucrose at the surface: it cannot brown."),
	WET_PLATEAU("The surface never left the wet plateau: water at the surface holds it near its boiling or wet-bulb temperature, where browning barely runs."),
	TOO_COOL("The surface dried but stayed too cool to brown quickly."),
	TOO_SLOW("Browning runs but too slowly to reach the target within the time allowed.");

	private final String explanation;

	Outcome(String explanation) {
		this.explanation = explanation;
	}

	public String explanation() {
		return explanation;
	}

}
