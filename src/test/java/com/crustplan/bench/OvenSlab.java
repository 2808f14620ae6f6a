package com.crustplan.bench;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.properties.ThermalProperties;

/**
 * The conduction part of a cook written as a method-of-lines system, so a general-purpose
 * ODE integrator and the engine's own stepper can solve the same equations on the same
 * grid: <pre>
 *   C_i(T_i)·dT_i/dt = Σ_j G_ij(T)·(T_j − T_i) + [face] q(T_face)
 *   q(T) = h·(T_air − T) + ε·σ·(T_air⁴ − T⁴)      both faces in a fan oven, walls at the air temperature
 * </pre> with C_i = m_i·cp(T_i) and k(T_i) from the Choi–Okos mixing rules exactly as
 * CookSimulation evaluates them (including its porosity rule), G_ij the series
 * conductance of the two half-spacings as in HeatConduction. Moisture is held at its
 * initial value and the face exchanges no vapour: no evaporation and no local boiling.
 * The engine's local-boiling constraint (a node holding water cannot rise above its
 * boiling point; the excess enthalpy boils water off) is an inequality on the state, not
 * a right-hand side, so a general ODE integrator cannot impose it without event handling
 * and a change of equations at every node; it is left out of both sides of the
 * comparison.
 */
final class OvenSlab {

	/** Stefan–Boltzmann constant, W/(m²·K⁴) (CODATA 2018, exact). */
	static final double SIGMA = 5.670374419e-8;

	private static final double LOG_AIR_CONDUCTIVITY = Math.log(ThermalProperties.AIR_CONDUCTIVITY);

	final String name;

	final Grid grid;

	final int n;

	final double airK;

	final double initialK;

	final double convection;

	final double emissivity;

	private final double[] nodeMass;

	private final double[] volume;

	private final double[] massFractions = new double[FoodComponent.values().length];

	private final double[] props = new double[3];

	OvenSlab(String name, Surface surface, double ovenC, int nodes) {
		this.name = name;
		this.grid = new Grid(surface.thicknessMm() / 1000, nodes, Grid.DEFAULT_CLUSTERING);
		this.n = nodes;
		this.airK = ovenC + 273.15;
		this.initialK = surface.initialTemperatureC() + 273.15;
		this.convection = HeatSetup.OVEN_FAN.value();
		this.emissivity = foodEmissivity();
		double x0 = surface.composition().moistureDryBasis();
		double[] dry = surface.composition().dryMatterFractions();
		massFractions[0] = x0 / (1 + x0);
		for (int j = 0; j < dry.length; j++) {
			massFractions[j + 1] = dry[j] / (1 + x0);
		}
		// the same initial bulk density as CookSimulation: matrix density at the start,
		// less the pores
		double matrixVolume = ThermalProperties.specificVolume(massFractions, surface.initialTemperatureC());
		double bulkDensity = (1 - surface.category().initialPorosity().value()) / matrixVolume;
		nodeMass = new double[n];
		volume = new double[n];
		for (int i = 0; i < n; i++) {
			volume[i] = grid.width(i);
			nodeMass[i] = bulkDensity * volume[i];
		}
	}

	/** A 25 mm steak (meat defaults) in a 200 °C fan oven. */
	static OvenSlab steak(int nodes) {
		return new OvenSlab("steak 25 mm, fan oven 200 °C", Surface.defaults(FoodCategory.MEAT), 200, nodes);
	}

	/** 10 mm chips (potato defaults) in a 200 °C fan oven. */
	static OvenSlab chips(int nodes) {
		return new OvenSlab("chips 10 mm, fan oven 200 °C", Surface.defaults(FoodCategory.POTATO), 200, nodes);
	}

	/**
	 * The same food on a grid refined by {@code factor} (factor·(n − 1) + 1 nodes, so
	 * every node is kept).
	 */
	OvenSlab refined(Surface surface, int factor) {
		return new OvenSlab(name, surface, airK - 273.15, factor * (n - 1) + 1);
	}

	private static double foodEmissivity() {
		for (Parameter p : HeatSetup.parameters()) {
			if (p.symbol().equals("ε")) {
				return p.value();
			}
		}
		throw new IllegalStateException("the engine lists no food emissivity");
	}

	double[] initialState() {
		double[] t = new double[n];
		java.util.Arrays.fill(t, initialK);
		return t;
	}

	/**
	 * Heat capacity per m² and conductivity of every node at temperatures {@code t}
	 * (CookSimulation step 1).
	 */
	void properties(double[] t, double[] capacity, double[] conductivity) {
		for (int i = 0; i < n; i++) {
			double tc = t[i] - 273.15;
			ThermalProperties.evaluate(massFractions, tc, props);
			double porosity = Math.max(0, Math.min(0.95, 1 - nodeMass[i] * props[2] / volume[i]));
			capacity[i] = nodeMass[i] * props[0];
			conductivity[i] = porosity > 0
					? Math.exp((1 - porosity) * Math.log(props[1]) + porosity * LOG_AIR_CONDUCTIVITY) : props[1];
		}
	}

	/** Heat flux into a face at temperature {@code t}, W/m². */
	double faceFlux(double t) {
		double t2 = t * t;
		double a2 = airK * airK;
		return convection * (airK - t) + emissivity * SIGMA * (a2 * a2 - t2 * t2);
	}

	/** −dq/dT ≥ 0, W/(m²·K). */
	double faceFluxSlope(double t) {
		return convection + 4 * emissivity * SIGMA * t * t * t;
	}

	/**
	 * The right-hand side dT/dt, using {@code capacity} and {@code conductivity} as
	 * scratch.
	 */
	void derivatives(double[] t, double[] capacity, double[] conductivity, double[] dtdt) {
		properties(t, capacity, conductivity);
		dtdt[0] = faceFlux(t[0]);
		dtdt[n - 1] = faceFlux(t[n - 1]);
		for (int i = 1; i < n - 1; i++) {
			dtdt[i] = 0;
		}
		for (int i = 0; i < n - 1; i++) {
			double d = grid.spacing(i);
			double g = 1 / (0.5 * d / conductivity[i] + 0.5 * d / conductivity[i + 1]);
			double q = g * (t[i + 1] - t[i]);
			dtdt[i] += q;
			dtdt[i + 1] -= q;
		}
		for (int i = 0; i < n; i++) {
			dtdt[i] /= capacity[i];
		}
	}

}
