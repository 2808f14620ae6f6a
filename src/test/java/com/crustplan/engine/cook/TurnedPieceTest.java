package com.crustplan.engine.cook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.food.Shape;
import com.crustplan.engine.heat.FaceExchange;
import com.crustplan.engine.heat.FaceSchedule;
import com.crustplan.engine.heat.PanContact;

/**
 * A strip, cube or ball turned in a pan: each part of its surface is down for one flip
 * interval in every 1/s of them, s the share of its surface that faces the pan at a time
 * (geometry of the shape: one side of a square strip's four, one face of a cube's six).
 */
class TurnedPieceTest {

	private static final FaceSchedule PAN = new PanContact(200, true, 60).schedule();

	/** Seconds of each 240 s (a strip) or 360 s (a cube) that the outer face is down. */
	private static double downSeconds(Shape shape, double spanS) {
		ActiveHeat heat = new ActiveHeat(PAN, shape);
		FaceExchange down = PAN.at(0, 0);
		double seconds = 0;
		for (double t = 0; t < spanS; t += 0.5) {
			FaceExchange e = heat.at(0, t);
			if (e == down) {
				seconds += 0.5;
			}
		}
		return seconds;
	}

	@Test
	void shouldPutEachSideDownForOneFlipIntervalPerTurnOfThePiece() {
		assertEquals(60 * 3, downSeconds(Shape.STRIP, 240 * 3), 1e-9);
		assertEquals(60 * 3, downSeconds(Shape.CUBE, 360 * 3), 1e-9);
		// the first minute is down, the next three up
		ActiveHeat strip = new ActiveHeat(PAN, Shape.STRIP);
		assertSame(PAN.at(0, 0), strip.at(0, 59.5));
		assertSame(PAN.at(1, 0), strip.at(0, 60));
		assertSame(PAN.at(0, 0), strip.at(0, 240));
		assertEquals(60, strip.nextChangeAfter(0), 1e-9);
		assertEquals(240, strip.nextChangeAfter(60), 1e-9);
		assertEquals(300, strip.nextChangeAfter(240 - 1e-12), 1e-9);
	}

	@Test
	void shouldLeaveASlabItsTwoFacesAndGiveACentreNoExchange() {
		ActiveHeat slab = new ActiveHeat(PAN, Shape.SLAB);
		assertSame(PAN.at(1, 75), slab.at(1, 75));
		assertEquals(120, slab.nextChangeAfter(60), 1e-9);
		assertTrue(new ActiveHeat(PAN, Shape.BALL).at(1, 10) == ActiveHeat.CENTRE);
	}

}
