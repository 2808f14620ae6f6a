package com.crustplan.engine.food;

import java.util.List;
import java.util.Optional;

import com.crustplan.engine.kinetics.ArrheniusRate;
import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.model.Evidence;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.GabIsotherm;
import com.crustplan.engine.water.MoistureDiffusivity;

/**
 * Food categories: each supplies defaults for a new surface, a sorption isotherm,
 * browning kinetics, a colour path and named browning stages. Compositions are typical
 * values, not a particular product; where each default make-up comes from is in
 * {@link DefaultMakeUp}.
 */
public enum FoodCategory {

	MEAT(category("meat", "Red meat (beef, lamb, pork)")
		.composition(new Composition.Parts().water(72).protein(21).fat(5).reducingSugar(0.1).ash(1.1))
		// free asparagine of muscle is low, tens of mg/kg (from memory)
		.asparagineMgPerKg(50)
		.surfaceWaterGPerM2(10)
		.thicknessMm(25)
		// a steak or chop: two broad faces (common practice)
		.shape(Shape.SLAB)
		.ph(5.6)
		.initialTemperatureC(5)
		.bufferCapacity(Parameter.published("β", "buffer capacity of post-rigor beef muscle", 51, "mmol H⁺/(pH·kg)",
				"Puolanne & Kivikari 2000, Meat Sci 56:7 (beef longissimus)"))
		.initialPorosity(
				Parameter.assumption("ε0", "initial gas fraction of whole muscle", 0, "–", "whole muscle has no pores"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of red meat muscle", 1, "–",
				"our reading of van der Sman 2007, AIChE J 53, a qualitative statement: cooking muscle is a saturated protein gel that shrinks as it loses water, opening no air pores"))
		.isotherm(Isotherms.MEAT)
		.browning(new BrowningKinetics(new ArrheniusRate(Parameter.calibrated("k0",
				"pre-exponential factor, meat surface browning", 3.2e5, "1/s",
				"calibrated so a patted-dry 25 mm steak in a 220 °C oiled pan is browned in 3–4 min per side (common practice; 3.5 min with the shrinking crust, CategoryCalibrationTest)"),
				Isotherms.BORROWED_EA),
				Parameter.assumption("aw,ref", "water activity at which the meat rate is referenced", 0.4, "–",
						"rate referenced to a dry crust, like the bread fit"),
				Parameter.secondary("pH,ref", "typical pH of beef", 5.6, "–",
						"beef 5.5–5.8 (quoted in food pH tables)"),
				Parameter.fromMemory("RS,ref", "reducing sugar of the reference meat", 0.1, "%",
						"glucose and ribose in post-rigor muscle ≈ 0.1 % (from memory)"),
				Parameter.fromMemory("P,ref", "protein of the reference meat", 21, "%",
						"lean beef, about 21 % (from memory, as in the default make-up)")))
		.colourPath(ColourPath.of(Evidence.FROM_MEMORY,
				"raw red → grey → brown → dark crust; L*a*b* anchors from memory of published meat colour ranges",
				new double[][] { { 0, 40, 22, 12 }, { 0.08, 50, 10, 14 }, { 0.45, 38, 12, 20 }, { 1, 22, 6, 9 } }))
		.stages(List.of(BrowningStage.byExtent("grey", "Grey, barely seared", 0.08),
				BrowningStage.byExtent("light-sear", "Light sear", 0.25),
				BrowningStage.byExtent("browned", "Browned crust", 0.45),
				BrowningStage.byExtent("deep-sear", "Deep, dark crust", 0.7),
				BrowningStage.byExtent("charred", "Charred", 0.9)))),

