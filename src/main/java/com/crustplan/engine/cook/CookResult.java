package com.crustplan.engine.cook;

import java.util.List;

import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.message.Message;

/**
 * What a run predicts: whether and when the target colour is reached, the series for
 * charts, and the assumptions it rests on. Times are NaN where the target was not
 * reached.
 */
public record CookResult(Outcome outcome, Message explanation, double timeToTargetS, double targetExtent,
		Lab targetColour, double ph, double coreTemperatureAtTargetC, double crustAcrylamideAtTargetUgPerKg,
		double portionAcrylamideAtTargetUgPerKg, double maxSurfaceTemperatureC, double finalBrowningExtent,
		double simulatedS, List<Sample> series, List<Message> assumptions, EnergyLedger energy, FinalState finalState) {

	public CookResult {
		series = List.copyOf(series);
		assumptions = List.copyOf(assumptions);
	}

	public boolean reached() {
		return outcome == Outcome.REACHED;
	}

	/**
	 * The state through the thickness at the end of the run (for energy checks and
	 * follow-on runs).
	 */
	public record FinalState(double[] positionM, double[] temperatureK, double[] moistureDryBasis,
			double[] dryMassKgPerM2, double[] standingWaterKgPerM2) {

		public FinalState {
			positionM = positionM.clone();
			temperatureK = temperatureK.clone();
			moistureDryBasis = moistureDryBasis.clone();
			dryMassKgPerM2 = dryMassKgPerM2.clone();
			standingWaterKgPerM2 = standingWaterKgPerM2.clone();
		}

	}

}
