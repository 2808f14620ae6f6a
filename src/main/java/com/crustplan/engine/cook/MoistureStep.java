package com.crustplan.engine.cook;

import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceFlux;
import com.crustplan.engine.layers.MoistureDiffusion;
import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.water.MoistureDiffusivity;
import com.crustplan.engine.water.WaterVapour;

/**
 * Step (4): moisture diffusion through the thickness with each bare face's evaporation
 * implicit in moisture, J(X) ≈ J* + s·(X − X*), s = dJ/daw · daw/dX, where J* is what the
 * heat step already drew latent heat for; the face node pays, in sensible heat, for the
 * difference. Water carries its sensible heat from layer to layer.
 */
final class MoistureStep {

	private final CookState state;

	private final ActiveHeat schedule;

	private final MatrixProperties properties;

	private final HeatStep heat;

	private final EnergyAccount account;

	private final MoistureDiffusion diffusion;

	private final int n;

	private final double[] solution;

	private final double[] before;

	private final double[] heatGain;

	private final double[] evaporationSlope = new double[2];

	private final FaceFlux flux = new FaceFlux();

	MoistureStep(CookState state, ActiveHeat schedule, MatrixProperties properties, HeatStep heat,
			EnergyAccount account, MoistureDiffusivity diffusivity) {
		this.state = state;
		this.schedule = schedule;
		this.properties = properties;
		this.heat = heat;
		this.account = account;
		this.n = state.size();
		this.diffusion = new MoistureDiffusion(state.grid(), diffusivity::at);
		this.solution = new double[n];
		this.before = new double[n];
		this.heatGain = new double[n];
	}

	void step(double dt) {
		double[] moisture = state.moisture;
		double[] temperature = state.temperature;
		diffusion.assemble(state.dryMass, state.volume, temperature, moisture, dt);
		state.takeBoiledOff(diffusion, dt); // numerics: boiled water leaves in this solve
		for (int face = 0; face < 2; face++) {
			evaporationSlope[face] = 0;
			if (state.face(face).standingWater > 0) {
				continue;
			}
			int i = state.faceNode(face);
			FaceExchange exchange = schedule.at(face, state.time);
			double x = moisture[i];
			double aw = state.isotherm().waterActivity(x);
			exchange.evaluate(temperature[i], aw, state.face(face).boilingFlux, flux);
			double dx = 1e-4 + 1e-3 * x;
			double slope = flux.evaporationSlopeAw * (state.isotherm().waterActivity(x + dx) - aw) / dx;
			evaporationSlope[face] = slope;
			diffusion.addEvaporation(i, heat.faceEvaporation[face], slope, x);
		}
		System.arraycopy(moisture, 0, before, 0, n);
		diffusion.solve(solution);
		System.arraycopy(solution, 0, moisture, 0, n);
		carryEnthalpyWithWater(dt);
		for (int face = 0; face < 2; face++) {
			if (state.face(face).standingWater > 0) {
				continue;
			}
			int i = state.faceNode(face);
			double predicted = heat.faceEvaporation[face];
			double j = predicted + evaporationSlope[face] * (moisture[i] - before[i]);
			if (moisture[i] < CookState.MIN_MOISTURE) {
				j -= state.dryMass[i] * (CookState.MIN_MOISTURE - moisture[i]) / dt;
				moisture[i] = CookState.MIN_MOISTURE;
			}
			// the heat step drew latent heat for J*; the face node pays for the
			// difference
			double latent = WaterVapour.latentHeat(temperature[i]);
			temperature[i] -= latent * (j - predicted) * dt / properties.capacity[i];
			account.vapour(j * dt, temperature[i]);
		}
		for (int i = 0; i < n; i++) {
			if (moisture[i] < CookState.MIN_MOISTURE) {
				moisture[i] = CookState.MIN_MOISTURE;
			}
		}
		if (schedule.at(0, state.time).inOil() || schedule.at(1, state.time).inOil()) {
			OilUptake.step(state, account);
		}
	}

	/**
	 * Water diffusing into a layer arrives at the temperature of the layer it left: mix
	 * its sensible heat in, so moisture transport neither makes nor loses energy.
	 */
	private void carryEnthalpyWithWater(double dt) {
		double[] temperature = state.temperature;
		double[] moisture = state.moisture;
		for (int i = 0; i < n; i++) {
			heatGain[i] = 0;
		}
		for (int i = 0; i < n - 1; i++) {
			double m = diffusion.conductance(i) * (moisture[i] - moisture[i + 1]) * dt; // kg/m²
																						// from
																						// i
																						// to
																						// i+1
			if (m > 0) {
				heatGain[i + 1] += m * (temperature[i] - temperature[i + 1]);
			}
			else {
				heatGain[i] += -m * (temperature[i + 1] - temperature[i]);
			}
		}
		for (int i = 0; i < n; i++) {
			if (heatGain[i] != 0) {
				temperature[i] += heatGain[i] * FoodComponent.WATER.specificHeat(temperature[i] - 273.15) / capacity(i);
			}
		}
	}

	private double capacity(int i) {
		return properties.capacity[i];
	}

}
