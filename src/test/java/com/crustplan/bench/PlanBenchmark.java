package com.crustplan.bench;

import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.assessment.RiskMap;
import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.cook.StepsResult;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.heat.Rest;
import com.crustplan.engine.cook.CookSettings;

/**
 * One plan at the default settings (CookSettings.defaults()), with the series a plan page
 * charts, and the 30-temperature fryer map. Goals (issue 6): a plan ≤ 2 ms median, the
 * map ≤ 60 ms. Sampling mode gives the median (p0.50) as well as the mean. Short runs:
 * the machine's two cores are shared.
 */
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
@State(Scope.Benchmark)
public class PlanBenchmark {

	private static final CookSettings DEFAULTS = CookSettings.defaults();

	/**
	 * A map needs only the time to target: it can stop there instead of running on by a
	 * quarter.
	 */
	private static final CookSettings STOP_AT_TARGET = DEFAULTS.withRecordSeries(false).withRunPastTargetFraction(0);

	private ExecutorService pool;

	@Setup
	public void startPool() {
		pool = Executors.newFixedThreadPool(2);
	}

	@TearDown
	public void stopPool() {
		pool.shutdownNow();
	}

	@Benchmark
	public CookResult steakPan220Browned() {
		return Plans.steak(DEFAULTS);
	}

	@Benchmark
	public CookResult chipsFryer175Golden() {
		return Plans.chips(DEFAULTS);
	}

	@Benchmark
	public CookResult chipsStripFryer175Golden() {
		return Plans.chipsStrip(DEFAULTS);
	}

	/**
	 * A 30 mm steak: sear 3 min in a 240 °C pan, fan oven at 180 °C to 52 °C core, rest 5
	 * min (series recorded).
	 */
	@Benchmark
	public StepsResult steakSearOvenRestThreeSteps() {
		return AcrylamideCook.runSteps(THICK_STEAK, SEAR_OVEN_REST, Plans.BROWNED, 52.0, DEFAULTS);
	}

	private static final Surface THICK_STEAK = Surface.defaults(FoodCategory.MEAT).withThicknessMm(30);

	private static final List<CookStep> SEAR_OVEN_REST = List.of(CookStep.timed(new PanContact(240, true, 60), 180),
			CookStep.toCore(new Oven(180, true, 1.6), 52, 3600), CookStep.timed(new Rest(22), 300));

	/**
	 * Twice the nodes at twice the step: about the same work, closer to converged (see
	 * the convergence table).
	 */
	private static final CookSettings DOUBLE_GRID_DOUBLE_STEP = DEFAULTS
		.withNodes(2 * (CookSettings.DEFAULT_NODES - 1) + 1)
		.withTimeStepS(2 * CookSettings.DEFAULT_TIME_STEP_S);

	@Benchmark
	public CookResult steakPan220BrownedDoubleGridDoubleStep() {
		return Plans.steak(DOUBLE_GRID_DOUBLE_STEP);
	}

	@Benchmark
	public CookResult chipsFryer175GoldenDoubleGridDoubleStep() {
		return Plans.chips(DOUBLE_GRID_DOUBLE_STEP);
	}

	private static final double[] MAP_TEMPERATURES_C = new double[Plans.MAP_POINTS];

	static {
		for (int i = 0; i < Plans.MAP_POINTS; i++) {
			MAP_TEMPERATURES_C[i] = Plans.mapTemperatureC(i);
		}
	}

	/**
	 * The acrylamide risk map as a plan page asks for it: chips, 30 fryer temperatures
	 * 150–195 °C, a column every 30 s to 15 min (each row runs to the map's end and
	 * records every column; rows in parallel).
	 */
	@Benchmark
	public RiskMap riskMapFries30Temperatures() {
		return RiskMap.compute(Plans.CHIPS, Product.FRENCH_FRIES, Plans.FRYER_175, Plans.GOLDEN, MAP_TEMPERATURES_C, 30,
				900, DEFAULTS);
	}

	/**
	 * The map's engine cost alone, as before RiskMap landed: 30 summary runs to the
	 * target and a quarter past.
	 */
	@Benchmark
	public double[] fryerMap30RunsNoSeries() {
		return Plans.fryerMapTimesToTarget();
	}

	/** The same map stopping at each target (the times to target are the same). */
	@Benchmark
	public double[] fryerMap30RunsStopAtTarget() {
		return Plans.fryerMapTimesToTarget(STOP_AT_TARGET);
	}

	/**
	 * The same map stopping at each target, the 30 runs spread over two threads (the
	 * machine's two cores).
	 */
	@Benchmark
	public double[] fryerMap30RunsStopAtTargetTwoThreads() throws Exception {
		@SuppressWarnings("unchecked")
		Future<Double>[] parts = new Future[Plans.MAP_POINTS];
		for (int i = 0; i < Plans.MAP_POINTS; i++) {
			int point = i;
			parts[i] = pool.submit(() -> Plans.mapPoint(point, STOP_AT_TARGET));
		}
		double[] times = new double[Plans.MAP_POINTS];
		for (int i = 0; i < Plans.MAP_POINTS; i++) {
			times[i] = parts[i].get();
		}
		return times;
	}

}