	POULTRY_SKIN(category("poultry-skin", "Poultry, skin on")
		.composition(new Composition.Parts().water(54).protein(13).fat(31).reducingSugar(0.05).ash(0.6))
		.asparagineMgPerKg(30)
		.surfaceWaterGPerM2(15)
		.thicknessMm(20)
		// a breast or thigh, skin side and flesh side (common practice)
		.shape(Shape.SLAB)
		.ph(6.0)
		.initialTemperatureC(5)
		.bufferCapacity(Parameter.published("β", "buffer capacity of broiler breast muscle", 58, "mmol H⁺/(pH·kg)",
				"Puolanne & Kivikari 2000, Meat Sci 56:7 (broiler breast)"))
		.initialPorosity(
				Parameter.assumption("ε0", "initial gas fraction of skin", 0, "–", "skin treated as pore-free"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of poultry skin", 1, "–",
				"as muscle (van der Sman 2007): a protein gel that stays saturated as it dries"))
		.isotherm(Isotherms.MEAT)
		.browning(new BrowningKinetics(new ArrheniusRate(
				Parameter.calibrated("k0", "pre-exponential factor, poultry skin browning", 1.5e5, "1/s",
						"calibrated so skin-on chicken in a 200 °C fan oven is golden in 20–30 min (common practice)"),
				Isotherms.BORROWED_EA),
				Parameter.assumption("aw,ref", "water activity at which the rate is referenced", 0.4, "–", "dry crust"),
				Parameter.secondary("pH,ref", "typical pH of poultry", 6.0, "–",
						"poultry 5.7–6.0 (quoted in food pH tables)"),
				Parameter.fromMemory("RS,ref", "reducing sugar of the reference skin", 0.05, "%", "from memory"),
				Parameter.fromMemory("P,ref", "protein of the reference skin", 13, "%", "chicken skin (from memory)")))
		.colourPath(ColourPath.of(Evidence.FROM_MEMORY, "pale skin → golden → mahogany; anchors from memory",
				new double[][] { { 0, 70, 4, 14 }, { 0.4, 60, 10, 30 }, { 0.7, 48, 14, 30 }, { 1, 33, 14, 22 } }))
		.stages(List.of(BrowningStage.byLightness("light-golden", "Light golden", 64),
				BrowningStage.byLightness("golden", "Golden", 58),
				BrowningStage.byLightness("deep-golden", "Deep golden", 52),
				BrowningStage.byLightness("mahogany", "Mahogany", 45)))),

	FISH(category("fish", "Fish fillet")
		.composition(new Composition.Parts().water(76).protein(20).fat(2.5).reducingSugar(0.05).ash(1.3))
		.asparagineMgPerKg(20)
		.surfaceWaterGPerM2(10)
		.thicknessMm(20)
		// a fillet or portion (common practice)
		.shape(Shape.SLAB)
		.ph(6.4)
		.initialTemperatureC(3)
		.bufferCapacity(Parameter.assumption("β", "buffer capacity of fish muscle", 45, "mmol H⁺/(pH·kg)",
				"taken between poultry leg (41) and beef (51) of Puolanne & Kivikari 2000; not measured for fish"))
		.initialPorosity(Parameter.assumption("ε0", "initial gas fraction of fish muscle", 0, "–", "pore-free"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of fish muscle", 1, "–",
				"as red meat muscle (van der Sman 2007)"))
		.isotherm(Isotherms.MEAT)
		.browning(new BrowningKinetics(new ArrheniusRate(Parameter.fromMemory("k0",
				"pre-exponential factor, fish surface L* under radiant grilling", 4759, "1/s",
				"J Food Eng 116:130–137 (2013), first-order L* kinetics, radiant grilling; read there, authors from memory"),
				Parameter.fromMemory("Ea", "activation energy, fish surface L* under radiant grilling", 50.7e3, "J/mol",
						"J Food Eng 116:130–137 (2013); read there, authors from memory")),
				Parameter.assumption("aw,ref", "water activity at which the fish rate is referenced", 0.8, "–",
						"measured on real grilled surfaces, taken at the peak so the factor never exceeds 1"),
				Parameter.fromMemory("pH,ref", "typical pH of fish muscle", 6.4, "–",
						"white fish 6.2–6.6 (from memory)"),
				Parameter.fromMemory("RS,ref", "reducing sugar of fish muscle", 0.05, "%", "from memory"),
				Parameter.fromMemory("P,ref", "protein of fish muscle", 20, "%", "white fish (from memory)")))
		// Raw anchor: pale pink-white, a raw fillet as the eye sees it (from memory).
		// Instruments read translucent raw flesh near L* 50 as light passes into it,
		// but on a screen that is a flat grey. Kept just paler than opaque white so
		// the path only darkens and the stage extents do not move.
		.colourPath(ColourPath.of(Evidence.FROM_MEMORY,
				"raw pink-white → opaque white → golden → dark; anchors from memory",
				new double[][] { { 0, 77, 5, 6 }, { 0.06, 76, 0, 10 }, { 0.45, 62, 8, 28 }, { 1, 35, 10, 20 } }))
		.stages(List.of(BrowningStage.byLightness("light-golden", "Light golden", 70),
				BrowningStage.byLightness("golden", "Golden", 63),
				BrowningStage.byLightness("deep-golden", "Deep golden", 55),
				BrowningStage.byLightness("dark", "Dark", 45)))),

