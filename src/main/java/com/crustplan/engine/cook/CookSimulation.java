package com.crustplan.engine.cook;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import com.crustplan.engine.acrylamide.AcrylamideFormation;
import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.browning.Caramelisation;
import com.crustplan.engine.browning.WaterActivityFactor;
import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceFlux;
import com.crustplan.engine.heat.FaceSchedule;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.layers.HeatConduction;
import com.crustplan.engine.layers.Layers;
import com.crustplan.engine.layers.Tridiagonal;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.properties.ThermalProperties;
import com.crustplan.engine.water.GabIsotherm;
import com.crustplan.engine.water.MoistureDiffusivity;
import com.crustplan.engine.water.WaterVapour;

/**
 * One cook of one surface in one heat setup: marches heat and moisture through the thickness with
 * backward-Euler steps and integrates browning at both faces until the target colour (and a little
 * past it) or the horizon.
 * <p>
 * Each step: (1) properties from composition, temperature and moisture (Choi &amp; Okos); (2) heat
 * conduction with the faces' exchange linearised about the last temperature, latent heat of evaporation
 * included; (3) local boiling — a node holding water cannot be hotter than where aw·p_sat(T) = 1 atm, the
 * excess enthalpy boils water off instead; (4) moisture diffusion with the face's evaporation implicit in
 * moisture; (5) browning at each face from its temperature and water activity. A run owns all its arrays:
 * make a new simulation per run, never share one between threads.
 */
public final class CookSimulation implements Layers {

	/** Residual moisture a node keeps, kg/kg d.b.: bone-dry is outside the isotherm fits. */
	private static final double MIN_MOISTURE = 1e-3;

	/** The reference water activity for caramelisation: a dry crust, like the Maillard fits. */
	private static final double CARAMEL_REFERENCE_AW = 0.4;

	/** Faces are re-linearised until their temperature estimate moves less than this in a pass. */
	private static final double FACE_LINEARISATION_K = 1.0;

	private static final int MAX_FACE_PASSES = 4;

	/** A face this wet gathers condensing steam as standing water rather than sorbing it. */
	private static final double WET_FACE_AW = 0.99;

	private static final double FREE_WATER_BOILING_K = WaterVapour.boilingTemperatureKFast(1.0);

	private static final double LOG_GAS_CONDUCTIVITY = Math.log(ThermalProperties.AIR_CONDUCTIVITY);

	private final Surface surface;

	private final FoodCategory category;

	private final FaceSchedule schedule;

	private final HeatSetup setup;

	private final CookSettings settings;

	private final Grid grid;

	private final GabIsotherm isotherm;


	private final BrowningKinetics kinetics;

	private final ColourPath path;

	private final int n;

	private final double[] dryFractions;

	private final double[] massFractions = new double[FoodComponent.values().length];

	private final double[] props = new double[3];

	// state
	private final double[] temperature;

	private final double[] moisture;

	private final double[] dryMass;

	private final double[] volume;

	private final double[] film = new double[2];

	private final double[] extent = new double[2];

	private final double[] boilingFlux = new double[2];

	private double time;

	// per-step scratch
	private final double[] capacity;

	private final double[] conductivity;

	private final double[] lower;

	private final double[] diag;

	private final double[] upper;

	private final double[] rhs;

	private final double[] solution;

	private final double[] faceSlopeJ = new double[2];

	private final double[] faceJ = new double[2];

	private final double[] boiled = new double[2];

	private final double[] heatFluxAtStart = new double[2];

	private final double[] heatSlope = new double[2];

	private final double[] evapPredicted = new double[2];

	private final double[] evapSlope = new double[2];

	private final double[] moistureBefore;


	private final double[] faceSlope = new double[2];

	private final double[] faceSource = new double[2];

	private final double[] linearisedAt = new double[2];

	private final HeatConduction conduction;

	private final boolean[] pinned;

	private final double[] solvedTemperature;

	private final boolean[] ranDry;

	private final double[] pinnedTemperature;

	private final double[] waterConductance;

	private final double[] heatGain;

	private final Tridiagonal solver;

