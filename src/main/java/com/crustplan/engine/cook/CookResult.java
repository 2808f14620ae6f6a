package com.crustplan.engine.cook;

import java.util.List;

import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.message.Message;

/**
 * What a run predicts: whether and when the target colour is reached, the series for
 * charts, and the assumptions it rests on. Times are NaN where the target was not
 * reached. The water and oil shares at the target are of the whole piece, g per 100 g.
 */
public record CookResult(Outcome outcome, Message explanation, double timeToTargetS, double targetExtent,
		Lab targetColour, double ph, double coreTemperatureAtTargetC, double crustAcrylamideAtTargetUgPerKg,
		double portionAcrylamideAtTargetUgPerKg, double maxSurfaceTemperatureC, double finalBrowningExtent,
		double simulatedS, List<Sample> series, List<Message> assumptions, EnergyLedger energy, FinalState finalState,
		double waterAtTargetPct, double oilAtTargetPct) {

	/** A result with no water or oil share recorded at the target (NaN). */
	public CookResult(Outcome outcome, Message explanation, double timeToTargetS, double targetExtent, Lab targetColour,
			double ph, double coreTemperatureAtTargetC, double crustAcrylamideAtTargetUgPerKg,
			double portionAcrylamideAtTargetUgPerKg, double maxSurfaceTemperatureC, double finalBrowningExtent,
			double simulatedS, List<Sample> series, List<Message> assumptions, EnergyLedger energy,
			FinalState finalState) {
		this(outcome, explanation, timeToTargetS, targetExtent, targetColour, ph, coreTemperatureAtTargetC,
				crustAcrylamideAtTargetUgPerKg, portionAcrylamideAtTargetUgPerKg, maxSurfaceTemperatureC,
				finalBrowningExtent, simulatedS, series, assumptions, energy, finalState, Double.NaN, Double.NaN);
	}

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
			double[] dryMassKgPerM2, double[] standingWaterKgPerM2, double[] oilKgPerM2) {

		public FinalState {
			positionM = positionM.clone();
			temperatureK = temperatureK.clone();
			moistureDryBasis = moistureDryBasis.clone();
			dryMassKgPerM2 = dryMassKgPerM2.clone();
			standingWaterKgPerM2 = standingWaterKgPerM2.clone();
			oilKgPerM2 = oilKgPerM2.clone();
		}

		/** A state that took up no oil. */
		public FinalState(double[] positionM, double[] temperatureK, double[] moistureDryBasis, double[] dryMassKgPerM2,
				double[] standingWaterKgPerM2) {
			this(positionM, temperatureK, moistureDryBasis, dryMassKgPerM2, standingWaterKgPerM2,
					new double[temperatureK.length]);
		}

	}

}
