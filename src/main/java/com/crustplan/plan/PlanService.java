package com.crustplan.plan;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;

import org.springframework.stereotype.Service;

import com.crustplan.engine.assessment.AcrylamideCautions;
import com.crustplan.engine.assessment.AcrylamideEstimate;
import com.crustplan.engine.assessment.AcrylamideWarning;
import com.crustplan.engine.assessment.Mitigation;
import com.crustplan.engine.assessment.Mitigations;
import com.crustplan.engine.assessment.RiskMap;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Outcome;
import com.crustplan.engine.cook.CookStep;
import com.crustplan.engine.assessment.AcrylamideCook;
import com.crustplan.engine.cook.Sample;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.doneness.DonenessJudge;
import com.crustplan.engine.doneness.DonenessWarning;
import com.crustplan.engine.doneness.FoodCode;
import com.crustplan.engine.doneness.FoodCode.Cut;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.colour.Lab;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.myoglobin.SurfaceGreying;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;

/**
 * The one place the web app runs the engine: takes engine inputs (never entities), runs
 * the cook and adds what a kitchen needs around the numbers (warnings with reasons, the
 * usual cautions, swatches), all as messages that the page renders in the cook's unit. A
 * new simulation per call: nothing stateful is shared between requests.
 */
@Service
public class PlanService {

	/** Longest plan: the engine's own limit of 6 h. */
	public static final double MAX_HORIZON_MINUTES = CookSettings.MAX_HORIZON_S / 60;

	/**
	 * An hour unless asked otherwise: longer than any sear, roast or fry in the demo
	 * kitchen (common practice).
	 */
	public static final double DEFAULT_HORIZON_MINUTES = 60;

	/**
	 * Swatches in the strip: enough to see the colour change, few enough to read on a
	 * tablet.
	 */
	static final int SWATCHES = 10;

	/**
	 * Above neutral, Maillard browning and acrylamide formation speed up (Martins, Jongen
	 * & van Boekel 2000, Trends Food Sci Technol 11:364).
	 */
	static final double ALKALINE_PH = 7;

	/**
	 * A plan for the category's usual product, with the acrylamide changes worked out.
	 */
	public PlanReport plan(Surface surface, HeatSetup setup, Target target, double horizonMinutes) {
		return plan(surface, Product.defaultFor(surface.category()), setup, target, horizonMinutes, true);
	}

	/**
	 * @param product what the surface is sold as (sets the acrylamide benchmark)
	 * @param withMitigations whether to run the model again for each acrylamide-reducing
	 * change (a few hundred milliseconds)
	 */
	public PlanReport plan(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean withMitigations) {
		return plan(surface, product, setup, target, horizonMinutes, withMitigations, Set.of());
	}

	/**
	 * @param done changes of the food already made (codes such as {@code BLANCH}): not
	 * offered again
	 */
	public PlanReport plan(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean withMitigations, Set<String> done) {
		return reports.get(new ReportKey(surface, product, setup, target, horizonMinutes, withMitigations, done),
				k -> compute(surface, product, setup, target, horizonMinutes, withMitigations, done));
	}

	/**
	 * Repeat plan-page views reuse the work done: the report depends only on these (all
	 * value records); its messages are worded per view, in the cook's unit, so the unit
	 * is not part of the key.
	 */
	private record ReportKey(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean withMitigations, Set<String> done) {
	}

	private final ReportCache<ReportKey, PlanReport> reports = new ReportCache<>(ReportCache.PLAN_REPORTS);

