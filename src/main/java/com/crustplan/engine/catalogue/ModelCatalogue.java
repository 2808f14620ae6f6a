package com.crustplan.engine.catalogue;

import com.crustplan.engine.assessment.AcrylamideChapter;
import com.crustplan.engine.model.Equation;
import com.crustplan.engine.model.ModelSection;
import com.crustplan.engine.model.Parameter;

import java.util.ArrayList;
import java.util.List;

import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.browning.Caramelisation;
import com.crustplan.engine.browning.WaterActivityFactor;
import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.OilUptake;
import com.crustplan.engine.doneness.DonenessChapter;
import com.crustplan.engine.food.DefaultMakeUp;
import com.crustplan.engine.myoglobin.InteriorChapter;
import com.crustplan.engine.food.Acidity;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.heat.GrillKind;
import com.crustplan.engine.cook.TurnedSurface;
import com.crustplan.engine.heat.HeatSetup;
import com.crustplan.engine.heat.RadiantGrill;
import com.crustplan.engine.heat.Oven;
import com.crustplan.engine.layers.Grid;
import com.crustplan.engine.properties.FoodComponent;
import com.crustplan.engine.properties.ThermalProperties;
import com.crustplan.engine.water.Atmosphere;
import com.crustplan.engine.water.MoistureDiffusivity;
import com.crustplan.engine.water.GabIsotherm;
import com.crustplan.engine.water.PoreVapourConductivity;
import com.crustplan.engine.water.WaterVapour;

/**
 * The model as implemented: every equation with the parameters it uses, read from the
 * same constants the engine runs on, so the model page and the contributor guide cannot
 * drift from the code.
 */
public final class ModelCatalogue {

	private ModelCatalogue() {
	}

	public static List<ModelSection> sections() {
		List<ModelSection> s = new ArrayList<>();
		s.add(properties());
		s.add(water());
		s.add(heat());
		s.add(numerics());
		s.add(browning());
		s.add(acidity());
		s.add(colour());
		s.add(AcrylamideChapter.section());
		s.add(DonenessChapter.section());
		s.add(InteriorChapter.section());
		s.add(defaults());
		return List.copyOf(s);
	}

	/** Every parameter of every section, once each, in order. */
	public static List<Parameter> allParameters() {
		List<Parameter> all = new ArrayList<>();
		for (ModelSection section : sections()) {
			for (Equation e : section.equations()) {
				for (Parameter p : e.parameters()) {
					if (!all.contains(p)) {
						all.add(p);
					}
				}
			}
		}
		return all;
	}

