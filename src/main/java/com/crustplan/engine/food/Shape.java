package com.crustplan.engine.food;

import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The form of a piece as the layer grid sees it, with its shape factor m (0 slab, 1
 * infinite cylinder, 2 sphere) and the size a cook gives (thickness for a slab, width or
 * diameter for a strip, edge or diameter for a cube or ball).
 * <p>
 * Assumption (a modelling choice, not a published rule): a square strip of side a is
 * taken as the cylinder with the same surface-to-volume ratio (4/a, so radius a/2), and a
 * cube of edge a as the sphere with the same surface-to-volume ratio (6/a, so radius
 * a/2). A round strip or a ball of diameter d is radius d/2 exactly.
 * <p>
 * What the mapping costs: equal surface-to-volume is exact for the heat a piece takes in
 * while its inside is still even (low Biot number), and it keeps the crust's share of the
 * piece; but the inscribed round body heats its centre sooner than the square one around
 * it. At a fixed surface temperature (Bi → ∞) a square strip's centre reaches 75 °C from
 * 20 °C in 100 °C surroundings 1.7× sooner than a slab's of the same thickness and a
 * cube's 2.2× sooner (product solutions of the plane wall), where the mapped cylinder and
 * sphere give 2.0× and 3.0× (Incropera, Table 5.1; ShapeHeatingRatioTest): the strip's
 * centre about 18 % and the cube's about 35 % early, less at a still oven's low Biot
 * numbers.
 */
public enum Shape {

	/** Heated on both faces; the size is the full thickness. */
	SLAB(0, "Flat piece (steak, fillet, slice, loaf)", "Thickness"),

	/** Long square or round strip (fries, wedges, sausages) as an infinite cylinder. */
	STRIP(1, "Long strip (fries, wedges, sausage)", "Width"),

	/** Cube (roast-potato chunks) as the sphere of equal surface-to-volume ratio. */
	CUBE(2, "Chunk or cube (roast potatoes)", "Edge"),

	/** Ball (meatballs, choux) as a sphere. */
	BALL(2, "Ball (meatball, choux bun)", "Diameter");

	private final int factor;

	private final String label;

	private final String sizeLabel;

	Shape(int factor, String label, String sizeLabel) {
		this.factor = factor;
		this.label = label;
		this.sizeLabel = sizeLabel;
	}

	/** The key in the API, the form and the database: slab, strip, cube, ball. */
	public String key() {
		return name().toLowerCase(Locale.ROOT);
	}

	/** A kitchen name with examples, for the form. */
	public String label() {
		return label;
	}

	/**
	 * What the one size field means for this shape: thickness, width (side or diameter),
	 * edge, diameter.
	 */
	public String sizeLabel() {
		return sizeLabel;
	}

	public static Optional<Shape> byKey(String key) {
		return Arrays.stream(values()).filter(s -> s.key().equalsIgnoreCase(key == null ? "" : key.trim())).findFirst();
	}

	/** The keys, for messages that list what is allowed. */
	public static List<String> keys() {
		return Arrays.stream(values()).map(Shape::key).toList();
	}

	/** Shape factor m of the conduction and moisture equations. */
	public int factor() {
		return factor;
	}

	/**
	 * The length the grid spans, m: the full thickness of a slab, the radius of the
	 * cylinder or sphere otherwise (heated from the outside, centre a symmetry point).
	 */
	public double gridLengthM(double sizeMm) {
		return factor == 0 ? sizeMm / 1000 : sizeMm / 2000;
	}

}
