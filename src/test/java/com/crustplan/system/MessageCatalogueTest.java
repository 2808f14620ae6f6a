package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.assessment.Mitigation;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.GrillKind;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.engine.message.Argument;
import com.crustplan.engine.message.Duration;
import com.crustplan.engine.message.Message;
import com.crustplan.engine.message.PlainNumber;
import com.crustplan.engine.message.Quantity;
import com.crustplan.engine.message.StatedTemperature;
import com.crustplan.engine.message.Temperature;
import com.crustplan.engine.message.TemperatureDifference;
import com.crustplan.engine.message.Text;
import com.crustplan.plan.PlanReport;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.PlanWarning;

/**
 * Every message code the engine and the planner use is in {@code messages.properties} and
 * the other way round, and every one reads right in °C and in °F: no °C on a °F rendering
 * and no figure twice (the "154 °F (155 °F)" of converting a code's own two figures).
 * Conversions: °F = °C × 9/5 + 32, a difference of 1 K = 1.8 °F (NIST SP 811, §B.9).
 */
class MessageCatalogueTest {

	static final MessageText TEXT = new MessageText();

	static final Pattern NUMBER = Pattern.compile("\\d+(?:\\.\\d+)?");

	static final Pattern PLACEHOLDER = Pattern.compile("\\{(\\d+)}");

	static Map<String, String> patterns;

	/**
	 * Binding codes Spring's form handling looks up in the same file; not engine
	 * messages.
	 */
	static boolean bindingCode(String key) {
		return key.startsWith("typeMismatch") || key.equals("repeated");
	}

	@BeforeAll
	static void load() throws IOException {
		Properties p = new Properties();
		try (Reader r = Files.newBufferedReader(Path.of("src/main/resources/messages.properties"),
				StandardCharsets.UTF_8)) {
			p.load(r);
		}
		patterns = new HashMap<>();
		p.stringPropertyNames().stream().filter(k -> !bindingCode(k)).forEach(k -> patterns.put(k, p.getProperty(k)));
	}

	/** A page's rendering with its no-break spaces read as spaces. */
	static String page(Message message, TemperatureUnit unit) {
		return TEXT.render(message, unit).replace('\u00a0', ' ');
	}

	static Temperature c(double v) {
		return Temperature.celsius(v);
	}

	static Quantity q(double v, String unit) {
		return Quantity.of(v, unit);
	}

	static Message m(String code, Argument... args) {
		return Message.of(code, args);
	}

	/**
	 * One realistic set of values per code, distinct from each other and from the figures
	 * in the wording.
	 */
	static final Map<String, Argument[]> SAMPLES = new LinkedHashMap<>();

	static void sample(String code, Argument... args) {
		SAMPLES.put(code, args);
	}

