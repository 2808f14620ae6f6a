package com.crustplan.engine.cook;

import com.crustplan.engine.layers.HeatConduction;
import com.crustplan.engine.water.WaterVapour;

/**
 * Step (3), solved together with conduction: a layer holding water cannot be hotter than
 * its boiling point, where aw·p_sat(T) = 1 atm. Layers the plain solve would push above
 * it are pinned there and solved again; the heat each pinned layer receives beyond what
 * it stores boils its water off (standing water first). This gives the 100 °C plateau
 * against a pan or in oil and an evaporation front that recedes into the food.
 */
final class LocalBoiling {

	static final double FREE_WATER_BOILING_K = WaterVapour.boilingTemperatureKFast(1.0);

	private final CookState state;

	private final HeatConduction conduction;

	private final EnergyAccount account;

	private final int n;

	private final boolean[] pinned;

	private final boolean[] ranDry;

	private final double[] pinnedTemperature;

	/** Water boiled off in the step under each half of the piece, kg/m². */
	private final double[] boiled = new double[2];

	LocalBoiling(CookState state, HeatConduction conduction, EnergyAccount account) {
		this.state = state;
		this.conduction = conduction;
		this.account = account;
		this.n = state.size();
		pinned = new boolean[n];
		ranDry = new boolean[n];
		pinnedTemperature = new double[n];
	}

	/**
	 * Solves the assembled conduction step into {@code solution}, pinning layers at their
	 * boiling point.
	 */
	void solve(double[] solution, double dt) {
		conduction.solve(solution, null, null);
		boolean any = false;
		for (int i = 0; i < n; i++) {
			pinned[i] = false;
			ranDry[i] = false;
			if (solution[i] > FREE_WATER_BOILING_K - 0.5 && state.hasWater(i)) {
				double tb = boilingPointOf(i);
				if (solution[i] > tb) {
					pinned[i] = true;
					pinnedTemperature[i] = tb;
					any = true;
				}
			}
		}
		if (!any) {
			return;
		}
		for (int pass = 0; pass < 2 * n; pass++) {
			conduction.solve(solution, pinned, pinnedTemperature);
			boolean changed = false;
			for (int i = 0; i < n; i++) {
				if (!pinned[i]) {
					continue;
				}
				double surplus = conduction.surplus(i, solution);
				if (surplus < 0) {
					pinned[i] = false; // it loses heat at the boiling point: it is not
										// boiling after all
					changed = true;
				}
				else if (surplus * dt > state.availableWater(i) * WaterVapour.latentHeat(pinnedTemperature[i])) {
					// it boils dry within the step: all its water goes, the rest of the
					// heat moves on
					pinned[i] = false;
					ranDry[i] = true;
					conduction.addSource(i,
							-state.availableWater(i) * WaterVapour.latentHeat(pinnedTemperature[i]) / dt);
					changed = true;
				}
				else if (holdAtEndOfStepBoilingPoint(i, surplus, dt)) {
					changed = true;
				}
			}
			if (!changed) {
				break;
			}
		}
	}

	/**
	 * A drying (hygroscopic) layer's boiling point rises as it boils: pinned at the
	 * boiling point of its moisture at the start of the step, it boils too much in one
	 * step and too little in the next, and face temperature and water activity saw-tooth
	 * from step to step. Pinning it instead at the boiling point of the moisture it will
	 * have at the end of the step (backward Euler in the sorption equilibrium, as in the
	 * rest of the step) solves T = T_b(X − S(T)·Δt/(h_fg·m)), with the surplus S falling
	 * by the assembled diagonal per kelvin, by bisection. True when the pin moved.
	 */
	private boolean holdAtEndOfStepBoilingPoint(int i, double surplus, double dt) {
		int face = state.faceOf(i);
		if (surplus <= 0 || (face >= 0 && state.face(face).standingWater > 0)) {
			return false;
		}
		double x = state.moisture[i];
		double t0 = pinnedTemperature[i];
		if (state.isotherm().waterActivity(x) >= 1) {
			return false;
		}
		double slope = conduction.diagonal(i);
		double perKelvinOfSurplus = dt / (WaterVapour.latentHeat(t0) * state.dryMass[i]);
		double lo = t0;
		double hi = t0 + surplus / slope;
		for (int k = 0; k < 30 && hi - lo > PIN_TOLERANCE_K; k++) {
			double mid = 0.5 * (lo + hi);
			double xEnd = Math.max(CookState.MIN_MOISTURE, x - (surplus - slope * (mid - t0)) * perKelvinOfSurplus);
			if (mid < WaterVapour.boilingTemperatureKFast(state.isotherm().waterActivity(xEnd))) {
				lo = mid;
			}
			else {
				hi = mid;
			}
		}
		double t = 0.5 * (lo + hi);
		if (Math.abs(t - t0) <= PIN_TOLERANCE_K) {
			return false;
		}
		pinnedTemperature[i] = t;
		return true;
	}

	/** A pin is moved only when it moves more than this. */
	private static final double PIN_TOLERANCE_K = 1e-3;

	/**
	 * Takes the solved temperatures into the state and boils off what the pinned and
	 * dried-out layers shed; leaves each face's boiling flux for the step.
	 */
	void apply(double[] solution, double dt) {
		boiled[0] = 0;
		boiled[1] = 0;
		for (int i = 0; i < n; i++) {
			double energy = pinned[i] ? conduction.surplus(i, solution) * dt
					: ranDry[i] ? state.availableWater(i) * WaterVapour.latentHeat(pinnedTemperature[i]) : 0;
			state.temperature[i] = solution[i];
			if (energy > 0) {
				boilOff(i, energy, pinnedTemperature[i]);
			}
		}
	}

	/** Sets each face's boiling flux from what boiled under its half in a step of dt. */
	void recordBoilingFlux(double dt) {
		state.face(0).boilingFlux = boiled[0] / dt;
		state.face(1).boilingFlux = boiled[1] / dt;
	}

	private double boilingPointOf(int i) {
		int face = state.faceOf(i);
		if (face >= 0 && state.face(face).standingWater > 0) {
			return FREE_WATER_BOILING_K;
		}
		return WaterVapour.boilingTemperatureKFast(state.isotherm().waterActivity(state.moisture[i]));
	}

	/**
	 * Boils {@code energy} (J/m²) worth of water off layer i at {@code boilingK},
	 * standing water first.
	 */
	private void boilOff(int i, double energy, double boilingK) {
		int face = state.faceOf(i);
		int half = state.grid().position(i) < 0.5 * state.grid().thickness() ? 0 : 1;
		double latent = WaterVapour.latentHeat(boilingK);
		double m = Math.min(energy / latent, state.availableWater(i));
		double left = m;
		if (face >= 0 && state.face(face).standingWater > 0) {
			double fromFilm = Math.min(state.face(face).standingWater, left);
			state.face(face).standingWater -= fromFilm;
			left -= fromFilm;
		}
		state.moisture[i] = Math.max(CookState.MIN_MOISTURE, state.moisture[i] - left / state.dryMass[i]);
		account.vapour(m, boilingK);
		boiled[half] += m;
	}

}
