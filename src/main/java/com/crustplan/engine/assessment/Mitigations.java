package com.crustplan.engine.assessment;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.BrowningStage;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.Text;
import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.Parameter;

/**
 * Changes that lower acrylamide, each computed by re-running the model with the change
 * and comparing the portion's acrylamide and the time at the target colour.
 * <p>
 * Precursor removals: soaking and blanching leach sugars and asparagine alike (both
 * small, water-soluble molecules of similar size, so we take the same fraction for both).
 * With formation proportional to [Asn]·[RS], removing a fraction f of each leaves (1 −
 * f)² of the acrylamide, so a measured reduction R gives f = 1 − √(1 − R).
 */
public final class Mitigations {

	public static final Parameter SOAK_REMOVAL = Parameter.derived("f_soak",
			"share of sugars and asparagine removed by soaking", 1 - Math.sqrt(1 - 0.27), "–",
			"Pedreschi, Kaack & Granby 2006 (Food Res Int 39:40): soaking 120 min cut fries' acrylamide by 33 / 21 / 27 % at 150 / 170 / 190 °C; mean 27 % → f = 1 − √0.73");

	public static final Parameter BLANCH_REMOVAL = Parameter.derived("f_blanch",
			"share of sugars and asparagine removed by blanching", 1 - Math.sqrt(1 - 0.64), "–",
			"Pedreschi et al. 2005: blanching 85 °C, 3.5 min cut crisps' acrylamide by 64 % on average → f = 1 − √0.36");

	public static final Parameter ASPARAGINASE_REMOVAL = Parameter.fromMemory("f_Asn",
			"share of free asparagine removed by asparaginase", 0.6, "–",
			"enzyme treatments of potato strips and doughs remove roughly half to nine tenths of free asparagine (e.g. Pedreschi, Kaack & Granby 2008, Food Chem 109:386, fries); 60 % from memory");

	public static final Parameter ACID_DIP_UPTAKE = Parameter.assumption("c_acid",
			"citric acid taken up by an acid dip", 1.0, "g/kg",
			"a dip of cut potatoes in about 1 % citric acid (as in Jung, Choi & Ju 2003, J Food Sci 68:1287); uptake of 1 g per kg of food assumed");

	public static final Parameter COLD_STORAGE_SUGAR = Parameter.fromMemory("F_cold",
			"reducing sugar of cold-stored tubers relative to warm-stored", 3.0, "–",
			"storage at 2–4 °C raises glucose and fructose several-fold within weeks (cold-induced sweetening); factor 3 from memory");

	public static final Parameter FRYER_STEP_C = Parameter.commonPractice("ΔT_fry", "temperature step for frying lower",
			10, "°C",
			"one usual fryer setting step; never above 170 °C so the result also meets the below-175 °C measure (common practice)");

	public static final Parameter OVEN_PAN_STEP_C = Parameter.commonPractice("ΔT_oven",
			"temperature step for baking or searing lower", 20, "°C",
			"a usual oven or pan setting step (common practice)");

	public static final Parameter GRILL_STEP_C = Parameter.commonPractice("ΔT_grill",
			"heater temperature step for grilling lower", 100, "°C",
			"a radiant element runs at 600–1000 °C; one step lower on the dial (common practice)");

	/**
	 * Blanching water as in Pedreschi et al. 2005 (85 °C, 3.5 min), the source of
	 * {@link #BLANCH_REMOVAL}.
	 */
	static final double BLANCH_WATER_C = 85;

	private static final String LIGHTER_SOURCE = "Regulation (EU) 2017/2158, Annex II: cook, bake and toast to a lighter colour; the stages are the category's own";

	private Mitigations() {
	}

	/** The changes a plan can apply in one click (see {@link #apply}). */
	public static final Set<String> PLANNABLE = Set.of("LOWER_TEMPERATURE", "LIGHTER_TARGET", "SOAK", "BLANCH",
			"ASPARAGINASE", "ACID_DIP");

	/**
	 * All changes for a planned cook, in a fixed order; those that do not apply say why.
	 */
	public static List<Mitigation> compute(Surface surface, Product product, HeatSetup setup, Target target,
			CookSettings base) {
		return compute(surface, product, setup, target, base, Set.of());
	}