	static {
		sample("outcome.reached");
		sample("outcome.no-reactants");
		sample("outcome.wet-plateau");
		sample("outcome.too-cool");
		sample("outcome.too-slow");
		sample("outcome.surface-limit");
		sample("report.water-at-target", PlainNumber.of(41, 0));
		sample("report.oil-at-target", PlainNumber.of(12.5, 1));
		sample("outcome.explained", m("outcome.too-cool"), c(128), Quantity.of(42, "%", 0), Duration.minutes(9));
		sample("target.stage", Text.of("Golden"));
		sample("target.lightness", PlainNumber.of(62, 0));
		sample("target.core", c(52));
		sample("exchange.kitchen-air");
		sample("exchange.wet-bulb");
		sample("exchange.pan", c(213), q(300, "W/m²K"));
		sample("exchange.oven.fan", c(232), q(20, "%"));
		sample("exchange.oven.still", c(232), q(20, "%"));
		sample("exchange.grill", c(815));
		sample("exchange.fryer", c(172), PlainNumber.of(280, 0), q(900, "W/m²K"));
		sample("assumption.pan.held", c(213));
		sample("assumption.pan.contact.fat", Quantity.of(300, "W/m²K", 1));
		sample("assumption.pan.contact.dry", Quantity.of(150, "W/m²K", 1));
		sample("assumption.pan.upper-face", c(25));
		sample("assumption.turned", Duration.seconds(45));
		sample("assumption.not-turned");
		sample("assumption.rest", c(22), q(10, "W/m²K"));
		sample("assumption.pan.body", c(230), Text.of("cast iron"), Quantity.of(2.3, "kg", 1), q(28, "cm"),
				Quantity.of(2.5, "kW", 1), m("control.kept-up"), q(50, "%"));
		sample("control.kept-up");
		sample("control.fixed");
		sample("assumption.fryer.body", c(175), Quantity.of(8, "L", 1), Quantity.of(3.2, "kW", 1),
				Quantity.of(0.5, "kg", 2));
		sample("exchange.rest", c(22));
		sample("assumption.surface.slab", q(12, "mm"));
		sample("assumption.surface.strip", q(10, "mm"));
		sample("assumption.surface.cube", q(35, "mm"));
		sample("assumption.surface.ball", q(40, "mm"));
		sample("assumption.surface.turned", q(25, "%"));
		sample("assumption.surface.ph", PlainNumber.of(5.8, 2), q(51, "mmol/(pH·kg)"));
		sample("assumption.surface.ph.after-additions", PlainNumber.of(6.4, 2), q(51, "mmol/(pH·kg)"));
		sample("assumption.surface.category", Text.of("red meat"));
		sample("assumption.surface.sucrose");
		sample("assumption.oven.fan", q(40, "W/m²K"));
		sample("assumption.oven.still", q(18, "W/m²K"));
		sample("assumption.oven.steam", Quantity.of(20, "%", 1), c(60), c(64));
		sample("assumption.oven.rack");
		sample("assumption.grill.element", c(815), q(50, "%"), q(37, "kW/m²"));
		sample("assumption.grill.lower-face");
		sample("assumption.grill.upper-face");
		sample("assumption.grill.flux", Text.of("Salamander"), Quantity.of(14, "kW/m²", 1), c(835));
		sample("assumption.grill.geometry", Text.of("Charcoal grill"), q(150, "mm"), PlainNumber.of(0.74, 2),
				q(25, "%"));
		sample("assumption.grill.surface-limit", c(250));
		sample("assumption.fryer.oil", c(172));
		sample("assumption.fryer.coefficient", q(280, "W/m²K"), q(900, "W/m²K"));
		sample("assumption.fryer.uptake");
		sample("acrylamide.basis");
		sample("caution.acrylamide.carcinogen");
		sample("caution.acrylamide.estimate");
		sample("caution.acrylamide.authority");
		sample("caution.acrylamide.benchmark-meaning");
		sample("warning.acrylamide.frying-too-hot", c(185), c(175));
		sample("warning.acrylamide.darker-than-guide", m("target.stage", Text.of("Brown")), Text.of("golden"));
		sample("warning.acrylamide.high-sugar-potato", Quantity.of(0.83, "%", 2), c(6));
		sample("warning.acrylamide.over-benchmark", q(612, "µg/kg"), q(500, "µg/kg"), Text.of("french fries (chips)"));
		sample("warning.acrylamide.near-benchmark", q(312, "µg/kg"), q(500, "µg/kg"), Text.of("french fries (chips)"));
		sample("mitigation.basis.same-colour");
		sample("mitigation.basis.same-time");
		sample("mitigation.basis.avoided");
		sample("surface.asparagine-far-below", Quantity.of(50, "mg/kg", 0), Quantity.of(3000, "mg/kg", 0),
				Text.of("Potato"));
		sample("surface.asparagine-far-above", Quantity.of(50000, "mg/kg", 0), Quantity.of(3000, "mg/kg", 0),
				Text.of("Potato"));
		sample("surface.sugar-far-below", Quantity.of(0, "%", 2), Quantity.of(0.3, "%", 2), Text.of("Potato"));
		sample("surface.sugar-far-above", Quantity.of(5, "%", 2), Quantity.of(0.3, "%", 2), Text.of("Potato"));
		sample("plan.change.lower-temperature");
		sample("plan.change.lighter-target");
		sample("plan.change.soak");
		sample("plan.change.blanch");
		sample("plan.change.asparaginase");
		sample("plan.change.acid-dip");
		sample("mitigation.lower-temperature.no-gain-here");
		sample("mitigation.asparaginase.dough-change", Quantity.of(60, "%"));
		sample("mitigation.no-baseline.title");
		sample("mitigation.no-baseline.change");
		sample("mitigation.no-baseline.reason");
		sample("mitigation.lower-temperature.title");
		sample("mitigation.lower-temperature.change", c(170), c(185));
		sample("mitigation.lower-temperature.at-lowest");
		sample("mitigation.lower-temperature.not-reached", c(170));
		sample("mitigation.lower-temperature.no-gain", c(175));
		sample("mitigation.lighter-target.title");
		sample("mitigation.lighter-target.one-stage");
		sample("mitigation.lighter-target.lightest", Text.of("Potato"));
		sample("mitigation.lighter-target.change", m("target.stage", Text.of("light golden")),
				m("target.lightness", PlainNumber.of(58, 0)));
		sample("mitigation.lighter-target.not-reached");
		sample("mitigation.soak.title");
		sample("mitigation.soak.change", q(15, "%"));
		sample("mitigation.blanch.title");
		sample("mitigation.blanch.change", c(85), q(40, "%"));
		sample("mitigation.soak.title-cooking");
		sample("mitigation.blanch.title-cooking");
		sample("mitigation.blanch.change-cooking", c(85), q(40, "%"));
		sample("mitigation.asparaginase.title");
		sample("mitigation.asparaginase.change", q(60, "%"));
		sample("mitigation.acid-dip.title");
		sample("mitigation.acid-dip.change", Quantity.of(1, "g", 1), PlainNumber.of(5.8, 2), PlainNumber.of(5.52, 2));
		sample("mitigation.acid-recipe.title");
		sample("mitigation.acid-recipe.change", Quantity.of(1, "g", 1), PlainNumber.of(5.8, 2),
				PlainNumber.of(5.52, 2));
		sample("mitigation.warm-storage.title", c(6));
		sample("mitigation.warm-storage.change", c(6), Quantity.of(2.4, "%", 1), Quantity.of(0.8, "%", 1));
		sample("warning.with-basis", m("warning.acrylamide.frying-too-hot", c(185), c(175)),
				Text.of("Regulation (EU) 2017/2158, Annex II, Part A (French fries)"));
		sample("warning.target-not-reached", m("outcome.too-slow"));
		sample("doneness.moment.colour");
		sample("doneness.moment.end");
		sample("interior.centre.meat.raw", c(44), c(50));
		sample("interior.centre.meat.rare", c(51), c(50), c(52));
		sample("interior.centre.meat.medium-rare", c(56), c(55), c(57));
		sample("interior.centre.meat.medium", c(61), c(60), c(63));
		sample("interior.centre.meat.medium-well", c(66), c(65), c(68));
		sample("interior.centre.meat.well", c(98), c(70));
		sample("interior.centre.poultry.done", c(77), StatedTemperature.of(74, 165));
		sample("interior.centre.poultry.under", c(69), StatedTemperature.of(74, 165));
		sample("interior.centre.fish.done", c(64), StatedTemperature.of(63, 145));
		sample("interior.centre.fish.under", c(52), StatedTemperature.of(63, 145));
		sample("interior.band.meat", Quantity.of(3.4, "mm", 1), Quantity.of(2.6, "mm", 1));
		sample("interior.band.meat.even", Quantity.of(3.4, "mm", 1));
		sample("interior.band.meat.one-face", Quantity.of(2.8, "mm", 1));
		sample("interior.band.meat.none");
		sample("interior.through.meat");
		sample("interior.band.poultry", Quantity.of(6.2, "mm", 1), Quantity.of(4.1, "mm", 1));
		sample("interior.band.poultry.even", Quantity.of(6.2, "mm", 1));
		sample("interior.band.poultry.one-face", Quantity.of(4.7, "mm", 1));
		sample("interior.band.poultry.none");
		sample("interior.through.poultry");
		sample("interior.band.fish", Quantity.of(5.5, "mm", 1), Quantity.of(3.9, "mm", 1));
		sample("interior.band.fish.even", Quantity.of(5.5, "mm", 1));
		sample("interior.band.fish.one-face", Quantity.of(3.6, "mm", 1));
		sample("interior.band.fish.none");
		sample("interior.through.fish");
		sample("warning.food-code.poultry", m("doneness.moment.colour"), c(52), StatedTemperature.of(74, 165));
		sample("warning.food-code.whole-cut", m("doneness.moment.colour"), c(48), StatedTemperature.of(63, 145),
				StatedTemperature.of(68, 155));
		sample("warning.food-code.minced", m("doneness.moment.end"), c(61), StatedTemperature.of(68, 155));
		sample("warning.doneness.crumb-raw", m("doneness.moment.colour"), c(26), c(96));
		sample("warning.doneness.fry-centre", m("doneness.moment.colour"), c(64), c(98));
		sample("warning.doneness.dry.meat", m("doneness.moment.colour"), c(82), c(70));
		sample("warning.doneness.dry.poultry", m("doneness.moment.colour"), c(99), c(80));
		sample("warning.doneness.dry.fish", m("doneness.moment.end"), c(86), c(65));
		sample("warning.doneness.colour-late", c(96), Duration.minutes(10), Duration.minutes(38));
		sample("warning.with-suggestion", m("warning.doneness.dry.poultry", m("doneness.moment.colour"), c(99), c(80)),
				m("suggestion.brown-first", StatedTemperature.of(74, 165)));
		sample("suggestion.lower-or-finish", TemperatureDifference.kelvin(20), c(180), StatedTemperature.of(74, 165));
		sample("suggestion.lower-heat", TemperatureDifference.kelvin(30));
		sample("suggestion.bake-lower", TemperatureDifference.kelvin(40));
		sample("suggestion.fry-cooler-or-thinner", c(175), q(10, "mm"));
		sample("suggestion.brown-first", StatedTemperature.of(74, 165));
		sample("suggestion.hotter", TemperatureDifference.kelvin(30));
		sample("warning.surface-limit", c(250), Duration.seconds(95));
		sample("warning.surface-past-limit", c(262), c(250));
		sample("warning.alkaline-surface", PlainNumber.of(7.6, 1));
		sample("caution.joined", m("caution.acrylamide.carcinogen"), m("caution.acrylamide.estimate"));
		sample("caution.probe");
		sample("caution.local-code");
		sample("caution.food-code", StatedTemperature.withFahrenheit(63, 145),
				StatedTemperature.withFahrenheit(68, 155), StatedTemperature.withFahrenheit(74, 165));
		sample("caution.hot-oil");
		sample("caution.hot-pan");
		sample("caution.bicarbonate");
		sample("warning.core-target-not-reached", c(74), c(68));
		sample("targets.colour-first", m("target.stage", Text.of("golden")), Duration.seconds(95), c(52));
		sample("targets.core-first", m("target.stage", Text.of("golden")), Duration.minutes(4), c(52));
		sample("targets.core-not-reached", m("target.stage", Text.of("golden")), c(52));
		sample("targets.colour-not-reached", c(52), m("target.stage", Text.of("golden")));
		sample("targets.neither", m("target.stage", Text.of("golden")), c(52));
		sample("targets.colour-missed", m("target.stage", Text.of("golden")));
		sample("targets.core-missed", c(52));
		sample("timeline.into.pan", c(240));
		sample("timeline.into.oven", c(180));
		sample("timeline.into.grill", c(800));
		sample("timeline.into.fryer", c(140));
		sample("timeline.into.rest", c(22));
		sample("timeline.flip");
		sample("timeline.flips", Duration.seconds(60), PlainNumber.of(12, 0));
		sample("timeline.probe", c(47), c(52));
		sample("timeline.pull.core", c(52));
		sample("timeline.pull.colour", m("target.stage", Text.of("golden")));
		sample("timeline.horizon");
		sample("timeline.rest.peak", c(55));
		sample("timeline.end", c(55), c(41));
	}