	private final FaceFlux flux = new FaceFlux();

	/** Acrylamide per layer, stepped after each moisture step. */
	private final AcrylamideFormation acrylamide;

	/** Optional view of the state after every step, for fitting tools and tests. */
	private Consumer<? super Layers> afterEachStep;

	// ledger
	private double heatIn;

	private double vapourOut;

	private double evaporated;

	// browning factors fixed for the run
	private final double maillardFactor;

	private final double caramelFactor;

	private final double ph;

	private CookSimulation(Surface surface, HeatSetup setup, CookSettings settings) {
		this.surface = surface;
		this.category = surface.category();
		this.setup = setup;
		this.schedule = setup.schedule();
		this.settings = settings;
		this.n = settings.nodes();
		this.grid = new Grid(surface.thicknessMm() / 1000, n, Grid.DEFAULT_CLUSTERING);
		this.acrylamide = new AcrylamideFormation(surface, grid);
		this.isotherm = category.isotherm();
		this.kinetics = category.browning();
		this.path = category.colourPath();
		Composition c = surface.composition();
		this.dryFractions = c.dryMatterFractions();
		this.ph = surface.ph();
		this.maillardFactor = kinetics.phFactor(ph) * kinetics.reactantFactor(c.reducingSugarPct(), c.proteinPct());
		this.caramelFactor = Caramelisation.sucroseFactor(c.sucrosePct());

		temperature = new double[n];
		moisture = new double[n];
		dryMass = new double[n];
		volume = new double[n];
		capacity = new double[n];
		conductivity = new double[n];
		lower = new double[n];
		diag = new double[n];
		upper = new double[n];
		rhs = new double[n];
		solution = new double[n];
		solver = new Tridiagonal(n);
		moistureBefore = new double[n];
		conduction = new HeatConduction(grid);
		pinned = new boolean[n];
		solvedTemperature = new double[n];
		ranDry = new boolean[n];
		pinnedTemperature = new double[n];
		waterConductance = new double[n];
		heatGain = new double[n];

		double t0 = surface.initialTemperatureC() + 273.15;
		double x0 = c.moistureDryBasis();
		fillMassFractions(x0);
		double matrixVolume = ThermalProperties.specificVolume(massFractions, surface.initialTemperatureC());
		double bulkDensity = (1 - category.initialPorosity().value()) / matrixVolume;
		for (int i = 0; i < n; i++) {
			temperature[i] = t0;
			moisture[i] = x0;
			volume[i] = grid.width(i);
			dryMass[i] = bulkDensity * volume[i] / (1 + x0);
		}
		film[0] = surface.surfaceWaterGPerM2() / 1000;
		film[1] = film[0];
	}

	/** Runs a cook to the target (and a little past it) or to the horizon. */
	public static CookResult run(Surface surface, HeatSetup setup, Target target, CookSettings settings) {
		double targetExtent = target.extentFor(surface.category());
		return new CookSimulation(surface, setup, settings).march(targetExtent);
	}

	/**
	 * As {@link #run(Surface, HeatSetup, Target, CookSettings)}, handing the live state through the thickness
	 * to {@code afterEachStep} after every time step (for fitting tools and tests; keep it cheap).
	 */
	public static CookResult run(Surface surface, HeatSetup setup, Target target, CookSettings settings,
			Consumer<? super Layers> afterEachStep) {
		double targetExtent = target.extentFor(surface.category());
		CookSimulation simulation = new CookSimulation(surface, setup, settings);
		simulation.afterEachStep = afterEachStep;
		return simulation.march(targetExtent);
	}

	public static CookResult run(Surface surface, HeatSetup setup, Target target) {
		return run(surface, setup, target, CookSettings.defaults());
	}

