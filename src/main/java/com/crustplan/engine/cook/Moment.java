package com.crustplan.engine.cook;

/**
 * The few values of a cook that listeners and events read at the end of a step: filled in
 * place by the driver (the inner loop allocates nothing), so hold on to the numbers, not
 * to the moment.
 */
public final class Moment {

	double timeS;

	double surfaceK;

	double coreK;

	double surfaceExtent;

	double surfaceWaterActivity;

	double crustLevel;

	double portionLevel;

	double heatSourceK = Double.NaN;

	double waterPct;

	double oilPct;

	void fill(CookState state, LayerReaction reaction, ActiveHeat heat) {
		timeS = state.time;
		surfaceK = state.surfaceK();
		coreK = state.coreK();
		surfaceExtent = state.browningExtent(0);
		surfaceWaterActivity = state.faceWaterActivity(0);
		crustLevel = reaction.crustLevel();
		portionLevel = reaction.portionLevel();
		waterPct = state.waterSharePct();
		oilPct = state.oilSharePct();
		heatSourceK = heat.body() == null ? Double.NaN : heat.body().temperatureK();
	}

	/**
	 * The pan's or oil's temperature where it is a body that moves under the load, K (NaN
	 * otherwise).
	 */
	public double heatSourceK() {
		return heatSourceK;
	}

	public double timeS() {
		return timeS;
	}

	/** Temperature of face 0, K. */
	public double surfaceK() {
		return surfaceK;
	}

	/** Centre temperature, K. */
	public double coreK() {
		return coreK;
	}

	/** Browning extent of face 0. */
	public double surfaceExtent() {
		return surfaceExtent;
	}

	/** Water activity at face 0 (1 while standing water covers it). */
	public double surfaceWaterActivity() {
		return surfaceWaterActivity;
	}

	/** The layer reaction's level in the outer crust (µg/kg for acrylamide). */
	public double crustLevel() {
		return crustLevel;
	}

	/** Water share of the whole piece, %. */
	public double waterPct() {
		return waterPct;
	}

	/** Oil taken up, g per 100 g of the piece. */
	public double oilPct() {
		return oilPct;
	}

	/** The layer reaction's level in the whole portion. */
	public double portionLevel() {
		return portionLevel;
	}

}