	/**
	 * Codes named where messages are made: the first argument of every Message.of in main
	 * code.
	 */
	static Set<String> codesInSource() throws IOException {
		Set<String> codes = new TreeSet<>();
		// the formatter may break a call after "Message": allow whitespace before ".of("
		Pattern call = Pattern.compile("Message\\s*\\.of\\(([^,)]*)");
		Pattern literal = Pattern.compile("\"([^\"]+)\"");
		try (Stream<Path> files = Files.walk(Path.of("src/main/java"))) {
			for (Path f : files.filter(p -> p.toString().endsWith(".java")).toList()) {
				if (f.endsWith(Path.of("engine/message/Message.java"))) {
					continue;
				}
				Matcher mc = call.matcher(Files.readString(f));
				while (mc.find()) {
					Matcher ml = literal.matcher(mc.group(1));
					int found = 0;
					while (ml.find()) {
						codes.add(ml.group(1));
						found++;
					}
					assertThat(found)
						.as("%s: Message.of(%s…) names its code as a literal, so it can be checked here", f,
								mc.group(1))
						.isPositive();
				}
			}
		}
		return codes;
	}

	@Test
	void shouldHaveEveryCodeTheCodeUsesAndNoOther() throws IOException {
		assertThat(new TreeSet<>(patterns.keySet())).isEqualTo(codesInSource());
		assertThat(new TreeSet<>(SAMPLES.keySet())).isEqualTo(new TreeSet<>(patterns.keySet()));
	}

