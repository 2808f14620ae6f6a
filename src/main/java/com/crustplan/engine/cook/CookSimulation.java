package com.crustplan.engine.cook;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.HeatedBody;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.Layers;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.properties.ThermalProperties;

/**
 * One cook of one surface in one heat setup: the driver that wires the state, the
 * stepper, the listeners and the events. It marches in backward-Euler steps, landing
 * exactly on output times and flips, until the target colour (and a little past it) or
 * the horizon. A run owns all its arrays: make a new simulation per run, never share one
 * between threads.
 */
public final class CookSimulation {

	private final Surface surface;

	private final HeatSetup setup;

	private final ActiveHeat heat;

	private final CookSettings settings;

	private final CookState state;

	private final LayerReaction reaction;

	private final EnergyAccount account = new EnergyAccount();

	private final BackwardEulerStep stepper;

	private final StepInterpolator interpolator = new StepInterpolator();

	private final List<StepListener> listeners = new ArrayList<>();

	private final List<Watch> events = new ArrayList<>();

	private CookSimulation(Surface surface, HeatSetup setup, CookSettings settings, LayerReaction.Factory reaction) {
		this.surface = surface;
		this.setup = setup;
		this.heat = new ActiveHeat(setup.schedule(), surface.shape());
		this.settings = settings;
		// a slab spans its thickness between two heated faces; a strip, cube or ball its
		// radius from the heated outer face to the centre
		Grid grid = new Grid(surface.shape().gridLengthM(surface.thicknessMm()), settings.nodes(),
				Grid.DEFAULT_CLUSTERING, surface.shape().factor());
		double x0 = surface.composition().moistureDryBasis();
		MatrixProperties properties = new MatrixProperties(surface.composition().dryMatterFractions(),
				surface.category().shrinkage().value(), surface.category().initialPorosity().value(), grid.size());
		double matrixVolume = ThermalProperties.specificVolume(properties.massFractions(x0),
				surface.initialTemperatureC());
		double bulkDensity = (1 - surface.category().initialPorosity().value()) / matrixVolume;
		this.state = new CookState(grid, surface.category().isotherm(), surface.initialTemperatureC() + 273.15, x0,
				bulkDensity, surface.surfaceWaterGPerM2() / 1000);
		this.reaction = reaction.start(surface, grid);
		this.stepper = new BackwardEulerStep(state, surface, heat, properties, this.reaction, account);
	}

	/**
	 * A cook ready to run, to which listeners and events can be added first (each run is
	 * one-shot):
	 * {@code CookSimulation.of(surface, setup, settings).listen(l).on(event, handler).run(target)}.
	 */
	public static CookSimulation of(Surface surface, HeatSetup setup, CookSettings settings,
			LayerReaction.Factory reaction) {
		return new CookSimulation(surface, setup, settings, reaction);
	}

	/** Adds a listener called at the start, after every step and at the end. */
	public CookSimulation listen(StepListener listener) {
		listeners.add(listener);
		return this;
	}

	/** Adds an event and what to do when it fires (it fires once). */
	public CookSimulation on(CookEvent event, EventHandler handler) {
		events.add(new Watch(event, handler));
		return this;
	}

	/**
	 * The pan or oil of the current heat where it is a body that moves under the load
	 * (its ledger), else null.
	 */
	public HeatedBody heatSourceBody() {
		return heat.body();
	}

	/**
	 * Runs to the target (and a little past it), to the horizon, or until an event
	 * handler stops it.
	 */
	public CookResult run(Target target) {
		return march(target.extentFor(surface.category()));
	}

	/**
	 * Runs a cook to the target (and a little past it) or to the horizon, with no layer
	 * reaction.
	 */
	public static CookResult run(Surface surface, HeatSetup setup, Target target, CookSettings settings) {
		return run(surface, setup, target, settings, LayerReaction.NONE);
	}

	/**
	 * Runs a cook with a reaction stepped in every layer (acrylamide formation, for one).
	 */
	public static CookResult run(Surface surface, HeatSetup setup, Target target, CookSettings settings,
			LayerReaction.Factory reaction) {
		return of(surface, setup, settings, reaction).run(target);
	}

	/**
	 * As {@link #run(Surface, HeatSetup, Target, CookSettings, LayerReaction.Factory)},
	 * handing the live state through the thickness to {@code afterEachStep} after every
	 * time step (for fitting tools and tests; keep it cheap).
	 */
	public static CookResult run(Surface surface, HeatSetup setup, Target target, CookSettings settings,
			LayerReaction.Factory reaction, Consumer<? super Layers> afterEachStep) {
		return of(surface, setup, settings, reaction).listen(new StepListener() {
			@Override
			public void handleStep(CookState state, StepInterpolator step) {
				afterEachStep.accept(state);
			}
		}).run(target);
	}

