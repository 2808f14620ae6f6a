package com.crustplan.engine.cook;

import java.util.Arrays;

import com.crustplan.engine.layers.HeatConduction;
import com.crustplan.engine.layers.MoistureDiffusion;
import com.crustplan.engine.water.MoistureDiffusivity;
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

	private final BoilingPointTable boilingPoints;

	/** The moisture step's law, for a boiling layer's exchange with its neighbours. */
	private final MoistureDiffusion diffusion;

	/**
	 * Water boiled off in the step under each half of the piece, kg/m² (a strip, cube or
	 * ball: all of it under its one outer face).
	 */
	private final double[] boiled = new double[2];

	LocalBoiling(CookState state, HeatConduction conduction, EnergyAccount account, MoistureDiffusivity diffusivity) {
		this.state = state;
		this.conduction = conduction;
		this.account = account;
		this.n = state.size();
		pinned = new boolean[n];
		ranDry = new boolean[n];
		pinnedTemperature = new double[n];
		diffusion = new MoistureDiffusion(state.grid(), diffusivity::at);
		boilingPoints = BoilingPointTable.of(state.isotherm());
		holdingMass = new double[n];
		boilable = new double[n];
		refilledAt = new long[n];
		refilledMoisture = new double[n];
		conductanceAt = new long[n];
		conductance = new double[n];
		lastRoot = new double[n];
		Arrays.fill(lastRoot, Double.NaN);
		Arrays.fill(refilledAt, -1);
		Arrays.fill(conductanceAt, -1);
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
				// under standing water it boils at 100 °C; else at the boiling point
				// of the moisture diffusion leaves it with
				double x = refilled(i, dt);
				int face = state.faceOf(i);
				double tb = face >= 0 && state.face(face).standingWater > 0 ? FREE_WATER_BOILING_K
						: boilingPoints.at(x);
				if (solution[i] > tb) {
					pinned[i] = true;
					pinnedTemperature[i] = tb <= FREE_WATER_BOILING_K ? tb
							: endOfStepBoilingPoint(x, i, tb, conduction.diagonal(i) * (solution[i] - tb), dt);
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
				else if (surplus * dt > boilable[i] * WaterVapour.latentHeat(pinnedTemperature[i])) {
					// it boils dry within the step: all its water goes, the rest of the
					// heat moves on
					pinned[i] = false;
					ranDry[i] = true;
					conduction.addSource(i, -boilable[i] * WaterVapour.latentHeat(pinnedTemperature[i]) / dt);
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
	 * from step to step. It is pinned instead at the boiling point of the moisture it
	 * will have at the end of the step (backward Euler in the sorption equilibrium, as in
	 * the rest of the step): T = T_b(X − S(T)·Δt/(h_fg·m)), solved by regula falsi, where
	 * the surplus S(T) = S₀ − a·(T − T_b) falls by the assembled diagonal a per kelvin
	 * from S₀ = a·(T_free − T_b), what the unpinned solve put above the boiling point
	 * (its neighbours held).
	 */
	private double endOfStepBoilingPoint(double x, int i, double tb, double surplus, double dt) {
		if (surplus <= 0) {
			return tb;
		}
		double t = boilingPointBetween(x, i, tb, surplus, dt);
		lastRoot[i] = t;
		return t;
	}

	private double boilingPointBetween(double x, int i, double tb, double surplus, double dt) {
		double slope = conduction.diagonal(i);
		double perWatt = dt / (WaterVapour.latentHeat(tb) * holdingMass[i]);
		// g(T) = T − T_b(X_end(T)) rises with T: negative at T_b, positive where the
		// surplus is spent; regula falsi with the Illinois modification. Where it is
		// spent the layer keeps its moisture X, whose boiling point is tb: g = hi − tb
		// there without evaluating it.
		double lo = tb;
		double hi = tb + surplus / slope;
		double gHi = hi - tb;
		double gLo = Double.NaN;
		double guess = lastRoot[i];
		if (guess > lo + PIN_TOLERANCE_K && guess < hi - PIN_TOLERANCE_K) {
			// warm start: the layer's root in the last solve (the face pass before, or
			// the step before) moves a fraction of a kelvin; it either is the root to the
			// tolerance or narrows the bracket from one side
			double g = guess - boilingPointAtEnd(x, surplus, slope, tb, guess, perWatt);
			if (Math.abs(g) < PIN_TOLERANCE_K) {
				return guess;
			}
			if (g < 0) {
				lo = guess;
				gLo = g;
			}
			else {
				hi = guess;
				gHi = g;
			}
		}
		if (Double.isNaN(gLo)) {
			gLo = lo - boilingPointAtEnd(x, surplus, slope, tb, lo, perWatt);
			if (gLo >= 0 || gHi <= 0) {
				return gLo >= 0 ? lo : hi;
			}
			if (-gLo < PIN_TOLERANCE_K && hi - lo > PIN_TOLERANCE_K) {
				// g rises at least as fast as T (the more the layer keeps, the lower its
				// boiling point): the root lies within −g(T_b) of T_b, and so does the
				// first regula falsi point, which is taken without checking it (a layer
				// whose boiling point hardly moves: the wet interior)
				return (lo * gHi - hi * gLo) / (gHi - gLo);
			}
		}
		int side = 0;
		for (int k = 0; k < MAX_PIN_ITERATIONS && hi - lo > PIN_TOLERANCE_K; k++) {
			double t = (lo * gHi - hi * gLo) / (gHi - gLo);
			double g = t - boilingPointAtEnd(x, surplus, slope, tb, t, perWatt);
			if (Math.abs(g) < PIN_TOLERANCE_K) {
				return t;
			}
			if (g < 0) {
				lo = t;
				gLo = g;
				if (side == -1) {
					gHi *= 0.5;
				}
				side = -1;
			}
			else {
				hi = t;
				gHi = g;
				if (side == 1) {
					gLo *= 0.5;
				}
				side = 1;
			}
		}
		return 0.5 * (lo + hi);
	}

	/** Each layer's end-of-step boiling point as last solved, K (NaN before any). */
	private final double[] lastRoot;

	/** The boiling point of the moisture left after the surplus at t is spent, K. */
	private double boilingPointAtEnd(double x, double surplus, double slope, double tb, double t, double perWatt) {
		double xEnd = Math.max(CookState.MIN_MOISTURE, x - (surplus - slope * (t - tb)) * perWatt);
		return boilingPoints.at(xEnd);
	}

	/**
	 * Dry mass that shares out the water boiled off a layer over the step, kg/m²: its own
	 * plus what its diffusive exchange with its neighbours brings in (set by
	 * {@link #refilled(int, double)}).
	 */
	private final double[] holdingMass;

	/**
	 * Water layer i can boil off within the step, kg/m²: standing water on its face and
	 * its own above the residue, with what diffusion brings it meanwhile.
	 */
	private final double[] boilable;

	/**
	 * The moisture a boiling layer would end the step with before the boiling is taken
	 * off, kg/kg d.b.: its water balance with its neighbours held, m·(X' − X) = Δt·Σ
	 * G·(X_j − X'), backward Euler as in the moisture step, whose law it uses. Boiling
	 * and diffusion are split within a step; a face layer a tenth of a millimetre thick
	 * refills from its neighbour in a fraction of a second (d²/2D), so pinned at the
	 * boiling point of its own moisture alone it boils nearly dry, is refilled by the
	 * moisture step, ends the step above its boiling point, and flashes the superheat off
	 * in the first instant of the next step, however short that step is (a 7 mm slab's
	 * face dropped 6 K in a 0.03 s step landing on the end of the cook), and where it
	 * boils more than it holds it runs dry in every step. Instead the water it boils, B,
	 * leaves in the moisture step's implicit solve as a sink
	 * ({@link CookState#boiledOff}), so the layer may boil what diffusion brings it
	 * within the step; with the exchange in its balance it ends at X' = X_eq − B/(m +
	 * Δt·ΣG), at its boiling point, and a short step no longer jumps.
	 */
	private double refilled(int i, double dt) {
		if (refilledAt[i] == stepCount) {
			return refilledMoisture[i];
		}
		double m = state.dryMass[i];
		double[] x = state.moisture;
		double gIn = 0;
		double inflow = 0;
		if (i > 0) {
			double g = conductance(i - 1);
			gIn += g;
			inflow += g * x[i - 1];
		}
		if (i < n - 1) {
			double g = conductance(i);
			gIn += g;
			inflow += g * x[i + 1];
		}
		double held = m + gIn * dt;
		double xEq = Math.max(CookState.MIN_MOISTURE, (m * x[i] + inflow * dt) / held);
		holdingMass[i] = held;
		int face = state.faceOf(i);
		boilable[i] = held * (xEq - CookState.MIN_MOISTURE) + (face >= 0 ? state.face(face).standingWater : 0);
		refilledMoisture[i] = xEq;
		refilledAt[i] = stepCount;
		return xEq;
	}

	/**
	 * The moisture conductance between layer k and k + 1: the last moisture step's (a
	 * coefficient lagged by one step, as in a linearised implicit scheme: it moves by a
	 * per cent or so a step), or before the first, at the start of the step.
	 */
	private double conductance(int k) {
		if (state.hasMoistureConductance) {
			return state.moistureConductance[k];
		}
		if (conductanceAt[k] != stepCount) {
			conductance[k] = diffusion.conductance(k, state.dryMass, state.volume, state.temperature, state.moisture);
			conductanceAt[k] = stepCount;
		}
		return conductance[k];
	}

	/** Starts a step: what was computed from the last step's start is stale. */
	void startStep() {
		stepCount++;
	}

	private long stepCount;

	private final long[] refilledAt;

	private final double[] refilledMoisture;

	private final long[] conductanceAt;

	private final double[] conductance;

	/**
	 * Regula falsi steps at most: the boiling-point curve is smooth, a few steps reach
	 * the tolerance.
	 */
	private static final int MAX_PIN_ITERATIONS = 8;

	/** Tolerance of the end-of-step boiling point, K. */
	private static final double PIN_TOLERANCE_K = 0.02;

	/**
	 * Takes the solved temperatures into the state and boils off what the pinned and
	 * dried-out layers shed; leaves each face's boiling flux for the step.
	 */
	void apply(double[] solution, double dt) {
		boiled[0] = 0;
		boiled[1] = 0;
		for (int i = 0; i < n; i++) {
			double energy = pinned[i] ? conduction.surplus(i, solution) * dt
					: ranDry[i] ? boilable[i] * WaterVapour.latentHeat(pinnedTemperature[i]) : 0;
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

	/**
	 * Boils {@code energy} (J/m²) worth of water off layer i at {@code boilingK},
	 * standing water first.
	 */
	private void boilOff(int i, double energy, double boilingK) {
		int face = state.faceOf(i);
		int half = state.faceCount() == 1 || state.grid().position(i) < 0.5 * state.grid().thickness() ? 0 : 1;
		double latent = WaterVapour.latentHeat(boilingK);
		double m = Math.min(energy / latent, boilable[i]);
		double left = m;
		if (face >= 0 && state.face(face).standingWater > 0) {
			double fromFilm = Math.min(state.face(face).standingWater, left);
			state.face(face).standingWater -= fromFilm;
			left -= fromFilm;
		}
		// the layer's own water leaves in the moisture step, solved with the diffusion
		// that refills it
		state.boiledOff[i] += left;
		account.vapour(m, boilingK);
		boiled[half] += m;
	}

}
