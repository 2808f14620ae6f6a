package com.crustplan.engine.cook;

import com.crustplan.engine.water.MoistureDiffusivity;

import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceFlux;
import com.crustplan.engine.layers.HeatConduction;
import com.crustplan.engine.water.WaterVapour;

/**
 * Step (2): heat conduction through the thickness with each face's exchange linearised
 * about an estimate of its new temperature, q ≈ q* + q'(T − T*) − h_fg(J* + J'(T − T*)) =
 * b − a·T, re-linearised while the estimate moves; local boiling solved with it; then
 * standing water evaporates (or steam condenses on a wet face into standing water).
 */
final class HeatStep {

	/**
	 * Faces are re-linearised until their temperature estimate moves less than this in a
	 * pass.
	 */
	private static final double FACE_LINEARISATION_K = 1.0;

	private static final int MAX_FACE_PASSES = 4;

	/**
	 * A face this wet gathers condensing steam as standing water rather than sorbing it.
	 */
	private static final double WET_FACE_AW = 0.99;

	private final CookState state;

	private final ActiveHeat schedule;

	private final MatrixProperties properties;

	private final HeatConduction conduction;

	private final LocalBoiling boiling;

	private final EnergyAccount account;

	private final int n;

	private final double[] solution;

	private final FaceFlux flux = new FaceFlux();

	private final double[] faceSlope = new double[2];

	private final double[] faceSource = new double[2];

	private final double[] linearisedAt = new double[2];

	private final double[] heatFluxAtStart = new double[2];

	private final double[] heatSlope = new double[2];

	private final double[] evaporationSlope = new double[2];

	/** Each face's exchange as last linearised. */
	private final FaceExchange[] exchangeAt = new FaceExchange[2];

	/**
	 * Heat into each face over the last step, W/m² (what a pan or the oil gave up to it).
	 */
	final double[] faceHeatFlux = new double[2];

	/**
	 * Heat the pan or oil gave up over the last step per m² of the food touching it,
	 * W/m²: the face's own flux, except where a turned strip, cube or ball touches the
	 * body with only part of its surface.
	 */
	final double[] bodyHeatFlux = new double[2];

	/**
	 * Evaporation from each bare face into the gas, kg/(m²·s), as this step drew latent
	 * heat for it; the moisture step takes the water from the face node.
	 */
	final double[] faceEvaporation = new double[2];

	HeatStep(CookState state, ActiveHeat schedule, MatrixProperties properties, HeatConduction conduction,
			EnergyAccount account, MoistureDiffusivity diffusivity) {
		this.state = state;
		this.schedule = schedule;
		this.properties = properties;
		this.conduction = conduction;
		this.account = account;
		this.n = state.size();
		this.solution = new double[n];
		this.boiling = new LocalBoiling(state, conduction, account, diffusivity);
	}

	void step(double dt) {
		double now = state.time;
		boiling.startStep();
		double[] temperature = state.temperature;
		for (int face = 0; face < 2; face++) {
			linearisedAt[face] = temperature[state.faceNode(face)];
		}
		for (int pass = 0; pass < MAX_FACE_PASSES; pass++) {
			for (int face = 0; face < 2; face++) {
				linearise(face, schedule.at(face, now));
			}
			conduction.assemble(temperature, properties.capacity, properties.conductivity, dt, faceSlope[0],
					faceSource[0], faceSlope[1], faceSource[1]);
			boiling.solve(solution, dt);
			double moved = Math.abs(solution[0] - linearisedAt[0]);
			if (state.faceCount() == 2) {
				moved = Math.max(moved, Math.abs(solution[n - 1] - linearisedAt[1]));
			}
			if (moved < FACE_LINEARISATION_K) {
				break;
			}
			linearisedAt[0] = solution[0];
			linearisedAt[1] = solution[n - 1];
		}
		boiling.apply(solution, dt);
		for (int face = 0; face < 2; face++) {
			// the face fluxes as the solve had them (a layer that ran dry is warmed only
			// afterwards)
			double dT = solution[state.faceNode(face)] - linearisedAt[face];
			faceHeatFlux[face] = heatFluxAtStart[face] + heatSlope[face] * dT;
			bodyHeatFlux[face] = exchangeAt[face] instanceof TurnedSurface t ? t.bodyHeatFlux + t.bodyHeatFluxSlope * dT
					: faceHeatFlux[face];
			account.heatIn(faceHeatFlux[face] * dt);
			faceEvaporation[face] += evaporationSlope[face] * dT;
		}
		if (schedule.touchingShare() < 1) {
			underTurnedPiece(dt);
		}
		for (int face = 0; face < 2; face++) {
			standingWater(face, dt);
		}
		boiling.recordBoilingFlux(dt);
	}

	/**
	 * A turned strip, cube or ball always has one side down, though the one side the
	 * model follows is down only for its share of the time: while it is, the pan loses
	 * what it takes; while it is up, the pan loses what the side down took on average
	 * over its last turn, so the pan sees the steady load of the whole piece.
	 */
	private void underTurnedPiece(double dt) {
		if (exchangeAt[0].body() != null) {
			contactJ += faceHeatFlux[0] * dt;
			contactS += dt;
		}
		else {
			if (contactS > 0) {
				lastContactFlux = contactJ / contactS;
				contactJ = 0;
				contactS = 0;
			}
			bodyHeatFlux[0] = lastContactFlux;
		}
	}

	private double contactJ;

	private double contactS;

	private double lastContactFlux;

	private void linearise(int face, FaceExchange exchange) {
		CookState.Face f = state.face(face);
		exchangeAt[face] = exchange;
		double aw = state.faceWaterActivity(face);
		double t = linearisedAt[face];
		exchange.evaluate(t, aw, f.boilingFlux, flux);
		double latent = WaterVapour.latentHeat(t);
		faceSlope[face] = -(flux.heatFluxSlope - latent * flux.evaporationSlopeT);
		faceSource[face] = flux.heatFlux - latent * flux.evaporation + faceSlope[face] * t;
		faceEvaporation[face] = flux.evaporation;
		evaporationSlope[face] = flux.evaporationSlopeT;
		heatFluxAtStart[face] = flux.heatFlux;
		heatSlope[face] = flux.heatFluxSlope;
	}

	/**
	 * Evaporation from standing water, or steam condensing on a wet face into standing
	 * water; vapour a dry face takes up from the air is left to the moisture step, which
	 * sorbs it into the layer.
	 */
	private void standingWater(int face, double dt) {
		CookState.Face f = state.face(face);
		int i = state.faceNode(face);
		double m = faceEvaporation[face] * dt;
		if (f.standingWater > 0 || (m < 0 && state.isotherm().waterActivity(state.moisture[i]) >= WET_FACE_AW)) {
			double fromFilm = Math.min(f.standingWater, m);
			f.standingWater -= fromFilm;
			account.vapour(fromFilm, state.temperature[i]);
			double rest = (m - fromFilm) / dt; // what the film could not supply comes
												// from the node
			if (rest > 0) {
				double take = Math.min(rest * dt, (state.moisture[i] - CookState.MIN_MOISTURE) * state.dryMass[i]);
				state.moisture[i] -= take / state.dryMass[i];
				account.vapour(take, state.temperature[i]);
			}
			faceEvaporation[face] = 0;
		}
	}

}
