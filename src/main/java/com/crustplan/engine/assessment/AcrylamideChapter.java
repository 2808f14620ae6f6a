package com.crustplan.engine.assessment;

import static com.crustplan.engine.acrylamide.AcrylamideModel.*;

import java.util.List;

import com.crustplan.engine.model.Equation;
import com.crustplan.engine.model.ModelSection;

/**
 * The acrylamide chapter of the model page: the formation model's constants and how the
 * assessment judges them.
 */
public final class AcrylamideChapter {

	private AcrylamideChapter() {
	}

	public static ModelSection section() {
		return new ModelSection("Acrylamide", List.of(new Equation("Precursors per dry matter",
				"[Asn]₀ = c_Asn / (M(Asn)·(1 − w)); [RS]₀ = 10·RS% / (M(RS)·(1 − w)) mol/kg → mmol/kg d.m.",
				"Asparagine (mg/kg as entered) and reducing sugar (% fresh weight) are expressed per kg of dry matter (w: water fraction) so that drying does not change them.",
				List.of(M_ASPARAGINE, M_HEXOSE)),
				new Equation("Condensation and formation, per layer of the grid",
						"r = k_f(T)/Y · [Asn]·[RS] · g(aw) · 10^(β_AA(pH − pH_ref));  d[Asn]/dt = d[RS]/dt = −r;  d[AA]/dt = Y·r − k_e(T)·[AA]",
						"Lumped form of the Knol et al. (2005) scheme: the precursors condense (and are used up), a share Y of the condensation gives acrylamide, which is itself eliminated. Integrated on every control volume from its own temperature and water activity; the limiting precursor is stepped implicitly so it never goes negative.",
						List.of(YIELD, PH_SLOPE, PH_REFERENCE)),
				new Equation("Temperature dependence",
						"k_f(T) = k_f,ref·exp(−Ea,f/R·(1/T − 1/443.15 K));  k_e(T) = k_e,ref·exp(−Ea,e/R·(1/T − 1/453.15 K))",
						"Arrhenius rates; formation fitted to Pedreschi, Kaack & Granby (2006) at 150 and 190 °C, elimination from model-system studies.",
						List.of(FORMATION_RATE, FORMATION_EA, ELIMINATION_RATE, ELIMINATION_EA)),
				new Equation("Dryness gate", "g(aw) = 1 for aw ≤ aw,dry; 0 for aw ≥ aw,wet; smooth step between",
						"Formation needs a layer that has lost its free water; a wet layer is also held near 100 °C by boiling, so the gate and the temperature agree.",
						List.of(GATE_DRY, GATE_WET, SKIP_BELOW)),
				new Equation("Reported levels, fresh (as eaten) basis",
						"AA_crust = Σ wᵢ·[AA]ᵢ·mᵢ / Σ wᵢ·mᵢ(1 + Xᵢ) · M(AA);  AA_portion = Σ [AA]ᵢ·mᵢ / Σ mᵢ(1 + Xᵢ) · M(AA)",
						"mᵢ dry mass and Xᵢ moisture of layer i; wᵢ the share of layer i inside the outer crust depth of face 0. The portion figure is what a laboratory would find in the whole piece homogenised; benchmark zones use it.",
						List.of(CRUST_DEPTH, M_ACRYLAMIDE)),
				new Equation("Benchmark zones and warnings",
						"low: AA_portion < B/2; elevated: B/2 ≤ AA_portion ≤ B; high: AA_portion > B",
						"B is the product's benchmark level (Regulation (EU) 2017/2158, Annex IV). Warnings follow the retail and catering measures of Annex II: fry potato products below 175 °C, cook to a lighter colour (golden) with a colour guide, use low-sugar potatoes.",
						List.of(AcrylamideWarnings.MAX_FRYING_C, AcrylamideWarnings.HIGH_SUGAR_PCT)),
				new Equation("Mitigations by re-running the model", "(1 − f)² = 1 − R  ⇒  f = 1 − √(1 − R)",
						"A pretreatment that leaches a fraction f of both precursors leaves (1 − f)² of the acrylamide, so a published reduction R gives f. Cooking changes are compared at the target colour, raw-material changes after the same cooking time.",
						Mitigations.parameters()),
				new Equation("Precursors far from the category", "flag when x > F·x_typ or x < x_typ / F",
						"x is the surface's free asparagine or reducing sugar, x_typ the category's default. The estimate scales with their product, so a value left from another category (meat's 50 mg/kg asparagine in a potato instead of about 3000) makes it many times low without another sign.",
						List.of(com.crustplan.engine.food.TypicalValues.FAR_FACTOR))),
				List.of("Fitted to one potato data set (blanched strips, one variety); other foods use the same kinetics with their own precursors, which is an extrapolation.",
						"Only two fitted constants; elimination, yield and the pH slope are from memory of the literature.",
						"Precursors do not move with the water; the crust is not enriched by solutes carried outwards.",
						"Oil taken up in frying is not counted: it would dilute the figure by roughly its share of the mass.",
						"Sugars used up by other amino acids and by caramelisation are not subtracted, so sugar depletion is underestimated in dark crusts.",
						"Ammonium raising agents (which raise acrylamide strongly) and bicarbonate's reported reduction in gingerbread (Amrein et al. 2004) are not modelled; only the pH effect is.",
						"A strip or crisp is treated as a slab of the given thickness; the fit is consistent with that convention (8 mm strips as an 8 mm slab).",
						"A real strip browns on four long faces, a slab on two: the fitted formation rate absorbs that difference, so true slabs (crisps, biscuits, bread crust) are likely over-estimated, thin crisps by a factor of several.",
						"Raw-material changes (soaking, blanching, enzyme, acid) are compared after the same cooking time, as the published reductions were measured; cooked on to the same colour, sugar removal gains much less in the model because browning slows too."));
	}

}
