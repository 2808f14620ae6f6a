package com.crustplan.engine.cook;

/**
 * Energy crossing the faces over a run, J/m²: heat in (contact, convection, radiation;
 * condensation counted as negative vapour out) and the enthalpy carried off by water
 * vapour (latent plus the sensible heat of the liquid relative to 0 °C).
 */
public record EnergyLedger(double heatInJPerM2, double vapourOutJPerM2, double evaporatedKgPerM2) {

	public double netInJPerM2() {
		return heatInJPerM2 - vapourOutJPerM2;
	}

}
