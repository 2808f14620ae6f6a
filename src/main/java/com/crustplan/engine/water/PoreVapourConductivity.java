package com.crustplan.engine.water;

import com.crustplan.engine.model.Parameter;

/**
 * Heat carried across a humid pore by evaporation at its warmer wall, vapour diffusion
 * through the pore gas and condensation at its colder wall, written as a conductivity
 * added to that of the still gas (de Vries 1958, Trans. Am. Geophys. Union 39:909, for
 * moist porous media; bread-baking models carry heat through crumb the same way:
 * Thorvaldsson &amp; Janestad 1999, J Food Eng 40:167; Purlis &amp; Salvadori 2009, J
 * Food Eng 91 — the bread citations from memory):
 *
 * <pre>
 * k_v = D_va · p/(p − p_v) · h_fg · aw · (dp_sat/dT) / (R_v·T),   p_v = aw·p_sat(T)
 * </pre>
 *
 * with dp_sat/dT = h_fg·p_sat/(R_v·T²) (Clausius–Clapeyron) and p/(p − p_v) the Stefan
 * factor of vapour diffusing through stagnant air, tapered off as the pore gas becomes
 * pure steam (the form needs air to diffuse through; a layer at its boiling point is left
 * to local boiling). It is small in cold dough, rises steeply towards 100 °C while the
 * pore walls are wet, and vanishes in a dry crust (aw → 0), as the measured rise of crumb
 * conductivity with temperature and moisture shows. It needs liquid on the walls to
 * return what condenses, so it fades out below aw,wet (on the matrix's share of aw where
 * the water is a syrup: {@link GabIsotherm#matrixActivity}). Dough's gas cells are closed
 * until the crumb sets and they open into one connected pore ({@link #openCellShare});
 * how the term is mixed into a layer's conductivity, closed or open, is the cook's.
 */
public final class PoreVapourConductivity {

	public static final Parameter VAPOUR_DIFFUSIVITY_298K = Parameter.fromMemory("D_va",
			"diffusivity of water vapour in air at 298 K and 1 atm", 0.26e-4, "m²/s",
			"Incropera, Fundamentals of Heat and Mass Transfer, Table A.8 (from memory); scaled as T^(3/2)/p (same, §14.1)");

	public static final Parameter MAX_VAPOUR_SHARE = Parameter.assumption("y_v,max",
			"vapour share of the pore gas above which the diffusion form is tapered off", 0.9, "–",
			"our choice: the diffusion form needs air in the pore and diverges as p_v → p; above this share it falls "
					+ "linearly to zero for pure steam at the boiling point, where local boiling carries the heat");

	public static final Parameter WET_WALL_ACTIVITY = Parameter.assumption("aw,wet",
			"water activity below which pore walls hold no liquid to return condensed water", 0.9, "–",
			"our choice: de Vries (1958) ties the enhancement to liquid on the pore walls; a hygroscopic crust "
					+ "only sorbs, so the term rises linearly from 0 at this activity to full at aw = 1; where the water is a "
					+ "sugar solution the matrix's share of aw is judged (Ross's rule), since a syrup is liquid below it");

	public static final Parameter CELL_OPENING_START = Parameter.published("T_open,0",
			"crumb temperature at which the dough's closed gas cells begin to open", 71, "°C",
			"Zhang, Yang, Xu, Long & Ye 2025, Foods 14:1649 (pore-opening function calibrated on baking experiments: "
					+ "opening mainly at 71–81 °C; abstract seen); a structural change near 70 °C after which vapour "
					+ "reaches the loaf centre is also reported by Thorvaldsson & Skjöldebrand 1998, LWT 31:658 (from memory)");

	public static final Parameter CELL_OPENING_END = Parameter.published("T_open,1",
			"crumb temperature by which the gas cells are open", 81, "°C",
			"Zhang et al. 2025, Foods 14:1649 (71–81 °C, abstract seen); set crumb is one interconnected open cell holding "
					+ "about 99 % of its porosity (Wang, Austin & Bell 2011, J Cereal Sci 54:203; abstract seen). "
					+ "A linear rise between the two temperatures is our assumption");

	private static final double WET_WALL = WET_WALL_ACTIVITY.value();

	private static final double OPEN_FROM_K = CELL_OPENING_START.value() + 273.15;

	private static final double OPEN_SPAN_K = CELL_OPENING_END.value() - CELL_OPENING_START.value();

	private static final double D_298 = VAPOUR_DIFFUSIVITY_298K.value();

	private static final double MAX_SHARE = MAX_VAPOUR_SHARE.value();

	private PoreVapourConductivity() {
	}

	/**
	 * Share of the dough's gas cells that have opened into one connected pore space, from
	 * the highest temperature the layer has reached (set crumb does not close again).
	 */
	public static double openCellShare(double peakTemperatureK) {
		return Math.max(0, Math.min(1, (peakTemperatureK - OPEN_FROM_K) / OPEN_SPAN_K));
	}

	/**
	 * Evaporation–condensation conductivity of a pore whose walls hold water at activity
	 * aw, W/(m·K), at 1 atm.
	 */
	public static double at(double temperatureK, double waterActivity) {
		return at(temperatureK, waterActivity, waterActivity);
	}

	/**
	 * The same where the walls' water is a sugar solution: whether the walls are wet is
	 * judged on the matrix's own activity (aw divided by the solution's, Ross's rule; see
	 * {@link GabIsotherm#matrixActivity}), the vapour pressure on aw itself.
	 */
	public static double at(double temperatureK, double waterActivity, double matrixActivity) {
		if (!(matrixActivity > WET_WALL)) {
			return 0;
		}
		double wet = Math.min(1, (matrixActivity - WET_WALL) / (1 - WET_WALL));
		double t = Math.max(SaturationPressure.MIN_TEMPERATURE_K, temperatureK);
		double rv = WaterVapour.GAS_CONSTANT.value();
		double latent = WaterVapour.latentHeat(t);
		double psat = SaturationPressure.pascal(t);
		double share = waterActivity * psat / WaterVapour.ATMOSPHERE_PA;
		if (share >= 1) {
			return 0;
		}
		// Stefan factor 1/(1 − y) up to y_max, then tapered to 0 at y = 1
		double stefan = share <= MAX_SHARE ? 1 / (1 - share) : (1 - share) / ((1 - MAX_SHARE) * (1 - MAX_SHARE));
		double ratio = t / 298.15;
		double diffusivity = D_298 * ratio * Math.sqrt(ratio);
		double slope = latent * psat / (rv * t * t);
		return wet * diffusivity * stefan * latent * waterActivity * slope / (rv * t);
	}

}
