package com.crustplan.engine.cook;

import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;
import com.crustplan.engine.layers.MoistureDiffusion;
import com.crustplan.engine.water.GabIsotherm;

/**
 * What a cook knows at one instant: per control volume its temperature, moisture, dry
 * matter and volume; per face its standing water, browning extent and boiling flux; and
 * the time. The stepper updates it in place; everything else reads it through
 * {@link Layers} or the accessors here.
 */
public final class CookState implements Layers {

	/**
	 * Residual moisture a node keeps, kg/kg d.b.: bone-dry is outside the isotherm fits.
	 */
	static final double MIN_MOISTURE = 1e-3;

	private final Grid grid;

	private final GabIsotherm isotherm;

	private final int n;

	final double[] temperature;

	final double[] moisture;

	final double[] dryMass;

	final double[] volume;

	/** Frying oil taken up by each control volume, kg per m² of face. */
	final double[] oil;

	/**
	 * Water the heat step boiled off each layer (beyond its face's standing water),
	 * kg/m², not yet taken from its moisture: the moisture step takes it in its implicit
	 * solve, together with the diffusion that refills the layer meanwhile.
	 */
	final double[] boiledOff;

	/**
	 * The moisture conductance between layer i and i + 1 of the last moisture step,
	 * kg/(m²·s) per unit of moisture (valid once {@link #hasMoistureConductance}).
	 */
	final double[] moistureConductance;

	boolean hasMoistureConductance;

	/** Moisture at the start, kg/kg d.b. (uniform). */
	final double initialMoisture;

	/**
	 * Face 0 (the node at x = 0) and face 1 (the last node). A radial grid (strip, cube,
	 * ball) has only face 0, its outer surface; its last node is the centre, and face 1
	 * stays an empty record there (no standing water, no browning, no exchange).
	 */
	final Face[] faces = { new Face(), new Face() };

	/** 2 for a slab, 1 for a cylinder or sphere. */
	private final int faceCount;

	double time;

	CookState(Grid grid, GabIsotherm isotherm, double temperatureK, double moistureDryBasis, double bulkDensity,
			double standingWaterKgPerM2) {
		this.grid = grid;
		this.isotherm = isotherm;
		this.n = grid.size();
		this.faceCount = grid.shape() == 0 ? 2 : 1;
		temperature = new double[n];
		moisture = new double[n];
		dryMass = new double[n];
		volume = new double[n];
		oil = new double[n];
		boiledOff = new double[n];
		moistureConductance = new double[n];
		initialMoisture = moistureDryBasis;
		for (int i = 0; i < n; i++) {
			temperature[i] = temperatureK;
			moisture[i] = moistureDryBasis;
			volume[i] = grid.width(i);
			dryMass[i] = bulkDensity * volume[i] / (1 + moistureDryBasis);
		}
		faces[0].standingWater = standingWaterKgPerM2;
		faces[1].standingWater = faceCount == 2 ? standingWaterKgPerM2 : 0;
	}

	/**
	 * The heated faces: 2 for a slab, 1 (the outer surface) for a strip, cube or ball.
	 */
	int faceCount() {
		return faceCount;
	}

	/** The node that carries a face. */
	int faceNode(int face) {
		return face == 0 ? 0 : n - 1;
	}

	/** The face a node carries, or −1 for an inner node (and for the centre). */
	int faceOf(int i) {
		return i == 0 ? 0 : i == n - 1 && faceCount == 2 ? 1 : -1;
	}

	Face face(int face) {
		return faces[face];
	}

	GabIsotherm isotherm() {
		return isotherm;
	}

	/**
	 * Water activity at a face: 1 while standing water covers it, else the isotherm's at
	 * its node.
	 */
	double faceWaterActivity(int face) {
		return faces[face].standingWater > 0 ? 1 : isotherm.waterActivity(moisture[faceNode(face)]);
	}

	/**
	 * Water a layer can still boil off, kg/m²: standing water on its face and its own
	 * above the residue.
	 */
	double availableWater(int i) {
		double w = Math.max(0, (moisture[i] - MIN_MOISTURE) * dryMass[i]);
		int face = faceOf(i);
		if (face >= 0) {
			w += faces[face].standingWater;
		}
		return w;
	}