	@Test
	void shouldGiveEachPatternExactlyTheArgumentsOfItsSample() {
		SAMPLES.forEach((code, args) -> assertThat(placeholders(patterns.get(code))).as(code).isEqualTo(args.length));
	}

	@Test
	void shouldRenderEveryCodeInCelsiusAndFahrenheitWithoutMixingUnitsOrRepeatingAFigure() {
		SAMPLES.forEach((code, args) -> {
			Message message = Message.of(code, args);
			for (TemperatureUnit unit : TemperatureUnit.values()) {
				String s = TEXT.render(message, unit);
				assertThat(s).as("%s in %s", code, unit).isNotBlank().doesNotContain("{", "}", "''");
				if (unit == TemperatureUnit.FAHRENHEIT) {
					assertThat(s).as(code).doesNotContain("°C", "° C");
				}
				List<String> figures = new ArrayList<>();
				NUMBER.matcher(s).results().forEach(r -> figures.add(r.group()));
				assertThat(figures).as("%s in %s: %s", code, unit, s).doesNotHaveDuplicates();
			}
		});
	}

	@Test
	void shouldWordMessagesAsTheyAlwaysRead() {
		// today's API wording, byte for byte, and the conversions of NIST SP 811 §B.9
		assertThat(TEXT.celsius(m("warning.acrylamide.frying-too-hot", c(190), c(175))))
			.startsWith("Oil at 190 °C: fry potato products below 175 °C, and as low as food safety allows.");
		assertThat(page(m("warning.acrylamide.frying-too-hot", c(190), c(175)), TemperatureUnit.FAHRENHEIT))
			.startsWith("Oil at 374 °F: fry potato products below 347 °F,");
		assertThat(page(m("assumption.pan.upper-face", c(25)), TemperatureUnit.FAHRENHEIT))
			.isEqualTo("The upper face loses heat and water to kitchen air at 77 °F.");
		assertThat(TEXT.celsius(m("assumption.grill.element", c(815), q(50, "%"), q(37, "kW/m²"))))
			.isEqualTo("Element at 815 °C filling 50 % of the food's view: 37 kW/m² on a cold surface.");
		// FDA Food Code 2022, 3-401.11: the code's own figures, 155 °F for minced meat
		// (not 154 °F from 68 °C)
		Message foodCode = m("caution.food-code", StatedTemperature.withFahrenheit(63, 145),
				StatedTemperature.withFahrenheit(68, 155), StatedTemperature.withFahrenheit(74, 165));
		assertThat(TEXT.celsius(foodCode)).contains("63 °C (145 °F) for 15 s", "68 °C (155 °F) for 17 s",
				"74 °C (165 °F) for under 1 s");
		assertThat(page(foodCode, TemperatureUnit.FAHRENHEIT))
			.contains("145 °F for 15 s", "155 °F for 17 s", "165 °F for under 1 s")
			.doesNotContain("154");
		assertThat(TEXT.celsius((Message) null)).isEmpty();
	}

