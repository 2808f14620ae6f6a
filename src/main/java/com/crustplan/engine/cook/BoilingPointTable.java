package com.crustplan.engine.cook;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import com.crustplan.engine.water.GabIsotherm;
import com.crustplan.engine.water.WaterVapour;

/**
 * The boiling point of a food's moisture at 1 atm, aw(X)·p_sat(T) = 1 atm, tabulated on
 * the moisture itself (the sorption isotherm composed with the boiling point in water
 * activity) and read with linear interpolation: the boiling solve asks for it a few dozen
 * times a step, and a look-up costs a multiply where the isotherm costs a square root and
 * a divide. Below 1 kg/kg d.b. the spacing is 1/16384 kg/kg, above it 1/4096 of the range
 * up to free water; the interpolation error is below 0.01 K (the solve's tolerance is
 * 0.02 K) everywhere but at the isotherm's aw = 0.01 floor, where the food is bone dry.
 * One table per isotherm, shared between runs (read only once built).
 */
final class BoilingPointTable {

	private static final Map<GabIsotherm, BoilingPointTable> TABLES = new ConcurrentHashMap<>();

	private static final int FINE = 16384;

	private static final int COARSE = 4096;

	private final double split;

	private final double free;

	private final double finePerX;

	private final double coarsePerX;

	private final double[] fine = new double[FINE + 1];

	private final double[] coarse = new double[COARSE + 1];

	private BoilingPointTable(GabIsotherm isotherm) {
		free = isotherm.freeWaterMoisture();
		split = Math.min(1, free);
		finePerX = FINE / split;
		coarsePerX = free > split ? COARSE / (free - split) : 0;
		for (int j = 0; j <= FINE; j++) {
			fine[j] = exact(isotherm, split * j / FINE);
		}
		for (int j = 0; j <= COARSE; j++) {
			coarse[j] = exact(isotherm, split + (free - split) * j / COARSE);
		}
	}

	private static double exact(GabIsotherm isotherm, double x) {
		return WaterVapour.boilingTemperatureKFast(isotherm.waterActivity(x));
	}

	static BoilingPointTable of(GabIsotherm isotherm) {
		return TABLES.computeIfAbsent(isotherm, BoilingPointTable::new);
	}

	/** Boiling point of moisture x (kg/kg d.b.), K. */
	double at(double x) {
		if (x < split) {
			double u = Math.max(0, x) * finePerX;
			int j = (int) u;
			return fine[j] + (u - j) * (fine[j + 1] - fine[j]);
		}
		if (x >= free) {
			return LocalBoiling.FREE_WATER_BOILING_K;
		}
		double u = (x - split) * coarsePerX;
		int j = Math.min((int) u, COARSE - 1);
		return coarse[j] + (u - j) * (coarse[j + 1] - coarse[j]);
	}

}
