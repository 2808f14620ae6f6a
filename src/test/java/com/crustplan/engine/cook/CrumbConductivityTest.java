package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.properties.ThermalProperties;
import com.crustplan.engine.water.PoreVapourConductivity;

/**
 * Heat through bread crumb, closed cells and open, against published figures: the
 * apparent diffusivity of baked crumb heated to 100 °C, and the share of evaporation–
 * condensation in the conductivity of unset dough.
 */
class CrumbConductivityTest {

	private static final double POROSITY = 0.6;

	/**
	 * A humid crumb wall: the activity of the lean dough just under the evaporation
	 * front.
	 */
	private static final double CRUMB_ACTIVITY = 0.97;

	private final Surface bread = Surface.typical(FoodCategory.BREAD);

	private final MatrixProperties matrix = new MatrixProperties(bread.composition().dryMatterFractions(), 0, POROSITY,
			1);

	private final double[] fractions = matrix.massFractions(bread.composition().moistureDryBasis()).clone();

	private final double[] props = new double[3];

	private double matrixConductivity(double c) {
		ThermalProperties.evaluate(fractions, c, props);
		return props[1];
	}

	@Test
	void shouldMatchTheApparentDiffusivityOfBakedCrumb() {
		// Zanoni, Peri & Gianotti 1995, J Food Eng 26:497: crumb of baked bread
		// heated in an oven at 100 °C, α = exp(0.01·ε[%] − 15.25) m²/s, 4.3e-7 at
		// 60 % porosity. The engine's open crumb as one equivalent diffusivity
		// over the same rise, 25 → 99 °C: the Kirchhoff mean ∫k dT / ∫ρc dT (exact
		// for steady conduction with k(T)). ±30 %: their α absorbs how they set
		// the surface, ours the vapour form's approximations.
		double published = Math.exp(0.01 * 100 * POROSITY - 15.25);
		double k = 0;
		double heat = 0;
		for (double c = 25; c <= 99; c += 1) {
			double km = matrixConductivity(c);
			double rho = (1 - POROSITY) / props[2];
			heat += rho * props[0];
			k += MatrixProperties.conductivity(km, POROSITY, POROSITY,
					PoreVapourConductivity.at(c + 273.15, CRUMB_ACTIVITY), 1);
		}
		assertEquals(published, k / heat, 0.3 * published);
	}

	@Test
	void shouldCarryMostOfTheHeatOfUnsetDoughByEvaporationCondensation() {
		// Zhang, Yang, Xu, Long & Ye 2025, Foods 14:1649 (model calibrated on
		// baking experiments): in closed pores evaporation–diffusion–condensation
		// gives about 60 % of the effective conductivity. Ours, averaged over
		// unset dough (25–70 °C): ±15 points, a model's figure, not a measurement
		double share = 0;
		int n = 0;
		for (double c = 25; c <= 70; c += 1) {
			double km = matrixConductivity(c);
			double kv = PoreVapourConductivity.at(c + 273.15, CRUMB_ACTIVITY);
			double with = MatrixProperties.conductivity(km, POROSITY, POROSITY, kv, 0);
			double without = MatrixProperties.conductivity(km, POROSITY, POROSITY, 0, 0);
			share += (with - without) / with;
			n++;
		}
		assertEquals(0.6, share / n, 0.15);
	}

	@Test
	void shouldNeverConductLessOnceOpenAndRiseSteeplyTowardsBoiling() {
		// opening takes the walls out of the vapour's path; the open crumb's k
		// rises several-fold from 60 to 95 °C, the steep rise bread-baking models
		// carry (de Vries 1958 form; Thorvaldsson & Janestad 1999, J Food Eng
		// 40:167)
		for (double c = 25; c <= 99; c += 2) {
			double km = matrixConductivity(c);
			double kv = PoreVapourConductivity.at(c + 273.15, CRUMB_ACTIVITY);
			assertTrue(MatrixProperties.conductivity(km, POROSITY, POROSITY, kv, 1) >= MatrixProperties.conductivity(km,
					POROSITY, POROSITY, kv, 0), c + " °C");
		}
		double warm = MatrixProperties.conductivity(matrixConductivity(60), POROSITY, POROSITY,
				PoreVapourConductivity.at(333.15, CRUMB_ACTIVITY), 1);
		double hot = MatrixProperties.conductivity(matrixConductivity(95), POROSITY, POROSITY,
				PoreVapourConductivity.at(368.15, CRUMB_ACTIVITY), 1);
		assertTrue(hot > 3 * warm, warm + " → " + hot);
	}

}
