package com.crustplan.engine.acrylamide;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * The per-layer kinetics on a uniform, constant state (every layer at one temperature and
 * water activity), where the answers are known in closed form.
 */
class AcrylamideFormationTest {

	private static final Surface POTATO = Surface.defaults(FoodCategory.POTATO);

	/** A still state: all layers at one temperature, moisture and water activity. */
	private static Layers uniform(Grid grid, double temperatureK, double moisture, double aw) {
		return new Layers() {

			@Override
			public Grid grid() {
				return grid;
			}

			@Override
			public int size() {
				return grid.size();
			}

			@Override
			public double temperatureK(int i) {
				return temperatureK;
			}

			@Override
			public double moisture(int i) {
				return moisture;
			}

			@Override
			public double waterActivity(int i) {
				return aw;
			}

			@Override
			public double dryMass(int i) {
				return 200 * grid.width(i);
			}

			@Override
			public double timeS() {
				return 0;
			}
		};
	}

	private static AcrylamideFormation heldAt(Surface s, AcrylamideKinetics k, double temperatureC, double seconds,
			double dt) {
		Grid grid = Grid.uniform(0.002, 5);
		AcrylamideFormation f = new AcrylamideFormation(s, grid, k);
		Layers state = uniform(grid, temperatureC + 273.15, 0.05, 0.2);
		for (double t = 0; t < seconds - 1e-9; t += dt) {
			f.step(state, dt);
		}
		return f;
	}

	@Test
	void secondOrderCondensationMatchesTheClosedForm() {
		// A + B → products with [A]₀ = [B]₀: [A](t) = [A]₀/(1 + k[A]₀t) (second-order
		// kinetics, e.g. Atkins'
		// Physical Chemistry); acrylamide = Y·([A]₀ − [A]) without elimination. 0.5 s
		// steps: 1 % tolerance
		// covers the first-order time-stepping error.
		Surface equimolar = POTATO.withAsparagineMgPerKg(POTATO.composition().reducingSugarPct() * 10
				/ AcrylamideModel.M_HEXOSE.value() * AcrylamideModel.M_ASPARAGINE.value() * 1000);
		AcrylamideKinetics noElimination = new AcrylamideKinetics(AcrylamideKinetics.DEFAULT.formationRateAtRef(),
				AcrylamideKinetics.DEFAULT.formationActivationEnergy(), 0,
				AcrylamideKinetics.DEFAULT.eliminationActivationEnergy(), AcrylamideKinetics.DEFAULT.yield());
		double a0 = AcrylamideFormation.initialAsparagine(equimolar);
		assertEquals(a0, AcrylamideFormation.initialReducingSugar(equimolar.composition()), 1e-9 * a0);
		double seconds = 600;
		AcrylamideFormation f = heldAt(equimolar, noElimination, 170, seconds, 0.5);
		double k = noElimination.formationRateAtRef() / noElimination.yield()
				* AcrylamideFormation.phFactor(equimolar.ph());
		double expected = a0 / (1 + k * a0 * seconds);
		assertEquals(expected, f.asparagine(2), 0.01 * expected);
		// precursor balance: what condensed, times the yield, is the acrylamide (exact in
		// the scheme)
		assertEquals(noElimination.yield() * (a0 - f.asparagine(2)), f.acrylamide(2), 1e-12 * a0);
		assertEquals(f.asparagine(2), f.reducingSugar(2), 1e-12 * a0);
	}

	@Test
	void formationIsNegligibleBelow120C() {
		// Regulation (EU) 2017/2158 recital 3: acrylamide forms at temperatures typically
		// above 120 °C.
		// The initial rate (a 5 s hold, precursors barely used) of a dry layer at 110 °C
		// is about 1 % of that at 170 °C, and at 120 °C under 3 %: the Arrhenius ratio
		// with Ea,f = 107 kJ/mol from the refit on whole strips gives 1.04 % and 2.45 %
		// (with the 110 kJ/mol of the previous fit 0.90 % and 2.2 %; the 110 °C bound was
		// 1 %, raised to 1.5 % when the blanched strips' precursors were taken from
		// published leaching and the fitted Ea fell).
		double cool = heldAt(POTATO, AcrylamideKinetics.DEFAULT, 110, 5, 0.1).acrylamide(2);
		double warm = heldAt(POTATO, AcrylamideKinetics.DEFAULT, 120, 5, 0.1).acrylamide(2);
		double hot = heldAt(POTATO, AcrylamideKinetics.DEFAULT, 170, 5, 0.1).acrylamide(2);
		assertTrue(warm < 0.03 * hot, () -> "120 °C: " + warm + ", 170 °C: " + hot);
		assertTrue(cool < 0.015 * hot, () -> "110 °C: " + cool + ", 170 °C: " + hot);
	}

