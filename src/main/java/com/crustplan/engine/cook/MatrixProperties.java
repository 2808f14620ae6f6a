package com.crustplan.engine.cook;

import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.properties.ThermalProperties;

/**
 * Step (1): each control volume's heat capacity and conductivity from its composition,
 * temperature and moisture (Choi &amp; Okos 1986), with the gas that fills what the food
 * no longer occupies mixed in by the geometric-mean rule; a face's standing water adds
 * its own heat capacity.
 */
final class MatrixProperties {

	private static final double LOG_GAS_CONDUCTIVITY = Math.log(ThermalProperties.AIR_CONDUCTIVITY);

	/**
	 * Dry-matter mass fractions of the composition, in {@link FoodComponent} order after
	 * water.
	 */
	private final double[] dryFractions;

	private final double[] massFractions = new double[FoodComponent.values().length];

	/** cp, k, specific volume from {@link ThermalProperties#evaluate}. */
	private final double[] props = new double[3];

	/** Heat capacity per m² of face, J/(m²·K). */
	final double[] capacity;

	/** W/(m·K). */
	final double[] conductivity;

	MatrixProperties(double[] dryFractions, int n) {
		this.dryFractions = dryFractions;
		this.capacity = new double[n];
		this.conductivity = new double[n];
	}

	/** Mass fractions of a matrix holding x kg water per kg dry matter. */
	double[] massFractions(double x) {
		double dry = 1 / (1 + x);
		massFractions[0] = x * dry;
		for (int j = 0; j < dryFractions.length; j++) {
			massFractions[j + 1] = dryFractions[j] * dry;
		}
		return massFractions;
	}

	void evaluate(CookState s) {
		int n = s.size();
		for (int i = 0; i < n; i++) {
			double tc = s.temperature[i] - 273.15;
			ThermalProperties.evaluate(massFractions(s.moisture[i]), tc, props);
			double mass = s.dryMass[i] * (1 + s.moisture[i]);
			double porosity = Math.max(0, Math.min(0.95, 1 - mass * props[2] / s.volume[i]));
			capacity[i] = mass * props[0];
			// geometric-mean rule k_m^(1−ε)·k_gas^ε, written with one exp
			conductivity[i] = porosity > 0
					? Math.exp((1 - porosity) * Math.log(props[1]) + porosity * LOG_GAS_CONDUCTIVITY) : props[1];
		}
		for (int face = 0; face < 2; face++) {
			int i = s.faceNode(face);
			capacity[i] += s.face(face).standingWater * FoodComponent.WATER.specificHeat(s.temperature[i] - 273.15);
		}
	}

}
