package com.crustplan.system;

import java.sql.Timestamp;
import java.time.Instant;

import org.springframework.boot.ApplicationArguments;
import org.springframework.boot.ApplicationRunner;
import org.springframework.boot.health.contributor.Health;
import org.springframework.boot.health.contributor.HealthIndicator;
import org.springframework.jdbc.core.JdbcTemplate;
import org.springframework.stereotype.Component;
import org.springframework.transaction.PlatformTransactionManager;
import org.springframework.transaction.support.TransactionTemplate;

/**
 * Whether the app can serve: a real write and read in one transaction (table
 * {@code health_probe}), not just an open connection, since signing in and saving both
 * write. Reported by {@code /actuator/health} as {@code databaseWrite}, and checked once
 * at startup, so a read-only data folder or a full disk stops the start with a message
 * saying so instead of failing sign-ins later.
 */
@Component("databaseWrite")
class DatabaseHealth implements HealthIndicator, ApplicationRunner {

	private final JdbcTemplate jdbc;

	private final TransactionTemplate tx;

	DatabaseHealth(JdbcTemplate jdbc, PlatformTransactionManager transactions) {
		this.jdbc = jdbc;
		this.tx = new TransactionTemplate(transactions);
	}

	@Override
	public Health health() {
		try {
			probe();
			return Health.up().withDetail("check", "a write and a read in one transaction").build();
		}
		catch (RuntimeException e) {
			return Health.down()
				.withDetail("reason",
						"the database refused a write or read (read-only data folder, full disk or no "
								+ "database server?): " + rootMessage(e))
				.build();
		}
	}

	@Override
	public void run(ApplicationArguments args) {
		try {
			probe();
		}
		catch (RuntimeException e) {
			throw new IllegalStateException("Crustplan cannot write to its database, so it cannot sign anyone in or "
					+ "save anything. Check that the data folder is writable and the disk has space (or that the "
					+ "database server accepts writes), then start again. The database said: " + rootMessage(e), e);
		}
	}

	private void probe() {
		tx.executeWithoutResult(s -> {
			int rows = jdbc.update("UPDATE health_probe SET checked_at = ? WHERE id = 1",
					Timestamp.from(Instant.now()));
			Integer read = jdbc.queryForObject("SELECT COUNT(*) FROM health_probe WHERE id = 1", Integer.class);
			if (rows != 1 || read == null || read != 1) {
				throw new IllegalStateException("the health probe row is missing");
			}
		});
	}

	static String rootMessage(Throwable e) {
		Throwable t = e;
		while (t.getCause() != null && t.getCause() != t) {
			t = t.getCause();
		}
		String m = t.getMessage() == null ? t.getClass().getSimpleName() : t.getMessage();
		return m.length() > 300 ? m.substring(0, 300) + "…" : m;
	}

}
