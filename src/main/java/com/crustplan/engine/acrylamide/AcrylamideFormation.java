package com.crustplan.engine.acrylamide;

import java.util.Arrays;

import com.crustplan.engine.cook.LayerReaction;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * Acrylamide in every control volume of a run, stepped from the layer's own temperature
 * and water activity (see {@link AcrylamideModel} for the equations and sources).
 * Concentrations are kept per kg of dry matter so drying does not change them; the
 * reported levels are per kg of the food as eaten.
 * <p>
 * The crust is the outer 1 mm of face 0 (half the thickness for thinner slabs, the whole
 * radius for thinner strips, cubes and balls): the face a {@code Sample} calls the
 * surface. The portion is the whole piece, mass-weighted over the grid's control volumes,
 * which for a strip, cube or ball are cylindrical or spherical shells: the portion figure
 * follows the shape's real crust-to-volume ratio. One instance belongs to one run;
 * {@link #step} allocates nothing.
 */
public final class AcrylamideFormation implements LayerReaction {

	/** Acrylamide formation as the cook's layer reaction. */
	public static final LayerReaction.Factory REACTION = AcrylamideFormation::new;

	/** µg of acrylamide per mmol. */
	private static final double UG_PER_MMOL = AcrylamideModel.ACRYLAMIDE_MOLAR_MASS * 1000;

	private final AcrylamideKinetics kinetics;

	private final int n;

	private final double[] asparagine;

	private final double[] sugar;

	private final double[] acrylamide;

	private final double[] crustWeight;

	private final double crustDepthM;

	private final double phFactor;

	private final RateTable rates;

	private final double skipBelowK;

	private final double gateDry;

	private final double gateWet;

	private double crust;

	private double portion;

	public AcrylamideFormation(Surface surface, Grid grid) {
		this(surface, grid, AcrylamideKinetics.DEFAULT);
	}

	public AcrylamideFormation(Surface surface, Grid grid, AcrylamideKinetics kinetics) {
		this.kinetics = kinetics;
		this.n = grid.size();
		asparagine = new double[n];
		sugar = new double[n];
		acrylamide = new double[n];
		crustWeight = new double[n];
		double asn0 = initialAsparagine(surface);
		double rs0 = initialReducingSugar(surface.composition());
		Arrays.fill(asparagine, asn0);
		Arrays.fill(sugar, rs0);
		int m = grid.shape();
		// a slab's face 0 owns half its thickness; a strip's, cube's or ball's one face
		// owns the whole radius
		crustDepthM = Math.min(AcrylamideModel.CRUST_DEPTH.value(), m == 0 ? 0.5 * grid.thickness() : grid.thickness());
		for (int i = 0; i < n; i++) {
			double left = i == 0 ? 0 : 0.5 * (grid.position(i - 1) + grid.position(i));
			double right = i == n - 1 ? grid.thickness() : 0.5 * (grid.position(i) + grid.position(i + 1));
			crustWeight[i] = m == 0 ? Math.max(0, Math.min(1, (crustDepthM - left) / (right - left)))
					: shellShare(grid.thickness(), m, left, right, crustDepthM);
		}
		phFactor = phFactor(surface.ph());
		rates = RateTable.of(kinetics);
		skipBelowK = AcrylamideModel.SKIP_BELOW.value();
		gateDry = AcrylamideModel.GATE_DRY.value();
		gateWet = AcrylamideModel.GATE_WET.value();
	}

	/**
	 * The share of a cylindrical (m = 1) or spherical (m = 2) shell between depths left
	 * and right below the surface of radius r that lies within the outer crust of depth
	 * d: volumes go as r^(m+1), so a crust shell of a thin strip holds more of the piece
	 * than slab area × depth would.
	 */
	static double shellShare(double r, int m, double left, double right, double d) {
		if (d <= left) {
			return 0;
		}
		double cut = Math.min(d, right);
		double outer = Math.pow(r - left, m + 1);
		return (outer - Math.pow(r - cut, m + 1)) / (outer - Math.pow(r - right, m + 1));
	}

	/** Free asparagine, mmol per kg dry matter. */
	public static double initialAsparagine(Surface surface) {
		return surface.asparagineMgPerKg() / AcrylamideModel.M_ASPARAGINE.value()
				/ (surface.composition().dryMatterPct() / 100);
	}

	/** Reducing sugar, mmol (hexose) per kg dry matter. */
	public static double initialReducingSugar(Composition c) {
		return c.reducingSugarPct() * 10 / AcrylamideModel.M_HEXOSE.value() * 1000 / (c.dryMatterPct() / 100);
	}

	/** 10^(β(pH − pH_ref)): lower pH, less acrylamide. */
	public static double phFactor(double ph) {
		return Math.pow(10, AcrylamideModel.PH_SLOPE.value() * (ph - AcrylamideModel.PH_REFERENCE.value()));
	}

	/** Smooth step from 1 (dry, aw ≤ aw,dry) to 0 (wet, aw ≥ aw,wet). */
	public static double dryness(double aw) {
		double dry = AcrylamideModel.GATE_DRY.value();
		double wet = AcrylamideModel.GATE_WET.value();
		return gate(aw, dry, wet);
	}

	private static double gate(double aw, double dry, double wet) {
		if (aw <= dry) {
			return 1;
		}
		if (aw >= wet) {
			return 0;
		}
		double u = (wet - aw) / (wet - dry);
		return u * u * (3 - 2 * u);
	}

	/**
	 * Advances every layer by dt from the state the view shows now (after the step's heat
	 * and moisture).
	 */
	@Override
	public void step(Layers layers, double dt) {
		double yield = kinetics.yield();
		double kfRef = kinetics.formationRateAtRef() * phFactor / yield;
		double keRef = kinetics.eliminationRateAtRef();
		double mass = 0;
		double wet = 0;
		double crustMass = 0;
		double crustWet = 0;
		for (int i = 0; i < n; i++) {
			double t = layers.temperatureK(i);
			if (t >= skipBelowK) {
				double g = gate(layers.waterActivity(i), gateDry, gateWet);
				if (g > 0) {
					// condensation, implicit in the limiting precursor so neither goes
					// negative
					double kc = kfRef * rates.formation(t) * g;
					double a = asparagine[i];
					double s = sugar[i];
					double limiting = Math.min(a, s);
					double excess = Math.max(a, s);
					double used = limiting - limiting / (1 + kc * excess * dt);
					asparagine[i] = a - used;
					sugar[i] = s - used;
					acrylamide[i] += yield * used;
				}
				if (acrylamide[i] > 0) {
					double ke = keRef * rates.elimination(t);
					acrylamide[i] /= 1 + ke * dt;
				}
			}
			double dm = layers.dryMass(i);
			double w = dm * (1 + layers.moisture(i));
			double aa = acrylamide[i] * dm;
			mass += aa;
			wet += w;
			crustMass += crustWeight[i] * aa;
			crustWet += crustWeight[i] * w;
		}
		portion = wet > 0 ? mass / wet * UG_PER_MMOL : 0;
		crust = crustWet > 0 ? crustMass / crustWet * UG_PER_MMOL : 0;
	}

	/**
	 * Acrylamide in the outer crust layer of face 0, µg per kg as eaten, after the last
	 * step.
	 */
	public double crustUgPerKg() {
		return crust;
	}

	/** Acrylamide in the whole piece, µg per kg as eaten, after the last step. */
	public double portionUgPerKg() {
		return portion;
	}

	/** Depth of the crust layer reported, m. */
	public double crustDepthM() {
		return crustDepthM;
	}

	/** Free asparagine of layer i, mmol/kg d.m. */
	public double asparagine(int i) {
		return asparagine[i];
	}

	/** Reducing sugar of layer i, mmol/kg d.m. */
	public double reducingSugar(int i) {
		return sugar[i];
	}

	/** Acrylamide of layer i, mmol/kg d.m. */
	public double acrylamide(int i) {
		return acrylamide[i];
	}

	@Override
	public double crustLevel() {
		return crustUgPerKg();
	}

	@Override
	public double portionLevel() {
		return portionUgPerKg();
	}

}