	public static CookResult run(Surface surface, HeatSetup setup, Target target) {
		return run(surface, setup, target, CookSettings.defaults());
	}

	/**
	 * Runs a cook in steps, each held until its end; the state carries over from step to
	 * step. The plan's targets, a colour and a core temperature (either may be null), are
	 * recorded where they are reached; they do not end the cook.
	 */
	public static StepsResult runSteps(Surface surface, List<CookStep> steps, Target colour, Double coreTargetC,
			CookSettings settings, LayerReaction.Factory reaction) {
		if (steps.isEmpty()) {
			throw new InvalidInputException("steps", "a plan needs at least one step");
		}
		return new CookSimulation(surface, steps.get(0).setup(), settings, reaction).marchSteps(steps, colour,
				coreTargetC);
	}

	private CookResult march(double targetExtent) {
		TargetRecord target = new TargetRecord(settings);
		events.add(0, new Watch(CookEvent.targetColourReached(targetExtent), target));
		watchSurfaceLimit(setup);
		start();
		advance(settings.horizonS());
		return finish(target, targetExtent, setup.assumptions());
	}

	private StepsResult marchSteps(List<CookStep> steps, Target colour, Double coreTargetC) {
		double targetExtent = colour == null ? Double.NaN : colour.extentFor(surface.category());
		TargetRecord target = new TargetRecord(null);
		if (colour != null) {
			events.add(new Watch(CookEvent.targetColourReached(targetExtent), target));
		}
		TargetRecord core = new TargetRecord(null);
		if (coreTargetC != null) {
			events.add(new Watch(CookEvent.coreTemperatureReached(coreTargetC + 273.15), core));
		}
		start();
		List<CookStep.Record> records = new ArrayList<>();
		List<Message> assumptions = new ArrayList<>();
		double horizon = settings.horizonS();
		for (int k = 0; k < steps.size() && state.time < horizon - 1e-9; k++) {
			CookStep step = steps.get(k);
			double startS = state.time;
			heat.use(step.setup().schedule(), startS);
			placeFood();
			for (Message a : step.setup().assumptions()) {
				if (!assumptions.contains(a)) {
					assumptions.add(a);
				}
			}
			CookStep.Ending[] endedBy = { CookStep.Ending.TIME };
			List<Watch> ends = new ArrayList<>();
			if (step.colour() != null) {
				ends.add(new Watch(CookEvent.targetColourReached(step.colour().extentFor(surface.category())),
						(s, f) -> {
							endedBy[0] = CookStep.Ending.COLOUR;
							return s.current().timeS();
						}));
			}
			if (step.coreTemperatureC() != null) {
				ends.add(new Watch(CookEvent.coreTemperatureReached(step.coreTemperatureC() + 273.15), (s, f) -> {
					endedBy[0] = CookStep.Ending.CORE;
					return s.current().timeS();
				}));
			}
			events.addAll(ends);
			int before = events.size();
			watchSurfaceLimit(step.setup());
			List<Watch> limit = new ArrayList<>(events.subList(before, events.size()));
			double until = startS + step.maxDurationS();
			if (until > horizon) {
				until = horizon;
				endedBy[0] = CookStep.Ending.HORIZON;
			}
			advance(until);
			events.removeAll(ends);
			events.removeAll(limit);
			records.add(new CookStep.Record(k, startS, state.time, endedBy[0], state.coreK() - 273.15,
					state.surfaceK() - 273.15, state.browningExtent(0)));
			if (!Double.isNaN(surfaceLimitAtS)) {
				// the surface would char: no later step starts
				break;
			}
		}
		CookResult cook = finish(target, targetExtent, assumptions);
		return new StepsResult(cook, records, coreTargetC == null ? Double.NaN : coreTargetC, core.reachedAtS(),
				core.reached() ? core.surfaceExtent() : Double.NaN);
	}

	/**
	 * When the surface passed the setup's limit and the cook stopped, s (NaN if it did
	 * not).
	 */
	private double surfaceLimitAtS = Double.NaN;

	/**
	 * A setup with a surface limit (a grill) stops the cook where the surface passes it.
	 */
	private void watchSurfaceLimit(HeatSetup s) {
		double limitC = s.surfaceLimitC();
		if (Double.isFinite(limitC)) {
			events.add(new Watch(CookEvent.surfaceTemperatureReached(limitC + 273.15), (step, f) -> {
				surfaceLimitAtS = step.timeAt(f);
				return step.current().timeS();
			}));
		}
	}

