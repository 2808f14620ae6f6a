package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.springframework.boot.builder.SpringApplicationBuilder;
import org.springframework.context.ConfigurableApplicationContext;

import com.crustplan.CrustplanApplication;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.plan.SavedPlan;
import com.crustplan.plan.SavedPlanRepository;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceRepository;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.TemperatureUnit;

/**
 * A save survives a restart of the application on the real database (H2 file by default,
 * PostgreSQL in CI): start, save, close the context, start a new one on the same
 * database, read.
 */
class SaveSurvivesRestartTest {

	/**
	 * Settings as command-line arguments: they outrank application.properties, as in
	 * production.
	 */
	static ConfigurableApplicationContext start(Map<String, Object> db) {
		java.util.List<String> args = new java.util.ArrayList<>(java.util.List.of("--server.port=0",
				"--crustplan.demo.enabled=false", "--spring.main.banner-mode=off", "--logging.level.root=WARN"));
		db.forEach((k, v) -> args.add("--" + k + "=" + v));
		return new SpringApplicationBuilder(CrustplanApplication.class).run(args.toArray(String[]::new));
	}

	@Test
	void shouldKeepASavedSurfaceAndPlanAcrossARestart() {
		Map<String, Object> db = TestDatabase.properties("restart");
		SurfaceForm form = SurfaceForm.defaults(FoodCategory.BREAD, "Restart loaf " + System.nanoTime(),
				TemperatureUnit.CELSIUS);
		long surfaceId;
		long planId;
		try (ConfigurableApplicationContext first = start(db)) {
			surfaceId = first.getBean(SurfaceService.class).create(form).getId();
			planId = first.getBean(SavedPlanRepository.class)
				.save(new SavedPlan("Restart plan", form.name(), "Deck oven", "Golden", "{\"x\":1}", true, 600.0,
						"chef"))
				.getId();
		}
		try (ConfigurableApplicationContext second = start(db)) {
			// the database is the one asked for, not the default ./data file
			String url = second.getEnvironment().getProperty("spring.datasource.url");
			assertThat(url).isEqualTo(db.get("spring.datasource.url"));
			SavedSurface s = second.getBean(SurfaceRepository.class).findById(surfaceId).orElseThrow();
			assertThat(s.getName()).as("on %s", TestDatabase.describe()).isEqualTo(form.name());
			// the bread category's typical water 43 % (the engine's default composition),
			// stored exactly
			assertThat(s.getWaterPct()).isEqualTo(43.0);
			assertThat(s.getPh()).isNull();
			SavedPlan p = second.getBean(SavedPlanRepository.class).findById(planId).orElseThrow();
			assertThat(p.getInputsJson()).isEqualTo("{\"x\":1}");
			assertThat(p.getTimeToTargetS()).isEqualTo(600.0);
		}
	}

}
