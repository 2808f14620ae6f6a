package com.crustplan.engine.heat;

/**
 * What a face exchanges with its surroundings at a given surface temperature, linearised
 * for the implicit step: sensible heat into the food q (W/m²) and its slope dq/dT,
 * evaporation to the gas J (kg/(m²·s), negative when steam condenses) and its slopes. A
 * mutable scratch holder so the inner loop allocates nothing.
 */
public final class FaceFlux {

	public double heatFlux;

	public double heatFluxSlope;

	public double evaporation;

	public double evaporationSlopeT;

	/** dJ/daw at fixed temperature. */
	public double evaporationSlopeAw;

	void clear() {
		heatFlux = 0;
		heatFluxSlope = 0;
		evaporation = 0;
		evaporationSlopeT = 0;
		evaporationSlopeAw = 0;
	}

}
