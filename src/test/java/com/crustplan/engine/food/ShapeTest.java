package com.crustplan.engine.food;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Equivalent dimensions by equal surface-to-volume ratio (elementary geometry). */
class ShapeTest {

	@Test
	void shouldKeepTheSurfaceToVolumeRatioOfASquareStripAndACube() {
		double a = 10;
		// square strip: perimeter 4a over area a² = 4/a; cylinder 2/r
		double r = stripRadius(a);
		assertEquals(4 / a, 2 / r, 1e-12);
		// cube: 6a² over a³ = 6/a; sphere 3/r
		double rc = Shape.CUBE.gridLengthM(a) * 1000;
		assertEquals(6 / a, 3 / rc, 1e-12);
		assertEquals(0.01, Shape.SLAB.gridLengthM(a), 1e-15);
		assertEquals(1, Shape.STRIP.factor());
		assertEquals(2, Shape.BALL.factor());
	}

	private static double stripRadius(double a) {
		return Shape.STRIP.gridLengthM(a) * 1000;
	}

}
