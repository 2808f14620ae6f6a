package com.crustplan.engine.acrylamide;

import com.crustplan.engine.cook.CookSettings;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.heat.DeepFryer;
import com.crustplan.engine.cook.Target;

/**
 * Fits the formation constants (k_f at 170 °C and Ea,f) to Pedreschi, Kaack &amp; Granby
 * 2006 (Food Res Int 39:40): potato strips 0.8 × 0.8 × 5 cm, blanched 50 °C / 80 min,
 * fried to 40 % moisture (wet basis), acrylamide 135 / 327 / 564 µg/kg at 150 / 170 / 190
 * °C. Fitted on 150 and 190 °C, 170 °C held out. Run {@link #main} after any change to
 * the heat and moisture model and copy the printed constants into
 * {@link AcrylamideModel}; the tests check that the recorded constants still fit. From
 * the project directory: {@code mvn -o -q test-compile} then
 * {@code java -cp target/classes:target/test-classes com.crustplan.engine.acrylamide.PedreschiFit}.
 * <p>
 * The strip is run as an 8 mm square strip (the cylinder of equal surface-to-volume
 * ratio, see {@link Shape}): the whole-strip figure follows the strip's real
 * crust-to-volume ratio. Blanched composition: the category's frying potato (0.40 %
 * reducing sugar, 3000 mg/kg asparagine; the paper's raw strips were not analysed in the
 * text we could read) with the share leached by the 50 °C / 80 min blanch taken from
 * published leaching: blanching 2.2 mm slices removed on average 76 % of the glucose and
 * 68 % of the asparagine (Pedreschi, Kaack &amp; Granby 2008, Agro Food Ind Hi-Tech
 * 19(2):32, six blanching conditions, 50 °C for 30 and 70 min among them). Leaching is
 * diffusion out of the piece, so the slice's removal fixes D·t through Crank's series for
 * a plane sheet (half-thickness 1.1 mm: D·t = 0.597 mm² for glucose, 0.456 mm² for
 * asparagine), and the same D·t in the 8 mm square strip, run as the cylinder of equal
 * surface-to-volume ratio (radius 4 mm, Crank's series for the cylinder), removes 39.7 %
 * and 35.1 % (see {@link #retainedAfterBlanch}). The slice figure is the mean of the six
 * conditions, not the 50 °C one alone, and is taken without scaling for the 80 against 70
 * min (which would remove 2 points more): an approximation stated, not a fit. Hence 0.40
 * × 0.603 = 0.241 % and 3000 × 0.649 = 1946 mg/kg. The fit is redone with the potato
 * moisture diffusivity (see {@code FoodCategory.POTATO}).
 */
public final class PedreschiFit {

	static final double[] OIL_C = { 150, 170, 190 };

	/**
	 * Pedreschi, Kaack &amp; Granby 2006, Food Res Int 39:40, blanched strips (µg/kg).
	 */
	static final double[] MEASURED_UG_PER_KG = { 135, 327, 564 };

	static final double FINAL_MOISTURE_WET_BASIS = 0.40;

	static final double THICKNESS_MM = 8;

	/** Half-thickness of the blanched slices of Pedreschi, Kaack &amp; Granby 2008, m. */
	static final double SLICE_HALF_THICKNESS_M = 1.1e-3;

	/** Glucose removed from the slices by blanching (mean of six conditions). */
	static final double SLICE_GLUCOSE_REMOVED = 0.76;

	/** Asparagine removed from the slices by blanching (mean of six conditions). */
	static final double SLICE_ASPARAGINE_REMOVED = 0.68;

	/** Radius of the cylinder with the 8 mm square strip's surface-to-volume ratio, m. */
	static final double STRIP_RADIUS_M = 4e-3;

	static final double RAW_REDUCING_SUGAR_PCT = FoodCategory.POTATO.defaultComposition().reducingSugarPct();

	static final double RAW_ASPARAGINE_MG_PER_KG = FoodCategory.POTATO.defaultAsparagineMgPerKg();

	static final double BLANCHED_REDUCING_SUGAR_PCT = RAW_REDUCING_SUGAR_PCT
			* retainedAfterBlanch(SLICE_GLUCOSE_REMOVED);

	static final double BLANCHED_ASPARAGINE_MG_PER_KG = RAW_ASPARAGINE_MG_PER_KG
			* retainedAfterBlanch(SLICE_ASPARAGINE_REMOVED);

	private PedreschiFit() {
	}

	/**
	 * Share of a solute left in the 8 mm strip after the blanch that removed
	 * {@code sliceRemoved} of it from the 2.2 mm slices: D·t from the plane sheet, then
	 * the cylinder (Crank 1975, The Mathematics of Diffusion, eqs. 4.18 and 5.23).
	 */
	static double retainedAfterBlanch(double sliceRemoved) {
		double lo = 0;
		double hi = 10;
		for (int i = 0; i < 200; i++) {
			double mid = 0.5 * (lo + hi);
			if (1 - CrankSeries.sheetRemaining(mid) < sliceRemoved) {
				lo = mid;
			}
			else {
				hi = mid;
			}
		}
		double dt = 0.5 * (lo + hi) * SLICE_HALF_THICKNESS_M * SLICE_HALF_THICKNESS_M;
		return CrankSeries.cylinderRemaining(dt / (STRIP_RADIUS_M * STRIP_RADIUS_M));
	}

