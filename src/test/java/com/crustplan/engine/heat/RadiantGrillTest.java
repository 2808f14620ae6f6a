package com.crustplan.engine.heat;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

import com.crustplan.engine.cook.CookResult;
import com.crustplan.engine.cook.CookSimulation;
import com.crustplan.engine.cook.Outcome;
import com.crustplan.engine.cook.Target;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.food.Surface;
import com.crustplan.engine.input.InvalidInputException;

/**
 * The grill by what can be measured: view factors, radiation exchange and the char limit.
 */
class RadiantGrillTest {

	static final double SIGMA = 5.670374419e-8;

	@Test
	void shouldGiveTheCoaxialDiscViewFactorsOfTheTextbook() {
		// Incropera Table 13.2, coaxial parallel discs, worked by hand: r_i = r_j = L
		// gives R = 1, S = 3,
		// F = (3 − √5)/2 = 0.38197; r_i = r_j = 1, L = 3 gives S = 11, F = (11 − √117)/2
		// = 0.09167
		assertThat(ViewFactor.coaxialDiscs(1, 1, 1)).isCloseTo((3 - Math.sqrt(5)) / 2, within(1e-12));
		assertThat(ViewFactor.coaxialDiscs(1, 1, 3)).isCloseTo((11 - Math.sqrt(117)) / 2, within(1e-12));
		// a small disc under a large one tends to the point-to-disc factor R²/(1 + R²): R
		// = 2 → 0.8
		assertThat(ViewFactor.coaxialDiscs(1e-4, 0.2, 0.1)).isCloseTo(0.8, within(1e-6));
		// reciprocity A_i·F_ij = A_j·F_ji (Incropera eq. 13.3)
		double fij = ViewFactor.coaxialDiscs(0.06, 0.25, 0.15);
		double fji = ViewFactor.coaxialDiscs(0.25, 0.06, 0.15);
		assertThat(0.06 * 0.06 * fij).isCloseTo(0.25 * 0.25 * fji, within(1e-12));
	}

	@Test
	void shouldWorkOutTheFluxAtTheFoodAsByHand() {
		// a salamander at 800 °C, food 150 mm below: heater 600 × 350 mm → equal-area
		// disc r = √(0.21/π) =
		// 0.25854 m, food r = 0.06 m; F from the disc formula, then q =
		// σ·0.85·0.25·F·(1073.15⁴ − 298.15⁴)
		double r = Math.sqrt(0.6 * 0.35 / Math.PI);
		double bigRi = 0.06 / 0.15;
		double bigRj = r / 0.15;
		double s = 1 + (1 + bigRj * bigRj) / (bigRi * bigRi);
		double f = 0.5 * (s - Math.sqrt(s * s - 4 * Math.pow(r / 0.06, 2)));
		assertThat(f).isCloseTo(0.7404, within(1e-4));
		double q = SIGMA * 0.85 * 0.25 * f * (Math.pow(1073.15, 4) - Math.pow(298.15, 4));
		RadiantGrill g = RadiantGrill.ofElement(GrillKind.SALAMANDER, 800, 150.0, 0);
		assertThat(g.viewFactor()).isCloseTo(f, within(1e-12));
		assertThat(g.heatFluxKwPerM2()).isCloseTo(q / 1000, within(1e-9)).isCloseTo(11.76, within(0.01));
		// the round-one constructor is the same salamander at its usual distance
		assertThat(new RadiantGrill(800, 0)).isEqualTo(g);
		// flux and element temperature are inverse of each other at the usual distance
		RadiantGrill byFlux = RadiantGrill.ofFlux(GrillKind.SALAMANDER, g.heatFluxKwPerM2(), 0);
		assertThat(byFlux.heaterTemperatureC()).isCloseTo(800, within(1e-6));
	}

	@Test
	void shouldExchangeRadiationWithTheFoodAsAGreySurface() {
		// a face at T_s under q = 15 kW/m² (a black radiometer's reading at 25 °C)
		// absorbs ε·(q + σ·T_room⁴)
		// and emits ε·σ·T_s⁴, plus natural convection h·(T_room − T_s): an opaque grey
		// surface (Kirchhoff: absorptivity = emissivity = 0.9), irradiation from a
		// radiometer reading
		RadiantGrill g = RadiantGrill.ofFlux(GrillKind.SALAMANDER, 15, 0);
		FaceFlux out = new FaceFlux();
		double ts = 273.15 + 150;
		g.schedule().at(0, 0).evaluate(ts, 0.3, 0, out);
		double room = 298.15;
		double expected = 0.9 * (15_000 + SIGMA * Math.pow(room, 4) - SIGMA * Math.pow(ts, 4)) + 10 * (room - ts);
		assertThat(out.heatFlux).isCloseTo(expected, within(1e-6 * Math.abs(expected)));
		// on a cold face the food absorbs ε·q: 13.5 kW/m²
		assertThat(g.heatFluxAtRoomKwPerM2()).isCloseTo(13.5, within(1e-9));
	}

	@Test
	void shouldStopWhereTheSurfaceWouldCharAndSaySo() {
		Surface toast = Surface.defaults(FoodCategory.BREAD).withThicknessMm(12);
		// 40 kW/m²: round one's model ran such a slice past 400 °C (and failed at 900 °C
		// elements)
		CookResult hot = CookSimulation.run(toast, RadiantGrill.fromHeatFlux(40, 0), Target.stage("dark"));
		assertThat(hot.outcome()).isEqualTo(Outcome.SURFACE_LIMIT);
		// the cook stops at the end of the step that crosses the limit: at 40 kW/m² a dry
		// crust climbs up to about 16 K in one 0.5 s step
		assertThat(hot.maxSurfaceTemperatureC()).isLessThan(RadiantGrill.CHAR_SURFACE.value() + 20);
		// the default salamander browns toast golden without passing the limit
		CookResult usual = CookSimulation.run(toast, new RadiantGrill(800, 0), Target.stage("golden"));
		assertThat(usual.reached()).isTrue();
		assertThat(usual.timeToTargetS()).isBetween(60.0, 300.0);
	}

	@Test
	void shouldNameTheFieldOfABadGrill() {
		assertThatThrownBy(() -> RadiantGrill.ofFlux(GrillKind.BROILER, 70, 0)).isInstanceOfSatisfying(
				InvalidInputException.class, e -> assertThat(e.field()).isEqualTo("heatFluxKwPerM2"));
		assertThatThrownBy(() -> RadiantGrill.ofElement(GrillKind.CHARCOAL, 650, 10.0, 0))
			.isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.field()).isEqualTo("distanceMm"));
		assertThatThrownBy(() -> RadiantGrill.ofElement(GrillKind.SALAMANDER, 1500, null, 0))
			.isInstanceOfSatisfying(InvalidInputException.class, e -> assertThat(e.field()).isEqualTo("temperatureC"));
	}

}
