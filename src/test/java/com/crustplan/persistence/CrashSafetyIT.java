package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;

import tools.jackson.databind.JsonNode;
import tools.jackson.databind.json.JsonMapper;

/**
 * Crash safety of the packaged app: start the jar on a real database (H2 file, or
 * PostgreSQL when CRUSTPLAN_TEST_PG_URL is set), send concurrent saves to
 * {@code POST /api/v1/surfaces}, SIGKILL the process part-way, start it again and check
 * that every save the app confirmed (201 Created, sent only after the save's transaction
 * committed) is there with every value sent, and that no record is half-written.
 */
class CrashSafetyIT {

	/** At least 100 concurrent saves, as the requirement asks; 32 in flight at a time. */
	static final int SAVES = 150;

	static final int THREADS = 32;

	/**
	 * Kill once this many saves are confirmed, so the kill lands while saves are in
	 * flight.
	 */
	static final int KILL_AFTER = 40;

	static final JsonMapper JSON = JsonMapper.builder().build();

	/**
	 * The composition fields of the API, each 0 to 100 % (the engine's Composition
	 * check).
	 */
	static final List<String> PERCENTS = List.of("waterPct", "proteinPct", "fatPct", "reducingSugarPct", "sucrosePct",
			"starchPct", "fibrePct", "ashPct");

	@Test
	void shouldKeepEveryConfirmedSaveThroughASigkill() throws Exception {
		Path jar = Path.of(System.getProperty("crustplan.jar", "target/crustplan-0.1.0-SNAPSHOT.jar"));
		assumeTrue(Files.isRegularFile(jar),
				"the packaged jar is needed: run mvn verify (failsafe runs after package)");
		Map<String, Object> db = TestDatabase.properties("crash");
		String run = Long.toString(System.nanoTime(), 36);
		Map<Integer, Long> confirmed = new ConcurrentHashMap<>();

		Process first = launch(jar, db, "first");
		try {
			Client chef = new Client((int) db.get("__port"), "chef", "chef-demo");
			ExecutorService pool = Executors.newFixedThreadPool(THREADS);
			for (int i = 0; i < SAVES; i++) {
				int n = i;
				pool.submit(() -> {
					try {
						HttpResponse<String> r = chef.post("/api/v1/surfaces", JSON.writeValueAsString(body(run, n)));
						String location = r.headers().firstValue("Location").orElse("");
						Matcher m = Pattern.compile("/api/v1/surfaces/(\\d+)$").matcher(location);
						if (r.statusCode() == 201 && m.find()) {
							confirmed.put(n, Long.parseLong(m.group(1)));
						}
					}
					catch (IOException | InterruptedException e) {
						// the process was killed under this request: it was never
						// confirmed
					}
				});
			}
			long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
			while (confirmed.size() < KILL_AFTER && System.nanoTime() < deadline) {
				Thread.sleep(5);
			}
			first.destroyForcibly(); // SIGKILL on Linux: no shutdown hooks, no flush
			first.waitFor(30, TimeUnit.SECONDS);
			pool.shutdown();
			pool.awaitTermination(60, TimeUnit.SECONDS);
		}
		finally {
			first.destroyForcibly();
		}
		System.out.printf("crash test on %s: %d of %d saves confirmed (201) before SIGKILL%n", TestDatabase.describe(),
				confirmed.size(), SAVES);
		assertThat(confirmed.size()).as("saves confirmed before the kill").isGreaterThanOrEqualTo(KILL_AFTER);
		assertThat(confirmed.size()).as("the kill came part-way").isLessThan(SAVES);

		Process second = launch(jar, db, "second");
		try {
			Client chef = new Client((int) db.get("__port"), "chef", "chef-demo");
			for (Map.Entry<Integer, Long> e : confirmed.entrySet()) {
				HttpResponse<String> r = chef.get("/api/v1/surfaces/" + e.getValue());
				assertThat(r.statusCode())
					.as("confirmed save %d (id %d) on %s", e.getKey(), e.getValue(), TestDatabase.describe())
					.isEqualTo(200);
				assertSameAsSent(JSON.readTree(r.body()), run, e.getKey());
			}
			// every record that exists at all is whole; one of this run holds exactly one
			// save's values
			HttpResponse<String> list = chef.get("/api/v1/surfaces");
			assertThat(list.statusCode()).isEqualTo(200);
			Pattern ours = Pattern.compile("Crash " + run + " #(\\d+)");
			int found = 0;
			for (JsonNode row : JSON.readTree(list.body())) {
				assertThat(row.path("name").asString()).as("list row %s", row).isNotBlank();
				assertThat(row.path("category").asString()).as("list row %s", row).isNotBlank();
				HttpResponse<String> r = chef.get("/api/v1/surfaces/" + row.path("id").asLong());
				assertThat(r.statusCode()).as("list row %s", row).isEqualTo(200);
				JsonNode s = JSON.readTree(r.body());
				assertWhole(s);
				Matcher m = ours.matcher(s.path("name").asString());
				if (m.matches()) {
					found++;
					assertSameAsSent(s, run, Integer.parseInt(m.group(1)));
				}
			}
			assertThat(found).as("records of this run").isGreaterThanOrEqualTo(confirmed.size());
		}
		finally {
			second.destroyForcibly();
			second.waitFor(30, TimeUnit.SECONDS);
		}
	}

