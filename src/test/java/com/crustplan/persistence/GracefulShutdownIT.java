package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import tools.jackson.databind.json.JsonMapper;

/**
 * SIGTERM while saves are in flight (H2 file, or PostgreSQL when CRUSTPLAN_TEST_PG_URL is
 * set): the web server stops taking new connections and finishes the requests it has,
 * then the database closes. No request gets a 5xx or a 401, and every save answered 201
 * is there after a restart.
 */
class GracefulShutdownIT {

	/** About 100 saves, 16 in flight; SIGTERM once 20 are confirmed. */
	static final int SAVES = 100;

	static final int THREADS = 16;

	static final int TERM_AFTER = 20;

	static final JsonMapper JSON = JsonMapper.builder().build();

	@Test
	void shouldFinishEverySaveInFlightOnSigterm() throws Exception {
		Path jar = Path.of(System.getProperty("crustplan.jar", "target/crustplan-0.1.0-SNAPSHOT.jar"));
		assumeTrue(Files.isRegularFile(jar),
				"the packaged jar is needed: run mvn verify (failsafe runs after package)");
		Map<String, Object> db = TestDatabase.properties("sigterm");
		String run = Long.toString(System.nanoTime(), 36);
		Map<Integer, Long> confirmed = new ConcurrentHashMap<>();
		Map<Integer, AtomicInteger> statuses = new ConcurrentHashMap<>();
		AtomicInteger refused = new AtomicInteger();

		Process app = CrashSafetyIT.launch(jar, db, "sigterm-first");
		int exit;
		try {
			CrashSafetyIT.Client chef = new CrashSafetyIT.Client((int) db.get("__port"), "chef", "chef-demo");
			ExecutorService pool = Executors.newFixedThreadPool(THREADS);
			for (int i = 0; i < SAVES; i++) {
				int n = i;
				pool.submit(() -> {
					try {
						var r = chef.post("/api/v1/surfaces", JSON.writeValueAsString(CrashSafetyIT.body(run, n)));
						statuses.computeIfAbsent(r.statusCode(), k -> new AtomicInteger()).incrementAndGet();
						Matcher m = Pattern.compile("/api/v1/surfaces/(\\d+)$")
							.matcher(r.headers().firstValue("Location").orElse(""));
						if (r.statusCode() == 201 && m.find()) {
							confirmed.put(n, Long.parseLong(m.group(1)));
						}
					}
					catch (IOException | InterruptedException e) {
						refused.incrementAndGet(); // not accepted: the server had stopped
													// listening
					}
				});
			}
			long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
			while (confirmed.size() < TERM_AFTER && System.nanoTime() < deadline) {
				Thread.sleep(5);
			}
			app.destroy(); // SIGTERM on Linux: Spring's graceful shutdown
			assertThat(app.waitFor(60, TimeUnit.SECONDS)).as("stopped within the 20 s shutdown phase").isTrue();
			exit = app.exitValue();
			pool.shutdown();
			pool.awaitTermination(60, TimeUnit.SECONDS);
		}
		finally {
			app.destroyForcibly();
		}
		System.out.printf("SIGTERM during %d saves on %s: statuses %s, %d not accepted, exit %d%n", SAVES,
				TestDatabase.describe(), statuses, refused.get(), exit);
		assertThat(statuses.keySet()).as("statuses %s", statuses).containsOnly(201);
		assertThat(confirmed.size()).isGreaterThanOrEqualTo(TERM_AFTER);

		Process second = CrashSafetyIT.launch(jar, db, "sigterm-second");
		try {
			CrashSafetyIT.Client chef = new CrashSafetyIT.Client((int) db.get("__port"), "chef", "chef-demo");
			for (Map.Entry<Integer, Long> e : confirmed.entrySet()) {
				var r = chef.get("/api/v1/surfaces/" + e.getValue());
				assertThat(r.statusCode()).as("confirmed save %d (id %d)", e.getKey(), e.getValue()).isEqualTo(200);
				CrashSafetyIT.assertSameAsSent(JSON.readTree(r.body()), run, e.getKey());
			}
		}
		finally {
			second.destroyForcibly();
			second.waitFor(30, TimeUnit.SECONDS);
		}
	}

}
