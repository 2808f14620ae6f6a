package com.crustplan.engine.food;

/**
 * The form of a piece as the layer grid sees it, with its shape factor m (0 slab, 1
 * infinite cylinder, 2 sphere) and the size a cook gives (thickness for a slab, width or
 * diameter for a strip, edge or diameter for a cube or ball).
 * <p>
 * Assumption (a modelling choice, not a published rule): a square strip of side a is
 * taken as the cylinder with the same surface-to-volume ratio (4/a, so radius a/2), and a
 * cube of edge a as the sphere with the same surface-to-volume ratio (6/a, so radius
 * a/2). A round strip or a ball of diameter d is radius d/2 exactly.
 */
public enum Shape {

	/** Heated on both faces; the size is the full thickness. */
	SLAB(0),

	/** Long square or round strip (fries, wedges, sausages) as an infinite cylinder. */
	STRIP(1),

	/** Cube (roast-potato chunks) as the sphere of equal surface-to-volume ratio. */
	CUBE(2),

	/** Ball (meatballs, choux) as a sphere. */
	BALL(2);

	private final int factor;

	Shape(int factor) {
		this.factor = factor;
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
