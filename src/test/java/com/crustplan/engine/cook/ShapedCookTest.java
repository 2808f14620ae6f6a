package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.layers.Layers;
import com.crustplan.engine.properties.ThermalProperties;

/**
 * The cook's grid follows the surface's shape: a strip's, cube's or ball's centre warms
 * as the analytic conduction series for an infinite cylinder or a sphere says, as a
 * slab's does for the plane wall.
 */
class ShapedCookTest {

	/**
	 * Zeros of J0 and J1 at them (Abramowitz &amp; Stegun, Handbook of Mathematical
	 * Functions, Table 9.5); 2/(λ1·J1(λ1)) = 1.6020 is Incropera's C1 for the infinite
	 * cylinder at Bi → ∞ (Table 5.1: ζ1 2.4050, C1 1.6018).
	 */
	private static final double[] J0_ZEROS = { 2.404826, 5.520078, 8.653728, 11.791534, 14.930918, 18.071064, 21.211637,
			24.352472 };

	private static final double[] J1_AT_ZEROS = { 0.519147, -0.340265, 0.271452, -0.232460, 0.206546, -0.187729,
			0.173266, -0.161702 };

	/**
	 * The centre's response to a unit step of the surface temperature at Fourier number
	 * fo (Fo = α·t/L², L the half-thickness or the radius): 1 − Σ Cn·exp(−λn²·Fo), the Bi
	 * → ∞ series of Incropera §5.5–5.6 (eqs. 5.39, 5.49, 5.50 with their Bi → ∞
	 * eigenvalues), eight terms. Below Fo 0.02 the centre has not yet felt the step (the
	 * semi-infinite solution gives under 1e-5 there), which is also where eight terms
	 * stop being enough.
	 */
	static double centreStepResponse(int shape, double fo) {
		if (fo < 0.02) {
			return 0;
		}
		double sum = 0;
		for (int n = 0; n < 8; n++) {
			double lambda;
			double c;
			switch (shape) {
				case 0 -> {
					lambda = (2 * n + 1) * Math.PI / 2;
					c = 4 / Math.PI * (n % 2 == 0 ? 1 : -1) / (2 * n + 1);
				}
				case 1 -> {
					lambda = J0_ZEROS[n];
					c = 2 / (lambda * J1_AT_ZEROS[n]);
				}
				default -> {
					lambda = (n + 1) * Math.PI;
					c = 2 * (n % 2 == 0 ? 1 : -1);
				}
			}
			sum += c * Math.exp(-lambda * lambda * fo);
		}
		return 1 - sum;
	}

	/**
	 * A potato strip, cube, ball or slab of 10 mm in a 100 °C steam oven (pure steam, so
	 * no water leaves and none boils: the face gains heat by condensation alone). The
	 * surface temperature the cook computes is taken as given, and the centre is
	 * predicted from it by Duhamel's superposition of the step responses above, with the
	 * diffusivity of the engine's own properties (Choi &amp; Okos 1986) at 60 °C, the
	 * middle of the 20 → 100 °C rise. The centre must follow within 3 % of the 80 K rise:
	 * the diffusivity moves by about ±6 % across the rise, which is what the tolerance
	 * allows for; the grid's own error is far smaller (see HeatConductionTest).
	 */
	@ParameterizedTest
	@EnumSource(Shape.class)
	void shouldWarmTheCentreAsTheSeriesForItsShapeSays(Shape shape) {
		Surface s = Surface.defaults(FoodCategory.POTATO)
			.withThicknessMm(10)
			.withSurfaceWaterGPerM2(0)
			.withInitialTemperatureC(20)
			.withShape(shape);
		List<double[]> history = new ArrayList<>();
		CookSimulation.run(s, new Oven(100, true, 100), Target.stage("golden"),
				CookSettings.defaults().withHorizonS(300), LayerReaction.NONE, (Layers l) -> {
					CookState state = (CookState) l;
					history.add(new double[] { l.timeS(), state.surfaceK() - 273.15, state.coreK() - 273.15 });
				});
		double lengthM = shape.gridLengthM(10) / (shape == Shape.SLAB ? 2 : 1);
		double alpha = diffusivity(s.composition(), 60);
		int checked = 0;
		for (int k = 0; k < history.size(); k += 20) {
			double t = history.get(k)[0];
			double predicted = 20;
			double before = 20;
			double previousTime = 0;
			for (int j = 0; j <= k; j++) {
				double[] h = history.get(j);
				double mid = 0.5 * (previousTime + h[0]);
				predicted += (h[1] - before)
						* centreStepResponse(shape.factor(), alpha * (t - mid) / (lengthM * lengthM));
				before = h[1];
				previousTime = h[0];
			}
			assertEquals(predicted, history.get(k)[2], 0.03 * 80, shape + " centre at " + t + " s");
			checked++;
		}
		assertEquals(30, checked, 1);
	}

	private static double diffusivity(Composition c, double temperatureC) {
		MatrixProperties p = new MatrixProperties(c.dryMatterFractions(), 0, 0, 1);
		double[] f = p.massFractions(c.moistureDryBasis());
		return ThermalProperties.conductivity(f, temperatureC) / ThermalProperties.density(f, temperatureC)
				/ ThermalProperties.specificHeat(f, temperatureC);
	}

}