	@Test
	void shouldShowDifferencesAndDurationsInTheirOwnUnits() {
		// a difference in the page's scale, as a cook reads it ("10 °C cooler", not
		// "10 K"): 1 K = 1 °C = 1.8 °F of difference (NIST SP 811 §B.9); figure and unit
		// joined by a no-break space (U+00A0) so a line never ends between them
		assertThat(TEXT.argument(TemperatureDifference.kelvin(10), TemperatureUnit.CELSIUS)).isEqualTo("10\u00a0°C");
		assertThat(TEXT.argument(TemperatureDifference.kelvin(10), TemperatureUnit.FAHRENHEIT)).isEqualTo("18\u00a0°F");
		assertThat(TEXT.argument(Temperature.kelvin(373.15), TemperatureUnit.FAHRENHEIT)).isEqualTo("212\u00a0°F");
		assertThat(TEXT.argument(Duration.minutes(12), TemperatureUnit.CELSIUS)).isEqualTo("12\u00a0min");
		assertThat(TEXT.argument(Duration.seconds(90), TemperatureUnit.CELSIUS)).isEqualTo("90\u00a0s");
		assertThat(TEXT.argument(Quantity.of(3.4, "mm", 1), TemperatureUnit.CELSIUS)).isEqualTo("3.4\u00a0mm");
		// the API keeps plain spaces, its wording unchanged but for the °C of a
		// difference
		assertThat(TEXT.celsius(m("suggestion.bake-lower", TemperatureDifference.kelvin(40))))
			.startsWith("Bake about 40 °C cooler");
		assertThat(
				TEXT.render(m("suggestion.bake-lower", TemperatureDifference.kelvin(40)), TemperatureUnit.FAHRENHEIT))
			.startsWith("Bake about 72\u00a0°F cooler");
		assertThat(TEXT.argument(Temperature.celsius(Double.NaN), TemperatureUnit.CELSIUS)).isEqualTo("–");
	}

