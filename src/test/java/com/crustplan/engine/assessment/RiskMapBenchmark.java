package com.crustplan.engine.assessment;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import com.crustplan.engine.acrylamide.AcrylamideFormation;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;

/**
 * Speed of the acrylamide work: a 30-temperature fry risk map (goal: 60 ms) and the
 * per-step layer update alone. Run with
 * {@code java -cp target/test-classes:<test classpath> org.openjdk.jmh.Main RiskMapBenchmark}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 3, time = 2)
@Fork(1)
public class RiskMapBenchmark {

	private final Surface chips = Surface.defaults(FoodCategory.POTATO);

	private final double[] temperatures = new double[30];

	private final Grid grid = new Grid(0.01, CookSettings.DEFAULT_NODES, Grid.DEFAULT_CLUSTERING);

	private final Layers hotCrust = new Layers() {

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
			return crust(i) ? 440 - 8 * depth(i) : 374;
		}

		@Override
		public double moisture(int i) {
			return crust(i) ? 0.1 + 0.1 * depth(i) : 3.5;
		}

		@Override
		public double waterActivity(int i) {
			return crust(i) ? 0.2 + 0.08 * depth(i) : 1;
		}

		/**
		 * A fry: six dried, hot layers under each face, a wet interior at its boiling
		 * point.
		 */
		private boolean crust(int i) {
			return depth(i) < 6;
		}

		private int depth(int i) {
			return Math.min(i, grid.size() - 1 - i);
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

	public RiskMapBenchmark() {
		for (int i = 0; i < temperatures.length; i++) {
			temperatures[i] = 140 + 2 * i;
		}
	}

	@Benchmark
	public RiskMap fryerMap30Temperatures() {
		return RiskMap.compute(chips, Product.FRENCH_FRIES, new DeepFryer(170), Target.stage("golden"), temperatures,
				30, 900, CookSettings.defaults());
	}

	/** 1200 steps (10 min at 0.5 s) of the layer update alone, on a frying state. */
	@Benchmark
	public double formation1200Steps() {
		AcrylamideFormation f = new AcrylamideFormation(chips, grid);
		for (int s = 0; s < 1200; s++) {
			f.step(hotCrust, 0.5);
		}
		return f.portionUgPerKg();
	}

}