	private SeriesRecorder recorder;

	private SurfaceWatch watch;

	/** Tells the current pan or fryer body how much food it carries. */
	private void placeFood() {
		if (heat.body() != null) {
			heat.body().placeFood(state.massKgPerM2());
		}
	}

	private void start() {
		placeFood();
		if (settings.recordSeries()) {
			recorder = new SeriesRecorder(surface.category().colourPath(), settings.outputIntervalS());
			listeners.add(recorder);
		}
		watch = new SurfaceWatch();
		listeners.add(watch);
		interpolator.start(state, reaction, heat);
		for (StepListener l : listeners) {
			l.init(state, interpolator);
		}
	}

	/** Marches until stopAt or until an event handler asks to stop sooner. */
	private void advance(double stopAt) {
		double dt = settings.timeStepS();
		double nextChange = heat.nextChangeAfter(state.time);
		while (state.time < stopAt - 1e-9) {
			// land exactly on output times, flips and the end
			double next = Math.min(stopAt, Math.min(nextCheckpoint(), nextChange));
			double step = Math.min(dt, next - state.time);
			stepper.step(step);
			checkPhysical();
			interpolator.advance(state, reaction, heat, step);
			for (StepListener l : listeners) {
				l.handleStep(state, interpolator);
			}
			for (int e = 0; e < events.size(); e++) {
				Watch w = events.get(e);
				if (!w.fired && w.event.happened(interpolator.current())) {
					w.fired = true;
					stopAt = Math.min(stopAt, w.handler.eventOccurred(interpolator, w.event.crossing(interpolator)));
				}
			}
			if (state.time >= nextChange - 1e-9) {
				nextChange = heat.nextChangeAfter(state.time + 1e-9);
			}
		}
	}

	private CookResult finish(TargetRecord target, double targetExtent, List<Message> heatAssumptions) {
		for (StepListener l : listeners) {
			l.finish(state, interpolator);
		}
		boolean noColourTarget = Double.isNaN(targetExtent);
		Outcome outcome = !target.reached() && !Double.isNaN(surfaceLimitAtS) ? Outcome.SURFACE_LIMIT : CookSummary
			.outcome(target.reached(), stepper.browning().canBrown(), watch.maxSurfaceK(), watch.everDry());
		Message explanation = CookSummary.explain(outcome, watch.maxSurfaceK(), state.browningExtent(0), state.time);
		List<Message> assumptions = new ArrayList<>(heatAssumptions);
		assumptions.addAll(CookSummary.surfaceAssumptions(surface));
		if (heat.turnedShare() > 0) {
			assumptions.add(Message.of("assumption.surface.turned", Quantity.of(100 * heat.turnedShare(), "%")));
		}
		return new CookResult(outcome, explanation, target.reachedAtS(), targetExtent,
				noColourTarget ? null : surface.category().colourPath().colourAt(targetExtent), surface.ph(),
				target.coreK() - 273.15, target.crustLevel(), target.portionLevel(), watch.maxSurfaceK() - 273.15,
				state.browningExtent(0), state.time, recorder == null ? List.of() : recorder.series(), assumptions,
				account.ledger(), state.finalState(), target.waterPct(), target.oilPct());
	}

	private double nextCheckpoint() {
		double next = Double.POSITIVE_INFINITY;
		for (StepListener l : listeners) {
			next = Math.min(next, l.nextCheckpointS());
		}
		return next;
	}

	/**
	 * Between the coldest start (−20 °C) and the hottest element (1200 °C), with margin:
	 * else the step failed.
	 */
	private void checkPhysical() {
		if (!physical(state.surfaceK()) || !physical(state.otherFaceK()) || !physical(state.coreK())) {
			throw new InvalidInputException("surface",
					String.format(
							"the model could not follow this cook (a %.1f mm piece with %.0f g/m² of standing water): "
									+ "use a thicker piece, less standing water or a gentler heat",
							surface.thicknessMm(), surface.surfaceWaterGPerM2()));
		}
	}

	private static boolean physical(double temperatureK) {
		return temperatureK > 223.15 && temperatureK < 1573.15;
	}

	/** An event with what to do when it fires, and whether it has. */
	private static final class Watch {

		final CookEvent event;

		final EventHandler handler;

		boolean fired;

		Watch(CookEvent event, EventHandler handler) {
			this.event = event;
			this.handler = handler;
		}

	}

}
