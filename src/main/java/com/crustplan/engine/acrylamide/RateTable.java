package com.crustplan.engine.acrylamide;

import com.crustplan.engine.kinetics.ArrheniusRate;

/**
 * The Arrhenius factors of formation and elimination tabulated every 0.05 K, so the
 * per-layer step needs no exponential. Linear interpolation over 0.05 K is exact to a few
 * parts per million for these activation energies; beyond the table the factor is
 * computed directly.
 */
final class RateTable {

	private static final double STEP_K = 0.05;

	private static final double TOP_K = 700;

	static final RateTable DEFAULT = new RateTable(AcrylamideKinetics.DEFAULT);

	private final double bottomK;

	private final double[] formation;

	private final double[] elimination;

	private final double formationOverR;

	private final double eliminationOverR;

	private final int last;

	private RateTable(AcrylamideKinetics k) {
		bottomK = AcrylamideModel.SKIP_BELOW.value();
		formationOverR = k.formationActivationEnergy() / ArrheniusRate.GAS_CONSTANT;
		eliminationOverR = k.eliminationActivationEnergy() / ArrheniusRate.GAS_CONSTANT;
		int size = (int) Math.ceil((TOP_K - bottomK) / STEP_K) + 1;
		formation = new double[size];
		elimination = new double[size];
		for (int j = 0; j < size; j++) {
			double t = bottomK + j * STEP_K;
			formation[j] = formationDirect(t);
			elimination[j] = eliminationDirect(t);
		}
		last = size - 1;
	}

	static RateTable of(AcrylamideKinetics k) {
		return k.equals(AcrylamideKinetics.DEFAULT) ? DEFAULT : new RateTable(k);
	}

	/** exp(−Ea,f/R·(1/T − 1/T_ref,f)). */
	double formationDirect(double t) {
		return Math.exp(-formationOverR * (1 / t - 1 / AcrylamideModel.FORMATION_REFERENCE_K));
	}

	/** exp(−Ea,e/R·(1/T − 1/T_ref,e)). */
	double eliminationDirect(double t) {
		return Math.exp(-eliminationOverR * (1 / t - 1 / AcrylamideModel.ELIMINATION_REFERENCE_K));
	}

	double formation(double t) {
		double u = (t - bottomK) / STEP_K;
		int j = (int) u;
		if (j < 0 || j >= last) {
			return formationDirect(t);
		}
		double f = u - j;
		return formation[j] + f * (formation[j + 1] - formation[j]);
	}

	double elimination(double t) {
		double u = (t - bottomK) / STEP_K;
		int j = (int) u;
		if (j < 0 || j >= last) {
			return eliminationDirect(t);
		}
		double f = u - j;
		return elimination[j] + f * (elimination[j + 1] - elimination[j]);
	}

}
