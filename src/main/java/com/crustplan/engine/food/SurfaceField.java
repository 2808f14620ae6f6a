package com.crustplan.engine.food;

import com.crustplan.engine.input.InvalidInputException;

import java.util.List;
import java.util.function.Function;

/**
 * The numeric fields of a surface, each with its name in the engine and the API, its unit
 * and the range the engine accepts. Stated here once: the engine's checks, the page
 * form's validation and the API documentation all read these ranges.
 */
public enum SurfaceField {

	// composition parts: mass percent, so 0 to 100 by definition; the sum is checked by
	// Composition
	WATER("waterPct", "%", 0, 100, s -> s.composition().waterPct()),

	PROTEIN("proteinPct", "%", 0, 100, s -> s.composition().proteinPct()),

	FAT("fatPct", "%", 0, 100, s -> s.composition().fatPct()),

	REDUCING_SUGAR("reducingSugarPct", "%", 0, 100, s -> s.composition().reducingSugarPct()),

	SUCROSE("sucrosePct", "%", 0, 100, s -> s.composition().sucrosePct()),

	STARCH("starchPct", "%", 0, 100, s -> s.composition().starchPct()),

	FIBRE("fibrePct", "%", 0, 100, s -> s.composition().fibrePct()),

	ASH("ashPct", "%", 0, 100, s -> s.composition().ashPct()),

	/**
	 * Free asparagine: retail potatoes reach about 58 mmol/kg ≈ 7.7 g/kg (Vivanti,
	 * Finotti & Friedman 2006, J Food Sci); 50 g/kg leaves room for concentrated products
	 * and catches a unit slip (g for mg).
	 */
	ASPARAGINE("asparagineMgPerKg", "mg/kg", 0, 50_000, Surface::asparagineMgPerKg),

	/**
	 * Standing water: 2 kg/m² is a 2 mm film, far beyond a dripping-wet surface (common
	 * practice).
	 */
	SURFACE_WATER("surfaceWaterGPerM2", "g/m²", 0, 2_000, Surface::surfaceWaterGPerM2),

	/**
	 * Thinner than a crisp slice or thicker than a large roast is outside the 1D model
	 * (common practice).
	 */
	THICKNESS("thicknessMm", "mm", 0.5, 200, Surface::thicknessMm),

	/**
	 * pH before additions: foods lie between about 2 (lime) and 9 (egg white) (FDA,
	 * approximate pH of foods; from memory).
	 */
	PH("pH", "", 2, 10, Surface::phOverride),

	/**
	 * Bicarbonate of soda: recipes use a few g/kg; 50 g/kg is inedible, so beyond it is a
	 * typing slip (common practice).
	 */
	BICARBONATE("bicarbonateGPerKg", "g/kg", 0, 50, Surface::bicarbonateGPerKg),

	/**
	 * Citric acid or an acid dip of the same strength: as for bicarbonate (common
	 * practice).
	 */
	ACID("acidGPerKg", "g/kg", 0, 50, Surface::acidGPerKg),

	/**
	 * Starting temperature: from a freezer (−20 °C) to a hot-held, par-cooked food (80
	 * °C) (common practice).
	 */
	INITIAL_TEMPERATURE("initialTemperatureC", "°C", -20, 80, Surface::initialTemperatureC);

	/** The composition parts, in the order of {@link Composition}'s components. */
	public static final List<SurfaceField> COMPOSITION = List.of(WATER, PROTEIN, FAT, REDUCING_SUGAR, SUCROSE, STARCH,
			FIBRE, ASH);

	private final String key;

	private final String unit;

	private final double min;

	private final double max;

	private final Function<Surface, Double> value;

	SurfaceField(String key, String unit, double min, double max, Function<Surface, Double> value) {
		this.key = key;
		this.unit = unit;
		this.min = min;
		this.max = max;
		this.value = value;
	}

	/**
	 * The field's name in the engine's messages and in the API (the plan request's
	 * {@code surface} object).
	 */
	public String key() {
		return key;
	}

	/** The unit symbol; empty for pH. */
	public String unit() {
		return unit;
	}

	public double min() {
		return min;
	}

	public double max() {
		return max;
	}

	public boolean accepts(double v) {
		return Double.isFinite(v) && v >= min && v <= max;
	}

	/**
	 * The field's value in a surface; null only for pH when the category's typical pH is
	 * taken.
	 */
	public Double of(Surface surface) {
		return value.apply(surface);
	}

	/** Returns {@code v}, or throws naming the field and its range. */
	public double check(double v) {
		if (!accepts(v)) {
			throw new InvalidInputException(key, "must be a number from " + plain(min) + " to " + plain(max));
		}
		return v;
	}

	/** A bound as people write it: 50000, 0.5, never 50000.0 or 5E4. */
	public static String plain(double v) {
		return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
	}

}
