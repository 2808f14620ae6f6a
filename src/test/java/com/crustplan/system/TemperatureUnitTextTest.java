package com.crustplan.system;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Engine prose follows the cook's unit: °F = °C × 9/5 + 32 (NIST SP 811, §B.9). */
class TemperatureUnitTextTest {

	@Test
	void shouldConvertTemperaturesAndRangesInProseToFahrenheit() {
		assertThat(TemperatureUnit.FAHRENHEIT.inText("Oil at 175 °C: fry below 175°C."))
			.isEqualTo("Oil at 347 °F: fry below 347 °F.");
		assertThat(TemperatureUnit.FAHRENHEIT.inText("a wet core stays at 100–103 °C, kitchen air 25 °C"))
			.isEqualTo("a wet core stays at 212–217 °F, kitchen air 77 °F");
		assertThat(TemperatureUnit.FAHRENHEIT.inText("contact 300 W/m²K, 50 % steam")).isEqualTo("contact 300 W/m²K, 50 % steam");
	}

	@Test
	void shouldLeaveCelsiusProseAlone() {
		assertThat(TemperatureUnit.CELSIUS.inText("Pan surface held at 220 °C.")).isEqualTo("Pan surface held at 220 °C.");
	}

}