	POTATO(category("potato", "Potato (chips, roasties, rösti)")
		.composition(new Composition.Parts().water(79)
			.protein(2)
			.fat(0.1)
			.reducingSugar(0.4)
			.sucrose(0.2)
			.starch(15.5)
			.fibre(1.8)
			.ash(1))
		// 3000 mg/kg = 22.7 mmol/kg, mid-range of 1.2–58 mmol/kg (Vivanti, Finotti &
		// Friedman 2006, J Food Sci)
		.asparagineMgPerKg(3000)
		.surfaceWaterGPerM2(20)
		.thicknessMm(10)
		// French fries, the category's usual product, are cut in strips (common practice)
		.shape(Shape.STRIP)
		.ph(5.8)
		.initialTemperatureC(5)
		.bufferCapacity(Parameter.assumption("β", "buffer capacity of potato tissue", 15, "mmol H⁺/(pH·kg)",
				"far lower than meat (from memory); not measured"))
		.initialPorosity(Parameter.assumption("ε0", "initial gas fraction of raw potato", 0.01, "–",
				"raw tuber is nearly pore-free (from memory)"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of potato tissue", 0.35, "–",
				"our estimate: a frying potato cylinder shrank 18.6 % in 300 s (Shah & Takhar 2024, InterPore J 1(2), a model checked against measurements) "
						+ "while losing, by our estimate, about half its volume of water"))
		.isotherm(Isotherms.POTATO)
		// liquid water in the tissue feeds the evaporation front; the constants are the
		// frying literature's for potato and sweet-potato sticks, the shape the category
		// is fried in
		.moistureDiffusivity(new MoistureDiffusivity(Parameter.calibrated("D_ref",
				"effective diffusivity of water in potato tissue at 100 °C", 1.06e-8, "m²/s",
				"fitted (1.1e-8 before boiling was coupled to the moisture solve) so that a 10 mm strip in 175 °C oil, its moisture read by the method of slopes as the frying "
						+ "studies read theirs, shows 1.8e-8 m²/s: sweet-potato sticks 10 × 10 × 50 mm fried at 160–180 °C "
						+ "gave 1.43e-8–1.99e-8 m²/s (Ratnaningsih, Sumangat & Rahardjo, agriTECH, Universitas Gadjah Mada), "
						+ "potato strips at 150–190 °C 1.82e-8–4.38e-8 m²/s (Food Sci Technol, Iran, 2017; authors not retrieved)"),
				373.15,
				Parameter.published("Ea,D", "activation energy of moisture diffusion in potato-like root tissue",
						26.88e3, "J/mol",
						"sweet-potato sticks 10 × 10 × 50 mm fried at 160–180 °C (Ratnaningsih, Sumangat & Rahardjo, agriTECH); "
								+ "potato slices oven-dried at 60–80 °C gave 25–36 kJ/mol untreated (abstract, authors not retrieved), "
								+ "half the 59.5 kJ/mol of chicken"),
				Parameter.assumption("X_c", "moisture at which the potato diffusivity has fallen to half", 0.3,
						"kg/kg d.b.",
						"as the default: a dry crust seals (drying studies report D_eff falling with moisture, from memory)")))
		.browning(new BrowningKinetics(new ArrheniusRate(Parameter.calibrated("k0",
				"pre-exponential factor, potato surface browning", 0.97e5, "1/s",
				"calibrated so 10 mm square strips (fries) in 175 °C oil are golden in the middle of the 6–8 min of common practice: 7.1 min; 0.9e5 gave 6.8 min while the boiling and moisture steps were split, an error of about 9 % in the fry time, and 7.4 min once they were coupled"),
				Isotherms.BORROWED_EA),
				Parameter.assumption("aw,ref", "water activity at which the potato rate is referenced", 0.4, "–",
						"dry crust"),
				Parameter.published("pH,ref", "typical pH of potato", 5.8, "–",
						"potato 5.4–6.1 (FDA, approximate pH of foods)"),
				Parameter.fromMemory("RS,ref", "reducing sugar of a frying potato", 0.4, "%",
						"glucose + fructose 2.8–69 mmol/kg in retail potatoes (Vivanti et al. 2006); French-fry potatoes up to 0.5 % of fresh weight (ICAR-Central Potato Research Institute, quality requirements for processing); 0.4 % from memory"),
				Parameter.fromMemory("P,ref", "protein of potato", 2, "%", "from memory"),
				// below first order: fry colour also comes from reactions other than the
				// sugar–asparagine condensation that limits acrylamide
				Parameter.assumption("n_RS", "apparent order of potato fry colour in reducing sugar", 0.3, "–",
						"below 1 because chip colour, while tracking reducing sugar most closely, also depends on protein, "
								+ "ascorbic acid and other constituents (Blenkinsop et al. 2002, J Agric Food Chem 50:4545; "
								+ "Marquez & Añón 1986, J Food Sci 51:157); value ours, set so that at equal colour acrylamide "
								+ "rises with reducing sugar as published (Amrein et al. 2003, J Agric Food Chem 51:5556; "
								+ "Pedreschi, Kaack & Granby 2006): any order below ≈ 0.4 does with the present transport")))
		.colourPath(ColourPath.of(Evidence.FROM_MEMORY,
				"raw → pale → golden → brown; anchors from memory of published fry colour ranges",
				new double[][] { { 0, 74, -2, 18 }, { 0.35, 64, 2, 28 }, { 0.7, 52, 9, 30 }, { 1, 38, 12, 24 } }))
		.stages(List.of(BrowningStage.byLightness("pale", "Pale", 70),
				BrowningStage.byLightness("light-golden", "Light golden", 66),
				BrowningStage.byLightness("golden", "Golden", 62),
				BrowningStage.byLightness("deep-golden", "Deep golden", 57),
				BrowningStage.byLightness("brown", "Brown", 50)))),

