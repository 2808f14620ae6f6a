package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.dao.DataIntegrityViolationException;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceRepository;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.TemperatureUnit;

/**
 * A save that the database refuses changes nothing: no half-written record, the old one
 * intact.
 */
@CrustplanTest
class TransactionalSaveTest {

	@Autowired
	SurfaceService service;

	@Autowired
	SurfaceRepository surfaces;

	/**
	 * 81 characters: one more than the name column holds (VARCHAR(80) in
	 * V1__kitchen.sql).
	 */
	static final String TOO_LONG = "x".repeat(81);

	@Test
	void shouldLeaveNoRecordWhenACreateFails() {
		long before = surfaces.count();
		SurfaceForm f = SurfaceForm.defaults(FoodCategory.POTATO, TOO_LONG, TemperatureUnit.CELSIUS);
		assertThatThrownBy(() -> service.create(f)).isInstanceOf(DataIntegrityViolationException.class);
		assertThat(surfaces.count()).isEqualTo(before);
	}

	@Test
	void shouldKeepTheOldValuesWhenAnUpdateFails() {
		SavedSurface s = service
			.create(SurfaceForm.defaults(FoodCategory.MEAT, "Rollback steak", TemperatureUnit.CELSIUS));
		SurfaceForm bad = SurfaceForm.defaults(FoodCategory.POTATO, TOO_LONG, TemperatureUnit.CELSIUS);
		assertThatThrownBy(() -> service.update(s.getId(), bad, s.getVersion()))
			.isInstanceOf(DataIntegrityViolationException.class);
		SavedSurface after = surfaces.findById(s.getId()).orElseThrow();
		assertThat(after.getName()).isEqualTo("Rollback steak");
		// meat's typical water 72 % stays; the failed update wanted potato's 79 %
		assertThat(after.getWaterPct()).isEqualTo(72.0);
		assertThat(after.getCategory()).isEqualTo("meat");
	}

}
