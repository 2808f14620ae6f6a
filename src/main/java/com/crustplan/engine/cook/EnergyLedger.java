package com.crustplan.engine.cook;

/**
 * Energy crossing the faces over a run, J/m²: heat in (contact, convection, radiation;
 * condensation counted as negative vapour out) and the enthalpy carried off by water
 * vapour (latent plus the sensible heat of the liquid relative to 0 °C), and the enthalpy
 * frying oil brings into the pores.
 */
public record EnergyLedger(double heatInJPerM2, double vapourOutJPerM2, double evaporatedKgPerM2, double oilInJPerM2) {

	public EnergyLedger(double heatInJPerM2, double vapourOutJPerM2, double evaporatedKgPerM2) {
		this(heatInJPerM2, vapourOutJPerM2, evaporatedKgPerM2, 0);
	}

	/** Heat in, plus the enthalpy of frying oil taken up, minus the vapour's. */
	public double netInJPerM2() {
		return heatInJPerM2 + oilInJPerM2 - vapourOutJPerM2;
	}

}
