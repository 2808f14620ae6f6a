package com.crustplan.engine.assessment;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.IntStream;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.message.Message;

/**
 * Set temperature × time for one surface and heat mode: per cell the browning stage
 * reached and the acrylamide zone of the portion, per temperature the time the target
 * colour is reached (the target line). Each temperature row is one engine run recorded
 * every time step of the map, so a cell is exactly what a single run at
 * {@link #settingsFor} shows at that time.
 */
public record RiskMap(FoodCategory category, Product product, String mode, Message targetDescription,
		BenchmarkLevel benchmarkOrNull, double timeStepS, List<Row> rows, List<Message> cautions) {

	/** Most temperatures a map may hold (one engine run each). */
	public static final int MAX_TEMPERATURES = 60;

	/** Most time columns a map may hold. */
	public static final int MAX_TIMES = 400;

	public RiskMap {
		rows = List.copyOf(rows);
		cautions = List.copyOf(cautions);
	}

	/**
	 * One set temperature: its cells over time, the time to the target and the portion's
	 * acrylamide there (both NaN if the target is not reached within the map).
	 */
	public record Row(double temperatureC, double targetTimeS, double targetPortionUgPerKg, List<Cell> cells) {

		public Row {
			cells = List.copyOf(cells);
		}

		public boolean reachesTarget() {
			return Double.isFinite(targetTimeS);
		}

	}

	/**
	 * One time at one temperature; {@code stageKey} "unbrowned" before the category's
	 * first stage; the core temperature for maps that aim at a doneness too.
	 */
	public record Cell(double timeS, String stageKey, String stageLabel, double browningExtent, double crustUgPerKg,
			double portionUgPerKg, AcrylamideZone zone, double coreTemperatureC) {
	}

	public static final String UNBROWNED_KEY = "unbrowned";

	/**
	 * The engine settings of every row: the base settings recorded every map step up to
	 * the map's end.
	 */
	public static CookSettings settingsFor(CookSettings base, double timeStepS, double maxTimeS) {
		// run on to the end of the map whatever the target: the cells past the target
		// line are the point
		return base.withOutputIntervalS(timeStepS)
			.withHorizonS(maxTimeS)
			.withRecordSeries(true)
			.withRunPastTargetFraction(1e6);
	}

	/**
	 * @param template the heat mode and its other settings; its temperature is replaced
	 * by each row's
	 * @param temperaturesC set temperatures, one row each
	 * @param timeStepS time between columns, s (a multiple of the engine step keeps the
	 * columns on exact times)
	 * @param maxTimeS last column, s
	 */
	public static RiskMap compute(Surface surface, Product product, HeatSetup template, Target target,
			double[] temperaturesC, double timeStepS, double maxTimeS, CookSettings base) {
		if (temperaturesC.length == 0 || temperaturesC.length > MAX_TEMPERATURES) {
			throw new InvalidInputException("temperatures", "give 1 to " + MAX_TEMPERATURES + " temperatures");
		}
		if (!(timeStepS > 0) || !(maxTimeS >= timeStepS) || maxTimeS > CookSettings.MAX_HORIZON_S) {
			throw new InvalidInputException("timeStepS",
					"the time step must be positive and no longer than the map, at most 6 h");
		}
		if (maxTimeS / timeStepS > MAX_TIMES) {
			throw new InvalidInputException("timeStepS", "at most " + MAX_TIMES + " time columns: use a longer step");
		}
		if (product.category() != surface.category()) {
			throw new InvalidInputException("product",
					"'" + product.key() + "' is not a product of " + surface.category().label());
		}
		FoodCategory category = surface.category();
		List<BrowningStage> stages = new ArrayList<>(category.stages());
		stages.sort(Comparator.comparingDouble(s -> s.extentOn(category.colourPath())));
		double[] stageExtent = new double[stages.size()];
		for (int i = 0; i < stageExtent.length; i++) {
			stageExtent[i] = stages.get(i).extentOn(category.colourPath());
		}
		BenchmarkLevel benchmark = product.benchmark().orElse(null);
		CookSettings settings = settingsFor(base, timeStepS, maxTimeS);
		// rows are independent runs, each owning its simulation: compute them on all
		// cores
		List<Row> rows = IntStream.range(0, temperaturesC.length).parallel().mapToObj(j -> {
			double t = temperaturesC[j];
			CookResult r = AcrylamideCook.run(surface, HeatSetups.withTemperature(template, t), target, settings);
			List<Cell> cells = new ArrayList<>(r.series().size());
			for (Sample s : r.series()) {
				int k = stageIndex(stageExtent, s.browningExtent());
				double portion = s.portionAcrylamideUgPerKg();
				cells.add(new Cell(s.timeS(), k < 0 ? UNBROWNED_KEY : stages.get(k).key(),
						k < 0 ? "Unbrowned" : stages.get(k).label(), s.browningExtent(), s.crustAcrylamideUgPerKg(),
						portion, benchmark == null ? AcrylamideZone.NO_BENCHMARK : benchmark.zoneOf(portion),
						s.coreTemperatureC()));
			}
			return new Row(t, r.reached() ? r.timeToTargetS() : Double.NaN,
					r.reached() ? r.portionAcrylamideAtTargetUgPerKg() : Double.NaN, cells);
		}).toList();
		return new RiskMap(category, product, template.mode(), target.describe(category), benchmark, timeStepS, rows,
				AcrylamideCautions.ALL);
	}

	/** The darkest stage reached at this extent, or −1 before the first. */
	static int stageIndex(double[] stageExtent, double extent) {
		int k = -1;
		for (int i = 0; i < stageExtent.length; i++) {
			if (extent >= stageExtent[i] - 1e-12) {
				k = i;
			}
		}
		return k;
	}

}