	private CookResult march(double targetExtent) {
		List<Sample> series = settings.recordSeries() ? new ArrayList<>() : List.of();
		double dt = settings.timeStepS();
		double stopAt = settings.horizonS();
		double nextOutput = settings.recordSeries() ? settings.outputIntervalS() : Double.POSITIVE_INFINITY;
		double nextChange = schedule.nextChangeAfter(0);
		double reachedAt = Double.NaN;
		double coreAtTarget = Double.NaN;
		double crustAtTarget = Double.NaN;
		double portionAtTarget = Double.NaN;
		double maxSurface = temperature[0];
		boolean everDry = false;
		if (settings.recordSeries()) {
			series.add(sample());
		}
		double core = core();
		while (time < stopAt - 1e-9) {
			// land exactly on output times, flips and the end
			double step = Math.min(dt, Math.min(stopAt, Math.min(nextOutput, nextChange)) - time);
			double before = extent[0];
			double coreBefore = core;
			double crustBefore = acrylamide.crustUgPerKg();
			double portionBefore = acrylamide.portionUgPerKg();
			step(step);
			if (!physical(temperature[0]) || !physical(temperature[n - 1]) || !physical(core())) {
				throw new InvalidInputException("surface", String.format(
						"the model could not follow this cook (a %.1f mm piece with %.0f g/m² of standing water): "
								+ "use a thicker piece, less standing water or a gentler heat", surface.thicknessMm(),
						surface.surfaceWaterGPerM2()));
			}
			if (afterEachStep != null) {
				afterEachStep.accept(this);
			}
			core = core();
			maxSurface = Math.max(maxSurface, temperature[0]);
			everDry |= film[0] <= 0 && waterActivity(0) < 0.95;
			if (Double.isNaN(reachedAt) && extent[0] >= targetExtent) {
				double f = (targetExtent - before) / (extent[0] - before);
				reachedAt = time - step + f * step;
				coreAtTarget = coreBefore + f * (core - coreBefore);
				crustAtTarget = crustBefore + f * (acrylamide.crustUgPerKg() - crustBefore);
				portionAtTarget = portionBefore + f * (acrylamide.portionUgPerKg() - portionBefore);
				stopAt = Math.min(settings.horizonS(),
						Math.max(reachedAt * (1 + settings.runPastTargetFraction()), reachedAt + settings.timeStepS()));
			}
			if (time >= nextOutput - 1e-9) {
				series.add(sample());
				nextOutput += settings.outputIntervalS();
			}
			if (time >= nextChange - 1e-9) {
				nextChange = schedule.nextChangeAfter(time + 1e-9);
			}
		}
		if (settings.recordSeries() && series.get(series.size() - 1).timeS() < time - 1e-9) {
			series.add(sample());
		}
		Outcome outcome = outcome(reachedAt, maxSurface, everDry);
		// explain and surfaceAssumptions still word their text here: shown as literal messages until given codes
		Message explanation = outcome == Outcome.REACHED ? outcome.explanation()
				: Message.of("outcome.explained", outcome.explanation(), Message.literal(explain(outcome, maxSurface)));
		List<Message> assumptions = new ArrayList<>(setup.assumptions());
		surfaceAssumptions().forEach(a -> assumptions.add(Message.literal(a)));
		return new CookResult(outcome, explanation, reachedAt, targetExtent, path.colourAt(targetExtent), ph,
				coreAtTarget - 273.15, crustAtTarget, portionAtTarget, maxSurface - 273.15, extent[0], time, series, assumptions,
				new EnergyLedger(heatIn, vapourOut, evaporated),
				new CookResult.FinalState(positions(), temperature, moisture, dryMass, film));
	}

	/** Between the coldest start (−20 °C) and the hottest element (1200 °C), with margin: else the step failed. */
	private static boolean physical(double temperatureK) {
		return temperatureK > 223.15 && temperatureK < 1573.15;
	}

	private double[] positions() {
		double[] p = new double[n];
		for (int i = 0; i < n; i++) {
			p[i] = grid.position(i);
		}
		return p;
	}