	/**
	 * As {@link #compute(Surface, Product, HeatSetup, Target, CookSettings)}, leaving out
	 * the changes already made to the food as entered ({@code done}: codes such as
	 * {@code BLANCH}); a blanched food is not offered soaking either, since blanching
	 * leaches the same sugars and more of them.
	 */
	public static List<Mitigation> compute(Surface surface, Product product, HeatSetup setup, Target target,
			CookSettings base, Set<String> done) {
		if (product.category() != surface.category()) {
			throw new InvalidInputException("product",
					"'" + product.key() + "' is not a product of " + surface.category().label());
		}
		CookSettings settings = base.withRecordSeries(false);
		CookResult baseline = AcrylamideCook.run(surface, setup, target, settings);
		List<Mitigation> list = new ArrayList<>();
		FoodCategory category = surface.category();
		boolean potato = category == FoodCategory.POTATO;
		if (!baseline.reached()) {
			list.add(Mitigation.notApplicable("NO_BASELINE", Message.of("mitigation.no-baseline.title"),
					Message.of("mitigation.no-baseline.change"), "—", Evidence.ASSUMPTION, Mitigation.Basis.SAME_COLOUR,
					Message.of("mitigation.no-baseline.reason")));
			return list;
		}
		Baseline b = new Baseline(surface, setup, target, settings, baseline);
		list.add(lowerTemperature(b));
		list.add(lighterTarget(b));
		boolean blanched = done.contains("BLANCH");
		// the measures are worded for the frying they were measured for only where the
		// food is fried
		boolean fried = setup instanceof DeepFryer;
		if (potato && !blanched && !done.contains("SOAK")) {
			list.add(rawChange(b, "SOAK", Message.of(fried ? "mitigation.soak.title" : "mitigation.soak.title-cooking"),
					Message.of("mitigation.soak.change", Quantity.of(SOAK_REMOVAL.value() * 100, "%")), SOAK_REMOVAL,
					removePrecursors(surface, SOAK_REMOVAL.value(), SOAK_REMOVAL.value())));
		}
		if (potato && !blanched) {
			list.add(rawChange(b, "BLANCH",
					Message.of(fried ? "mitigation.blanch.title" : "mitigation.blanch.title-cooking"),
					Message.of(fried ? "mitigation.blanch.change" : "mitigation.blanch.change-cooking",
							Temperature.celsius(BLANCH_WATER_C), Quantity.of(BLANCH_REMOVAL.value() * 100, "%")),
					BLANCH_REMOVAL, removePrecursors(surface, BLANCH_REMOVAL.value(), BLANCH_REMOVAL.value())));
		}
		// the enzyme is sold for potato products and doughs, not for vegetables or meat
		boolean enzymeFood = potato || category == FoodCategory.BREAD || category == FoodCategory.SWEET_DOUGH;
		if (enzymeFood && !done.contains("ASPARAGINASE")) {
			list.add(rawChange(b, "ASPARAGINASE", Message.of("mitigation.asparaginase.title"),
					Message.of(potato ? "mitigation.asparaginase.change" : "mitigation.asparaginase.dough-change",
							Quantity.of(ASPARAGINASE_REMOVAL.value() * 100, "%")),
					ASPARAGINASE_REMOVAL, apply("ASPARAGINASE", surface)));
		}
		if (!done.contains("ACID_DIP")) {
			// pieces are dipped; a dough takes the acid in the recipe
			boolean dip = potato || category == FoodCategory.VEGETABLE;
			Surface acid = apply("ACID_DIP", surface);
			list.add(rawChange(b, "ACID_DIP",
					Message.of(dip ? "mitigation.acid-dip.title" : "mitigation.acid-recipe.title"),
					Message.of(dip ? "mitigation.acid-dip.change" : "mitigation.acid-recipe.change",
							Quantity.of(ACID_DIP_UPTAKE.value(), "g", 1), PlainNumber.of(surface.ph(), 2),
							PlainNumber.of(acid.ph(), 2)),
					ACID_DIP_UPTAKE, acid));
		}
		if (potato) {
			list.add(warmStorage(b));
		}
		return list;
	}

	/** The planned cook, against which every change is measured. */
	private record Baseline(Surface surface, HeatSetup setup, Target target, CookSettings settings, CookResult result) {

		double ug() {
			return result.portionAcrylamideAtTargetUgPerKg();
		}

		double minutes() {
			return result.timeToTargetS() / 60;
		}

	}

	/** The step down a setup's mode takes. */
	private static Parameter step(HeatSetup setup) {
		return setup instanceof DeepFryer ? FRYER_STEP_C
				: setup instanceof RadiantGrill ? GRILL_STEP_C : OVEN_PAN_STEP_C;
	}

	/**
	 * The set temperature the lower-temperature change cooks at, °C: one step of the mode
	 * lower (a fryer never above 170 °C).
	 */
	public static double lowerTemperatureC(HeatSetup setup) {
		double t = setup.temperatureC();
		double lower = t - step(setup).value();
		return setup instanceof DeepFryer ? Math.min(lower, 170) : lower;
	}

