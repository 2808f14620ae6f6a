package com.crustplan.engine.cook;

import com.crustplan.engine.food.Surface;
import com.crustplan.engine.water.MoistureDiffusivity;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.layers.HeatConduction;

/**
 * One time step of a cook, implicit (backward Euler) in heat and moisture: (1) properties
 * from composition, temperature and moisture; (2) heat conduction with the faces'
 * exchange linearised and (3) local boiling solved with it; (4) moisture diffusion with
 * the face's evaporation implicit in moisture; then the layer reaction, and (5) browning
 * at each face. Owns its scratch arrays: one per run.
 */
final class BackwardEulerStep {

	private final CookState state;

	private final MatrixProperties properties;

	private final HeatStep heat;

	private final MoistureStep moisture;

	private final SurfaceBrowning browning;

	private final LayerReaction reaction;

	private final ActiveHeat schedule;

	BackwardEulerStep(CookState state, Surface surface, ActiveHeat schedule, MatrixProperties properties,
			LayerReaction reaction, EnergyAccount account) {
		this.state = state;
		this.properties = properties;
		MoistureDiffusivity diffusivity = surface.category().moistureDiffusivity();
		this.heat = new HeatStep(state, schedule, properties, new HeatConduction(state.grid()), account, diffusivity);
		this.moisture = new MoistureStep(state, schedule, properties, heat, account, diffusivity);
		this.browning = new SurfaceBrowning(surface.category().browning(), surface.composition(), surface.ph());
		this.reaction = reaction;
		this.schedule = schedule;
	}

	SurfaceBrowning browning() {
		return browning;
	}

	void step(double dt) {
		double now = state.time;
		properties.evaluate(state);
		heat.step(dt);
		drawOnBody(now, dt);
		moisture.step(dt);
		reaction.step(state, dt);
		browning.step(state, dt);
		state.time = now + dt;
	}

	/**
	 * A pan or fryer with a body gives up what the faces touching it took, and its heat
	 * input answers.
	 */
	private void drawOnBody(double now, double dt) {
		HeatedBody body = schedule.body();
		if (body == null) {
			return;
		}
		for (int face = 0; face < 2; face++) {
			// a turned piece has a side down while the side the model follows is up
			if (schedule.at(face, now).body() == body || (face == 0 && schedule.touchingShare() < 1)) {
				body.draw(heat.bodyHeatFlux[face]);
			}
		}
		body.advance(dt);
	}

}
