package com.crustplan.engine.acrylamide;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * The state through the thickness after every step of one engine run, recorded so the
 * acrylamide kinetics can be integrated again over the same temperature and water history
 * with trial constants (the history does not depend on them).
 */
final class LayerHistory implements Consumer<Layers> {

	private final List<double[]> temperature = new ArrayList<>();

	private final List<double[]> moisture = new ArrayList<>();

	private final List<double[]> waterActivity = new ArrayList<>();

	private final List<double[]> dryMass = new ArrayList<>();

	private final List<Double> time = new ArrayList<>();

	private Grid grid;

	@Override
	public void accept(Layers layers) {
		grid = layers.grid();
		int n = layers.size();
		double[] t = new double[n];
		double[] x = new double[n];
		double[] aw = new double[n];
		double[] dm = new double[n];
		for (int i = 0; i < n; i++) {
			t[i] = layers.temperatureK(i);
			x[i] = layers.moisture(i);
			aw[i] = layers.waterActivity(i);
			dm[i] = layers.dryMass(i);
		}
		temperature.add(t);
		moisture.add(x);
		waterActivity.add(aw);
		dryMass.add(dm);
		time.add(layers.timeS());
	}

	int steps() {
		return time.size();
	}

	Grid grid() {
		return grid;
	}

	double timeS(int step) {
		return time.get(step);
	}

	/**
	 * Mean moisture of the whole piece after a step, kg water per kg of food (wet basis).
	 */
	double meanMoistureWetBasis(int step) {
		double water = 0;
		double dry = 0;
		double[] x = moisture.get(step);
		double[] dm = dryMass.get(step);
		for (int i = 0; i < x.length; i++) {
			water += dm[i] * x[i];
			dry += dm[i];
		}
		return water / (water + dry);
	}

	/**
	 * The first time the piece's mean moisture falls to {@code wetBasis}, interpolated
	 * between steps, as {step index after the crossing, fraction of that step}; null if
	 * never.
	 */
	double[] crossing(double wetBasis) {
		double before = meanMoistureWetBasis(0);
		for (int k = 1; k < steps(); k++) {
			double now = meanMoistureWetBasis(k);
			if (now <= wetBasis) {
				return new double[] { k, (before - wetBasis) / (before - now) };
			}
			before = now;
		}
		return null;
	}

	/** The recorded state after one step, as the live view the formation reads. */
	Layers at(int step) {
		double[] t = temperature.get(step);
		double[] x = moisture.get(step);
		double[] aw = waterActivity.get(step);
		double[] dm = dryMass.get(step);
		double now = time.get(step);
		Grid g = grid;
		return new Layers() {

			@Override
			public Grid grid() {
				return g;
			}

			@Override
			public int size() {
				return t.length;
			}

			@Override
			public double temperatureK(int i) {
				return t[i];
			}

			@Override
			public double moisture(int i) {
				return x[i];
			}

			@Override
			public double waterActivity(int i) {
				return aw[i];
			}

			@Override
			public double dryMass(int i) {
				return dm[i];
			}

			@Override
			public double timeS() {
				return now;
			}
		};
	}

}