	BREAD(category("bread", "Bread or dough")
		.composition(
				new Composition.Parts().water(43).protein(9).fat(2).reducingSugar(1.5).starch(40.5).fibre(2.5).ash(1.5))
		// wheat flour 0.1–0.5 g/kg (from memory), diluted by the dough's water
		.asparagineMgPerKg(150)
		.surfaceWaterGPerM2(0)
		.thicknessMm(30)
		// a slice or a flat loaf, heated top and bottom (common practice)
		.shape(Shape.SLAB)
		.ph(5.4)
		.initialTemperatureC(22)
		.bufferCapacity(Parameter.assumption("β", "buffer capacity of bread dough", 20, "mmol H⁺/(pH·kg)",
				"not measured; low (from memory)"))
		.initialPorosity(Parameter.fromMemory("ε0", "gas fraction of proofed dough", 0.6, "–",
				"bulk density ≈ 450 kg/m³ against a gas-free 1170 kg/m³ (from memory)"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of baked crumb", 0, "–",
				"set crumb and crust keep their volume (oven rise and collapse not modelled)"))
		.isotherm(Isotherms.BREAD)
		.browning(new BrowningKinetics(
				new ArrheniusRate(Parameter.published("k0", "pre-exponential factor, bread crust ΔE", 42_000, "1/s",
						"Zanoni, Peri & Bruno 1995, LWT 28:604–609"), Isotherms.ZANONI_EA),
				Parameter.assumption("aw,ref", "water activity of the crust the rate was measured on", 0.4, "–",
						"dried crust (Zanoni's rates were measured on dried crumb)"),
				Parameter.published("pH,ref", "typical pH of bread", 5.4, "–", "FDA, approximate pH of foods"),
				Parameter.fromMemory("RS,ref", "reducing sugar of lean bread dough", 1.5, "%",
						"maltose and glucose from fermentation (from memory)"),
				Parameter.fromMemory("P,ref", "protein of bread dough", 9, "%", "from memory")))
		// L* 80 → 25, a* −0.5 → 15, b* 18 → 30 (quoted ranges); the end point is cut at
		// ΔE = 52 so
		// that ΔE from the dough colour equals 52·extent, as in Zanoni's fit.
		.colourPath(ColourPath.of(Evidence.SECONDARY,
				"dough (80, −0.5, 18) towards (25, 15, 30), ΔE∞ = 52 (Zanoni, Peri & Bruno 1995)",
				new double[][] { { 0, 80, -0.5, 18 },
						{ 1, 80 - 55 * 0.8904, -0.5 + 15.5 * 0.8904, 18 + 12 * 0.8904 } }))
		.stages(List.of(BrowningStage.byLightness("pale", "Pale", 72),
				BrowningStage.byLightness("light-golden", "Light golden", 64),
				BrowningStage.byLightness("golden", "Golden", 57),
				BrowningStage.byLightness("deep-golden", "Deep golden", 50),
				BrowningStage.byLightness("dark", "Dark", 40)))),