	private Outcome outcome(double reachedAt, double maxSurfaceK, boolean everDry) {
		if (!Double.isNaN(reachedAt)) {
			return Outcome.REACHED;
		}
		if (maillardFactor <= 0 && caramelFactor <= 0) {
			return Outcome.NO_REACTANTS;
		}
		if (!everDry || maxSurfaceK < 378.15) {
			return Outcome.WET_PLATEAU;
		}
		// below ≈ 130 °C even a dry surface browns an order of magnitude slower than at 150 °C (Ea ≈ 64 kJ/mol)
		if (maxSurfaceK < 403.15) {
			return Outcome.TOO_COOL;
		}
		return Outcome.TOO_SLOW;
	}

	private String explain(Outcome outcome, double maxSurfaceK) {
		return String.format("%s Highest surface temperature %.0f °C; browning extent %.2f after %.0f min.",
				"", maxSurfaceK - 273.15, extent[0], time / 60);
	}

	private List<String> surfaceAssumptions() {
		List<String> a = new ArrayList<>();
		a.add(String.format("The whole %.0f mm thickness has the surface's composition; heat and water move only through the thickness (a slab).",
				surface.thicknessMm()));
		a.add(String.format("pH %.2f at the surface%s (buffer capacity %.0f mmol/(pH·kg)).", ph,
				surface.bicarbonateGPerKg() > 0 || surface.acidGPerKg() > 0 ? " after the additions" : "",
				category.bufferCapacity().value()));
		a.add("Browning kinetics, sorption isotherm and colour path of the category " + category.label() + ".");
		if (surface.composition().sucrosePct() > 0) {
			a.add("Sucrose browns only by caramelisation (it is not a reducing sugar); its inversion is not modelled.");
		}
		return a;
	}

	// ---------------------------------------------------------------- one step

	private void fillMassFractions(double x) {
		double dry = 1 / (1 + x);
		massFractions[0] = x * dry;
		for (int j = 0; j < dryFractions.length; j++) {
			massFractions[j + 1] = dryFractions[j] * dry;
		}
	}

	private int faceNode(int face) {
		return face == 0 ? 0 : n - 1;
	}

