package com.crustplan.engine.cook;

import java.util.Arrays;

import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.properties.ThermalProperties;
import com.crustplan.engine.water.PoreVapourConductivity;

/**
 * Step (1): each control volume's heat capacity and conductivity from its composition,
 * temperature and moisture (Choi &amp; Okos 1986), frying oil it has taken up counted as
 * fat, and the pores mixed in by the geometric-mean rule k_m^(1−ε)·k_pore^ε. What a layer
 * does with the volume of the water it loses is the category's: a share s closes by
 * shrinkage (muscle, s = 1, stays a saturated gel), the rest opens pores, which frying
 * oil partly fills ({@link OilUptake}); pores hold still gas. Across the raw food's own
 * closed gas cells (proofed dough), where their walls are wet, evaporation–condensation
 * ({@link PoreVapourConductivity}) adds to that, as the cells in series with their walls:
 * it carries heat through humid dough (at most k_m/(1 − ε)) but not through a dry crust.
 * As the crumb sets (71–81 °C) the cells open into one connected pore space, and the
 * vapour term then joins the pore gas in the mixing rule itself, free of the walls: the
 * steep rise of crumb conductivity towards 100 °C. A layer keeps the highest temperature
 * it has reached, since set crumb does not close again. A face's standing water adds its
 * own heat capacity.
 */
final class MatrixProperties {

	private static final int FAT = FoodComponent.FAT.ordinal();

	/**
	 * Dry-matter mass fractions of the composition, in {@link FoodComponent} order after
	 * water.
	 */
	private final double[] dryFractions;

	/** Share of a lost water's volume that the layer gives up by shrinking. */
	private final double shrinkage;

	/** Gas fraction of the raw food: closed, humid cells (dough crumb). */
	private final double cellPorosity;

	private static final double LOG_AIR = Math.log(ThermalProperties.AIR_CONDUCTIVITY);

	private final double[] massFractions = new double[FoodComponent.values().length];

	/** cp, k, specific volume from {@link ThermalProperties#evaluate}. */
	private final double[] props = new double[3];

	/**
	 * Highest temperature each layer has reached, K (NaN before the first evaluation).
	 */
	private final double[] peakK;

	/** Heat capacity per m² of face, J/(m²·K). */
	final double[] capacity;

	/** W/(m·K). */
	final double[] conductivity;

	MatrixProperties(double[] dryFractions, double shrinkage, double cellPorosity, int n) {
		this.dryFractions = dryFractions;
		this.shrinkage = shrinkage;
		this.cellPorosity = cellPorosity;
		this.peakK = new double[n];
		Arrays.fill(this.peakK, Double.NaN);
		this.capacity = new double[n];
		this.conductivity = new double[n];
	}

	/** Mass fractions of a matrix holding x kg water per kg dry matter. */
	double[] massFractions(double x) {
		return massFractions(x, 0);
	}

	/**
	 * Mass fractions of a matrix holding x kg water and {@code oilPerDry} kg oil per kg
	 * dry matter, the oil counted as fat.
	 */
	double[] massFractions(double x, double oilPerDry) {
		double share = 1 / (1 + x + oilPerDry);
		massFractions[0] = x * share;
		for (int j = 0; j < dryFractions.length; j++) {
			massFractions[j + 1] = dryFractions[j] * share;
		}
		massFractions[FAT] += oilPerDry * share;
		return massFractions;
	}

	/**
	 * What evaporation–condensation adds across the raw food's closed, humid cells: the
	 * cells in series with their walls (heat must cross each wall; a closed-cell foam),
	 * with and without the vapour conductivity k_v in the cell gas. Pores opened by
	 * drying vent to the outside (vapour leaves rather than condenses) and get none.
	 */
	private static double evaporationCondensationGain(double km, double cells, double kv) {
		if (!(kv > 0)) {
			return 0;
		}
		double wall = (1 - cells) / km;
		return 1 / (wall + cells / (ThermalProperties.AIR_CONDUCTIVITY + kv))
				- 1 / (wall + cells / ThermalProperties.AIR_CONDUCTIVITY);
	}

	/**
	 * Open cells: the gas space is one connected pore, so the vapour term joins the pore
	 * gas in the engine's geometric-mean rule with the matrix (de Vries 1963, in Physics
	 * of Plant Environment: the apparent conductivity k_gas + k_v of humid pore air in a
	 * moist porous medium), the pores vented by drying keeping still gas.
	 */
	static double openCellConductivity(double km, double porosity, double cells, double kv) {
		return Math.exp((1 - porosity) * Math.log(km) + (porosity - cells) * LOG_AIR
				+ cells * Math.log(ThermalProperties.AIR_CONDUCTIVITY + kv));
	}

	/**
	 * Closed cells: the geometric-mean rule with still gas, plus what
	 * evaporation–condensation adds across the cells in series with their walls.
	 */
	static double closedCellConductivity(double km, double porosity, double cells, double kv) {
		return Math.exp((1 - porosity) * Math.log(km) + porosity * LOG_AIR)
				+ evaporationCondensationGain(km, cells, kv);
	}

	/**
	 * A layer's conductivity with a share of the raw food's humid gas cells opened.
	 * Opening takes the walls out of the vapour's path, so it never lowers k: below about
	 * 75 °C, where the two rules differ by under a tenth, the closed-cell value stands.
	 */
	static double conductivity(double km, double porosity, double cells, double kv, double openShare) {
		double closed = closedCellConductivity(km, porosity, cells, kv);
		if (!(openShare > 0) || !(kv > 0)) {
			return closed;
		}
		return closed + openShare * Math.max(0, openCellConductivity(km, porosity, cells, kv) - closed);
	}

	void evaluate(CookState s) {
		int n = s.size();
		for (int i = 0; i < n; i++) {
			peakK[i] = Double.isNaN(peakK[i]) ? s.temperature[i] : Math.max(peakK[i], s.temperature[i]);
			double tc = s.temperature[i] - 273.15;
			double x = s.moisture[i];
			double dry = s.dryMass[i];
			ThermalProperties.evaluate(massFractions(x, s.oil[i] / dry), tc, props);
			double mass = dry * (1 + x) + s.oil[i];
			double lostWater = Math.max(0, (s.initialMoisture - x) * dry) / FoodComponent.WATER.density(tc);
			double volume = s.volume[i] - shrinkage * lostWater;
			double porosity = Math.max(0, Math.min(0.95, 1 - mass * props[2] / volume));
			capacity[i] = mass * props[0];
			if (porosity > 0) {
				// geometric-mean rule over matrix and pore gas, written with one exp
				double km = props[1];
				double cells = Math.min(porosity, cellPorosity);
				double aw = cells > 0 ? s.waterActivity(i) : 0;
				double kv = cells > 0 ? PoreVapourConductivity.at(s.temperature[i], aw, s.isotherm().matrixActivity(aw))
						: 0;
				conductivity[i] = conductivity(km, porosity, cells, kv, PoreVapourConductivity.openCellShare(peakK[i]));
			}
			else {
				conductivity[i] = props[1];
			}
		}
		for (int face = 0; face < 2; face++) {
			int i = s.faceNode(face);
			capacity[i] += s.face(face).standingWater * FoodComponent.WATER.specificHeat(s.temperature[i] - 273.15);
		}
	}

}