	private PlanReport compute(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			boolean withMitigations, Set<String> done) {
		if (!Double.isFinite(horizonMinutes) || horizonMinutes < 1 || horizonMinutes > MAX_HORIZON_MINUTES) {
			throw new InvalidInputException("horizonMinutes",
					String.format(Locale.ROOT, "must be from 1 to %.0f minutes", MAX_HORIZON_MINUTES));
		}
		CookSettings settings = CookSettings.defaults().withHorizonS(horizonMinutes * 60);
		AcrylamideCook.Inside<CookResult> inside = AcrylamideCook.runInside(surface, setup, target, settings);
		CookResult result = inside.result();
		AcrylamideEstimate estimate = AcrylamideEstimate.of(surface, product, setup, target, result);
		// changes are offered where acrylamide matters: a product with a benchmark, or a
		// starchy food without one (roast potatoes, vegetables), where they are browning
		// advice rather than an EU measure; muscle foods get none
		boolean matters = product.benchmark().isPresent() || PlanReport.starchy(surface.category());
		List<Mitigation> mitigations = withMitigations && matters
				? Mitigations.compute(surface, product, setup, target, settings, done) : List.of();
		List<PlanWarning> warnings = warnings(surface, setup, result);
		surfaceLimit(setup, result).ifPresent(warnings::add);
		for (AcrylamideWarning a : estimate.warnings()) {
			warnings.add(new PlanWarning(a.code().toLowerCase(Locale.ROOT).replace('_', '-'),
					Message.of("warning.with-basis", a.message(), Text.of(a.basis()))));
		}
		return new PlanReport(surface, setup, target.describe(surface.category()), horizonMinutes, result, warnings,
				cautions(surface, product, setup), AcrylamideView.of(estimate, mitigations),
				swatches(result, surface.category(), inside.face()), null, CutFace.of(inside.interior()));
	}

	/**
	 * A grill stops the cook where the surface would char; in the other modes a surface
	 * hotter than the fitted range before the target is flagged.
	 */
	static Optional<PlanWarning> surfaceLimit(HeatSetup setup, CookResult result) {
		double limitC = RadiantGrill.CHAR_SURFACE.value();
		if (result.outcome() == Outcome.SURFACE_LIMIT) {
			return Optional.of(new PlanWarning("surface-limit", Message.of("warning.surface-limit",
					Temperature.celsius(setup.surfaceLimitC()), Duration.seconds(result.simulatedS()))));
		}
		double until = result.reached() ? result.timeToTargetS() : Double.POSITIVE_INFINITY;
		double hottest = result.series()
			.stream()
			.filter(x -> x.timeS() <= until)
			.mapToDouble(Sample::surfaceTemperatureC)
			.max()
			.orElse(Double.NaN);
		if (hottest > limitC) {
			return Optional.of(new PlanWarning("surface-limit", Message.of("warning.surface-past-limit",
					Temperature.celsius(hottest), Temperature.celsius(limitC))));
		}
		return Optional.empty();
	}

	static List<PlanWarning> warnings(Surface surface, HeatSetup setup, CookResult result) {
		List<PlanWarning> w = new ArrayList<>();
		if (!result.reached()) {
			w.add(new PlanWarning("target-not-reached",
					Message.of("warning.target-not-reached", result.explanation())));
		}
		// both ways: short of done (food code, raw crumb, a fry's centre) and past
		// juiciness or done long before the colour
		for (DonenessWarning d : DonenessJudge.judge(surface, setup, result, Cut.WHOLE)) {
			w.add(new PlanWarning(d.code(), d.message()));
		}
		if (surface.ph() > ALKALINE_PH) {
			w.add(new PlanWarning("alkaline-surface",
					Message.of("warning.alkaline-surface", PlainNumber.of(surface.ph(), 1))));
		}
		return w;
	}

