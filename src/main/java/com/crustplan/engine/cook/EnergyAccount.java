package com.crustplan.engine.cook;

import com.crustplan.engine.water.WaterVapour;

/**
 * The running energy ledger of a cook: heat in through the faces and the enthalpy the
 * vapour carries off.
 */
final class EnergyAccount {

	private double heatIn;

	private double vapourOut;

	private double evaporated;

	private double oilIn;

	/** Frying oil entering the food, with its enthalpy relative to 0 °C. */
	void oilIn(double joulesPerM2) {
		oilIn += joulesPerM2;
	}

	void heatIn(double joulesPerM2) {
		heatIn += joulesPerM2;
	}

	/** Vapour leaving (or, negative, condensing) at temperature t, K. */
	void vapour(double massKgPerM2, double t) {
		vapourOut += massKgPerM2 * (WaterVapour.latentHeat(t) + WaterVapour.liquidEnthalpy(t));
		evaporated += massKgPerM2;
	}

	EnergyLedger ledger() {
		return new EnergyLedger(heatIn, vapourOut, evaporated, oilIn);
	}

}