	private void step(double dt) {
		double now = time;
		// (1) properties
		for (int i = 0; i < n; i++) {
			double tc = temperature[i] - 273.15;
			fillMassFractions(moisture[i]);
			ThermalProperties.evaluate(massFractions, tc, props);
			double mass = dryMass[i] * (1 + moisture[i]);
			double porosity = Math.max(0, Math.min(0.95, 1 - mass * props[2] / volume[i]));
			capacity[i] = mass * props[0];
			// geometric-mean rule k_m^(1−ε)·k_gas^ε, written with one exp
			conductivity[i] = porosity > 0 ? Math.exp((1 - porosity) * Math.log(props[1]) + porosity * LOG_GAS_CONDUCTIVITY)
					: props[1];
		}
		for (int face = 0; face < 2; face++) {
			int i = faceNode(face);
			capacity[i] += film[face] * FoodComponent.WATER.specificHeat(temperature[i] - 273.15);
		}
		// (2) heat conduction with local boiling; each face's exchange linearised about an estimate of its new
		// temperature, q ≈ q* + q'(T − T*) − h_fg(J* + J'(T − T*)) = b − a·T, re-linearised while the estimate moves
		for (int face = 0; face < 2; face++) {
			linearisedAt[face] = temperature[faceNode(face)];
		}
		for (int pass = 0; pass < MAX_FACE_PASSES; pass++) {
			for (int face = 0; face < 2; face++) {
				int i = faceNode(face);
				FaceExchange exchange = schedule.at(face, now);
				double aw = film[face] > 0 ? 1 : isotherm.waterActivity(moisture[i]);
				double t = linearisedAt[face];
				exchange.evaluate(t, aw, boilingFlux[face], flux);
				double latent = WaterVapour.latentHeat(t);
				faceSlope[face] = -(flux.heatFluxSlope - latent * flux.evaporationSlopeT);
				faceSource[face] = flux.heatFlux - latent * flux.evaporation + faceSlope[face] * t;
				faceJ[face] = flux.evaporation;
				faceSlopeJ[face] = flux.evaporationSlopeT;
				heatFluxAtStart[face] = flux.heatFlux;
				heatSlope[face] = flux.heatFluxSlope;
			}
			conduction.assemble(temperature, capacity, conductivity, dt, faceSlope[0], faceSource[0], faceSlope[1],
					faceSource[1]);
			solveWithBoiling(dt);
			double moved = Math.max(Math.abs(solution[0] - linearisedAt[0]), Math.abs(solution[n - 1] - linearisedAt[1]));
			if (moved < FACE_LINEARISATION_K) {
				break;
			}
			linearisedAt[0] = solution[0];
			linearisedAt[1] = solution[n - 1];
		}
		applyBoiling(dt);
		for (int face = 0; face < 2; face++) {
			// the face fluxes as the solve had them (a layer that ran dry is warmed only afterwards)
			double dT = solvedTemperature[faceNode(face)] - linearisedAt[face];
			heatIn += (heatFluxAtStart[face] + heatSlope[face] * dT) * dt;
			faceJ[face] += faceSlopeJ[face] * dT;
		}

		// evaporation from standing water, or steam condensing on a wet face into standing water; vapour a dry
		// face takes up from the air is sorbed into the layer (moisture step)
		for (int face = 0; face < 2; face++) {
			int i = faceNode(face);
			double m = faceJ[face] * dt;
			if (film[face] > 0 || (m < 0 && isotherm.waterActivity(moisture[i]) >= WET_FACE_AW)) {
				double fromFilm = Math.min(film[face], m);
				film[face] -= fromFilm;
				account(fromFilm, temperature[i]);
				faceJ[face] = (m - fromFilm) / dt; // what the film could not supply comes from the node
				if (faceJ[face] > 0) {
					double take = Math.min(faceJ[face] * dt, (moisture[i] - MIN_MOISTURE) * dryMass[i]);
					moisture[i] -= take / dryMass[i];
					account(take, temperature[i]);
				}
				faceJ[face] = 0;
			}
		}

		boilingFlux[0] = boiled[0] / dt;
		boilingFlux[1] = boiled[1] / dt;

		// (4) moisture diffusion, face evaporation implicit in moisture
		moistureStep(dt);
		// (4b) acrylamide in every layer, from this step's temperature and water
		acrylamide.step(this, dt);

		// (5) browning at both faces
		for (int face = 0; face < 2; face++) {
			int i = faceNode(face);
			double aw = film[face] > 0 ? 1 : isotherm.waterActivity(moisture[i]);
			double t = temperature[i];
			double k = kinetics.rate().at(t) * WaterActivityFactor.relative(aw, kinetics.referenceWaterActivity().value())
					* maillardFactor
					+ Caramelisation.RATE.at(t) * caramelFactor * WaterActivityFactor.relative(aw, CARAMEL_REFERENCE_AW);
			extent[face] = 1 - (1 - extent[face]) * Math.exp(-k * dt);
		}
		time = now + dt;
	}

	/** Vapour leaving (or, negative, condensing) at temperature t. */
	private void account(double massKgPerM2, double t) {
		vapourOut += massKgPerM2 * (WaterVapour.latentHeat(t) + WaterVapour.liquidEnthalpy(t));
		evaporated += massKgPerM2;
	}

	/**
	 * (3) Local boiling, solved together with conduction: a layer holding water cannot be hotter than its
	 * boiling point. Layers the plain solve would push above it are pinned there and solved again; the
	 * heat each pinned layer receives beyond what it stores boils its water off (standing water first).
	 */
	private void solveWithBoiling(double dt) {
		conduction.solve(solution, null, null);
		boolean any = false;
		for (int i = 0; i < n; i++) {
			pinned[i] = false;
			ranDry[i] = false;
			if (solution[i] > FREE_WATER_BOILING_K - 0.5 && hasWater(i)) {
				double tb = boilingPointOf(i);
				if (solution[i] > tb) {
					pinned[i] = true;
					pinnedTemperature[i] = tb;
					any = true;
				}
			}
		}
		if (!any) {
			return;
		}
		for (int pass = 0; pass < 2 * n; pass++) {
			conduction.solve(solution, pinned, pinnedTemperature);
			boolean changed = false;
			for (int i = 0; i < n; i++) {
				if (!pinned[i]) {
					continue;
				}
				double surplus = conduction.surplus(i, solution);
				if (surplus < 0) {
					pinned[i] = false; // it loses heat at the boiling point: it is not boiling after all
					changed = true;
				}
				else if (surplus * dt > availableWater(i) * WaterVapour.latentHeat(pinnedTemperature[i])) {
					// it boils dry within the step: all its water goes, the rest of the heat moves on
					pinned[i] = false;
					ranDry[i] = true;
					conduction.addSource(i, -availableWater(i) * WaterVapour.latentHeat(pinnedTemperature[i]) / dt);
					changed = true;
				}
			}
			if (!changed) {
				break;
			}
		}
	}