	/** The stage one lighter than the target, if the category has one. */
	public static Optional<BrowningStage> lighterStage(FoodCategory category, Target target) {
		double extent = target.extentFor(category);
		return category.stages()
			.stream()
			.filter(s -> s.extentOn(category.colourPath()) < extent - 1e-6)
			.max(Comparator.comparingDouble(s -> s.extentOn(category.colourPath())));
	}

	/**
	 * The food after a change of the raw material ({@code SOAK}, {@code BLANCH},
	 * {@code ASPARAGINASE}, {@code ACID_DIP}), as the table computes it.
	 * @throws InvalidInputException naming field {@code change} for any other code
	 */
	public static Surface apply(String code, Surface surface) {
		return switch (code) {
			case "SOAK" -> removePrecursors(surface, SOAK_REMOVAL.value(), SOAK_REMOVAL.value());
			case "BLANCH" -> removePrecursors(surface, BLANCH_REMOVAL.value(), BLANCH_REMOVAL.value());
			case "ASPARAGINASE" -> removePrecursors(surface, 0, ASPARAGINASE_REMOVAL.value());
			case "ACID_DIP" -> surface.withAcidGPerKg(Math.min(50, surface.acidGPerKg() + ACID_DIP_UPTAKE.value()));
			default -> throw new InvalidInputException("change", "'" + code + "' is not a change of the food");
		};
	}

	private static Mitigation lowerTemperature(Baseline b) {
		HeatSetup setup = b.setup();
		double t = setup.temperatureC();
		double lower = lowerTemperatureC(setup);
		Parameter step = step(setup);
		Message title = Message.of("mitigation.lower-temperature.title");
		Message change = Message.of("mitigation.lower-temperature.change", Temperature.celsius(lower),
				Temperature.celsius(t));
		HeatSetup cooler;
		try {
			cooler = HeatSetups.withTemperature(setup, lower);
		}
		catch (IllegalArgumentException e) {
			return Mitigation.notApplicable("LOWER_TEMPERATURE", title, change, step.source(), step.evidence(),
					Mitigation.Basis.SAME_COLOUR, Message.of("mitigation.lower-temperature.at-lowest"));
		}
		CookResult r = AcrylamideCook.run(b.surface(), cooler, b.target(), b.settings());
		Mitigation m = sameColour(b, "LOWER_TEMPERATURE", title, change, step.source(), step.evidence(), r,
				Message.of("mitigation.lower-temperature.not-reached", Temperature.celsius(lower)));
		if (m.applicable() && m.effectUgPerKg() >= 0) {
			// an honest null result: the slower formation is offset by a longer cook that
			// dries more of the piece; the frying rule is said only where it belongs
			boolean fried = setup instanceof DeepFryer && b.surface().category() == FoodCategory.POTATO;
			Message note = fried
					? Message.of("mitigation.lower-temperature.no-gain",
							Temperature.celsius(AcrylamideWarnings.MAX_FRYING_C.value()))
					: Message.of("mitigation.lower-temperature.no-gain-here");
			return new Mitigation(m.code(), m.title(), m.change(), m.source(), m.evidence(), true, note, m.basis(),
					m.beforeUgPerKg(), m.afterUgPerKg(), m.beforeMinutes(), m.afterMinutes(),
					m.afterAtSameColourUgPerKg());
		}
		return m;
	}

	private static Mitigation lighterTarget(Baseline b) {
		FoodCategory category = b.surface().category();
		Optional<BrowningStage> lighter = lighterStage(category, b.target());
		if (lighter.isEmpty()) {
			return Mitigation.notApplicable("LIGHTER_TARGET", Message.of("mitigation.lighter-target.title"),
					Message.of("mitigation.lighter-target.one-stage"), LIGHTER_SOURCE, Evidence.PUBLISHED,
					Mitigation.Basis.SAME_COLOUR,
					Message.of("mitigation.lighter-target.lightest", Text.of(category.label())));
		}
		BrowningStage s = lighter.get();
		CookResult r = AcrylamideCook.run(b.surface(), b.setup(), Target.stage(s.key()), b.settings());
		return sameColour(b, "LIGHTER_TARGET", Message.of("mitigation.lighter-target.title"),
				Message.of("mitigation.lighter-target.change", Target.stage(s.key()).describeInText(category),
						b.target().describeInText(category)),
				LIGHTER_SOURCE, Evidence.PUBLISHED, r, Message.of("mitigation.lighter-target.not-reached"));
	}