	static String name(String run, int n) {
		return "Crash " + run + " #" + n;
	}

	/**
	 * Save n: a lean beef cut (water 72, protein 21, fat 5, ash 1.1 %: typical raw lean
	 * beef, from memory of food composition tables) with thickness, asparagine, start
	 * temperature and notes that differ per save, so a record holding another save's
	 * values is caught.
	 */
	static Map<String, Object> body(String run, int n) {
		Map<String, Object> s = new LinkedHashMap<>();
		s.put("category", "meat");
		s.put("waterPct", 72.0);
		s.put("proteinPct", 21.0);
		s.put("fatPct", 5.0);
		s.put("reducingSugarPct", 0.1);
		s.put("sucrosePct", 0.0);
		s.put("starchPct", 0.0);
		s.put("fibrePct", 0.0);
		s.put("ashPct", 1.1);
		s.put("asparagineMgPerKg", 50.0 + n);
		s.put("surfaceWaterGPerM2", 10.0);
		s.put("thicknessMm", 5 + n / 10.0);
		s.put("pH", 5.6);
		s.put("bicarbonateGPerKg", 0.0);
		s.put("acidGPerKg", 0.0);
		s.put("initialTemperatureC", 1.0 + n % 7);
		Map<String, Object> b = new LinkedHashMap<>();
		b.put("name", name(run, n));
		b.put("notes", "crash test save " + n);
		b.put("surface", s);
		return b;
	}

	/**
	 * Every value read back equals the one sent: JSON numbers compared exactly (doubles
	 * round-trip).
	 */
	static void assertSameAsSent(JsonNode got, String run, int n) {
		Map<String, Object> sent = body(run, n);
		assertThat(got.path("name").asString()).isEqualTo(sent.get("name"));
		assertThat(got.path("notes").asString()).isEqualTo(sent.get("notes"));
		@SuppressWarnings("unchecked")
		Map<String, Object> s = (Map<String, Object>) sent.get("surface");
		assertThat(got.path("category").asString()).isEqualTo(s.get("category"));
		s.forEach((field, value) -> {
			if (value instanceof Double d) {
				assertThat(got.path(field).isNumber()).as("%s of save %d is a number", field, n).isTrue();
				assertThat(got.path(field).doubleValue()).as("%s of save %d", field, n).isEqualTo(d);
			}
		});
	}