	SWEET_DOUGH(category("sweet-dough", "Sweet dough (enriched buns, biscuits)")
		.composition(new Composition.Parts().water(25)
			.protein(7)
			.fat(15)
			.reducingSugar(2)
			.sucrose(15)
			.starch(33)
			.fibre(1.5)
			.ash(1))
		.asparagineMgPerKg(120)
		.surfaceWaterGPerM2(0)
		.thicknessMm(15)
		// biscuits and buns as flat pieces (common practice)
		.shape(Shape.SLAB)
		.ph(6.5)
		.initialTemperatureC(20)
		.bufferCapacity(Parameter.assumption("β", "buffer capacity of sweet dough", 20, "mmol H⁺/(pH·kg)",
				"not measured; low (from memory)"))
		.initialPorosity(Parameter.fromMemory("ε0", "gas fraction of sweet dough", 0.4, "–",
				"denser than bread dough (from memory)"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of baked sweet dough", 0, "–", "as bread"))
		.isotherm(Isotherms.SWEET_DOUGH)
		.browning(new BrowningKinetics(new ArrheniusRate(Parameter.assumption("k0",
				"pre-exponential factor, crust ΔE (bread kinetics)", 42_000, "1/s",
				"the bread crust fit of Zanoni, Peri & Bruno 1995 (LWT 28:604–609) borrowed: never measured on sweet dough"),
				Isotherms.BORROWED_EA),
				Parameter.assumption("aw,ref", "water activity of a dry crust", 0.4, "–", "as bread"),
				Parameter.published("pH,ref", "typical pH of bread, whose crust kinetics are borrowed", 5.4, "–",
						"FDA, approximate pH of foods"),
				Parameter.fromMemory("RS,ref", "reducing sugar of lean bread dough", 1.5, "%", "from memory"),
				Parameter.fromMemory("P,ref", "protein of bread dough", 9, "%", "from memory")))
		.colourPath(ColourPath.of(Evidence.FROM_MEMORY, "pale dough → golden → dark brown; anchors from memory",
				new double[][] { { 0, 78, 0, 22 }, { 0.4, 62, 10, 32 }, { 1, 30, 14, 22 } }))
		.stages(List.of(BrowningStage.byLightness("pale", "Pale", 72),
				BrowningStage.byLightness("light-golden", "Light golden", 66),
				BrowningStage.byLightness("golden", "Golden", 60),
				BrowningStage.byLightness("deep-golden", "Deep golden", 52),
				BrowningStage.byLightness("dark", "Dark", 42)))),

	VEGETABLE(category("vegetable", "Vegetable (onion, root, squash)").composition(
			new Composition.Parts().water(89).protein(1.1).fat(0.1).reducingSugar(4.2).sucrose(1).fibre(1.7).ash(0.4))
		.asparagineMgPerKg(100)
		.surfaceWaterGPerM2(10)
		.thicknessMm(6)
		// slices or rings of vegetable (common practice)
		.shape(Shape.SLAB)
		.ph(5.5)
		.initialTemperatureC(5)
		.bufferCapacity(Parameter.assumption("β", "buffer capacity of vegetable tissue", 15, "mmol H⁺/(pH·kg)",
				"far lower than meat (from memory); not measured"))
		.initialPorosity(Parameter.assumption("ε0", "initial gas fraction", 0.02, "–", "from memory"))
		.shrinkage(Parameter.assumption("s", "shrinkage share of vegetable tissue", 0.35, "–", "as potato"))
		.isotherm(Isotherms.POTATO)
		.browning(new BrowningKinetics(new ArrheniusRate(Parameter.assumption("k0",
				"pre-exponential factor (potato kinetics borrowed)", 0.97e5, "1/s",
				"the potato value, not calibrated for vegetables (assumption): they differ mainly by their sugar, which the reactant factor carries"),
				Isotherms.BORROWED_EA),
				Parameter.assumption("aw,ref", "water activity at which the rate is referenced", 0.4, "–", "dry crust"),
				Parameter.published("pH,ref", "pH of potato (kinetics borrowed)", 5.8, "–",
						"FDA, approximate pH of foods"),
				Parameter.fromMemory("RS,ref", "reducing sugar of a frying potato", 0.4, "%", "as potato"),
				Parameter.fromMemory("P,ref", "protein of potato", 2, "%", "as potato")))
		.colourPath(ColourPath.of(Evidence.FROM_MEMORY,
				"raw → translucent → golden → deep brown; anchors from memory (onion)",
				new double[][] { { 0, 85, -2, 15 }, { 0.45, 62, 8, 35 }, { 1, 32, 12, 22 } }))
		.stages(List.of(BrowningStage.byLightness("light-golden", "Light golden", 72),
				BrowningStage.byLightness("golden", "Golden", 64),
				BrowningStage.byLightness("deep-golden", "Deep golden", 56),
				BrowningStage.byLightness("dark", "Dark brown", 45))));

	private final CategorySpec spec;

	FoodCategory(CategorySpec spec) {
		this.spec = spec.complete();
		// the defaults must pass the engine's own checks, since a new surface starts from
		// them
		Surface.defaults(this);
	}

	private static CategorySpec category(String key, String label) {
		return new CategorySpec(key, label);
	}

	public static Optional<FoodCategory> byKey(String key) {
		for (FoodCategory c : values()) {
			if (c.key().equalsIgnoreCase(key) || c.name().equalsIgnoreCase(key)) {
				return Optional.of(c);
			}
		}
		return Optional.empty();
	}

	public Optional<BrowningStage> stage(String stageKey) {
		return spec.stages.stream().filter(s -> s.key().equalsIgnoreCase(stageKey)).findFirst();
	}

	public String key() {
		return spec.key;
	}

	public String label() {
		return spec.label;
	}

	public Composition defaultComposition() {
		return spec.composition;
	}

	public double defaultAsparagineMgPerKg() {
		return spec.asparagineMgPerKg;
	}

	public double defaultSurfaceWaterGPerM2() {
		return spec.surfaceWaterGPerM2;
	}

	public double defaultThicknessMm() {
		return spec.thicknessMm;
	}

	/** The usual shape of a piece of this category (fries: strips). */
	public Shape defaultShape() {
		return spec.shape;
	}

	public double defaultPh() {
		return spec.ph;
	}

	/**
	 * Fridge (5 °C) for raw proteins and vegetables, room temperature for doughs (common
	 * practice).
	 */
	public double defaultInitialTemperatureC() {
		return spec.initialTemperatureC;
	}

	public Parameter bufferCapacity() {
		return spec.bufferCapacity;
	}

	public Parameter initialPorosity() {
		return spec.initialPorosity;
	}

	/**
	 * Share of the volume of the water a layer loses that the layer gives up by shrinking
	 * (1: it stays saturated, no pores open; 0: a rigid matrix whose lost water leaves
	 * pores).
	 */
	public Parameter shrinkage() {
		return spec.shrinkage;
	}

	public GabIsotherm isotherm() {
		return spec.isotherm;
	}

	/** Effective diffusivity of liquid water in the food's tissue. */
	public MoistureDiffusivity moistureDiffusivity() {
		return spec.moistureDiffusivity;
	}

	public BrowningKinetics browning() {
		return spec.browning;
	}

	public ColourPath colourPath() {
		return spec.colourPath;
	}

	public List<BrowningStage> stages() {
		return spec.stages;
	}

	/** Shared parameter sets, kept apart so the enum constants can refer to them. */
	static final class Isotherms {

		static final Parameter ZANONI_EA = Parameter.published("Ea", "activation energy of crust browning", 64_151,
				"J/mol", "Zanoni, Peri & Bruno 1995, LWT 28:604–609 (bread crust ΔE)");

		/**
		 * The same number where it was never measured: meat, poultry, potato and
		 * vegetables borrow it.
		 */
		static final Parameter BORROWED_EA = Parameter.assumption("Ea",
				"activation energy of surface browning (bread value)", ZANONI_EA.value(), "J/mol",
				"measured on bread crust (Zanoni, Peri & Bruno 1995, LWT 28:604–609); applied to this food without a measurement of its own (assumption)");

		static final GabIsotherm POTATO = new GabIsotherm(
				Parameter.secondary("Xm", "GAB monolayer moisture, potato", 0.209, "kg/kg d.b.",
						"Chemkhi et al. 2004 (40–50 °C)"),
				Parameter.secondary("C", "GAB constant C, potato", 4.416, "–", "Chemkhi et al. 2004"),
				Parameter.secondary("K", "GAB constant K, potato", 0.976, "–", "Chemkhi et al. 2004"));

		static final GabIsotherm MEAT = new GabIsotherm(
				Parameter.fromMemory("Xm", "GAB monolayer moisture, muscle", 0.08, "kg/kg d.b.",
						"GAB fits meat best (Trujillo, Yeow & Pham 2003, J Food Eng 60:357); values from memory"),
				Parameter.fromMemory("C", "GAB constant C, muscle", 10, "–", "from memory"),
				Parameter.fromMemory("K", "GAB constant K, muscle", 0.95, "–", "from memory"));

		static final GabIsotherm BREAD = new GabIsotherm(
				Parameter.fromMemory("Xm", "GAB monolayer moisture, bread crust", 0.08, "kg/kg d.b.",
						"from memory, low confidence"),
				Parameter.fromMemory("C", "GAB constant C, bread crust", 10, "–", "from memory, low confidence"),
				Parameter.fromMemory("K", "GAB constant K, bread crust", 0.9, "–", "from memory, low confidence"));

		/**
		 * Sweet dough's typical composition (the SWEET_DOUGH entry; a test holds the two
		 * together): fat and dissolved sugar sorb no water, so the bread matrix holds the
		 * water per kg of its protein, starch, fibre and ash, and the water itself is a
		 * syrup. The isotherm is the category's, taken at its typical composition.
		 */
		static final double SWEET_WATER_PCT = 25;

		static final double SWEET_SUCROSE_PCT = 15;

		static final double SWEET_REDUCING_SUGAR_PCT = 2;

		static final double SWEET_SORBING_PCT = 7 + 33 + 1.5 + 1;

		static final GabIsotherm SWEET_DOUGH = BREAD.withDissolvedSugar(SWEET_SORBING_PCT / (100 - SWEET_WATER_PCT),
				GabIsotherm.sugarSolutionActivity(SWEET_WATER_PCT, SWEET_SUCROSE_PCT, SWEET_REDUCING_SUGAR_PCT),
				"sweet dough",
				"typical sweet dough, 25 % water, 15 % sucrose, 2 % reducing sugar; protein, starch, fibre and ash (42.5 %) sorb, fat and sugar do not");

		private Isotherms() {
		}

	}

}
