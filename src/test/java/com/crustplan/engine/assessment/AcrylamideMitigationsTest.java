package com.crustplan.engine.assessment;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.heat.PanContact;
import com.crustplan.system.MessageText;

/**
 * Mitigations for 10 mm chips fried golden at 180 °C, each computed by re-running the
 * model.
 */
class AcrylamideMitigationsTest {

	/** The engine speaks in codes: its text is read as the API shows it (°C). */
	static final MessageText TEXT = new MessageText();

	private static Map<String, Mitigation> byCode;

	@BeforeAll
	static void compute() {
		List<Mitigation> list = Mitigations.compute(Surface.defaults(FoodCategory.POTATO), Product.FRENCH_FRIES,
				new DeepFryer(180), Target.stage("golden"), CookSettings.defaults());
		byCode = list.stream().collect(Collectors.toMap(Mitigation::code, Function.identity()));
	}

	@Test
	void lighterColourAndRawMaterialMeasuresReduceAcrylamide() {
		// Annex II measures: lighter colour, soaking, blanching, asparaginase, acid,
		// storage above 6 °C
		assertEquals(List
			.of("LOWER_TEMPERATURE", "LIGHTER_TARGET", "SOAK", "BLANCH", "ASPARAGINASE", "ACID_DIP", "WARM_STORAGE")
			.stream()
			.sorted()
			.toList(), byCode.keySet().stream().sorted().toList());
		for (Mitigation m : byCode.values()) {
			assertTrue(m.applicable(), m.code() + ": " + m.reason());
			assertFalse(m.source().isBlank(), m.code());
			if (m.basis() == Mitigation.Basis.AVOIDED) {
				assertTrue(m.effectUgPerKg() > 0, () -> m.code() + ": giving it up would raise acrylamide");
			}
			else if (!m.code().equals("LOWER_TEMPERATURE")) {
				assertTrue(m.effectUgPerKg() < 0, () -> m.code() + ": " + m.beforeUgPerKg() + " → " + m.afterUgPerKg());
			}
		}
	}

	@Test
	void lowerTemperatureTakesLongerToTheSameColour() {
		Mitigation m = byCode.get("LOWER_TEMPERATURE");
		assertEquals(Mitigation.Basis.SAME_COLOUR, m.basis());
		assertTrue(TEXT.celsius(m.change()).contains("170 °C"),
				"180 °C oil steps down to 170 °C, below the 175 °C measure");
		assertTrue(m.effectMinutes() > 0);
		assertTrue(m.effectUgPerKg() < 0 || m.reason().code().startsWith("mitigation.lower-temperature.no-gain"),
				"a null result says so");
		assertTrue(byCode.get("LIGHTER_TARGET").effectMinutes() < 0, "a lighter colour is reached sooner");
	}

	@Test
	void lowerTemperatureForThickChipsIsWeighedAtTheSameColour() {
		// Annex II of Regulation (EU) 2017/2158: fry below 175 °C. For thick-cut chips
		// (14 mm) fried golden at 190 °C the model weighs 170 °C at the same colour.
		// Formation refitted on whole strips (Ea,f 107 kJ/mol) is steeper than browning
		// (64 kJ/mol) but the longer, drier cook to the same colour more than offsets it:
		// the mitigation must then say so with the frying rule rather than claim a gain.
		// The evidence we found compares at equal time or equal moisture, not at equal
		// colour: acrylamide rises with oil temperature at equal moisture (Pedreschi,
		// Kaack & Granby 2006, Food Res Int 39:40: 135 / 327 / 564 µg/kg at 150 / 170 /
		// 190 °C) and at equal time (Matthäus, Haase & Vosmann 2004, Eur J Lipid Sci
		// Technol 106:793, most above 175 °C; a 150 / 170 / 190 °C palm-oil series of 6,
		// 8
		// and 11 min, 118–232 / 188–684 / 192–1141 µg/kg); the same 2006 study found
		// colour (ΔE) and acrylamide on one line across temperatures and pretreatments
		// (r² 0.85), which is what equal acrylamide at equal colour looks like. A lower
		// final-stage oil temperature halved acrylamide at equal frying time (Palazoğlu &
		// Gökmen 2008, J Agric Food Chem 56:6162), where the cooler fries also come out
		// lighter. A published potato fry-colour activation energy (Hunter L, 94.85
		// kJ/mol, Şahin 2000, Eur Food Res Technol; the record, not the paper, seen) lies
		// closer to the fitted 107 than the borrowed 64 does: replacing it would narrow
		// the
		// gap that favours cooler oil and make hotter oil look still better at equal
		// colour. No source we found puts a gain at equal colour, so the honest result is
		// "no gain", with the rule.
		Mitigation m = Mitigations
			.compute(Surface.defaults(FoodCategory.POTATO).withThicknessMm(14), Product.FRENCH_FRIES,
					new DeepFryer(190), Target.stage("golden"), CookSettings.defaults())
			.stream()
			.filter(x -> x.code().equals("LOWER_TEMPERATURE"))
			.findFirst()
			.orElseThrow();
		assertTrue(m.applicable(), () -> String.valueOf(m.reason()));
		if (m.effectUgPerKg() >= 0) {
			assertEquals("mitigation.lower-temperature.no-gain", m.reason().code());
		}
	}