	/**
	 * The cautions that apply to this food on this heat: acrylamide where it forms
	 * (starchy foods, or a product with an EU benchmark), the food code's core
	 * temperatures where the code sets them (meat, poultry, fish), and the hot-oil and
	 * hot-pan cautions for those setups. The probe and the deference to the local food
	 * code and licensed practice always.
	 */
	static List<Message> cautions(Surface surface, Product product, HeatSetup setup) {
		List<Message> c = new ArrayList<>();
		if (PlanReport.acrylamideMatters(surface.category(), product.benchmark().isPresent())) {
			c.add(Message.of("caution.joined", AcrylamideCautions.CARCINOGEN, AcrylamideCautions.ESTIMATE));
		}
		c.add(Message.of("caution.probe"));
		if (FoodCode.forCategory(surface.category(), Cut.WHOLE) != null) {
			// the code's own figures in both scales: a °F page shows 155 °F, not 154 °F
			// converted from 68 °C
			c.add(Message.of("caution.food-code", FoodCode.WHOLE_CUT.withFahrenheit(),
					FoodCode.COMMINUTED.withFahrenheit(), FoodCode.POULTRY.withFahrenheit()));
		}
		else {
			// no FDA core figure for chips or bread: the local code still decides
			c.add(Message.of("caution.local-code"));
		}
		if (setup instanceof DeepFryer) {
			c.add(Message.of("caution.hot-oil"));
		}
		if (setup instanceof PanContact) {
			c.add(Message.of("caution.hot-pan"));
		}
		if (surface.bicarbonateGPerKg() > 0) {
			c.add(Message.of("caution.bicarbonate"));
		}
		return c;
	}

	/**
	 * A plan in steps (sear, oven, rest): each step a heat setup held until its end; the
	 * targets, a colour and a core temperature (either may be null, not both), are
	 * recorded where they are reached. Acrylamide is estimated without the reducing
	 * changes, which are worked out for one setup.
	 * @param labels each step's name for the page (a setup's name, "Rest")
	 */
	public PlanReport planSteps(Surface surface, Product product, List<CookStep> steps, List<String> labels,
			Target colour, Double coreTargetC, double horizonMinutes) {
		checkHorizon(horizonMinutes);
		if (steps.isEmpty()) {
			throw new InvalidInputException("steps", "a plan needs at least one step");
		}
		return StepPlanner.plan(surface, product, steps, labels, colour, coreTargetC, horizonMinutes);
	}

	/**
	 * A saved or page plan's inputs (°C): in steps when it has them, else one setup with
	 * its changes worked out.
	 */
	public PlanReport plan(PlanInputs in) {
		if (!in.stepped()) {
			return plan(in.surface().toSurface(), in.surface().toProduct(), in.setup().toHeatSetup(), in.target(),
					in.horizonMinutes(), true, PlanChanges.done(in));
		}
		List<CookStep> steps = new ArrayList<>();
		List<String> labels = new ArrayList<>();
		for (int i = 0; i < in.steps().size(); i++) {
			PlanStep p = in.steps().get(i);
			try {
				steps.add(p.toCookStep(in.horizonMinutes()));
			}
			catch (InvalidInputException e) {
				throw new InvalidInputException("steps[" + i + "]." + e.field(), e.reason());
			}
			labels.add(p.label());
		}
		return planSteps(in.surface().toSurface(), in.surface().toProduct(), steps, labels, in.colourTarget(),
				in.coreTargetC(), in.horizonMinutes());
	}

	private static void checkHorizon(double horizonMinutes) {
		if (!Double.isFinite(horizonMinutes) || horizonMinutes < 1 || horizonMinutes > MAX_HORIZON_MINUTES) {
			throw new InvalidInputException("horizonMinutes",
					String.format(Locale.ROOT, "must be from 1 to %.0f minutes", MAX_HORIZON_MINUTES));
		}
	}

	/** Most time columns on the risk map: readable on a tablet. */
	static final int RISK_MAP_COLUMNS = 24;