	static Surface blanchedStrip() {
		Composition raw = FoodCategory.POTATO.defaultComposition();
		return Surface.defaults(FoodCategory.POTATO)
			.withComposition(raw.withReducingSugarPct(BLANCHED_REDUCING_SUGAR_PCT))
			.withAsparagineMgPerKg(BLANCHED_ASPARAGINE_MG_PER_KG)
			.withShape(Shape.STRIP)
			.withThicknessMm(THICKNESS_MM)
			.withSurfaceWaterGPerM2(0);
	}

	/**
	 * Settings of the fit runs: the engine's defaults, without series, long enough for
	 * 150 °C.
	 */
	static CookSettings settings() {
		return CookSettings.defaults().withRecordSeries(false).withHorizonS(3 * 3600);
	}

	/**
	 * One fry recorded step by step; the target is the darkest colour, never reached, so
	 * it runs on.
	 */
	static LayerHistory fry(double oilC) {
		LayerHistory history = new LayerHistory();
		Surface strip = blanchedStrip();
		Target never = Target.lightness(FoodCategory.POTATO.colourPath().darkestLightness());
		CookSimulation.run(strip, new DeepFryer(oilC), never, settings().withHorizonS(horizonFor(oilC)),
				AcrylamideFormation.REACTION, history::accept);
		return history;
	}

	private static double horizonFor(double oilC) {
		return oilC < 160 ? 5400 : 3600;
	}

	/**
	 * Portion acrylamide (µg/kg) when the piece reaches 40 % moisture, integrating over a
	 * recorded fry.
	 */
	static double portionAtFinalMoisture(LayerHistory h, AcrylamideKinetics k) {
		double[] cross = h.crossing(FINAL_MOISTURE_WET_BASIS);
		if (cross == null) {
			throw new IllegalStateException("the fry never dried to 40 % moisture within the horizon");
		}
		int last = (int) cross[0];
		AcrylamideFormation f = new AcrylamideFormation(blanchedStrip(), h.grid(), k);
		double before = 0;
		double previousTime = 0;
		for (int s = 0; s <= last; s++) {
			before = f.portionUgPerKg();
			double t = h.timeS(s);
			f.step(h.at(s), t - previousTime);
			previousTime = t;
		}
		return before + cross[1] * (f.portionUgPerKg() - before);
	}

	/** Time to 40 % moisture, s. */
	static double timeToFinalMoisture(LayerHistory h) {
		double[] cross = h.crossing(FINAL_MOISTURE_WET_BASIS);
		int k = (int) cross[0];
		double t0 = k == 0 ? 0 : h.timeS(k - 1);
		return t0 + cross[1] * (h.timeS(k) - t0);
	}

	/**
	 * Newton iteration on ln(predicted/measured) at 150 and 190 °C for (ln k_f,ref,
	 * Ea,f), elimination and yield held at the model's values.
	 */
	static AcrylamideKinetics fit(LayerHistory at150, LayerHistory at190) {
		double lnK = Math.log(AcrylamideKinetics.DEFAULT.formationRateAtRef());
		double ea = AcrylamideKinetics.DEFAULT.formationActivationEnergy();
		double[] measured = { MEASURED_UG_PER_KG[0], MEASURED_UG_PER_KG[2] };
		LayerHistory[] runs = { at150, at190 };
		for (int it = 0; it < 40; it++) {
			double[] r = residuals(runs, measured, lnK, ea);
			if (Math.abs(r[0]) < 1e-6 && Math.abs(r[1]) < 1e-6) {
				break;
			}
			double dLnK = 1e-4;
			double dEa = 10;
			double[] rk = residuals(runs, measured, lnK + dLnK, ea);
			double[] re = residuals(runs, measured, lnK, ea + dEa);
			double a = (rk[0] - r[0]) / dLnK;
			double b = (re[0] - r[0]) / dEa;
			double c = (rk[1] - r[1]) / dLnK;
			double d = (re[1] - r[1]) / dEa;
			double det = a * d - b * c;
			double stepK = (d * r[0] - b * r[1]) / det;
			double stepE = (-c * r[0] + a * r[1]) / det;
			// damp large steps in Ea so the iteration stays in the physical range
			double scale = Math.min(1, 30_000 / Math.abs(stepE));
			lnK -= scale * stepK;
			ea -= scale * stepE;
		}
		return AcrylamideKinetics.DEFAULT.withFormation(Math.exp(lnK), ea);
	}

	private static double[] residuals(LayerHistory[] runs, double[] measured, double lnK, double ea) {
		AcrylamideKinetics k = AcrylamideKinetics.DEFAULT.withFormation(Math.exp(lnK), ea);
		double[] r = new double[runs.length];
		for (int i = 0; i < runs.length; i++) {
			r[i] = Math.log(portionAtFinalMoisture(runs[i], k) / measured[i]);
		}
		return r;
	}

	public static void main(String[] args) {
		LayerHistory[] runs = new LayerHistory[OIL_C.length];
		for (int i = 0; i < OIL_C.length; i++) {
			runs[i] = fry(OIL_C[i]);
		}
		AcrylamideKinetics fitted = fit(runs[0], runs[2]);
		System.out.printf("k_f,ref = %.4e kg/(mmol·s), Ea,f = %.4e J/mol%n", fitted.formationRateAtRef(),
				fitted.formationActivationEnergy());
		for (int i = 0; i < OIL_C.length; i++) {
			double p = portionAtFinalMoisture(runs[i], fitted);
			System.out.printf("%.0f °C: %.1f min to 40 %% moisture, predicted %.0f µg/kg, measured %.0f (%+.1f %%)%s%n",
					OIL_C[i], timeToFinalMoisture(runs[i]) / 60, p, MEASURED_UG_PER_KG[i],
					100 * (p / MEASURED_UG_PER_KG[i] - 1), i == 1 ? "  [held out]" : "");
		}
	}

}