	private static ModelSection properties() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("Mixture rules", "cp = Σ xᵢ·cpᵢ;  1/ρ = Σ xᵢ/ρᵢ;  k = Σ vᵢ·kᵢ,  vᵢ = (xᵢ/ρᵢ)/Σ(xⱼ/ρⱼ)",
				"Specific heat, density and conductivity of the solid–liquid matrix from component mass fractions xᵢ "
						+ "(Choi & Okos 1986, Food Engineering and Process Applications vol. 1, 93–101; ASHRAE Handbook — Refrigeration, Thermal Properties of Foods). "
						+ "Sugars, starch and the remainder count as carbohydrate.",
				List.of()));
		for (FoodComponent c : FoodComponent.values()) {
			eq.add(new Equation("Component: " + c.name().toLowerCase(), c.formulaText(),
					"T in °C; k in W/(m·K), ρ in kg/m³, cp in kJ/(kg·K); valid −40…150 °C (held at the end values beyond).",
					List.of()));
		}
		eq.add(new Equation("Porous foods",
				"k = k_matrix^(1−ε) · k_gas^ε;  ε = 1 − (m·v_matrix) / (V − s·V_water lost)",
				"Gas fraction ε from the volume the matrix (with any frying oil, counted as fat) leaves empty in each control volume. "
						+ "A share s of the volume of the water a layer loses is given up by shrinking: muscle stays a saturated gel (s = 1) "
						+ "and its drying crust keeps the conductivity of the drier solid; baked crumb is rigid (s = 0) and opens pores.",
				List.of(Parameter.fromMemory("k_gas", "conductivity of the gas in pores",
						ThermalProperties.AIR_CONDUCTIVITY, "W/(m·K)",
						"still air, 0.0263 and 0.0300 W/(m·K) at 300 and 350 K (Incropera, Table A.4; values from memory): air near 50 °C, about 10 % below air at 100 °C"))));
		List<Parameter> shrinkage = new ArrayList<>();
		for (FoodCategory c : FoodCategory.values()) {
			shrinkage.add(c.shrinkage());
		}
		eq.add(new Equation("Shrinkage as a layer dries", "V = V₀ − s·(X₀ − X)·m_dry/ρ_water",
				"Per category, in the order of the category list (meat, poultry skin, fish, potato, bread, sweet dough, vegetable). "
						+ "The grid keeps its geometry: shrinkage acts on what fills the layer, not on the distances heat travels.",
				shrinkage));
		eq.add(new Equation("Evaporation–condensation in crumb",
				"closed: k = k_geo + 1/((1−ε_c)/k_m + ε_c/(k_gas + k_v)) − 1/((1−ε_c)/k_m + ε_c/k_gas);  "
						+ "open: k = k_m^(1−ε)·k_gas^(ε−ε_c)·(k_gas + k_v)^ε_c;  k = k_closed + φ·max(0, k_open − k_closed), "
						+ "φ = (T_peak − T_open,0)/(T_open,1 − T_open,0) in [0, 1];  k_v = f_wet·D_va·S(y)·h_fg·aw·(dp_sat/dT)/(R_v·T)",
				"Across the raw food's own closed gas cells ε_c (proofed dough), water evaporates at the warm wall, diffuses and "
						+ "condenses at the cold one (de Vries 1958; the mechanism of bread-baking models, e.g. Thorvaldsson & Janestad 1999, "
						+ "Purlis & Salvadori 2009). Cells in series with their walls; dp_sat/dT by Clausius–Clapeyron; S(y) = 1/(1 − y) the "
						+ "Stefan factor up to y_v,max, then tapered to 0 for pure steam; f_wet rises from 0 at aw,wet to 1 at aw = 1. "
						+ "As the crumb sets its cells open into one connected pore space (71–81 °C, Zhang et al. 2025; "
						+ "Wang, Austin & Bell 2011), and the vapour term joins the pore gas in the geometric-mean rule "
						+ "(de Vries 1963); T_peak is the highest temperature the layer has reached. "
						+ "Pores opened by drying vent and get none.",
				List.of(PoreVapourConductivity.VAPOUR_DIFFUSIVITY_298K, PoreVapourConductivity.MAX_VAPOUR_SHARE,
						PoreVapourConductivity.WET_WALL_ACTIVITY, PoreVapourConductivity.CELL_OPENING_START,
						PoreVapourConductivity.CELL_OPENING_END)));
		eq.add(new Equation("Frying oil in the pores",
				"m_oil,i = r_oil·(X₀ − X_i)·m_dry,i  (never decreasing, while a face is in oil)",
				"Oil uptake follows the water lost (Gamble, Rice & Selman 1987: both linear in √t, oil where water left); the oil is "
						+ "counted as Choi–Okos fat in the layer. Reported with the moisture at the target as g per 100 g of the piece.",
				List.of(OilUptake.OIL_PER_WATER_LOST)));
		return new ModelSection("Thermal properties from composition", eq, List.of(
				"Choi–Okos fits end at 150 °C; hotter crusts use the 150 °C values.",
				"Fat rendering out of skin is not modelled; oil that enters a fry as it leaves the fryer is taken in during frying.",
				"The whole thickness has one composition (a surface layer of different make-up is not resolved)."));
	}

	private static ModelSection water() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("Saturation pressure",
				"p_sat(T): IAPWS-IF97 region 4, eqs. 30 (pressure) and 31 (temperature)",
				"IAPWS R7-97(2012); vapour treated as an ideal gas, ρv = p/(R_v·T).",
				List.of(WaterVapour.GAS_CONSTANT)));
		eq.add(new Equation("Latent heat", "h_fg = 2501 − 2.36·t  kJ/kg  (t in °C)", "A linear fit to steam tables.",
				List.of(WaterVapour.LATENT_HEAT_0C, WaterVapour.LATENT_HEAT_SLOPE)));
		eq.add(new Equation("Local boiling", "aw(X)·p_sat(T) ≤ p_atm  for every control volume holding water",
				"A layer that still holds water cannot be hotter than its boiling point; the excess enthalpy boils water off "
						+ "instead. This gives the 100 °C plateau against a pan or in oil, an evaporation front that recedes into the food, "
						+ "crust temperatures that climb as aw falls, and wet cores that stay near 100 °C.",
				List.of()));
		eq.add(new Equation("Moisture diffusion",
				"ρ_d·∂X/∂t = ∂/∂x(ρ_d·D·∂X/∂x);  D = D_ref·exp(−Ea/R·(1/T − 1/353.15 K))·X²/(X² + X_c²)",
				"X in kg water per kg dry matter; vapour leaves through the faces.",
				List.of(MoistureDiffusivity.REFERENCE, MoistureDiffusivity.ACTIVATION_ENERGY,
						MoistureDiffusivity.CRUST_MOISTURE)));
		for (FoodCategory c : FoodCategory.values()) {
			MoistureDiffusivity d = c.moistureDiffusivity();
			if (d != MoistureDiffusivity.DEFAULT) {
				eq.add(new Equation("Moisture diffusion: " + c.label(),
						String.format(java.util.Locale.ROOT, "D = D_ref·exp(−Ea/R·(1/T − 1/%.2f K))·X²/(X² + X_c²)",
								d.referenceK()),
						"The category's own diffusivity, in place of the default above.",
						List.of(d.reference(), d.activationEnergy(), d.crustMoisture())));
			}
		}
		for (FoodCategory c : FoodCategory.values()) {
			eq.add(new Equation("Sorption isotherm: " + c.label(),
					"X = Xm·C·K·aw / ((1 − K·aw)(1 − K·aw + C·K·aw))  (GAB)",
					"Water activity of each layer from its moisture, inverted by the positive root of the GAB quadratic; above X(aw = 1) the water is free.",
					isothermParameters(c.isotherm())));
		}
		return new ModelSection("Water: vapour, sorption, drying and boiling", eq, List.of(
				"Isotherms measured at 40–50 °C are used at all temperatures (at crust temperatures they overstate how tightly water is held).",
				"Vapour formed inside the food is taken to leave at once; pressure build-up and puffing are not modelled.",
				"Shrinkage changes what fills a layer, not the grid: a shrinking piece's thickness is not updated."));
	}

	/** A syrup-holding food also lists its solution's activity and how it was had. */
	private static List<Parameter> isothermParameters(GabIsotherm g) {
		List<Parameter> p = new ArrayList<>(List.of(g.monolayer(), g.c(), g.k()));
		if (g.solution().value() < 1) {
			p.addAll(List.of(g.solution(), GabIsotherm.NORRISH_SUCROSE, GabIsotherm.NORRISH_GLUCOSE));
		}
		return p;
	}

	private static ModelSection heat() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("Open face (oven, kitchen air, under a grill)",
				"q = h·(T_gas − Ts) + ε·σ·(T_rad⁴ − Ts⁴) − h_fg·J;  J = h_m·(aw·p_sat(Ts) − p_v)/(R_v·T_film);  h/h_m = ρ·cp·Le^(2/3)",
				"Convection, grey-body radiation and evaporation (Chilton–Colburn analogy, vapour densities at the film temperature; Incropera §6.7). "
						+ "J < 0 is steam condensing on a face below the dew point, which heats it fast.",
				HeatSetup.parameters()));
		eq.add(new Equation("Pan contact", "q = h_c·(T_pan − Ts)",
				"Through a fat film or a dry pan; the upper face is an open face in kitchen air; a flip swaps the faces.",
				List.of(HeatSetup.CONTACT_WITH_FAT, HeatSetup.CONTACT_DRY)));
		eq.add(new Equation("Turned strip, cube or ball",
				"heated for t_flip, open for (1/s − 1)·t_flip;  unturned: q = s·q_heated + (1 − s)·q_open",
				"A strip, cube or ball has one outer face; in a pan or under a grill it is taken as turned side by side, each side down "
						+ "for the flip interval, so every part of its surface faces the heat a share s of the time. Left unturned, the heat "
						+ "is spread over its surface in the same share. A slab keeps its two faces and its flips.",
				TurnedSurface.parameters()));
		eq.add(new Equation("Oven atmosphere", "p_v = y·p_atm;  humidity ratio w = 0.622·y/(1 − y)",
				"The oven input is the steam share y of the oven atmosphere by volume (dry kitchen air ≈ 1.6 %, pure steam 100 %), shown with its dew point. "
						+ "Relative humidity at the oven temperature is no cook's scale: 10 % RH at 175 °C is already about 88 % steam.",
				List.of(Parameter.commonPractice("y_room", "steam share of kitchen air (25 °C, 50 % RH)",
						Atmosphere.KITCHEN_STEAM_FRACTION * 100, "%", "common practice; p_sat from IAPWS-IF97"))));
		eq.add(new Equation("Radiant grill",
				"T_rad⁴ = q/σ + T_room⁴;  q = σ·ε_el·s·F·(T_el⁴ − T_room⁴);  F = ½·{S − [S² − 4(r_h/r_f)²]^½}, S = 1 + (1 + (r_h/L)²)/(r_f/L)²",
				"q is the heat flux at the food as a black radiometer at room temperature reads it, given by the cook or worked out "
						+ "from the element temperature T_el, the glowing share s of the heater face and the view factor F of coaxial "
						+ "parallel discs (food radius r_f, heater of equal area r_h, distance L; Incropera Table 13.2). "
						+ "The cook stops where the surface passes T_char.",
				List.of(GrillKind.FOOD_RADIUS, RadiantGrill.CHAR_SURFACE)));
		eq.add(new Equation("Deep fryer", "q = h·(T_oil − Ts);  h = h_oil + (h_oil,boil − h_oil)·min(1, J_boil/J_full)",
				"Bubbling stirs the oil in proportion to the vapour leaving; J_full = h_oil,boil·(T_oil − 100 °C)/h_fg. h falls back as the crust dries.",
				List.of(HeatSetup.OIL_QUIET, HeatSetup.OIL_BUBBLING)));
		eq.add(new Equation("Pan or fryer with a body",
				"m·c·dT/dt = P(T) − Q_food − h·A·(T − T_room) − ε·σ·A·(T⁴ − T_room⁴)",
				"Where the cook gives a pan or fryer as equipment, its metal or oil is one lumped mass that the food's load pulls down "
						+ "and the burner, hob or heater brings back (a thermostat tapers its power across a proportional band; a flame "
						+ "left where it was set gives the power that held the empty pan). The defaults are what a cook who gives "
						+ "no figures gets; a pan's specific heat and emissivity follow its material.",
				HeatSetup.equipmentParameters()));
		return new ModelSection("Heat at the faces", eq, List.of(
				"Oven air and grill elements hold their set temperature; a pan or fryer does too unless it is given as equipment with a body.",
				"Pan contact is uniform; real items curl, shrink and touch the pan unevenly.",
				"Both oven faces see the same heat (on a rack, not on a tray)."));
	}

	private static ModelSection numerics() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("Conduction",
				"C_i·(T_i' − T_i)/Δt = Σ_j G_ij·(T_j' − T_i') + q_face;  G = 1/(d/2k_i + d/2k_j)",
				"Vertex-centred finite volumes through the thickness (half volumes at the faces, so a face node is the surface layer), "
						+ "backward Euler, tridiagonal solve; face fluxes linearised about the last temperature. Energy is counted: heat in = "
						+ "sensible + latent + sensible heat carried off by the vapour.",
				List.of(Parameter.assumption("N", "nodes through the thickness", CookSettings.DEFAULT_NODES, "–",
						"from the grid convergence table (README, Performance)"),
						Parameter.assumption("Δt", "time step", CookSettings.DEFAULT_TIME_STEP_S, "s",
								"from the step convergence table (README, Performance)"),
						Parameter.assumption("w", "share of cosine spacing in the grid (crowds nodes to the faces)",
								Grid.DEFAULT_CLUSTERING, "–", "our choice"))));
		return new ModelSection("Numerical method", eq,
				List.of("One-dimensional: edges and corners of a piece brown faster than the model's flat face."));
	}

	private static ModelSection browning() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("Browning extent",
				"dB/dt = [k_M(T)·f_aw·f_pH·f_r + k_C(T)·f_s·f_aw]·(1 − B);  k = k0·exp(−Ea/(R·T))",
				"First-order approach of the browning extent B to 1 at each face, integrated over the face's own temperature and water "
						+ "activity history. k_M is the category's Maillard rate, k_C sucrose caramelisation.",
				List.of()));
		eq.add(new Equation("Water activity factor",
				"f_aw = g(max(aw, aw_ref))/g(aw_ref);  g(aw) = (aw/a*)^p·((1 − aw)/(1 − a*))^(p(1−a*)/a*)",
				"Fastest at intermediate water activity, zero for a wet face; 1 on the dry side of the water activity at which the "
						+ "category's rate was measured, so published crust rates are not reduced twice.",
				List.of(WaterActivityFactor.PEAK, WaterActivityFactor.DRY_EXPONENT)));
		eq.add(new Equation("pH factor", "f_pH = 10^(β·(pH − pH_ref))", "Log k rises roughly linearly with pH.",
				List.of(BrowningKinetics.PH_SENSITIVITY)));
		eq.add(new Equation("Reactant factor", "f_r = min(f_max, (RS/RS_ref)^n_RS·(P/P_ref))",
				"Order n_RS in reducing sugar (glucose, fructose, lactose, maltose), first order where no other order is known, "
						+ "and first order in amino groups, protein as their proxy. Potato fry colour takes an apparent order well "
						+ "below 1: colour also comes from other constituents, while acrylamide stays first order in the sugar that "
						+ "limits it. Sucrose is not a reducing sugar and takes no part.",
				List.of(BrowningKinetics.REACTANT_FACTOR_CAP, BrowningKinetics.FIRST_ORDER_IN_SUGAR)));
		eq.add(new Equation("Caramelisation", "k_C = k0,c·exp(−Ea,c/(R·T));  f_s = min(f_max, S/S_ref)",
				"Sucrose browns by caramelisation alone, significant above about 160 °C.",
				List.of(Caramelisation.PRE_EXPONENTIAL, Caramelisation.ACTIVATION_ENERGY,
						Caramelisation.REFERENCE_SUCROSE_PCT)));
		for (FoodCategory c : FoodCategory.values()) {
			BrowningKinetics k = c.browning();
			eq.add(new Equation("Maillard rate: " + c.label(), "k_M = k0·exp(−Ea/(R·T))",
					"Parameters and the reference conditions of the fit.",
					List.of(k.rate().preExponential(), k.rate().activationEnergy(), k.referenceWaterActivity(),
							k.referencePh(), k.referenceReducingSugarPct(), k.referenceProteinPct(),
							k.reducingSugarOrder())));
		}
		return new ModelSection("Browning kinetics", eq, List.of(
				"Reported Maillard activation energies scatter from about 30 to 180 kJ/mol (van Boekel 2001, Nahrung 45:150): "
						+ "several categories borrow the bread crust value and are calibrated to common kitchen practice — calibrate them to your own equipment.",
				"Colour is predicted at the face only; oxygen, smoke and marinade sugars on the surface are not modelled separately.",
				"Browning says nothing about whether the inside is safe to eat: check the core with a probe."));
	}

	private static ModelSection acidity() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("pH after additions", "ΔpH = (n_base − n_acid) / (β·m)",
				"Sodium bicarbonate adds one mole of base per mole; citric acid gives about two protons per mole in the food pH range. "
						+ "β is the category's buffer capacity. Held between the pH limits below.",
				List.of(Acidity.BICARBONATE_MOLAR_MASS, Acidity.CITRIC_ACID_MOLAR_MASS, Acidity.CITRIC_PROTONS,
						Acidity.MAX_PH, Acidity.MIN_PH)));
		for (FoodCategory c : FoodCategory.values()) {
			eq.add(new Equation("Buffer capacity: " + c.label(), "β", "Initial gas fraction ε0 listed alongside.",
					List.of(c.bufferCapacity(), c.initialPorosity())));
		}
		return new ModelSection("pH and additions", eq, List
			.of("Buffer capacities of vegetables and doughs are assumptions; ammonium bicarbonate (which raises acrylamide) is not offered."));
	}

	private static ModelSection colour() {
		List<Equation> eq = new ArrayList<>();
		eq.add(new Equation("Colour path",
				"L*a*b*(B): straight segments between anchor colours along the browning extent",
				"Each category's surface runs through its own anchors; stages are defined by L* limits, or by extent where the path is "
						+ "not monotone in L* (raw red meat lightens as it greys before it browns).",
				List.of()));
		for (FoodCategory c : FoodCategory.values()) {
			eq.add(new Equation("Colour path: " + c.label(), "anchor colours along the browning extent B",
					c.colourPath().source(),
					c.colourPath().anchorParameters(c.label() + " surface", "browning extent")));
		}
		eq.add(new Equation("Colour difference", "ΔE*ab = √(ΔL*² + Δa*² + Δb*²)", "CIE 1976.", List.of()));
		eq.add(new Equation("Swatches",
				"L*a*b* → XYZ (D65, CIE 1976 inverse) → linear RGB (IEC 61966-2-1 matrix) → sRGB transfer curve",
				"Out-of-gamut values are clipped.", List.of()));
		return new ModelSection("Colour", eq, List
			.of("Anchor colours of most paths are from memory of published ranges, not a measured colour chart: a screen swatch is a guide, "
					+ "not a standard; use the kitchen's own colour guide at the station."));
	}

	private static ModelSection defaults() {
		List<Equation> eq = new ArrayList<>();
		for (FoodCategory c : FoodCategory.values()) {
			eq.add(new Equation("Default make-up: " + c.label(), "x₀ (% by mass) and Asn₀ (mg/kg) of a new surface",
					"What a new surface of the category starts from; a cook enters the product's own figures where known.",
					DefaultMakeUp.parameters(c)));
		}
		return new ModelSection("Default make-up of each category", eq, List.of(
				"Typical values, not a particular product: reducing sugar and asparagine vary several-fold between lots and varieties.",
				"Measure or ask the supplier for the reducing sugar of potatoes: it drives both colour and acrylamide."));
	}

}
