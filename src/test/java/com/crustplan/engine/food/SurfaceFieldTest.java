package com.crustplan.engine.food;

import com.crustplan.engine.input.InvalidInputException;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

class SurfaceFieldTest {

	/** One row of the README's table of surface fields: keys, unit, range. */
	record Row(List<String> keys, String unit, double min, double max) {
	}

	private static final Pattern ROW = Pattern
		.compile("^\\s*\\|([^|]+)\\|([^|]*)\\|\\s*(-?[\\d.]+) to (-?[\\d.]+)\\s*\\|\\s*$");

	private static final Pattern KEY = Pattern.compile("`(\\w+)`");

	static List<Row> readmeTable() throws IOException {
		List<Row> rows = new ArrayList<>();
		for (String line : Files.readAllLines(Path.of("README.md"))) {
			Matcher m = ROW.matcher(line);
			if (m.matches()) {
				List<String> keys = KEY.matcher(m.group(1)).results().map(r -> r.group(1)).toList();
				rows.add(new Row(keys, m.group(2).trim(), Double.parseDouble(m.group(3)),
						Double.parseDouble(m.group(4))));
			}
		}
		return rows;
	}

	/**
	 * The API documentation (README, "JSON API v1") states each field's range as the
	 * engine checks it.
	 */
	@ParameterizedTest
	@EnumSource(SurfaceField.class)
	void shouldBeDocumentedWithItsRangeAndUnit(SurfaceField f) throws IOException {
		List<Row> rows = readmeTable().stream().filter(r -> r.keys().contains(f.key())).toList();
		assertThat(rows).as(f.key() + " in the README's table").hasSize(1);
		Row row = rows.get(0);
		assertThat(row.min()).isEqualTo(f.min());
		assertThat(row.max()).isEqualTo(f.max());
		// the README writes "% by mass" for the composition parts
		assertThat(row.unit()).startsWith(f.unit());
	}

	/** Mass percentages run from 0 to 100 by definition (ISO 80000-9, mass fraction). */
	@Test
	void shouldBoundEachCompositionPartByTheDefinitionOfAPercentage() {
		assertThat(SurfaceField.COMPOSITION).hasSize(8).allSatisfy(f -> {
			assertThat(f.min()).isZero();
			assertThat(f.max()).isEqualTo(100);
			assertThat(f.unit()).isEqualTo("%");
		});
	}

	/**
	 * pH is dimensionless; food pH tables (FDA, approximate pH of foods) run from about 2
	 * to 9.
	 */
	@Test
	void shouldSpanThePhOfFoods() {
		assertThat(SurfaceField.PH.unit()).isEmpty();
		assertThat(SurfaceField.PH.accepts(2.0)).isTrue(); // lime juice, about pH 2
		assertThat(SurfaceField.PH.accepts(9.0)).isTrue(); // egg white after storage,
															// about pH 9
	}

	/**
	 * The engine's message names the field and the range, as the plan page has always
	 * shown it.
	 */
	@Test
	void shouldNameTheFieldAndTheRangeWhenRefusing() {
		assertThatThrownBy(() -> SurfaceField.THICKNESS.check(0.4)).isInstanceOf(InvalidInputException.class)
			.hasMessage("thicknessMm: must be a number from 0.5 to 200");
		assertThatThrownBy(() -> SurfaceField.WATER.check(Double.NaN))
			.hasMessage("waterPct: must be a number from 0 to 100");
		assertThatThrownBy(() -> SurfaceField.INITIAL_TEMPERATURE.check(81))
			.hasMessage("initialTemperatureC: must be a number from -20 to 80");
		assertThat(SurfaceField.ASPARAGINE.check(50_000)).isEqualTo(50_000);
	}

	/**
	 * Every category's defaults lie inside the ranges (a new surface starts from them).
	 */
	@ParameterizedTest
	@EnumSource(FoodCategory.class)
	void shouldHoldEachCategorysDefaults(FoodCategory c) {
		Surface d = Surface.defaults(c);
		for (SurfaceField f : SurfaceField.values()) {
			Double v = f == SurfaceField.PH ? d.basePh() : f.of(d);
			assertThat(f.accepts(v)).as(c + " " + f.key() + " = " + v).isTrue();
		}
	}

}
