package com.crustplan.engine.food;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * pH shift from additions, ΔpH = n/(β·m), with the buffer capacity of post-rigor beef, β
 * = 51 mmol H⁺/(pH·kg) (Puolanne &amp; Kivikari 2000, Meat Sci 56:7).
 */
class AcidityTest {

	@Test
	void shouldRaiseBeefPhByThePinchOfBicarbonateTheBufferCapacityAllows() {
		// A quarter teaspoon of sodium bicarbonate (≈ 1.15 g, from memory) per pound (454
		// g) of beef:
		// n = 1.15 g / 84.007 g/mol (IUPAC) = 13.69 mmol, i.e. 30.15 mmol/kg; ΔpH =
		// 30.15/51 = 0.591, "about
		// 0.6" in the design note. Tolerance 0.001: the figures are exact arithmetic on
		// the published β.
		double gPerKg = 1.15 / 0.454;
		double expectedShift = 1.15 / 84.007 / 0.454 / 0.051;
		assertEquals(0.591, expectedShift, 0.001);
		assertEquals(5.6 + expectedShift, Acidity.adjustedPh(5.6, gPerKg, 0, 51), 0.001);
		Surface beef = Surface.defaults(FoodCategory.MEAT).withPh(5.6).withBicarbonateGPerKg(gPerKg);
		assertEquals(51, FoodCategory.MEAT.bufferCapacity().value(), 0);
		assertEquals(5.6 + expectedShift, beef.ph(), 0.001);
	}

	@Test
	void shouldScaleTheShiftInverselyWithTheBufferCapacity() {
		// Same dose on broiler breast (β 58) and leg (β 41), Puolanne & Kivikari 2000:
		// the shift scales as 1/β.
		double dose = 2.0;
		double breast = Acidity.adjustedPh(6.0, dose, 0, 58) - 6.0;
		double leg = Acidity.adjustedPh(6.0, dose, 0, 41) - 6.0;
		assertEquals(58.0 / 41.0, leg / breast, 1e-9);
	}

	@Test
	void shouldNotRaisePhBeyondThatOfABicarbonateSolution() {
		// A sodium bicarbonate solution has pH ≈ 8.3 (CRC Handbook): more base cannot
		// push the food past it.
		assertEquals(8.3, Acidity.adjustedPh(5.6, 50, 0, 51), 1e-9);
		assertTrue(Acidity.adjustedPh(5.6, 5, 0, 51) < 8.3);
	}

	@Test
	void shouldLowerPhWithCitricAcid() {
		// Citric acid 192.12 g/mol (IUPAC), about two of its three protons released
		// between pH 4 and 6
		// (pKa 3.13, 4.76, 6.40): 1 g/kg on beef lowers pH by 2/192.12/0.051 = 0.204.
		// Exact arithmetic: 1e-9.
		assertEquals(5.6 - 2 / 192.12 / 0.051, Acidity.adjustedPh(5.6, 0, 1, 51), 1e-9);
	}

}
