package com.crustplan.engine.layers;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The moisture equation carries the shape factor as the conduction does: water leaving a
 * plane sheet, an infinite cylinder and a sphere whose surface is held dry follows the
 * series of Crank, The Mathematics of Diffusion (2nd ed. 1975), eqs. 4.18, 5.23 and 6.20,
 * for constant diffusivity.
 */
class MoistureShapeSeriesTest {

	/** Zeros of J0 (Abramowitz &amp; Stegun, Table 9.5); enough for Fo ≥ 0.05. */
	private static final double[] J0_ZEROS = { 2.404826, 5.520078, 8.653728, 11.791534, 14.930918, 18.071064, 21.211637,
			24.352472 };

	/**
	 * Share of the water still held, 1 − M_t/M_∞, at Fo = D·t/L² (L the half-thickness or
	 * the radius).
	 */
	static double stillHeld(int shape, double fo) {
		double sum = 0;
		switch (shape) {
			case 0 -> {
				for (int n = 0; n < 200; n++) {
					double k = (2 * n + 1) * Math.PI / 2;
					sum += 2 / (k * k) * Math.exp(-k * k * fo);
				}
			}
			case 1 -> {
				for (double a : J0_ZEROS) {
					sum += 4 / (a * a) * Math.exp(-a * a * fo);
				}
			}
			default -> {
				for (int n = 1; n < 200; n++) {
					sum += 6 / (n * n * Math.PI * Math.PI) * Math.exp(-n * n * Math.PI * Math.PI * fo);
				}
			}
		}
		return sum;
	}

	@ParameterizedTest(name = "shape {0}, Fo {1}")
	@CsvSource({ "0, 0.05", "0, 0.2", "0, 0.6", "1, 0.05", "1, 0.2", "1, 0.6", "2, 0.05", "2, 0.2", "2, 0.6" })
	void shouldDryAsCranksSeriesSays(int shape, double fourier) {
		// Crank's series at Fo = 0.05 must itself agree with its short-time form
		// (sphere: 6·√(Fo/π) − 3·Fo lost; eq. 6.21) to show the terms suffice
		if (shape == 2 && fourier == 0.05) {
			assertEquals(1 - (6 * Math.sqrt(fourier / Math.PI) - 3 * fourier), stillHeld(2, fourier), 1e-6);
		}
		// radius or half-thickness 5 mm, D 1e-9 m²/s, dry matter 200 kg/m³; default
		// clustered 25-node grid over the radius (a slab's half, with its centre a
		// symmetry point); the face node held dry by a stiff sink
		double length = 0.005;
		double d = 1e-9;
		Grid grid = new Grid(length, 25, Grid.DEFAULT_CLUSTERING, shape);
		int n = grid.size();
		double[] volume = new double[n];
		double[] dryMass = new double[n];
		double[] temperature = new double[n];
		for (int i = 0; i < n; i++) {
			volume[i] = grid.width(i);
			dryMass[i] = 200 * volume[i];
		}
		Arrays.fill(temperature, 330);
		double[] x = new double[n];
		Arrays.fill(x, 1);
		double total = 0;
		for (int i = 0; i < n; i++) {
			total += dryMass[i];
		}
		double time = fourier * length * length / d;
		double dt = time / 4000;
		MoistureDiffusion diffusion = new MoistureDiffusion(grid, (t, m) -> d);
		double[] next = new double[n];
		for (int k = 0; k < 4000; k++) {
			diffusion.assemble(dryMass, volume, temperature, x, dt);
			double sink = 1e6 * dryMass[0] / dt;
			diffusion.addEvaporation(0, sink * x[0], sink, x[0]);
			diffusion.solve(next);
			System.arraycopy(next, 0, x, 0, n);
		}
		double held = 0;
		for (int i = 0; i < n; i++) {
			held += dryMass[i] * x[i];
		}
		// backward Euler with 4000 steps and the default grid: within 0.002 of the series
		assertEquals(stillHeld(shape, fourier), held / total, 0.002, "share of water still held");
	}

}
