package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.springframework.boot.health.contributor.HealthIndicator;
import org.springframework.boot.health.contributor.Status;
import org.springframework.context.ConfigurableApplicationContext;

/**
 * Health reflects whether the app can write, and a database that takes no writes stops
 * the start with a message saying so. H2's ACCESS_MODE_DATA=r opens the file read-only,
 * as H2 does by itself when the data folder is read-only (H2 documentation, "Database URL
 * Overview": read-only databases).
 */
class DatabaseHealthTest {

	@Test
	void shouldReportUpWhenTheDatabaseTakesAWriteAndRefuseToStartWhenItIsReadOnly() {
		Map<String, Object> db = TestDatabase.properties("health");
		try (ConfigurableApplicationContext app = SaveSurvivesRestartTest.start(db)) {
			HealthIndicator health = app.getBean("databaseWrite", HealthIndicator.class);
			assertThat(health.health().getStatus()).isEqualTo(Status.UP);
		}
		if (TestDatabase.postgres()) {
			return; // a read-only PostgreSQL needs a server setting; the H2 case is the
					// one kitchens meet
		}
		db.put("spring.datasource.url", db.get("spring.datasource.url") + ";ACCESS_MODE_DATA=r");
		assertThatThrownBy(() -> SaveSurvivesRestartTest.start(db).close())
			.hasStackTraceContaining("cannot write to its database");
	}

}
