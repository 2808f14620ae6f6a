package com.crustplan.engine.cook;

import com.crustplan.engine.food.Surface;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * A reaction the cook runs in every layer after each step, from that layer's temperature
 * and water (acrylamide formation is one). The cook knows nothing of its chemistry: it
 * steps it and reports its level in the outer crust and in the whole portion, in the
 * reaction's own unit (µg/kg for acrylamide).
 */
public interface LayerReaction {

	/**
	 * Advances the reaction over a step of dt seconds that has just brought the layers to
	 * their state.
	 */
	void step(Layers layers, double dt);

	/** Level in the outer crust of face 0. */
	double crustLevel();

	/** Level in the whole portion. */
	double portionLevel();

	/** Starts a reaction for one run: one instance per run, like the cook. */
	@FunctionalInterface
	interface Factory {

		LayerReaction start(Surface surface, Grid grid);

	}

	/** No reaction: levels stay zero. */
	Factory NONE = (surface, grid) -> new LayerReaction() {

		@Override
		public void step(Layers layers, double dt) {
		}

		@Override
		public double crustLevel() {
			return 0;
		}

		@Override
		public double portionLevel() {
			return 0;
		}

	};

}
