package com.crustplan.engine.myoglobin;

import java.util.Arrays;

import com.crustplan.engine.cook.CookState;
import com.crustplan.engine.cook.LayerReaction;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * The native pigment of every layer of a muscle food, stepped first order from the
 * layer's own temperature (see {@link PigmentKinetics}), with the hottest each layer got
 * and the browning of both faces, so the cut face can be drawn at any moment. Levels are
 * in % of the pigment denatured: the crust level is face 0's layer, the portion level
 * mass-weighted. One instance belongs to one run; {@link #step} allocates only to grow
 * the face's history.
 */
public final class MyoglobinDenaturation implements LayerReaction {

	private final FoodCategory category;

	private final PigmentKinetics kinetics;

	private final Grid grid;

	private final int n;

	private final double[] nativeShare;

	private final double[] peakK;

	private final double[] waterActivity;

	private final double skipBelowK;

	private double extent0;

	private double extent1;

	private double timeS;

	private double face;

	private double portion;

	private final SurfaceGreying.FaceHistory history = new SurfaceGreying.FaceHistory();

	/**
	 * @throws IllegalArgumentException for a category whose inside is not judged by
	 * colour (see {@link PigmentKinetics#forCategory})
	 */
	public MyoglobinDenaturation(Surface surface, Grid grid) {
		this.category = surface.category();
		this.kinetics = PigmentKinetics.forCategory(category)
			.orElseThrow(() -> new IllegalArgumentException("no pigment kinetics for " + category));
		this.grid = grid;
		this.n = grid.size();
		nativeShare = new double[n];
		Arrays.fill(nativeShare, 1);
		peakK = new double[n];
		Arrays.fill(peakK, surface.initialTemperatureC() + 273.15);
		waterActivity = new double[n];
		Arrays.fill(waterActivity, 1);
		skipBelowK = kinetics.skipBelow().value() + 273.15;
	}

	@Override
	public void step(Layers layers, double dt) {
		double denatured = 0;
		double mass = 0;
		for (int i = 0; i < n; i++) {
			double t = layers.temperatureK(i);
			if (t > peakK[i]) {
				peakK[i] = t;
			}
			if (t >= skipBelowK) {
				// exact over the step at the step's end temperature: never negative
				nativeShare[i] *= Math.exp(-kinetics.rateAt(t) * dt);
			}
			waterActivity[i] = layers.waterActivity(i);
			double dm = layers.dryMass(i);
			denatured += dm * (1 - nativeShare[i]);
			mass += dm;
		}
		if (layers instanceof CookState s) {
			extent0 = s.browningExtent(0);
			extent1 = s.browningExtent(1);
		}
		timeS = layers.timeS();
		face = 100 * (1 - nativeShare[0]);
		history.add(timeS, 1 - nativeShare[0]);
		portion = mass > 0 ? 100 * denatured / mass : 0;
	}

	/** The cut face as the layers stand now (after the last step). */
	public InteriorProfile profile() {
		double[] depth = new double[n];
		double[] denatured = new double[n];
		double[] peakC = new double[n];
		for (int i = 0; i < n; i++) {
			depth[i] = grid.position(i) * 1000;
			denatured[i] = 1 - nativeShare[i];
			peakC[i] = peakK[i] - 273.15;
		}
		return InteriorProfile.of(category, kinetics, grid.shape(), grid.thickness() * 1000, depth, denatured, peakC,
				waterActivity, extent0, extent1, timeS);
	}

	/** Face 0's share of pigment denatured over the run so far. */
	public SurfaceGreying.FaceHistory faceHistory() {
		return history;
	}

	/** % of the pigment denatured in face 0's layer. */
	@Override
	public double crustLevel() {
		return face;
	}

	/** % of the pigment denatured in the whole piece, by dry mass. */
	@Override
	public double portionLevel() {
		return portion;
	}

}