	@Test
	void wetLayersFormNone() {
		// formation needs a dried layer (Food Chem 352:129305, 2021: crisps form
		// acrylamide once below ≈ 6 % d.b.)
		assertEquals(0, AcrylamideFormation.dryness(0.95), 0.0);
		assertEquals(1, AcrylamideFormation.dryness(0.3), 0.0);
		Grid grid = Grid.uniform(0.002, 5);
		AcrylamideFormation f = new AcrylamideFormation(POTATO, grid);
		Layers wetAndHot = uniform(grid, 443.15, 3, 0.99);
		for (int i = 0; i < 600; i++) {
			f.step(wetAndHot, 1);
		}
		assertEquals(0, f.portionUgPerKg(), 0.0);
	}

	@Test
	void lowerPhFormsLess() {
		// lower pH, less acrylamide (Jung, Choi & Ju 2003; Rydberg et al. 2003); one pH
		// unit lower scales the
		// initial rate by 10^−β. A 1 s hold uses under 1 % of the precursors: 1 %
		// tolerance.
		Surface acid = POTATO.withPh(POTATO.basePh() - 1);
		double normal = heldAt(POTATO, AcrylamideKinetics.DEFAULT, 160, 1, 0.1).acrylamide(2);
		double lower = heldAt(acid, AcrylamideKinetics.DEFAULT, 160, 1, 0.1).acrylamide(2);
		assertEquals(Math.pow(10, -AcrylamideModel.PH_SLOPE.value()), lower / normal, 0.01);
	}

	@Test
	void eliminationRemovesAcrylamideAtHighTemperature() {
		// acrylamide is an intermediate: it is eliminated on prolonged heating (Knol et
		// al. 2005; Claeys et al. 2005)
		AcrylamideKinetics k = AcrylamideKinetics.DEFAULT;
		AcrylamideKinetics noElimination = new AcrylamideKinetics(k.formationRateAtRef(), k.formationActivationEnergy(),
				0, k.eliminationActivationEnergy(), k.yield());
		double with = heldAt(POTATO, k, 190, 1800, 1).acrylamide(2);
		double without = heldAt(POTATO, noElimination, 190, 1800, 1).acrylamide(2);
		assertTrue(with < without, () -> with + " vs " + without);
	}

	@Test
	void freshBasisDilutesByTheWaterPresent() {
		// µg/kg as eaten = µg/kg d.m. / (1 + X): with X = 1 the fresh figure is half the
		// dry-matter figure (exact)
		Grid grid = Grid.uniform(0.002, 5);
		AcrylamideFormation dryBasis = new AcrylamideFormation(POTATO, grid);
		AcrylamideFormation wetBasis = new AcrylamideFormation(POTATO, grid);
		Layers dry = uniform(grid, 443.15, 0, 0.2);
		Layers wet = uniform(grid, 443.15, 1, 0.2);
		for (int i = 0; i < 60; i++) {
			dryBasis.step(dry, 1);
			wetBasis.step(wet, 1);
		}
		assertEquals(0.5 * dryBasis.portionUgPerKg(), wetBasis.portionUgPerKg(), 1e-9 * dryBasis.portionUgPerKg());
		assertEquals(dryBasis.portionUgPerKg(), dryBasis.crustUgPerKg(), 1e-9 * dryBasis.portionUgPerKg(),
				"uniform state");
		assertEquals(0.001, dryBasis.crustDepthM(), 0.0);
	}

	@Test
	void rateTableMatchesTheArrheniusLaw() {
		// the tabulated factors against exp(−Ea/R·(1/T − 1/T_ref)) computed directly:
		// linear interpolation over
		// 0.05 K errs by (Ea/RT²·0.05 K)²/8 < 1e-5 relative at 105 °C
		RateTable table = RateTable.DEFAULT;
		for (double t = 378.2; t < 720; t += 0.737) {
			assertEquals(table.formationDirect(t), table.formation(t), 1e-5 * table.formationDirect(t), "T " + t);
			assertEquals(table.eliminationDirect(t), table.elimination(t), 1e-5 * table.eliminationDirect(t), "T " + t);
		}
		double e = AcrylamideKinetics.DEFAULT.formationActivationEnergy();
		double ratio = Math.exp(-e / 8.314462618 * (1 / 463.15 - 1 / 443.15));
		assertEquals(ratio, table.formation(463.15), 1e-5 * ratio, "190 °C relative to 170 °C");
	}

}
