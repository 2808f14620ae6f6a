package com.crustplan.bench;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince54Integrator;
import org.hipparchus.ode.sampling.StepNormalizer;

import com.crustplan.engine.layers.HeatConduction;

/**
 * The two ways of solving an {@link OvenSlab}: the engine's backward-Euler conduction
 * step (properties and the face flux linearised about the start of each step, one
 * tridiagonal solve, as CookSimulation does) and Hipparchus' adaptive Dormand–Prince 5(4)
 * on the full nonlinear right-hand side. Both can record the profile every
 * {@code sampleS} seconds into {@code samples[k][i]} (null: record nothing).
 */
final class SlabSolvers {

	private SlabSolvers() {
	}

	/**
	 * Backward Euler with the engine's HeatConduction; {@code dt} must divide
	 * {@code sampleS}.
	 */
	static double[] backwardEuler(OvenSlab slab, double dt, double endS, double sampleS, double[][] samples) {
		int n = slab.n;
		double[] t = slab.initialState();
		double[] capacity = new double[n];
		double[] conductivity = new double[n];
		HeatConduction conduction = new HeatConduction(slab.grid);
		int steps = (int) Math.round(endS / dt);
		int perSample = samples == null ? 0 : (int) Math.round(sampleS / dt);
		if (samples != null) {
			samples[0] = t.clone();
		}
		for (int s = 1; s <= steps; s++) {
			slab.properties(t, capacity, conductivity);
			// q(T') ≈ q(T) − a·(T' − T) = b − a·T'
			double a0 = slab.faceFluxSlope(t[0]);
			double a1 = slab.faceFluxSlope(t[n - 1]);
			double b0 = slab.faceFlux(t[0]) + a0 * t[0];
			double b1 = slab.faceFlux(t[n - 1]) + a1 * t[n - 1];
			conduction.step(t, capacity, conductivity, dt, a0, b0, a1, b1);
			if (samples != null && s % perSample == 0) {
				samples[s / perSample] = t.clone();
			}
		}
		return t;
	}

	/**
	 * The same system as a Hipparchus ODE. Hipparchus hands back a new array per
	 * evaluation.
	 */
	static final class Equations implements OrdinaryDifferentialEquation {

		private final OvenSlab slab;

		private final double[] capacity;

		private final double[] conductivity;

		int evaluations;

		Equations(OvenSlab slab) {
			this.slab = slab;
			capacity = new double[slab.n];
			conductivity = new double[slab.n];
		}

		@Override
		public int getDimension() {
			return slab.n;
		}

		@Override
		public double[] computeDerivatives(double time, double[] t) {
			evaluations++;
			double[] dtdt = new double[slab.n];
			slab.derivatives(t, capacity, conductivity, dtdt);
			return dtdt;
		}

	}

	/**
	 * Dormand–Prince 5(4) with an absolute tolerance in kelvin on every node and no
	 * relative tolerance (temperatures are all 270–470 K, so a relative tolerance would
	 * only rescale it).
	 * @return the final profile; {@code evaluations[0]} gets the number of
	 * right-hand-side evaluations if given
	 */
	static double[] dormandPrince(OvenSlab slab, double absTolK, double endS, double sampleS, double[][] samples,
			int[] evaluations) {
		DormandPrince54Integrator integrator = new DormandPrince54Integrator(1e-9, endS, absTolK, 0);
		if (samples != null) {
			integrator.addStepHandler(new StepNormalizer(sampleS, (state, last) -> {
				int k = (int) Math.round(state.getTime() / sampleS);
				if (k < samples.length) {
					samples[k] = state.getPrimaryState().clone();
				}
			}));
		}
		Equations equations = new Equations(slab);
		ODEStateAndDerivative end = integrator.integrate(equations, new ODEState(0, slab.initialState()), endS);
		if (evaluations != null) {
			evaluations[0] = equations.evaluations;
		}
		return end.getPrimaryState();
	}

}
