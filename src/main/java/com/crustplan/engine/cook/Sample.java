package com.crustplan.engine.cook;

import com.crustplan.engine.colour.Lab;

/**
 * The state of a run at one output time. "Surface" is face 0: the face put down first on
 * a pan or turned up first to a grill; in an oven or fryer both faces see the same heat.
 * The heat source's temperature is the pan's or the oil's where it is a body that moves
 * under the load (NaN otherwise).
 */
public record Sample(double timeS, double surfaceTemperatureC, double otherFaceTemperatureC, double coreTemperatureC,
		double surfaceWaterActivity, double surfaceMoistureDryBasis, double standingWaterGPerM2, double browningExtent,
		Lab colour, double crustAcrylamideUgPerKg, double portionAcrylamideUgPerKg, double heatSourceTemperatureC) {

	public String colourHex() {
		return colour.hex();
	}

}
