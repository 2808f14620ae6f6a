package com.crustplan.surface;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Table;

import com.crustplan.system.KitchenRecord;
import com.crustplan.engine.assessment.Pretreatment;
import com.crustplan.engine.assessment.Product;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Shape;

/**
 * A surface the kitchen keeps (a cut, a dough, a batch of potatoes). Never handed to the
 * engine.
 */
@Entity
@Table(name = "surface")
public class SavedSurface extends KitchenRecord {

	@Column(nullable = false, length = 32)
	private String category;

	/** Empty for the category's usual product. */
	@Column(length = 32)
	private String product;

	@Column(name = "water_pct", nullable = false)
	private double waterPct;

	@Column(name = "protein_pct", nullable = false)
	private double proteinPct;

	@Column(name = "fat_pct", nullable = false)
	private double fatPct;

	@Column(name = "reducing_sugar_pct", nullable = false)
	private double reducingSugarPct;

	@Column(name = "sucrose_pct", nullable = false)
	private double sucrosePct;

	@Column(name = "starch_pct", nullable = false)
	private double starchPct;

	@Column(name = "fibre_pct", nullable = false)
	private double fibrePct;

	@Column(name = "ash_pct", nullable = false)
	private double ashPct;

	@Column(name = "asparagine_mg_per_kg", nullable = false)
	private double asparagineMgPerKg;

	@Column(name = "surface_water_g_per_m2", nullable = false)
	private double surfaceWaterGPerM2;

	/** The size as the shape reads it: thickness, width, edge or diameter. */
	@Column(name = "thickness_mm", nullable = false)
	private double thicknessMm;

	/** slab, strip, cube or ball ({@link Shape#key()}). */
	@Column(nullable = false, length = 16)
	private String shape = Shape.SLAB.key();

	private Double ph;

	/** soaked or blanched; null for nothing done before cooking. */
	@Column(length = 16)
	private String pretreatment;

	@Column(name = "bicarbonate_g_per_kg", nullable = false)
	private double bicarbonateGPerKg;

	@Column(name = "acid_g_per_kg", nullable = false)
	private double acidGPerKg;

	@Column(name = "initial_temperature_c", nullable = false)
	private double initialTemperatureC;

	protected SavedSurface() {
	}

	/** A new record from a form that has passed validation and the engine's checks. */
	public static SavedSurface from(SurfaceForm form) {
		SavedSurface s = new SavedSurface();
		s.update(form);
		return s;
	}

	public void update(SurfaceForm f) {
		rename(f.name(), f.notes());
		category = FoodCategory.byKey(f.category()).map(FoodCategory::key).orElse(f.category());
		product = f.product() == null || f.product().isBlank() ? null : f.toProduct().key();
		String done = f.toPretreatment().key();
		pretreatment = done.isEmpty() ? null : done;
		waterPct = f.waterPct();
		proteinPct = f.proteinPct();
		fatPct = f.fatPct();
		reducingSugarPct = f.reducingSugarPct();
		sucrosePct = f.sucrosePct();
		starchPct = f.starchPct();
		fibrePct = f.fibrePct();
		ashPct = f.ashPct();
		asparagineMgPerKg = f.asparagineMgPerKg();
		surfaceWaterGPerM2 = f.surfaceWaterGPerM2();
		thicknessMm = f.thicknessMm();
		shape = f.toShape().key();
		ph = f.ph();
		bicarbonateGPerKg = f.bicarbonateGPerKg();
		acidGPerKg = f.acidGPerKg();
		initialTemperatureC = f.initialTemperatureC();
	}

	/** The category's label for lists; an unknown key is shown as it is stored. */
	public String getCategoryLabel() {
		return FoodCategory.byKey(category).map(FoodCategory::label).orElse(category);
	}

	public String getCategory() {
		return category;
	}

	public String getProduct() {
		return product;
	}

	/**
	 * What it is sold as, for pages: the category's usual product when none was chosen.
	 */
	public String getProductLabel() {
		return FoodCategory.byKey(category).map(c -> {
			try {
				return Product.forSurface(c, product).label();
			}
			catch (IllegalArgumentException e) {
				return product;
			}
		}).orElse(product);
	}

	public double getWaterPct() {
		return waterPct;
	}

	public double getProteinPct() {
		return proteinPct;
	}

	public double getFatPct() {
		return fatPct;
	}

	public double getReducingSugarPct() {
		return reducingSugarPct;
	}

	public double getSucrosePct() {
		return sucrosePct;
	}

	public double getStarchPct() {
		return starchPct;
	}

	public double getFibrePct() {
		return fibrePct;
	}

	public double getAshPct() {
		return ashPct;
	}

	public double getAsparagineMgPerKg() {
		return asparagineMgPerKg;
	}

	public double getSurfaceWaterGPerM2() {
		return surfaceWaterGPerM2;
	}

	public double getThicknessMm() {
		return thicknessMm;
	}

	public String getShape() {
		return shape;
	}

	/** The shape's kitchen name; an unknown key is shown as it is stored. */
	public String getShapeLabel() {
		return Shape.byKey(shape).map(Shape::label).orElse(shape);
	}

	/** What the size means for this shape: Thickness, Width, Edge or Diameter. */
	public String getSizeLabel() {
		return Shape.byKey(shape).map(Shape::sizeLabel).orElse("Size");
	}

	public Double getPh() {
		return ph;
	}

	public double getBicarbonateGPerKg() {
		return bicarbonateGPerKg;
	}

	public double getAcidGPerKg() {
		return acidGPerKg;
	}

	public double getInitialTemperatureC() {
		return initialTemperatureC;
	}

	public String getPretreatment() {
		return pretreatment;
	}

	/** What was done to it before cooking, in words. */
	public String getPretreatmentLabel() {
		return Pretreatment.byKey(pretreatment).orElse(Pretreatment.NONE).label();
	}

}
