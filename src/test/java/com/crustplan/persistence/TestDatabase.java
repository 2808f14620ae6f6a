package com.crustplan.persistence;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The database the persistence tests run against: a fresh H2 file database under target/
 * by default, or a real PostgreSQL server when {@code CRUSTPLAN_TEST_PG_URL} is set (as
 * .ci/run does), with user and password from {@code CRUSTPLAN_TEST_PG_USER} /
 * {@code CRUSTPLAN_TEST_PG_PASSWORD}.
 */
final class TestDatabase {

	private TestDatabase() {
	}

	static boolean postgres() {
		String url = System.getenv("CRUSTPLAN_TEST_PG_URL");
		return url != null && !url.isBlank();
	}

	/** Spring properties for an application context on this database. */
	static Map<String, Object> properties(String name) {
		Map<String, Object> p = new LinkedHashMap<>();
		if (postgres()) {
			p.put("spring.datasource.url", System.getenv("CRUSTPLAN_TEST_PG_URL"));
			p.put("spring.datasource.username", env("CRUSTPLAN_TEST_PG_USER", "crustplan"));
			p.put("spring.datasource.password", env("CRUSTPLAN_TEST_PG_PASSWORD", "crustplan"));
		}
		else {
			Path file = Path.of("target", "test-databases", name + "-" + System.nanoTime()).toAbsolutePath();
			p.put("spring.datasource.url", "jdbc:h2:file:" + file + ";WRITE_DELAY=0;DB_CLOSE_ON_EXIT=FALSE");
			p.put("spring.datasource.username", "sa");
			p.put("spring.datasource.password", "");
		}
		return p;
	}

	static String describe() {
		return postgres() ? "PostgreSQL" : "H2 file";
	}

	private static String env(String name, String fallback) {
		String v = System.getenv(name);
		return v == null || v.isBlank() ? fallback : v;
	}

}