	/** Takes the solved temperatures and boils off what the pinned and dried-out layers shed. */
	private void applyBoiling(double dt) {
		boiled[0] = 0;
		boiled[1] = 0;
		for (int i = 0; i < n; i++) {
			solvedTemperature[i] = solution[i];
			double energy = pinned[i] ? conduction.surplus(i, solution) * dt
					: ranDry[i] ? availableWater(i) * WaterVapour.latentHeat(pinnedTemperature[i]) : 0;
			temperature[i] = solution[i];
			if (energy > 0) {
				boilOff(i, energy, pinnedTemperature[i]);
			}
		}
	}

	/** Water a layer can still boil off, kg/m²: standing water on its face and its own above the residue. */
	private double availableWater(int i) {
		double w = Math.max(0, (moisture[i] - MIN_MOISTURE) * dryMass[i]);
		if (i == 0) {
			w += film[0];
		}
		else if (i == n - 1) {
			w += film[1];
		}
		return w;
	}

	private boolean hasWater(int i) {
		return moisture[i] > MIN_MOISTURE || (i == 0 && film[0] > 0) || (i == n - 1 && film[1] > 0);
	}

	private double boilingPointOf(int i) {
		if ((i == 0 && film[0] > 0) || (i == n - 1 && film[1] > 0)) {
			return FREE_WATER_BOILING_K;
		}
		return boilingPoint(moisture[i]);
	}

	/** Boils {@code energy} (J/m²) worth of water off layer i at {@code boilingK}, standing water first. */
	private void boilOff(int i, double energy, double boilingK) {
		int face = i == 0 ? 0 : i == n - 1 ? 1 : -1;
		int half = grid.position(i) < 0.5 * grid.thickness() ? 0 : 1;
		double latent = WaterVapour.latentHeat(boilingK);
		double m = Math.min(energy / latent, availableWater(i));
		double left = m;
		if (face >= 0 && film[face] > 0) {
			double fromFilm = Math.min(film[face], left);
			film[face] -= fromFilm;
			left -= fromFilm;
		}
		moisture[i] = Math.max(MIN_MOISTURE, moisture[i] - left / dryMass[i]);
		account(m, boilingK);
		boiled[half] += m;
	}

	private double boilingPoint(double x) {
		return WaterVapour.boilingTemperatureKFast(isotherm.waterActivity(x));
	}

