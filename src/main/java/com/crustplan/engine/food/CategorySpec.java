package com.crustplan.engine.food;

import java.util.List;

import com.crustplan.engine.browning.BrowningKinetics;
import com.crustplan.engine.colour.ColourPath;
import com.crustplan.engine.model.Parameter;
import com.crustplan.engine.water.GabIsotherm;
import com.crustplan.engine.water.MoistureDiffusivity;

/**
 * A food category as named parts, so each value reads beside its name and its source
 * comment. Every part must be given; {@link #complete()} checks that once, when the
 * category is built, and the parts are not changed after it.
 */
final class CategorySpec {

	final String key;

	final String label;

	Composition.Parts parts;

	Composition composition;

	double asparagineMgPerKg = Double.NaN;

	double surfaceWaterGPerM2 = Double.NaN;

	double thicknessMm = Double.NaN;

	Shape shape;

	double ph = Double.NaN;

	double initialTemperatureC = Double.NaN;

	Parameter bufferCapacity;

	Parameter initialPorosity;

	Parameter shrinkage;

	GabIsotherm isotherm;

	MoistureDiffusivity moistureDiffusivity = MoistureDiffusivity.DEFAULT;

	BrowningKinetics browning;

	ColourPath colourPath;

	List<BrowningStage> stages;

	CategorySpec(String key, String label) {
		this.key = key;
		this.label = label;
	}

	/** Typical composition of a new surface, % by mass. */
	CategorySpec composition(Composition.Parts parts) {
		this.parts = parts;
		return this;
	}

	CategorySpec asparagineMgPerKg(double v) {
		this.asparagineMgPerKg = v;
		return this;
	}

	/** Water standing on a new surface as it goes into the heat. */
	CategorySpec surfaceWaterGPerM2(double v) {
		this.surfaceWaterGPerM2 = v;
		return this;
	}

	CategorySpec thicknessMm(double v) {
		this.thicknessMm = v;
		return this;
	}

	/** The usual form of a piece of this category, which a new surface starts from. */
	CategorySpec shape(Shape s) {
		this.shape = s;
		return this;
	}

	/** Typical pH, taken when a surface gives none. */
	CategorySpec ph(double v) {
		this.ph = v;
		return this;
	}

	/**
	 * Fridge (5 °C) for raw proteins and vegetables, room temperature for doughs (common
	 * practice).
	 */
	CategorySpec initialTemperatureC(double v) {
		this.initialTemperatureC = v;
		return this;
	}

	/** β for pH shifts by additions (see {@link Acidity}). */
	CategorySpec bufferCapacity(Parameter p) {
		this.bufferCapacity = p;
		return this;
	}

	CategorySpec initialPorosity(Parameter p) {
		this.initialPorosity = p;
		return this;
	}

	CategorySpec shrinkage(Parameter p) {
		this.shrinkage = p;
		return this;
	}

	CategorySpec isotherm(GabIsotherm g) {
		this.isotherm = g;
		return this;
	}

	/**
	 * The category's own moisture diffusivity; without one it takes
	 * {@link MoistureDiffusivity#DEFAULT}.
	 */
	CategorySpec moistureDiffusivity(MoistureDiffusivity d) {
		this.moistureDiffusivity = d;
		return this;
	}

	CategorySpec browning(BrowningKinetics b) {
		this.browning = b;
		return this;
	}

	CategorySpec colourPath(ColourPath c) {
		this.colourPath = c;
		return this;
	}

	/** Named stages, lightest first. */
	CategorySpec stages(List<BrowningStage> s) {
		this.stages = s;
		return this;
	}

	/**
	 * This spec, once every part is given; a gap in the table stops the class from
	 * loading.
	 */
	CategorySpec complete() {
		if (parts == null || shape == null || bufferCapacity == null || initialPorosity == null || shrinkage == null
				|| isotherm == null || browning == null || colourPath == null || stages == null) {
			throw new IllegalStateException("food category " + key + ": every part must be given");
		}
		SurfaceField.PH.check(ph);
		composition = parts.build();
		stages = List.copyOf(stages);
		return this;
	}

}
