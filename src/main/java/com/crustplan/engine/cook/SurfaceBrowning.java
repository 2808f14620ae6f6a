package com.crustplan.engine.cook;

import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.browning.Caramelisation;
import com.crustplan.engine.browning.WaterActivityFactor;
import com.crustplan.engine.food.Composition;

/**
 * Step (5): browning at each face, first order towards the colour path's end, dE/dt =
 * k(T, aw)·(1 − E), with the Maillard rate scaled by pH and reactants and sucrose
 * caramelising on its own, slower pathway. Integrated exactly over the step at the step's
 * face temperature.
 */
final class SurfaceBrowning {

	/**
	 * The reference water activity for caramelisation: a dry crust, like the Maillard
	 * fits.
	 */
	private static final double CARAMEL_REFERENCE_AW = 0.4;

	private final BrowningKinetics kinetics;

	/**
	 * Maillard factors fixed for the run: pH and reactants against the fit's reference.
	 */
	private final double maillardFactor;

	private final double caramelFactor;

	SurfaceBrowning(BrowningKinetics kinetics, Composition composition, double ph) {
		this.kinetics = kinetics;
		this.maillardFactor = kinetics.phFactor(ph)
				* kinetics.reactantFactor(composition.reducingSugarPct(), composition.proteinPct());
		this.caramelFactor = Caramelisation.sucroseFactor(composition.sucrosePct());
	}

	/**
	 * False where there is nothing to brown: no reducing sugar with amino groups, and no
	 * sucrose.
	 */
	boolean canBrown() {
		return maillardFactor > 0 || caramelFactor > 0;
	}

	void step(CookState state, double dt) {
		for (int face = 0; face < state.faceCount(); face++) {
			double aw = state.faceWaterActivity(face);
			double t = state.temperature[state.faceNode(face)];
			double k = kinetics.rate().at(t)
					* WaterActivityFactor.relative(aw, kinetics.referenceWaterActivity().value()) * maillardFactor
					+ Caramelisation.RATE.at(t) * caramelFactor
							* WaterActivityFactor.relative(aw, CARAMEL_REFERENCE_AW);
			CookState.Face f = state.face(face);
			f.browningExtent = 1 - (1 - f.browningExtent) * Math.exp(-k * dt);
		}
	}

}