	/**
	 * Real plans across the four heat modes: their messages match the samples' shape and
	 * read right in °F.
	 */
	@Test
	void shouldRenderWhatRealPlansSayInFahrenheitWithoutCelsius() {
		PlanService planner = new PlanService();
		Surface sweetChips = Surface.defaults(FoodCategory.POTATO)
			.withComposition(new Composition(78, 2, 0.1, 0.8, 0.2, 15.9, 2, 1));
		List<PlanReport> reports = List.of(
				planner.plan(sweetChips, Product.FRENCH_FRIES, new DeepFryer(185), Target.stage("brown"), 30, true),
				planner.plan(Surface.defaults(FoodCategory.POULTRY_SKIN).withThicknessMm(60),
						new PanContact(240, true, 0), Target.stage("light-golden"), 30),
				planner.plan(Surface.defaults(FoodCategory.MEAT), RadiantGrill.fromHeatFlux(15, 90),
						Target.stage("browned"), 30),
				planner.plan(Surface.defaults(FoodCategory.BREAD).withThicknessMm(12), new RadiantGrill(800, 0),
						Target.stage("dark"), 30),
				planner.plan(Surface.defaults(FoodCategory.MEAT),
						RadiantGrill.ofElement(GrillKind.CHARCOAL, 650, 100.0, 90), Target.stage("browned"), 30),
				planner.plan(Surface.defaults(FoodCategory.BREAD).withBicarbonateGPerKg(10), new Oven(200, true, 20),
						Target.lightness(60), 30),
				planner.plan(Surface.defaults(FoodCategory.MEAT), new Oven(60, false, 1.6), Target.stage("browned"),
						10));
		List<Message> said = new ArrayList<>();
		for (PlanReport r : reports) {
			said.add(r.targetLabel());
			said.add(r.result().explanation());
			said.addAll(r.result().assumptions());
			r.warnings().stream().map(PlanWarning::message).forEach(said::add);
			said.addAll(r.cautions());
			said.add(r.acrylamide().basis());
			said.addAll(r.acrylamide().cautions());
			for (Mitigation x : r.acrylamide().mitigations()) {
				said.addAll(Stream.of(x.title(), x.change(), x.reason(), x.basis().meaning())
					.filter(y -> y != null)
					.toList());
			}
			for (int face = 0; face < 2; face++) {
				said.add(r.setup().schedule().at(face, 0).describe());
			}
		}
		Set<String> seen = new HashSet<>();
		for (Message message : said) {
			checkShape(message, seen);
			if (!containsLiteral(message)) {
				assertThat(TEXT.render(message, TemperatureUnit.FAHRENHEIT)).as(message.code()).doesNotContain("°C");
			}
		}
		assertThat(seen).contains("warning.acrylamide.frying-too-hot", "warning.food-code.poultry",
				"warning.food-code.whole-cut", "warning.alkaline-surface", "mitigation.warm-storage.change",
				"assumption.grill.element", "assumption.oven.steam", "exchange.fryer", "warning.target-not-reached");
		// toast taken to dark under a salamander passes the surface limit; the coals heat
		// the lower face
		assertThat(seen).contains("assumption.grill.flux", "assumption.grill.geometry", "assumption.grill.upper-face",
				"warning.surface-limit", "outcome.surface-limit");
	}

	/** The engine passes what the sample passes: as many arguments, of the same kinds. */
	static void checkShape(Message message, Set<String> seen) {
		seen.add(message.code());
		Argument[] sample = SAMPLES.get(message.code());
		assertThat(sample).as("a sample for %s", message.code()).isNotNull();
		assertThat(message.args().stream().map(Object::getClass).toList()).as(message.code())
			.isEqualTo(Stream.of(sample).map(Object::getClass).toList());
		message.args().stream().filter(Message.class::isInstance).forEach(a -> checkShape((Message) a, seen));
	}

	static boolean containsLiteral(Message message) {
		return message.args().stream().anyMatch(a -> a instanceof Message inner && containsLiteral(inner));
	}

	static int placeholders(String pattern) {
		Set<Integer> used = new TreeSet<>();
		PLACEHOLDER.matcher(pattern).results().forEach(r -> used.add(Integer.parseInt(r.group(1))));
		for (int i = 0; i < used.size(); i++) {
			assertThat(used).as("%s numbers its placeholders from {0} without gaps", pattern).contains(i);
		}
		return used.size();
	}

}
