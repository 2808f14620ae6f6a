package com.crustplan.engine.acrylamide;

import java.util.List;

import com.crustplan.engine.model.Parameter;

/**
 * The constants of the acrylamide model and its description for the model page. The model
 * form follows Knol et al. 2005 (J Agric Food Chem 53:6133) reduced to one lumped step:
 * asparagine and a reducing sugar condense (consuming both), a small molar share of what
 * condenses becomes acrylamide, and acrylamide is eliminated at high temperature.
 * Formation is fitted to whole French-fry strips (Pedreschi, Kaack &amp; Granby 2006,
 * Food Res Int 39:40), whole 8 mm strips run as strips, on the 150 and 190 °C points; 170
 * °C is held out (predicted 276 against 327 µg/kg, −16 %). Refitted when potato got its
 * own moisture diffusivity (k_f,ref was 2.9627e-7, Ea,f 1.0935e5 J/mol): water now leaves
 * the strip faster, so 40 % moisture comes sooner (6.5 / 5.3 / 4.6 min at 150 / 170 / 190
 * °C). Refitted again when the blanched strips' sugar and asparagine were taken from
 * published leaching (60 % and 65 % retained instead of an assumed half; k_f,ref was
 * 5.4675e-7, Ea,f 1.1049e5 J/mol). Refitted a third time when boiling was coupled to the
 * moisture solve, which removed a time-step error of about 10 % in the fry's drying
 * (k_f,ref was 3.0316e-7, Ea,f 1.0744e5 J/mol; strips now reach 40 % moisture at 6.0 /
 * 5.0 / 4.4 min): see {@code PedreschiFit}.
 */
public final class AcrylamideModel {

	public static final double ACRYLAMIDE_MOLAR_MASS = 71.08;

	public static final Parameter M_ACRYLAMIDE = Parameter.published("M(AA)", "molar mass of acrylamide",
			ACRYLAMIDE_MOLAR_MASS, "g/mol", "IUPAC standard atomic weights (C₃H₅NO)");

	public static final Parameter M_ASPARAGINE = Parameter.published("M(Asn)", "molar mass of asparagine", 132.12,
			"g/mol", "IUPAC standard atomic weights (C₄H₈N₂O₃)");

	public static final Parameter M_HEXOSE = Parameter.published("M(RS)",
			"molar mass of a reducing hexose (glucose, fructose)", 180.16, "g/mol",
			"IUPAC standard atomic weights (C₆H₁₂O₆); maltose and lactose are counted per hexose-equivalent mass, an assumption");

	/**
	 * Reference temperature of the formation fit, K (170 °C: the held-out middle of the
	 * data).
	 */
	public static final double FORMATION_REFERENCE_K = 443.15;

	/** Reference temperature of the elimination rate, K (180 °C). */
	public static final double ELIMINATION_REFERENCE_K = 453.15;

	public static final Parameter FORMATION_RATE = Parameter.calibrated("k_f,ref",
			"acrylamide formation rate constant at 170 °C, per mmol/kg d.m. of each precursor", 3.0316e-7,
			"kg d.m./(mmol·s)",
			"fitted to Pedreschi, Kaack & Granby 2006 (150 and 190 °C), blanched 8 mm strips run as strips with the potato moisture diffusivity, fried to 40 % moisture; 170 °C held out (−16 %); the blanched strips keep 60 % of the sugar and 65 % of the asparagine, the slice leaching of Pedreschi, Kaack & Granby 2008 (Agro Food Ind Hi-Tech 19(2):32) carried to the strip by Crank's diffusion series");

	public static final Parameter FORMATION_EA = Parameter.calibrated("Ea,f",
			"activation energy of acrylamide formation", 1.0977e5, "J/mol",
			"fitted to Pedreschi, Kaack & Granby 2006 (150 and 190 °C), whole 8 mm strips");

	public static final Parameter ELIMINATION_RATE = Parameter.fromMemory("k_e,ref",
			"acrylamide elimination rate constant at 180 °C", 3.0e-4, "1/s",
			"order of magnitude of the decline of acrylamide in heated asparagine–sugar systems (Claeys, De Vleeschouwer & Hendrickx 2005, J Agric Food Chem 53:9999; Knol et al. 2005); value from memory");

	public static final Parameter ELIMINATION_EA = Parameter.fromMemory("Ea,e",
			"activation energy of acrylamide elimination", 9.5e4, "J/mol",
			"Claeys, De Vleeschouwer & Hendrickx 2005 (asparagine–glucose, 140–200 °C); value from memory");

	public static final Parameter YIELD = Parameter.fromMemory("Y",
			"acrylamide formed per asparagine–sugar pair condensed", 0.005, "mol/mol",
			"model-system yields of well below 1 mol % (glucose) to about 3 mol % (fructose, lower pH) (Knol et al. 2005 and its fructose follow-up); 0.5 % from memory");

	public static final Parameter PH_SLOPE = Parameter.fromMemory("β_AA",
			"decade change of the formation rate per pH unit", 0.35, "1/pH",
			"lowering pH by citric acid dips cut fries' acrylamide by roughly 70 % (Jung, Choi & Ju 2003, J Food Sci 68:1287) and pH 4 vs 6 cut it strongly in potato systems (Rydberg et al. 2003, J Agric Food Chem 51:7012); slope from memory");

	public static final Parameter PH_REFERENCE = Parameter.assumption("pH_ref",
			"pH of the potatoes the formation was fitted on", 5.8, "–",
			"typical potato pH 5.4–6.1 (FDA, approximate pH of foods); the fit data give no pH, mid-range taken");

	public static final Parameter GATE_DRY = Parameter.assumption("aw,dry",
			"water activity below which a layer forms acrylamide fully", 0.6, "–",
			"formation starts when the layer has dried (Regulation (EU) 2017/2158 recital 3: low moisture; crisps: below ≈ 6 % d.b., Food Chem 352:129305, 2021); gate placed where a layer can pass ≈ 115 °C");

	public static final Parameter GATE_WET = Parameter.assumption("aw,wet",
			"water activity above which a layer forms none", 0.9, "–",
			"a layer still holding nearly free water sits at its boiling point, ≈ 100–103 °C (assumption)");

	public static final Parameter SKIP_BELOW = Parameter.assumption("T_min",
			"layers cooler than this are not integrated", 378.15, "K",
			"at 105 °C formation is about 150 times slower than at 170 °C with the fitted Ea (derived); skipping the wet interior, which boils at 100–103 °C, saves most of the work");

	public static final Parameter CRUST_DEPTH = Parameter.commonPractice("d_crust", "depth of the crust layer reported",
			1.0e-3, "m",
			"the outer 1 mm of the face, about the thickness of a French fry's crust (common practice); half the thickness for thinner pieces");

	private AcrylamideModel() {
	}

	public static List<Parameter> parameters() {
		return List.of(FORMATION_RATE, FORMATION_EA, ELIMINATION_RATE, ELIMINATION_EA, YIELD, PH_SLOPE, PH_REFERENCE,
				GATE_DRY, GATE_WET, SKIP_BELOW, CRUST_DEPTH, M_ACRYLAMIDE, M_ASPARAGINE, M_HEXOSE);
	}

}
