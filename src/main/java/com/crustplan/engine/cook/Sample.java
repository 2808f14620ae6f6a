package com.crustplan.engine.cook;

import com.crustplan.engine.colour.Lab;

/**
 * The state of a run at one output time. "Surface" is face 0: the face put down first on a pan or
 * turned up first to a grill; in an oven or fryer both faces see the same heat.
 */
public record Sample(double timeS, double surfaceTemperatureC, double otherFaceTemperatureC, double coreTemperatureC,
		double surfaceWaterActivity, double surfaceMoistureDryBasis, double standingWaterGPerM2, double browningExtent,
		Lab colour, double crustAcrylamideUgPerKg, double portionAcrylamideUgPerKg) {

	public String colourHex() {
		return colour.hex();
	}

}
