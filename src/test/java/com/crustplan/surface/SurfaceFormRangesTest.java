package com.crustplan.surface;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

import jakarta.validation.ConstraintViolation;
import jakarta.validation.Validation;
import jakarta.validation.Validator;
import jakarta.validation.ValidatorFactory;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import com.crustplan.engine.food.FoodCategory;
import com.crustplan.engine.input.InvalidInputException;
import com.crustplan.system.TemperatureUnit;

/**
 * The form's range messages, now worded from the engine's ranges, read exactly as the
 * form worded them before (the wording cooks and API clients already know), and a value
 * the form refuses is also one the engine refuses.
 */
class SurfaceFormRangesTest {

	static ValidatorFactory factory;

	static Validator validator;

	@BeforeAll
	static void validator() {
		factory = Validation.buildDefaultValidatorFactory();
		validator = factory.getValidator();
	}

	@AfterAll
	static void close() {
		factory.close();
	}

	/** The potato defaults (a valid form) with one field replaced. */
	static SurfaceForm potatoWith(String field, double value) {
		SurfaceForm f = SurfaceForm.defaults(FoodCategory.POTATO, "Chips", TemperatureUnit.CELSIUS);
		Map<String, Double> v = new HashMap<>();
		v.put(field, value);
		return new SurfaceForm(f.name(), f.category(), f.product(), v.getOrDefault("waterPct", f.waterPct()),
				v.getOrDefault("proteinPct", f.proteinPct()), v.getOrDefault("fatPct", f.fatPct()),
				v.getOrDefault("reducingSugarPct", f.reducingSugarPct()), v.getOrDefault("sucrosePct", f.sucrosePct()),
				v.getOrDefault("starchPct", f.starchPct()), v.getOrDefault("fibrePct", f.fibrePct()),
				v.getOrDefault("ashPct", f.ashPct()), v.getOrDefault("asparagineMgPerKg", f.asparagineMgPerKg()),
				v.getOrDefault("surfaceWaterGPerM2", f.surfaceWaterGPerM2()),
				v.getOrDefault("thicknessMm", f.thicknessMm()), v.getOrDefault("ph", f.ph()),
				v.getOrDefault("bicarbonateGPerKg", f.bicarbonateGPerKg()),
				v.getOrDefault("acidGPerKg", f.acidGPerKg()), f.initialTemperature(), f.temperatureUnit(), f.notes(),
				f.shape(), f.pretreatment());
	}

	static Set<String> messages(SurfaceForm f, String field) {
		Set<ConstraintViolation<SurfaceForm>> all = validator.validate(f);
		return all.stream()
			.filter(v -> v.getPropertyPath().toString().equals(field))
			.map(ConstraintViolation::getMessage)
			.collect(Collectors.toSet());
	}

	// the messages as SurfaceForm's @DecimalMin/@DecimalMax annotations wrote them before
	// the ranges
	// moved into the engine
	@ParameterizedTest
	@CsvSource(delimiter = '|', textBlock = """
			waterPct           | 100.5  | must be 0 to 100 %
			proteinPct         | -1     | must be 0 to 100 %
			fatPct             | 101    | must be 0 to 100 %
			reducingSugarPct   | -0.1   | must be 0 to 100 %
			sucrosePct         | 100.01 | must be 0 to 100 %
			starchPct          | -5     | must be 0 to 100 %
			fibrePct           | 200    | must be 0 to 100 %
			ashPct             | -0.5   | must be 0 to 100 %
			asparagineMgPerKg  | 50001  | must be 0 to 50000 mg/kg
			surfaceWaterGPerM2 | -1     | must be 0 to 2000 g/m²
			thicknessMm        | 0.4    | must be 0.5 to 200 mm
			thicknessMm        | 201    | must be 0.5 to 200 mm
			ph                 | 1.9    | must be 2 to 10, or empty for the category's typical pH
			ph                 | 10.5   | must be 2 to 10, or empty for the category's typical pH
			bicarbonateGPerKg  | 51     | must be 0 to 50 g/kg
			acidGPerKg         | -1     | must be 0 to 50 g/kg
			""")
	void shouldWordEachRangeAsTheFormAlwaysHas(String field, double value, String message) {
		SurfaceForm f = potatoWith(field, value);
		assertThat(messages(f, field)).containsExactly(message);
	}

	@ParameterizedTest
	@CsvSource(delimiter = '|', textBlock = """
			waterPct           | 0
			asparagineMgPerKg  | 50000
			surfaceWaterGPerM2 | 2000
			thicknessMm        | 0.5
			thicknessMm        | 200
			ph                 | 2
			ph                 | 10
			bicarbonateGPerKg  | 50
			acidGPerKg         | 0
			""")
	void shouldTakeTheBoundsThemselves(String field, double value) {
		assertThat(messages(potatoWith(field, value), field)).isEmpty();
	}

	@ParameterizedTest
	@CsvSource(delimiter = '|', textBlock = """
			asparagineMgPerKg  | 50001  | asparagineMgPerKg
			surfaceWaterGPerM2 | 2000.5 | surfaceWaterGPerM2
			thicknessMm        | 0.4    | thicknessMm
			ph                 | 10.5   | pH
			bicarbonateGPerKg  | 51     | bicarbonateGPerKg
			acidGPerKg         | 51     | acidGPerKg
			ashPct             | -0.5   | ashPct
			""")
	void shouldBeRefusedByTheEngineToo(String field, double value, String engineField) {
		SurfaceForm f = potatoWith(field, value);
		assertThat(messages(f, field)).hasSize(1);
		InvalidInputException e = catchThrowableOfType(InvalidInputException.class, f::toSurface);
		assertThat(e).as(field + " " + value + " refused by the engine").isNotNull();
		assertThat(e.field()).isEqualTo(engineField);
		assertThat(SurfaceForm.formField(e.field())).isEqualTo(field);
	}

}
