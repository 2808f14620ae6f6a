package com.crustplan.engine.food;

import java.util.List;
import java.util.Optional;

import com.crustplan.engine.kinetics.ArrheniusRate;
import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.GabIsotherm;

/**
 * Food categories: each supplies defaults for a new surface, a sorption isotherm, browning kinetics, a
 * colour path and named browning stages. Compositions are typical values, not a particular product.
 */
public enum FoodCategory {

	MEAT("meat", "Red meat (beef, lamb, pork)",
			new Composition(72, 21, 5, 0.1, 0, 0, 0, 1.1),
			// free asparagine of muscle is low, tens of mg/kg (from memory)
			50, 10, 25, 5.6, 5,
			Parameter.published("β", "buffer capacity of post-rigor beef muscle", 51, "mmol H⁺/(pH·kg)",
					"Puolanne & Kivikari 2000, Meat Sci 56:7 (beef longissimus)"),
			Parameter.assumption("ε0", "initial gas fraction of whole muscle", 0, "–", "whole muscle has no pores"),
			Isotherms.MEAT,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.commonPractice("k0", "pre-exponential factor, meat surface browning", 2.0e5, "1/s",
							"calibrated so a patted-dry 25 mm steak in a 220 °C oiled pan is browned in 3–4 min per side (common practice)"),
					Isotherms.ZANONI_EA),
					Parameter.assumption("aw,ref", "water activity at which the meat rate is referenced", 0.4, "–",
							"rate referenced to a dry crust, like the bread fit"),
					Parameter.secondary("pH,ref", "typical pH of beef", 5.6, "–", "beef 5.5–5.8 (quoted in food pH tables)"),
					Parameter.commonPractice("RS,ref", "reducing sugar of the reference meat", 0.1, "%",
							"glucose and ribose in post-rigor muscle ≈ 0.1 % (from memory)"),
					Parameter.commonPractice("P,ref", "protein of the reference meat", 21, "%", "lean beef (common practice)")),
			ColourPath.of("raw red → grey → brown → dark crust; L*a*b* anchors from memory of published meat colour ranges",
					new double[][] { { 0, 40, 22, 12 }, { 0.08, 50, 10, 14 }, { 0.45, 38, 12, 20 }, { 1, 22, 6, 9 } }),
			List.of(BrowningStage.byExtent("grey", "Grey, barely seared", 0.08),
					BrowningStage.byExtent("light-sear", "Light sear", 0.25),
					BrowningStage.byExtent("browned", "Browned crust", 0.45),
					BrowningStage.byExtent("deep-sear", "Deep, dark crust", 0.7),
					BrowningStage.byExtent("charred", "Charred", 0.9))),

	POULTRY_SKIN("poultry-skin", "Poultry, skin on",
			new Composition(54, 13, 31, 0.05, 0, 0, 0, 0.6),
			30, 15, 20, 6.0, 5,
			Parameter.published("β", "buffer capacity of broiler breast muscle", 58, "mmol H⁺/(pH·kg)",
					"Puolanne & Kivikari 2000, Meat Sci 56:7 (broiler breast)"),
			Parameter.assumption("ε0", "initial gas fraction of skin", 0, "–", "skin treated as pore-free"),
			Isotherms.MEAT,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.commonPractice("k0", "pre-exponential factor, poultry skin browning", 1.5e5, "1/s",
							"calibrated so skin-on chicken in a 200 °C fan oven is golden in 20–30 min (common practice)"),
					Isotherms.ZANONI_EA),
					Parameter.assumption("aw,ref", "water activity at which the rate is referenced", 0.4, "–", "dry crust"),
					Parameter.secondary("pH,ref", "typical pH of poultry", 6.0, "–", "poultry 5.7–6.0 (quoted in food pH tables)"),
					Parameter.commonPractice("RS,ref", "reducing sugar of the reference skin", 0.05, "%", "from memory"),
					Parameter.commonPractice("P,ref", "protein of the reference skin", 13, "%", "chicken skin (from memory)")),
			ColourPath.of("pale skin → golden → mahogany; anchors from memory",
					new double[][] { { 0, 70, 4, 14 }, { 0.4, 60, 10, 30 }, { 0.7, 48, 14, 30 }, { 1, 33, 14, 22 } }),
			List.of(BrowningStage.byLightness("light-golden", "Light golden", 64),
					BrowningStage.byLightness("golden", "Golden", 58),
					BrowningStage.byLightness("deep-golden", "Deep golden", 52),
					BrowningStage.byLightness("mahogany", "Mahogany", 45))),

	FISH("fish", "Fish fillet",
			new Composition(76, 20, 2.5, 0.05, 0, 0, 0, 1.3),
			20, 10, 20, 6.4, 3,
			Parameter.assumption("β", "buffer capacity of fish muscle", 45, "mmol H⁺/(pH·kg)",
					"taken between poultry leg (41) and beef (51) of Puolanne & Kivikari 2000; not measured for fish"),
			Parameter.assumption("ε0", "initial gas fraction of fish muscle", 0, "–", "pore-free"),
			Isotherms.MEAT,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.published("k0", "pre-exponential factor, fish surface L* under radiant grilling", 4759, "1/s",
							"J Food Eng 116:130–137 (2013), first-order L* kinetics, radiant grilling"),
					Parameter.published("Ea", "activation energy, fish surface L* under radiant grilling", 50.7e3, "J/mol",
							"J Food Eng 116:130–137 (2013)")),
					Parameter.assumption("aw,ref", "water activity at which the fish rate is referenced", 0.8, "–",
							"measured on real grilled surfaces, taken at the peak so the factor never exceeds 1"),
					Parameter.fromMemory("pH,ref", "typical pH of fish muscle", 6.4, "–", "white fish 6.2–6.6 (from memory)"),
					Parameter.fromMemory("RS,ref", "reducing sugar of fish muscle", 0.05, "%", "from memory"),
					Parameter.fromMemory("P,ref", "protein of fish muscle", 20, "%", "white fish (from memory)")),
			ColourPath.of("translucent → opaque white → golden → dark; anchors from memory",
					new double[][] { { 0, 52, 1, 4 }, { 0.06, 76, 0, 10 }, { 0.45, 62, 8, 28 }, { 1, 35, 10, 20 } }),
			List.of(BrowningStage.byLightness("light-golden", "Light golden", 70),
					BrowningStage.byLightness("golden", "Golden", 63),
					BrowningStage.byLightness("deep-golden", "Deep golden", 55),
					BrowningStage.byLightness("dark", "Dark", 45))),

	POTATO("potato", "Potato (chips, roasties, rösti)",
			new Composition(79, 2, 0.1, 0.4, 0.2, 15.5, 1.8, 1),
			// 3000 mg/kg = 22.7 mmol/kg, mid-range of 1.2–58 mmol/kg (Vivanti, Finotti & Friedman 2006, J Food Sci)
			3000, 20, 10, 5.8, 5,
			Parameter.assumption("β", "buffer capacity of potato tissue", 15, "mmol H⁺/(pH·kg)",
					"far lower than meat (from memory); not measured"),
			Parameter.assumption("ε0", "initial gas fraction of raw potato", 0.01, "–", "raw tuber is nearly pore-free (from memory)"),
			Isotherms.POTATO,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.commonPractice("k0", "pre-exponential factor, potato surface browning", 1.5e5, "1/s",
							"calibrated so 10 mm chips in 175 °C oil are golden in 6–8 min (common practice)"),
					Isotherms.ZANONI_EA),
					Parameter.assumption("aw,ref", "water activity at which the potato rate is referenced", 0.4, "–", "dry crust"),
					Parameter.published("pH,ref", "typical pH of potato", 5.8, "–", "potato 5.4–6.1 (FDA, approximate pH of foods)"),
					Parameter.fromMemory("RS,ref", "reducing sugar of a frying potato", 0.4, "%",
							"glucose + fructose 2.8–69 mmol/kg in retail potatoes (Vivanti et al. 2006); 0.4 % typical of frying varieties"),
					Parameter.fromMemory("P,ref", "protein of potato", 2, "%", "from memory")),
			ColourPath.of("raw → pale → golden → brown; anchors from memory of published fry colour ranges",
					new double[][] { { 0, 74, -2, 18 }, { 0.35, 64, 2, 28 }, { 0.7, 52, 9, 30 }, { 1, 38, 12, 24 } }),
			List.of(BrowningStage.byLightness("pale", "Pale", 70),
					BrowningStage.byLightness("light-golden", "Light golden", 66),
					BrowningStage.byLightness("golden", "Golden", 62),
					BrowningStage.byLightness("deep-golden", "Deep golden", 57),
					BrowningStage.byLightness("brown", "Brown", 50))),

	BREAD("bread", "Bread or dough",
			new Composition(43, 9, 2, 1.5, 0, 40.5, 2.5, 1.5),
			// wheat flour 0.1–0.5 g/kg (from memory), diluted by the dough's water
			150, 0, 30, 5.4, 22,
			Parameter.assumption("β", "buffer capacity of bread dough", 20, "mmol H⁺/(pH·kg)", "not measured; low (from memory)"),
			Parameter.fromMemory("ε0", "gas fraction of proofed dough", 0.6, "–",
					"bulk density ≈ 450 kg/m³ against a gas-free 1170 kg/m³ (from memory)"),
			Isotherms.BREAD,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.published("k0", "pre-exponential factor, bread crust ΔE", 42_000, "1/s",
							"Zanoni, Peri & Bruno 1995, LWT 28:604–609"),
					Isotherms.ZANONI_EA),
					Parameter.assumption("aw,ref", "water activity of the crust the rate was measured on", 0.4, "–",
							"dried crust (Zanoni's rates were measured on dried crumb)"),
					Parameter.published("pH,ref", "typical pH of bread", 5.4, "–", "FDA, approximate pH of foods"),
					Parameter.fromMemory("RS,ref", "reducing sugar of lean bread dough", 1.5, "%", "maltose and glucose from fermentation (from memory)"),
					Parameter.fromMemory("P,ref", "protein of bread dough", 9, "%", "from memory")),
			// L* 80 → 25, a* −0.5 → 15, b* 18 → 30 (quoted ranges); the end point is cut at ΔE = 52 so
			// that ΔE from the dough colour equals 52·extent, as in Zanoni's fit.
			ColourPath.of("dough (80, −0.5, 18) towards (25, 15, 30), ΔE∞ = 52 (Zanoni, Peri & Bruno 1995)",
					new double[][] { { 0, 80, -0.5, 18 }, { 1, 80 - 55 * 0.8904, -0.5 + 15.5 * 0.8904, 18 + 12 * 0.8904 } }),
			List.of(BrowningStage.byLightness("pale", "Pale", 72),
					BrowningStage.byLightness("light-golden", "Light golden", 64),
					BrowningStage.byLightness("golden", "Golden", 57),
					BrowningStage.byLightness("deep-golden", "Deep golden", 50),
					BrowningStage.byLightness("dark", "Dark", 40))),

	SWEET_DOUGH("sweet-dough", "Sweet dough (enriched buns, biscuits)",
			new Composition(25, 7, 15, 2, 15, 33, 1.5, 1),
			120, 0, 15, 6.5, 20,
			Parameter.assumption("β", "buffer capacity of sweet dough", 20, "mmol H⁺/(pH·kg)", "not measured; low (from memory)"),
			Parameter.fromMemory("ε0", "gas fraction of sweet dough", 0.4, "–", "denser than bread dough (from memory)"),
			Isotherms.BREAD,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.published("k0", "pre-exponential factor, crust ΔE (bread kinetics)", 42_000, "1/s",
							"Zanoni, Peri & Bruno 1995, LWT 28:604–609"),
					Isotherms.ZANONI_EA),
					Parameter.assumption("aw,ref", "water activity of a dry crust", 0.4, "–", "as bread"),
					Parameter.published("pH,ref", "pH of the bread the rate was measured on", 5.4, "–", "FDA, approximate pH of foods"),
					Parameter.fromMemory("RS,ref", "reducing sugar of lean bread dough", 1.5, "%", "from memory"),
					Parameter.fromMemory("P,ref", "protein of bread dough", 9, "%", "from memory")),
			ColourPath.of("pale dough → golden → dark brown; anchors from memory",
					new double[][] { { 0, 78, 0, 22 }, { 0.4, 62, 10, 32 }, { 1, 30, 14, 22 } }),
			List.of(BrowningStage.byLightness("pale", "Pale", 72),
					BrowningStage.byLightness("light-golden", "Light golden", 66),
					BrowningStage.byLightness("golden", "Golden", 60),
					BrowningStage.byLightness("deep-golden", "Deep golden", 52),
					BrowningStage.byLightness("dark", "Dark", 42))),

	VEGETABLE("vegetable", "Vegetable (onion, root, squash)",
			new Composition(89, 1.1, 0.1, 4.2, 1, 0, 1.7, 0.4),
			100, 10, 6, 5.5, 5,
			Parameter.assumption("β", "buffer capacity of vegetable tissue", 15, "mmol H⁺/(pH·kg)",
					"far lower than meat (from memory); not measured"),
			Parameter.assumption("ε0", "initial gas fraction", 0.02, "–", "from memory"),
			Isotherms.POTATO,
			new BrowningKinetics(new ArrheniusRate(
					Parameter.commonPractice("k0", "pre-exponential factor (potato kinetics borrowed)", 1.5e5, "1/s",
							"potato value; vegetables differ mainly by their sugar, which the reactant factor carries"),
					Isotherms.ZANONI_EA),
					Parameter.assumption("aw,ref", "water activity at which the rate is referenced", 0.4, "–", "dry crust"),
					Parameter.published("pH,ref", "pH of potato (kinetics borrowed)", 5.8, "–", "FDA, approximate pH of foods"),
					Parameter.fromMemory("RS,ref", "reducing sugar of a frying potato", 0.4, "%", "as potato"),
					Parameter.fromMemory("P,ref", "protein of potato", 2, "%", "as potato")),
			ColourPath.of("raw → translucent → golden → deep brown; anchors from memory (onion)",
					new double[][] { { 0, 85, -2, 15 }, { 0.45, 62, 8, 35 }, { 1, 32, 12, 22 } }),
			List.of(BrowningStage.byLightness("light-golden", "Light golden", 72),
					BrowningStage.byLightness("golden", "Golden", 64),
					BrowningStage.byLightness("deep-golden", "Deep golden", 56),
					BrowningStage.byLightness("dark", "Dark brown", 45)));

	private final String key;

	private final String label;

	private final Composition defaultComposition;

	private final double defaultAsparagineMgPerKg;

	private final double defaultSurfaceWaterGPerM2;

	private final double defaultThicknessMm;

	private final double defaultPh;

	private final double defaultInitialTemperatureC;

	private final Parameter bufferCapacity;

	private final Parameter initialPorosity;

	private final GabIsotherm isotherm;

	private final BrowningKinetics browning;

	private final ColourPath colourPath;

	private final List<BrowningStage> stages;

	FoodCategory(String key, String label, Composition defaultComposition, double defaultAsparagineMgPerKg,
			double defaultSurfaceWaterGPerM2, double defaultThicknessMm, double defaultPh,
			double defaultInitialTemperatureC, Parameter bufferCapacity, Parameter initialPorosity, GabIsotherm isotherm,
			BrowningKinetics browning, ColourPath colourPath, List<BrowningStage> stages) {
		this.key = key;
		this.label = label;
		this.defaultComposition = defaultComposition;
		this.defaultAsparagineMgPerKg = defaultAsparagineMgPerKg;
		this.defaultSurfaceWaterGPerM2 = defaultSurfaceWaterGPerM2;
		this.defaultThicknessMm = defaultThicknessMm;
		this.defaultPh = defaultPh;
		this.defaultInitialTemperatureC = defaultInitialTemperatureC;
		this.bufferCapacity = bufferCapacity;
		this.initialPorosity = initialPorosity;
		this.isotherm = isotherm;
		this.browning = browning;
		this.colourPath = colourPath;
		this.stages = List.copyOf(stages);
	}

	public static Optional<FoodCategory> byKey(String key) {
		for (FoodCategory c : values()) {
			if (c.key.equalsIgnoreCase(key) || c.name().equalsIgnoreCase(key)) {
				return Optional.of(c);
			}
		}
		return Optional.empty();
	}

	public Optional<BrowningStage> stage(String stageKey) {
		return stages.stream().filter(s -> s.key().equalsIgnoreCase(stageKey)).findFirst();
	}

	public String key() {
		return key;
	}

	public String label() {
		return label;
	}

	public Composition defaultComposition() {
		return defaultComposition;
	}

	public double defaultAsparagineMgPerKg() {
		return defaultAsparagineMgPerKg;
	}

	public double defaultSurfaceWaterGPerM2() {
		return defaultSurfaceWaterGPerM2;
	}

	public double defaultThicknessMm() {
		return defaultThicknessMm;
	}

	public double defaultPh() {
		return defaultPh;
	}

	/** Fridge (5 °C) for raw proteins and vegetables, room temperature for doughs (common practice). */
	public double defaultInitialTemperatureC() {
		return defaultInitialTemperatureC;
	}

	public Parameter bufferCapacity() {
		return bufferCapacity;
	}

	public Parameter initialPorosity() {
		return initialPorosity;
	}

	public GabIsotherm isotherm() {
		return isotherm;
	}

	public BrowningKinetics browning() {
		return browning;
	}

	public ColourPath colourPath() {
		return colourPath;
	}

	public List<BrowningStage> stages() {
		return stages;
	}

	/** Shared parameter sets, kept apart so the enum constants can refer to them. */
	static final class Isotherms {

		static final Parameter ZANONI_EA = Parameter.published("Ea", "activation energy of crust browning", 64_151,
				"J/mol", "Zanoni, Peri & Bruno 1995, LWT 28:604–609 (bread crust ΔE)");

		static final GabIsotherm POTATO = new GabIsotherm(
				Parameter.secondary("Xm", "GAB monolayer moisture, potato", 0.209, "kg/kg d.b.", "Chemkhi et al. 2004 (40–50 °C)"),
				Parameter.secondary("C", "GAB constant C, potato", 4.416, "–", "Chemkhi et al. 2004"),
				Parameter.secondary("K", "GAB constant K, potato", 0.976, "–", "Chemkhi et al. 2004"));

		static final GabIsotherm MEAT = new GabIsotherm(
				Parameter.fromMemory("Xm", "GAB monolayer moisture, muscle", 0.08, "kg/kg d.b.",
						"GAB fits meat best (Trujillo, Yeow & Pham 2003, J Food Eng 60:357); values from memory"),
				Parameter.fromMemory("C", "GAB constant C, muscle", 10, "–", "from memory"),
				Parameter.fromMemory("K", "GAB constant K, muscle", 0.95, "–", "from memory"));

		static final GabIsotherm BREAD = new GabIsotherm(
				Parameter.fromMemory("Xm", "GAB monolayer moisture, bread crust", 0.08, "kg/kg d.b.", "from memory, low confidence"),
				Parameter.fromMemory("C", "GAB constant C, bread crust", 10, "–", "from memory, low confidence"),
				Parameter.fromMemory("K", "GAB constant K, bread crust", 0.9, "–", "from memory, low confidence"));

		private Isotherms() {
		}

	}

}
