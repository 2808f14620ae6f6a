package com.crustplan.bench;

import java.util.concurrent.TimeUnit;

import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Warmup;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;

/**
 * One plan at the default grid (25 nodes, 0.5 s), with the series a plan page charts, and the
 * 30-temperature fryer map. Goals (issue 6): a plan ≤ 2 ms median, the map ≤ 60 ms. Sampling mode gives
 * the median (p0.50) as well as the mean. Short runs: the machine's two cores are shared.
 */
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class PlanBenchmark {

	private static final CookSettings DEFAULTS = CookSettings.defaults();

	@Benchmark
	public CookResult steakPan220Browned() {
		return Plans.steak(DEFAULTS);
	}

	@Benchmark
	public CookResult chipsFryer175Golden() {
		return Plans.chips(DEFAULTS);
	}

	/** Named for what it is until the acrylamide RiskMap lands: 30 summary runs, 150–195 °C. */
	@Benchmark
	public double[] fryerMap30RunsNoSeries() {
		return Plans.fryerMapTimesToTarget();
	}

}