	private void moistureStep(double dt) {
		for (int i = 0; i < n; i++) {
			lower[i] = 0;
			upper[i] = 0;
			diag[i] = dryMass[i] / dt;
			rhs[i] = dryMass[i] / dt * moisture[i];
		}
		for (int i = 0; i < n - 1; i++) {
			double d = grid.spacing(i);
			double dryDensity = 0.5 * (dryMass[i] / volume[i] + dryMass[i + 1] / volume[i + 1]);
			double g = dryDensity * MoistureDiffusivity.at(0.5 * (temperature[i] + temperature[i + 1]),
					0.5 * (moisture[i] + moisture[i + 1])) / d;
			waterConductance[i] = g;
			diag[i] += g;
			diag[i + 1] += g;
			upper[i] = -g;
			lower[i + 1] = -g;
		}
		// evaporation from a bare face into gas: J(X) ≈ J* + s·(X − X*), s = dJ/daw · daw/dX, where J* is
		// what the heat step already drew latent heat for
		for (int face = 0; face < 2; face++) {
			int i = faceNode(face);
			if (film[face] > 0) {
				continue;
			}
			FaceExchange exchange = schedule.at(face, time);
			double x = moisture[i];
			double aw = isotherm.waterActivity(x);
			exchange.evaluate(temperature[i], aw, boilingFlux[face], flux);
			double j = faceJ[face];
			double dx = 1e-4 + 1e-3 * x;
			double slope = flux.evaporationSlopeAw * (isotherm.waterActivity(x + dx) - aw) / dx;
			evapPredicted[face] = j;
			evapSlope[face] = slope;
			diag[i] += slope;
			rhs[i] -= j - slope * x;
		}
		double[] before = moistureBefore;
		System.arraycopy(moisture, 0, before, 0, n);
		solver.solve(lower, diag, upper, rhs, solution);
		System.arraycopy(solution, 0, moisture, 0, n);
		carryEnthalpyWithWater(dt);
		for (int face = 0; face < 2; face++) {
			int i = faceNode(face);
			if (film[face] > 0) {
				continue;
			}
			double j = evapPredicted[face] + evapSlope[face] * (moisture[i] - before[i]);
			if (moisture[i] < MIN_MOISTURE) {
				j -= dryMass[i] * (MIN_MOISTURE - moisture[i]) / dt;
				moisture[i] = MIN_MOISTURE;
			}
			// the heat step drew latent heat for J*; the face node pays for the difference
			double latent = WaterVapour.latentHeat(temperature[i]);
			temperature[i] -= latent * (j - evapPredicted[face]) * dt / capacity[i];
			account(j * dt, temperature[i]);
			evapPredicted[face] = 0;
			evapSlope[face] = 0;
		}
		for (int i = 0; i < n; i++) {
			if (moisture[i] < MIN_MOISTURE) {
				moisture[i] = MIN_MOISTURE;
			}
		}
	}


	/**
	 * Water diffusing into a layer arrives at the temperature of the layer it left: mix its sensible
	 * heat in, so moisture transport neither makes nor loses energy.
	 */
	private void carryEnthalpyWithWater(double dt) {
		for (int i = 0; i < n; i++) {
			heatGain[i] = 0;
		}
		for (int i = 0; i < n - 1; i++) {
			double m = waterConductance[i] * (moisture[i] - moisture[i + 1]) * dt; // kg/m² from i to i+1
			if (m > 0) {
				heatGain[i + 1] += m * (temperature[i] - temperature[i + 1]);
			}
			else {
				heatGain[i] += -m * (temperature[i + 1] - temperature[i]);
			}
		}
		for (int i = 0; i < n; i++) {
			if (heatGain[i] != 0) {
				temperature[i] += heatGain[i] * FoodComponent.WATER.specificHeat(temperature[i] - 273.15) / capacity[i];
			}
		}
	}

	// ---------------------------------------------------------------- outputs

	private double core() {
		return grid.interpolate(temperature, 0.5 * grid.thickness());
	}

	private Sample sample() {
		return new Sample(time, temperature[0] - 273.15, temperature[n - 1] - 273.15, core() - 273.15,
				film[0] > 0 ? 1 : isotherm.waterActivity(moisture[0]), moisture[0], film[0] * 1000, extent[0],
				path.colourAt(extent[0]), acrylamide.crustUgPerKg(), acrylamide.portionUgPerKg());
	}

	// ---------------------------------------------------------------- Layers view

	@Override
	public Grid grid() {
		return grid;
	}

	@Override
	public int size() {
		return n;
	}

	@Override
	public double temperatureK(int i) {
		return temperature[i];
	}

	@Override
	public double moisture(int i) {
		return moisture[i];
	}

	@Override
	public double waterActivity(int i) {
		if ((i == 0 && film[0] > 0) || (i == n - 1 && film[1] > 0)) {
			return 1;
		}
		return isotherm.waterActivity(moisture[i]);
	}

	@Override
	public double dryMass(int i) {
		return dryMass[i];
	}

	@Override
	public double timeS() {
		return time;
	}

}