	/**
	 * The acrylamide risk map around a setup: the mode's usual range of set temperatures
	 * (and the setup's own) down, times across up to twice the planned time (10 min at
	 * least, the horizon at most).
	 */
	public RiskMapView riskMap(Surface surface, Product product, HeatSetup setup, Target target, double horizonMinutes,
			String surfaceName, String setupName) {
		CookSettings settings = CookSettings.defaults();
		CookResult planned = AcrylamideCook.run(surface, setup, target,
				settings.withHorizonS(horizonMinutes * 60).withRecordSeries(false));
		double span = Math.min(horizonMinutes * 60,
				Math.max(600, planned.reached() ? 2 * planned.timeToTargetS() : horizonMinutes * 60));
		double step = Math.max(30, Math.ceil(span / RISK_MAP_COLUMNS / 30) * 30);
		RiskMap map = RiskMap.compute(surface, product, setup, target, riskMapTemperatures(setup), step,
				step * Math.ceil(span / step), settings);
		FoodCategory category = surface.category();
		String stage = target.stage() != null
				? category.stage(target.stage()).map(s -> s.label()).orElse(target.stage())
				: "L* " + Math.round(target.lightness());
		return RiskMapView.of(map, category.colourPath(), surfaceName, setupName, target.extentFor(category), stage);
	}

	/** The mode's usual range in even steps, with the setup's own temperature added. */
	static double[] riskMapTemperatures(HeatSetup setup) {
		// fryer: the common frying range (EU 2017/2158 Annex II asks for below 175 °C);
		// grill: element
		// temperatures (from memory); pan surfaces and oven air: common practice
		double from = setup instanceof RadiantGrill ? 500 : 150;
		double to = setup instanceof DeepFryer ? 190 : setup instanceof RadiantGrill ? 1000 : 250;
		double by = setup instanceof DeepFryer ? 5 : setup instanceof RadiantGrill ? 50 : 10;
		TreeSet<Double> t = new TreeSet<>();
		for (double v = from; v <= to + 1e-9; v += by) {
			t.add(v);
		}
		t.add(setup.temperatureC());
		double[] out = new double[t.size()];
		int i = 0;
		for (double v : t) {
			out[i++] = v;
		}
		return out;
	}

	/** Evenly spaced swatches over the run; the one nearest the target time is marked. */
	static List<Swatch> swatches(CookResult result) {
		return swatches(result, null, null);
	}

	/**
	 * As {@link #swatches(CookResult)}; where the face's pigment history is known (red
	 * meat) a face that denatured before it browned is drawn grey, not raw red.
	 */
	static List<Swatch> swatches(CookResult result, FoodCategory category, SurfaceGreying.FaceHistory face) {
		List<Sample> s = result.series();
		if (s.isEmpty()) {
			return List.of();
		}
		int n = s.size();
		TreeSet<Integer> picks = new TreeSet<>();
		for (int k = 0; k < SWATCHES; k++) {
			picks.add((int) Math.round(k * (n - 1) / (double) (SWATCHES - 1)));
		}
		int targetIndex = -1;
		if (result.reached()) {
			targetIndex = nearest(s, result.timeToTargetS());
			Integer near = picks.floor(targetIndex);
			Integer above = picks.ceiling(targetIndex);
			Integer replace = near == null ? above
					: above == null ? near : (targetIndex - near <= above - targetIndex ? near : above);
			if (replace != null && replace != 0 && replace != n - 1) {
				picks.remove(replace);
			}
			picks.add(targetIndex);
		}
		List<Swatch> out = new ArrayList<>();
		for (int i : picks) {
			Sample x = s.get(i);
			Lab c = face == null || !SurfaceGreying.applies(category) ? x.colour()
					: SurfaceGreying.colour(category, x.browningExtent(), face.at(x.timeS()));
			out.add(new Swatch(x.timeS(), c.hex(), c.lightness(), i == targetIndex));
		}
		return out;
	}

	private static int nearest(List<Sample> s, double t) {
		int best = 0;
		for (int i = 1; i < s.size(); i++) {
			if (Math.abs(s.get(i).timeS() - t) < Math.abs(s.get(best).timeS() - t)) {
				best = i;
			}
		}
		return best;
	}

}
