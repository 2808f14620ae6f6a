package com.crustplan.surface;

import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Size;

import com.crustplan.engine.assessment.Pretreatment;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.food.Composition;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.food.SurfaceField;
import com.crustplan.system.TemperatureUnit;

/**
 * What a cook types in for a surface. The ranges, the engine's own
 * ({@link SurfaceField}), give every field its message at once; the engine's checks
 * across fields (the composition sum) run after them in {@link #toSurface()} and are the
 * final word. {@code initialTemperature} is in the unit named by {@code temperatureUnit}.
 */
public record SurfaceForm(
		@NotBlank(message = "give the surface a name") @Size(max = 80, message = "at most 80 characters") String name,
		@NotBlank(message = "choose a category") String category,
		@Size(max = 32, message = "choose from the list") String product,
		@NotNull(message = "required") @InRange(SurfaceField.WATER) Double waterPct,
		@NotNull(message = "required") @InRange(SurfaceField.PROTEIN) Double proteinPct,
		@NotNull(message = "required") @InRange(SurfaceField.FAT) Double fatPct,
		@NotNull(message = "required") @InRange(SurfaceField.REDUCING_SUGAR) Double reducingSugarPct,
		@NotNull(message = "required") @InRange(SurfaceField.SUCROSE) Double sucrosePct,
		@NotNull(message = "required") @InRange(SurfaceField.STARCH) Double starchPct,
		@NotNull(message = "required") @InRange(SurfaceField.FIBRE) Double fibrePct,
		@NotNull(message = "required") @InRange(SurfaceField.ASH) Double ashPct,
		@NotNull(message = "required") @InRange(SurfaceField.ASPARAGINE) Double asparagineMgPerKg,
		@NotNull(message = "required") @InRange(SurfaceField.SURFACE_WATER) Double surfaceWaterGPerM2,
		@NotNull(message = "required") @InRange(SurfaceField.THICKNESS) Double thicknessMm,
		@InRange(value = SurfaceField.PH, orElse = "or empty for the category's typical pH") Double ph,
		@NotNull(message = "required (0 for none)") @InRange(SurfaceField.BICARBONATE) Double bicarbonateGPerKg,
		@NotNull(message = "required (0 for none)") @InRange(SurfaceField.ACID) Double acidGPerKg,
		@NotNull(message = "required") Double initialTemperature, String temperatureUnit,
		@Size(max = 1000, message = "at most 1000 characters") String notes,
		@Size(max = 16, message = "choose from the list") String shape,
		@Size(max = 16, message = "choose from the list") String pretreatment) {

	/**
	 * A surface with nothing done to it before cooking, in its category's usual shape.
	 */
	public SurfaceForm(String name, String category, String product, Double waterPct, Double proteinPct, Double fatPct,
			Double reducingSugarPct, Double sucrosePct, Double starchPct, Double fibrePct, Double ashPct,
			Double asparagineMgPerKg, Double surfaceWaterGPerM2, Double thicknessMm, Double ph,
			Double bicarbonateGPerKg, Double acidGPerKg, Double initialTemperature, String temperatureUnit,
			String notes) {
		this(name, category, product, waterPct, proteinPct, fatPct, reducingSugarPct, sucrosePct, starchPct, fibrePct,
				ashPct, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, ph, bicarbonateGPerKg, acidGPerKg,
				initialTemperature, temperatureUnit, notes, null, null);
	}

	/** A new form with the category's defaults, in the category's usual shape. */
	public static SurfaceForm defaults(FoodCategory c, String name, TemperatureUnit unit) {
		return of(Surface.typical(c), name, null, null).inUnit(unit);
	}

	/**
	 * The form of an engine surface (temperatures in °C), so a surface read elsewhere
	 * saves as the form would.
	 */
	public static SurfaceForm of(Surface s, String name, String product, String notes) {
		return of(s, name, product, notes, null);
	}

	/**
	 * As {@link #of(Surface, String, String, String)}, with what was done to it before.
	 */
	public static SurfaceForm of(Surface s, String name, String product, String notes, String pretreatment) {
		Composition k = s.composition();
		return new SurfaceForm(name, s.category().key(), product, k.waterPct(), k.proteinPct(), k.fatPct(),
				k.reducingSugarPct(), k.sucrosePct(), k.starchPct(), k.fibrePct(), k.ashPct(), s.asparagineMgPerKg(),
				s.surfaceWaterGPerM2(), s.thicknessMm(), s.phOverride(), s.bicarbonateGPerKg(), s.acidGPerKg(),
				s.initialTemperatureC(), TemperatureUnit.CELSIUS.code(), notes, s.shape().key(), pretreatment);
	}

	public static SurfaceForm of(SavedSurface s, TemperatureUnit unit) {
		return new SurfaceForm(s.getName(), s.getCategory(), s.getProduct(), s.getWaterPct(), s.getProteinPct(),
				s.getFatPct(), s.getReducingSugarPct(), s.getSucrosePct(), s.getStarchPct(), s.getFibrePct(),
				s.getAshPct(), s.getAsparagineMgPerKg(), s.getSurfaceWaterGPerM2(), s.getThicknessMm(), s.getPh(),
				s.getBicarbonateGPerKg(), s.getAcidGPerKg(), round1(unit.fromCelsius(s.getInitialTemperatureC())),
				unit.code(), s.getNotes(), s.getShape(), s.getPretreatment());
	}

	/**
	 * The form with the composition, shape and size, asparagine, pH and starting
	 * temperature of {@code c}'s defaults (what the form's refill button fills in), the
	 * name, notes and what was done before cooking kept; a product of another category
	 * falls back to the category's usual one.
	 */
	public SurfaceForm refilledFrom(FoodCategory c) {
		SurfaceForm d = defaults(c, name, unit());
		boolean productFits = product == null || product.isBlank()
				|| Product.of(c).stream().anyMatch(p -> p.key().equalsIgnoreCase(product.trim()));
		return new SurfaceForm(name, c.key(), productFits ? product : "", d.waterPct, d.proteinPct, d.fatPct,
				d.reducingSugarPct, d.sucrosePct, d.starchPct, d.fibrePct, d.ashPct, d.asparagineMgPerKg,
				d.surfaceWaterGPerM2, d.thicknessMm, null, bicarbonateGPerKg, acidGPerKg, d.initialTemperature,
				d.temperatureUnit, notes, d.shape, pretreatment);
	}

	public SurfaceForm withName(String newName) {
		return with(newName, initialTemperature, temperatureUnit);
	}

	/**
	 * The same form with temperatures in another unit (for re-rendering after a °C/°F
	 * switch).
	 */
	public SurfaceForm inUnit(TemperatureUnit unit) {
		Double c = initialTemperatureC();
		return with(name, c == null ? null : round1(unit.fromCelsius(c)), unit.code());
	}

	/**
	 * The one copy that changes what is not the surface itself: its name and the unit of
	 * its temperature.
	 */
	private SurfaceForm with(String newName, Double temperature, String unitCode) {
		return new SurfaceForm(newName, category, product, waterPct, proteinPct, fatPct, reducingSugarPct, sucrosePct,
				starchPct, fibrePct, ashPct, asparagineMgPerKg, surfaceWaterGPerM2, thicknessMm, ph, bicarbonateGPerKg,
				acidGPerKg, temperature, unitCode, notes, shape, pretreatment);
	}

	public TemperatureUnit unit() {
		return TemperatureUnit.fromCode(temperatureUnit);
	}

	public Double initialTemperatureC() {
		return unit().toCelsius(initialTemperature);
	}

	/**
	 * The engine's input. Throws {@link InvalidInputException} naming the engine's field
	 * ({@code waterPct}, {@code composition}, {@code pH}, {@code initialTemperatureC}
	 * ...).
	 */
	public Surface toSurface() {
		FoodCategory c = FoodCategory.byKey(category == null ? "" : category)
			.orElseThrow(() -> new InvalidInputException("category", "is not a category Crustplan knows"));
		Composition composition = new Composition(req("waterPct", waterPct), req("proteinPct", proteinPct),
				req("fatPct", fatPct), req("reducingSugarPct", reducingSugarPct), req("sucrosePct", sucrosePct),
				req("starchPct", starchPct), req("fibrePct", fibrePct), req("ashPct", ashPct));
		return new Surface(c, composition, req("asparagineMgPerKg", asparagineMgPerKg),
				req("surfaceWaterGPerM2", surfaceWaterGPerM2), req("thicknessMm", thicknessMm), ph,
				req("bicarbonateGPerKg", bicarbonateGPerKg), req("acidGPerKg", acidGPerKg),
				req("initialTemperatureC", initialTemperatureC()), toShape());
	}

	/** The shape named, or a slab where it names none or none known (for labels). */
	public Shape toShapeOrSlab() {
		return Shape.byKey(shape).orElse(Shape.SLAB);
	}

	/**
	 * The shape named; a form saved before shapes existed (a plan's stored inputs) names
	 * none and was planned as a slab, so it stays one. Throws
	 * {@link InvalidInputException} (field {@code shape}) for a name it does not know.
	 */
	public Shape toShape() {
		if (shape == null || shape.isBlank()) {
			return Shape.SLAB;
		}
		return Shape.byKey(shape)
			.orElseThrow(() -> new InvalidInputException("shape",
					"'" + shape + "' is not a shape; use one of " + Shape.keys()));
	}

	/**
	 * What the surface is sold as, which sets its acrylamide benchmark; empty means the
	 * category's usual product. Throws {@link InvalidInputException} (field
	 * {@code product}) for a product of another category.
	 */
	public Product toProduct() {
		FoodCategory c = FoodCategory.byKey(category == null ? "" : category)
			.orElseThrow(() -> new InvalidInputException("category", "is not a category Crustplan knows"));
		return Product.forSurface(c, product);
	}

	/**
	 * What was done to the food before cooking (none, soaked, blanched). Throws
	 * {@link InvalidInputException} (field {@code pretreatment}) for another value.
	 */
	public Pretreatment toPretreatment() {
		return Pretreatment.byKey(pretreatment)
			.orElseThrow(() -> new InvalidInputException("pretreatment", "choose nothing, soaked or blanched"));
	}

	/** The form field an engine field name belongs to; null for checks across fields. */
	public static String formField(String engineField) {
		return switch (engineField) {
			case "pH" -> "ph";
			case "initialTemperatureC" -> "initialTemperature";
			case "composition" -> null;
			default -> engineField;
		};
	}

	private static double req(String field, Double v) {
		if (v == null) {
			throw new InvalidInputException(field, "is required");
		}
		return v;
	}

	private static double round1(double v) {
		return Math.round(v * 10) / 10.0;
	}

}
