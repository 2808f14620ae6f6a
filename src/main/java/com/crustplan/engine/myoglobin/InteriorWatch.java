package com.crustplan.engine.myoglobin;

import com.crustplan.engine.cook.EventHandler;
import com.crustplan.engine.cook.LayerReaction;
import com.crustplan.engine.cook.StepInterpolator;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * Runs {@link MyoglobinDenaturation} beside another layer reaction (acrylamide) in one
 * cook and keeps hold of it, so the cut face can be read at the pull (the target colour,
 * as an event handler) or at the end. The other reaction's levels are the ones the cook
 * reports. One watch per run.
 */
public final class InteriorWatch implements LayerReaction.Factory, EventHandler {

	private final LayerReaction.Factory primary;

	private MyoglobinDenaturation pigment;

	private InteriorProfile atPull;

	public InteriorWatch(LayerReaction.Factory primary) {
		this.primary = primary;
	}

	@Override
	public LayerReaction start(Surface surface, Grid grid) {
		LayerReaction first = primary.start(surface, grid);
		MyoglobinDenaturation second = new MyoglobinDenaturation(surface, grid);
		this.pigment = second;
		return new LayerReaction() {

			@Override
			public void step(Layers layers, double dt) {
				first.step(layers, dt);
				second.step(layers, dt);
			}

			@Override
			public double crustLevel() {
				return first.crustLevel();
			}

			@Override
			public double portionLevel() {
				return first.portionLevel();
			}

		};
	}

	/** The pull moment: the cut face is kept as it is at the end of this step. */
	@Override
	public double eventOccurred(StepInterpolator step, double fraction) {
		if (atPull == null && pigment != null) {
			atPull = pigment.profile();
		}
		return Double.POSITIVE_INFINITY;
	}

	/** Face 0's share of pigment denatured over the whole run. */
	public SurfaceGreying.FaceHistory faceHistory() {
		if (pigment == null) {
			throw new IllegalStateException("the watch has not run");
		}
		return pigment.faceHistory();
	}

	/** The cut face at the pull if one was marked, else as the run ended. */
	public InteriorProfile profile() {
		if (atPull != null) {
			return atPull;
		}
		if (pigment == null) {
			throw new IllegalStateException("the watch has not run");
		}
		return pigment.profile();
	}

}