	@Test
	void soakingAndBlanchingWithinThePublishedReductions() {
		// soaking 120 min: −21 … −33 % (Pedreschi, Kaack & Granby 2006); blanching 85 °C
		// / 3.5 min: −64 % on average
		// (Pedreschi et al. 2005). The removal fractions were derived from these at face
		// value, but the engine
		// adds depletion and a changed browning time, so we allow the published range
		// widened by 10 points.
		double soak = byCode.get("SOAK").relativeEffect();
		assertTrue(soak < -0.11 && soak > -0.43, () -> "soak " + soak);
		double blanch = byCode.get("BLANCH").relativeEffect();
		assertTrue(blanch < -0.54 && blanch > -0.74, () -> "blanch " + blanch);
		assertEquals(Mitigation.Basis.SAME_TIME, byCode.get("SOAK").basis());
		assertTrue(byCode.get("BLANCH").effectMinutes() > 0, "less sugar browns more slowly");
	}

	@Test
	void warmStorageComparesWithColdStoredTubers() {
		Mitigation m = byCode.get("WARM_STORAGE");
		// cold-stored tubers (×3 reducing sugar, from memory) brown sooner and hold more
		// acrylamide; the row reads from the potatoes as entered to what cold storage
		// would give, a practice to keep rather than a change to make
		assertEquals(Mitigation.Basis.AVOIDED, m.basis());
		assertTrue(m.afterUgPerKg() > m.beforeUgPerKg());
		assertTrue(m.afterMinutes() < m.beforeMinutes());
		assertFalse(m.plannable());
	}

	@Test
	void removalFractionsFollowFromThePublishedReductions() {
		// (1 − f)² = 1 − R: soaking R = 0.27 → f = 0.146; blanching R = 0.64 → f = 0.40
		// (derived; 1e-3)
		assertEquals(0.146, Mitigations.SOAK_REMOVAL.value(), 1e-3);
		assertEquals(0.400, Mitigations.BLANCH_REMOVAL.value(), 1e-3);
	}

	@Test
	void meatHasNoPotatoMeasures() {
		List<Mitigation> list = Mitigations.compute(Surface.defaults(FoodCategory.MEAT), Product.MEAT,
				new PanContact(220, true, 60), Target.stage("browned"), CookSettings.defaults());
		assertTrue(list.stream().noneMatch(m -> m.code().equals("SOAK") || m.code().equals("WARM_STORAGE")));
		assertTrue(list.stream().noneMatch(m -> m.code().equals("ASPARAGINASE")), "the enzyme is not sold for meat");
	}

	@Test
	void blanchedChipsAreNotOfferedBlanchingOrSoaking() {
		// a blanched food has had its sugars leached: offering it again would count the
		// same loss twice (Pedreschi et al. 2005 measured one blanch)
		List<Mitigation> list = Mitigations.compute(Surface.defaults(FoodCategory.POTATO), Product.FRENCH_FRIES,
				new DeepFryer(180), Target.stage("golden"), CookSettings.defaults(), java.util.Set.of("BLANCH"));
		assertTrue(list.stream().noneMatch(m -> m.code().equals("BLANCH") || m.code().equals("SOAK")));
		assertTrue(list.stream().anyMatch(m -> m.code().equals("LIGHTER_TARGET")));
	}

	@Test
	void breadIsNotToldTheFryingRule() {
		// the below-175 °C frying measure is the potato products' (EU 2017/2158 Annex I);
		// a loaf in the oven never gets it, whatever the model finds
		List<Mitigation> list = Mitigations.compute(Surface.defaults(FoodCategory.BREAD), Product.SOFT_BREAD_WHEAT,
				new com.crustplan.engine.heat.Oven(220, false, 0), Target.stage("golden"), CookSettings.defaults());
		for (Mitigation m : list) {
			String all = TEXT.celsius(m.title()) + " " + TEXT.celsius(m.change()) + " " + TEXT.celsius(m.reason());
			assertFalse(all.contains("175") || all.toLowerCase(java.util.Locale.ROOT).contains("frying")
					|| all.toLowerCase(java.util.Locale.ROOT).contains("potato"), all);
		}
	}

	@Test
	void aChangeAppliedToTheFoodGivesWhatTheTableComputed() {
		// one click plans with the same food the row was computed with
		Surface s = Surface.defaults(FoodCategory.POTATO);
		Surface blanched = Mitigations.apply("BLANCH", s);
		double kept = 1 - Mitigations.BLANCH_REMOVAL.value();
		assertEquals(s.asparagineMgPerKg() * kept, blanched.asparagineMgPerKg(), 1e-9);
		assertEquals(s.composition().reducingSugarPct() * kept, blanched.composition().reducingSugarPct(), 1e-9);
		assertEquals(170, Mitigations.lowerTemperatureC(new DeepFryer(180)), 1e-9,
				"180 °C oil one step down stays below 175 °C");
		assertTrue(byCode.get("BLANCH").plannable());
	}

	@Test
	void aCookThatNeverReachesItsTargetHasNothingToCompare() {
		List<Mitigation> list = Mitigations.compute(Surface.defaults(FoodCategory.POTATO), Product.FRENCH_FRIES,
				new DeepFryer(120), Target.stage("brown"), CookSettings.defaults().withHorizonS(300));
		assertEquals(1, list.size());
		assertFalse(list.get(0).applicable());
	}

}