	/**
	 * Hands the water boiled off in the heat step to the moisture solve as a sink and
	 * clears it.
	 */
	void takeBoiledOff(MoistureDiffusion diffusion, double dt) {
		for (int i = 0; i < n - 1; i++) {
			moistureConductance[i] = diffusion.conductance(i);
		}
		hasMoistureConductance = true;
		for (int i = 0; i < n; i++) {
			if (boiledOff[i] > 0) {
				diffusion.addSink(i, boiledOff[i] / dt);
				boiledOff[i] = 0;
			}
		}
	}

	boolean hasWater(int i) {
		int face = faceOf(i);
		return moisture[i] > MIN_MOISTURE || (face >= 0 && faces[face].standingWater > 0);
	}

	/** Food per m² of face, kg (dry matter and water through the whole thickness). */
	public double massKgPerM2() {
		double m = 0;
		for (int i = 0; i < n; i++) {
			m += dryMass[i] * (1 + moisture[i]);
		}
		return m;
	}

	/** Water share of the whole piece (oil counted in its mass), %. */
	public double waterSharePct() {
		double water = 0;
		double mass = 0;
		for (int i = 0; i < n; i++) {
			water += dryMass[i] * moisture[i];
			mass += dryMass[i] * (1 + moisture[i]) + oil[i];
		}
		return 100 * water / mass;
	}

	/** Oil taken up, g per 100 g of the piece as it is now. */
	public double oilSharePct() {
		double o = 0;
		double mass = 0;
		for (int i = 0; i < n; i++) {
			o += oil[i];
			mass += dryMass[i] * (1 + moisture[i]) + oil[i];
		}
		return 100 * o / mass;
	}

	/**
	 * Centre temperature, K: the mid-thickness of a slab (interpolated), the centre node
	 * of a strip, cube or ball.
	 */
	public double coreK() {
		return faceCount == 2 ? grid.interpolate(temperature, 0.5 * grid.thickness()) : temperature[n - 1];
	}

	public double surfaceK() {
		return temperature[0];
	}

	/**
	 * The face away from the heat of a slab, K; for a strip, cube or ball, whose one
	 * outer face is all its surface, that face.
	 */
	public double otherFaceK() {
		return faceCount == 2 ? temperature[n - 1] : temperature[0];
	}

	/** Browning extent at a face, 0 (raw) to 1 (the colour path's end). */
	public double browningExtent(int face) {
		return faces[face].browningExtent;
	}

	/** Standing water on a face, kg/m². */
	public double standingWater(int face) {
		return faces[face].standingWater;
	}

	CookResult.FinalState finalState() {
		double[] p = new double[n];
		for (int i = 0; i < n; i++) {
			p[i] = grid.position(i);
		}
		return new CookResult.FinalState(p, temperature, moisture, dryMass,
				new double[] { faces[0].standingWater, faces[1].standingWater }, oil);
	}

	// ---------------------------------------------------------------- Layers view

	@Override
	public Grid grid() {
		return grid;
	}

	@Override
	public int size() {
		return n;
	}

	@Override
	public double temperatureK(int i) {
		return temperature[i];
	}

	@Override
	public double moisture(int i) {
		return moisture[i];
	}

	@Override
	public double waterActivity(int i) {
		int face = faceOf(i);
		if (face >= 0 && faces[face].standingWater > 0) {
			return 1;
		}
		return isotherm.waterActivity(moisture[i]);
	}

	@Override
	public double dryMass(int i) {
		return dryMass[i];
	}

	@Override
	public double timeS() {
		return time;
	}

	/**
	 * What each heated face carries besides its node: standing water, browning, the
	 * boiling under it.
	 */
	static final class Face {

		/** Standing water, kg/m². */
		double standingWater;

		/** Browning extent, 0–1. */
		double browningExtent;

		/**
		 * Water boiled off under this half of the piece in the last step, kg/(m²·s): it
		 * stirs a fryer's oil.
		 */
		double boilingFlux;

	}

}