	/**
	 * A record is whole when every field the form requires is present and inside the
	 * engine's ranges.
	 */
	static void assertWhole(JsonNode s) {
		assertThat(s.path("id").asLong()).as("id of %s", s).isPositive();
		assertThat(s.path("name").asString()).as("name of %s", s).isNotBlank();
		assertThat(s.path("category").asString()).as("category of %s", s).isNotBlank();
		double sum = 0;
		for (String f : PERCENTS) {
			assertThat(s.path(f).isNumber()).as("%s of %s", f, s).isTrue();
			assertThat(s.path(f).doubleValue()).as("%s of %s", f, s).isBetween(0.0, 100.0);
			sum += s.path(f).doubleValue();
		}
		// the engine's Composition check allows rounding of 0.05 points over 100 %
		assertThat(sum).as("composition of %s", s).isLessThanOrEqualTo(100.05);
		assertThat(s.path("thicknessMm").doubleValue()).as("thickness of %s", s).isBetween(0.5, 200.0);
		for (String f : List.of("asparagineMgPerKg", "surfaceWaterGPerM2", "bicarbonateGPerKg", "acidGPerKg",
				"initialTemperatureC")) {
			assertThat(s.path(f).isNumber()).as("%s of %s", f, s).isTrue();
		}
	}

	static Process launch(Path jar, Map<String, Object> db, String label) throws Exception {
		int port;
		try (ServerSocket s = new ServerSocket(0)) {
			port = s.getLocalPort();
		}
		db.put("__port", port);
		List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
				"-Xmx512m", "-jar", jar.toString(), "--server.port=" + port, "--crustplan.demo.enabled=true",
				"--spring.main.banner-mode=off"));
		ProcessBuilder pb = new ProcessBuilder(cmd);
		if (TestDatabase.postgres()) {
			// exactly as a kitchen group runs it: the postgres profile, connection from
			// the environment
			cmd.add("--spring.profiles.active=postgres");
			pb.environment().put("CRUSTPLAN_DB_URL", (String) db.get("spring.datasource.url"));
			pb.environment().put("CRUSTPLAN_DB_USER", (String) db.get("spring.datasource.username"));
			pb.environment().put("CRUSTPLAN_DB_PASSWORD", (String) db.get("spring.datasource.password"));
		}
		else {
			db.forEach((k, v) -> {
				if (!k.startsWith("__")) {
					cmd.add("--" + k + "=" + v);
				}
			});
		}
		Path log = Path.of("target", "crash-" + label + ".log");
		Process p = pb.redirectErrorStream(true).redirectOutput(log.toFile()).start();
		HttpClient http = HttpClient.newHttpClient();
		long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
		while (System.nanoTime() < deadline) {
			assertThat(p.isAlive()).as("app started (see %s)", log).isTrue();
			try {
				HttpResponse<String> r = http.send(
						HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/actuator/health")).build(),
						HttpResponse.BodyHandlers.ofString());
				if (r.statusCode() == 200 && r.body().contains("UP")) {
					return p;
				}
			}
			catch (IOException e) {
				// not listening yet
			}
			Thread.sleep(250);
		}
		p.destroyForcibly();
		throw new AssertionError("app did not become healthy in 120 s; see " + log);
	}

	/** An API client: HTTP Basic on every request, no cookies, redirects not followed. */
	static final class Client {

		final HttpClient http;

		final int port;

		final String authorization;

		Client(int port, String user, String password) {
			this.port = port;
			this.authorization = "Basic "
					+ Base64.getEncoder().encodeToString((user + ":" + password).getBytes(StandardCharsets.UTF_8));
			this.http = HttpClient.newBuilder()
				.followRedirects(HttpClient.Redirect.NEVER)
				.version(HttpClient.Version.HTTP_1_1)
				.connectTimeout(Duration.ofSeconds(5))
				.build();
		}

		HttpResponse<String> get(String path) throws IOException, InterruptedException {
			return http.send(HttpRequest.newBuilder(uri(path))
				.timeout(Duration.ofSeconds(30))
				.header("Authorization", authorization)
				.header("Accept", "application/json")
				.build(), HttpResponse.BodyHandlers.ofString());
		}

		HttpResponse<String> post(String path, String json) throws IOException, InterruptedException {
			return http.send(HttpRequest.newBuilder(uri(path))
				.timeout(Duration.ofSeconds(30))
				.header("Authorization", authorization)
				.header("Content-Type", "application/json")
				.header("Accept", "application/json")
				.POST(HttpRequest.BodyPublishers.ofString(json))
				.build(), HttpResponse.BodyHandlers.ofString());
		}

		URI uri(String path) {
			return URI.create("http://127.0.0.1:" + port + path);
		}

	}

}