	private static Mitigation sameColour(Baseline b, String code, Message title, Message change, String source,
			Evidence evidence, CookResult r, Message notReached) {
		if (!r.reached()) {
			return Mitigation.notApplicable(code, title, change, source, evidence, Mitigation.Basis.SAME_COLOUR,
					notReached);
		}
		return new Mitigation(code, title, change, source, evidence, true, null, Mitigation.Basis.SAME_COLOUR, b.ug(),
				r.portionAcrylamideAtTargetUgPerKg(), b.minutes(), r.timeToTargetS() / 60,
				r.portionAcrylamideAtTargetUgPerKg());
	}

	/** A change of the raw food, compared after the baseline's cooking time. */
	private static Mitigation rawChange(Baseline b, String code, Message title, Message change, Parameter fraction,
			Surface changed) {
		double atSameTime = portionAfter(changed, b.setup(), b.settings(), b.result().timeToTargetS());
		CookResult toColour = AcrylamideCook.run(changed, b.setup(), b.target(), b.settings());
		return new Mitigation(code, title, change, fraction.source(), fraction.evidence(), true, null,
				Mitigation.Basis.SAME_TIME, b.ug(), atSameTime, b.minutes(),
				toColour.reached() ? toColour.timeToTargetS() / 60 : Double.NaN,
				toColour.reached() ? toColour.portionAcrylamideAtTargetUgPerKg() : Double.NaN);
	}

	private static Mitigation warmStorage(Baseline b) {
		Composition c = b.surface().composition();
		double extra = c.reducingSugarPct() * (COLD_STORAGE_SUGAR.value() - 1);
		// the extra sugar comes from starch (cold-induced sweetening breaks starch down)
		double fromStarch = Math.min(extra, c.starchPct());
		Composition cold = new Composition(c.waterPct(), c.proteinPct(), c.fatPct(), c.reducingSugarPct() + fromStarch,
				c.sucrosePct(), c.starchPct() - fromStarch, c.fibrePct(), c.ashPct());
		Surface coldStored = b.surface().withComposition(cold);
		Temperature warm = Temperature.celsius(AcrylamideWarnings.WARM_STORAGE_C);
		Message title = Message.of("mitigation.warm-storage.title", warm);
		Message change = Message.of("mitigation.warm-storage.change", warm,
				Quantity.of(cold.reducingSugarPct(), "%", 1), Quantity.of(c.reducingSugarPct(), "%", 1));
		double coldAtSameTime = portionAfter(coldStored, b.setup(), b.settings(), b.result().timeToTargetS());
		CookResult coldToColour = AcrylamideCook.run(coldStored, b.setup(), b.target(), b.settings());
		// before: the potatoes as entered, cooked as planned; after: what cold storage
		// would have made of them, the level the warm storage keeps away
		return new Mitigation("WARM_STORAGE", title, change, COLD_STORAGE_SUGAR.source(), COLD_STORAGE_SUGAR.evidence(),
				true, null, Mitigation.Basis.AVOIDED, b.ug(), coldAtSameTime, b.minutes(),
				coldToColour.reached() ? coldToColour.timeToTargetS() / 60 : Double.NaN,
				coldToColour.reached() ? coldToColour.portionAcrylamideAtTargetUgPerKg() : Double.NaN);
	}

	/** Portion acrylamide after exactly {@code timeS} of cooking, whatever the colour. */
	static double portionAfter(Surface surface, HeatSetup setup, CookSettings settings, double timeS) {
		Target never = Target.lightness(surface.category().colourPath().darkestLightness());
		CookResult r = AcrylamideCook.run(surface, setup, never,
				settings.withHorizonS(timeS).withRecordSeries(true).withOutputIntervalS(timeS));
		return r.series().get(r.series().size() - 1).portionAcrylamideUgPerKg();
	}

	/**
	 * The surface with a share of its reducing sugar and of its asparagine leached out.
	 */
	static Surface removePrecursors(Surface surface, double sugarFraction, double asparagineFraction) {
		Composition c = surface.composition();
		return surface.withComposition(c.withReducingSugarPct(c.reducingSugarPct() * (1 - sugarFraction)))
			.withAsparagineMgPerKg(surface.asparagineMgPerKg() * (1 - asparagineFraction));
	}

	public static List<Parameter> parameters() {
		return List.of(SOAK_REMOVAL, BLANCH_REMOVAL, ASPARAGINASE_REMOVAL, ACID_DIP_UPTAKE, COLD_STORAGE_SUGAR,
				FRYER_STEP_C, OVEN_PAN_STEP_C, GRILL_STEP_C);
	}

}
