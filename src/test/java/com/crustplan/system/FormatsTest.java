package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * One rule for a time on a page, whichever way it is written: whole seconds, floored, as
 * a kitchen timer counts them; and a figure never parts from its unit at a line end.
 */
class FormatsTest {

	static final String NBSP = "\u00a0";

	final Formats fmt = new Formats();

	@Test
	void shouldShowTheSameSecondAtTheTopAndInTheStepsTable() {
		// 26 min 12.6 s: "26 min 12 s" above, 26:12 in the table (rounding would give
		// 26:13 where the other time, 1572.4 s, gives 26:12)
		for (double t : new double[] { 1572.4, 1572.6, 1572.999 }) {
			assertThat(Formats.duration(t)).isEqualTo("26" + NBSP + "min" + NBSP + "12" + NBSP + "s");
			assertThat(fmt.clock(t)).isEqualTo("26:12");
		}
		// a hair under a whole second from floating point is that second
		assertThat(fmt.clock(59.9999999)).isEqualTo("1:00");
		assertThat(Formats.duration(59.9999999)).isEqualTo("1" + NBSP + "min" + NBSP + "00" + NBSP + "s");
		assertThat(Formats.duration(3 * 3600 + 59 * 60 + 59.7))
			.isEqualTo("3" + NBSP + "h" + NBSP + "59" + NBSP + "min");
		assertThat(Formats.duration(42.8)).isEqualTo("42" + NBSP + "s");
		assertThat(fmt.clock(Double.NaN)).isEqualTo("–");
	}

	@Test
	void shouldKeepTemperaturesWithTheirUnitInBothScales() {
		// °F = °C × 9/5 + 32 (NIST SP 811 §B.9)
		assertThat(fmt.temp(52.0, TemperatureUnit.CELSIUS)).isEqualTo("52" + NBSP + "°C");
		assertThat(fmt.temp(52.0, TemperatureUnit.FAHRENHEIT)).isEqualTo("126" + NBSP + "°F");
		assertThat(fmt.tempBoth(230.0)).isEqualTo("230" + NBSP + "°C" + NBSP + "/ 446" + NBSP + "°F");
		assertThat(fmt.signedPct(-0.3)).isEqualTo("−30" + NBSP + "%");
		// differences in the page's scale: 40 K is 40 °C and 72 °F of difference
		assertThat(TemperatureUnit.CELSIUS.formatDifference(40)).isEqualTo("40" + NBSP + "°C");
		assertThat(TemperatureUnit.FAHRENHEIT.formatDifference(40)).isEqualTo("72" + NBSP + "°F");
	}

}
