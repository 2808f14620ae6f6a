package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.CookieManager;
import java.net.ServerSocket;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

/**
 * Crash safety of the packaged app: start the jar on a real database (H2 file, or PostgreSQL when
 * CRUSTPLAN_TEST_PG_URL is set), send concurrent saves, SIGKILL the process part-way, start it again
 * and check that every save the app confirmed (the redirect to the new record, the page form's
 * success answer) is there with the values sent, and that no record is half-written.
 */
class CrashSafetyIT {

	/** At least 100 concurrent saves, as the requirement asks; 32 in flight at a time. */
	static final int SAVES = 150;

	static final int THREADS = 32;

	/** Kill once this many saves are confirmed, so the kill lands while saves are in flight. */
	static final int KILL_AFTER = 40;

	static final Pattern CSRF = Pattern.compile("name=\"_csrf\" value=\"([^\"]+)\"");

	@Test
	void shouldKeepEveryConfirmedSaveThroughASigkill() throws Exception {
		Path jar = Path.of(System.getProperty("crustplan.jar", "target/crustplan-0.1.0-SNAPSHOT.jar"));
		assumeTrue(Files.isRegularFile(jar), "the packaged jar is needed: run mvn verify (failsafe runs after package)");
		Map<String, Object> db = TestDatabase.properties("crash");
		String run = Long.toString(System.nanoTime(), 36);
		Map<Integer, Long> confirmed = new ConcurrentHashMap<>();

		Process first = launch(jar, db, "first");
		try {
			int port = (int) db.get("__port");
			Client chef = Client.signIn(port, "chef", "chef-demo");
			String token = chef.csrf("/surfaces/new");
			ExecutorService pool = Executors.newFixedThreadPool(THREADS);
			for (int i = 0; i < SAVES; i++) {
				int n = i;
				pool.submit(() -> {
					try {
						HttpResponse<String> r = chef.post("/surfaces/new", form(run, n, token));
						String location = r.headers().firstValue("Location").orElse("");
						Matcher m = Pattern.compile("/surfaces/(\\d+)$").matcher(location);
						if (r.statusCode() / 100 == 3 && m.find()) {
							confirmed.put(n, Long.parseLong(m.group(1)));
						}
					}
					catch (IOException | InterruptedException e) {
						// the process was killed under this request: it was never confirmed
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
		System.out.printf("crash test on %s: %d of %d saves confirmed before SIGKILL%n", TestDatabase.describe(),
				confirmed.size(), SAVES);
		assertThat(confirmed.size()).as("saves confirmed before the kill").isGreaterThanOrEqualTo(KILL_AFTER);
		assertThat(confirmed.size()).as("the kill came part-way").isLessThan(SAVES);

		Process second = launch(jar, db, "second");
		try {
			int port = (int) db.get("__port");
			Client chef = Client.signIn(port, "chef", "chef-demo");
			for (Map.Entry<Integer, Long> e : confirmed.entrySet()) {
				HttpResponse<String> page = chef.get("/surfaces/" + e.getValue());
				assertThat(page.statusCode()).as("confirmed save %d (id %d) on %s", e.getKey(), e.getValue(),
						TestDatabase.describe()).isEqualTo(200);
				assertThat(page.body()).contains(name(run, e.getKey())).contains(thickness(e.getKey()) + " mm");
			}
			// every record of this run that exists at all is whole: its page renders from all its values
			String list = chef.get("/surfaces").body();
			Matcher m = Pattern.compile("href=\"/surfaces/(\\d+)\">Crash " + run + " #(\\d+)<").matcher(list);
			int found = 0;
			while (m.find()) {
				found++;
				HttpResponse<String> page = chef.get("/surfaces/" + m.group(1));
				assertThat(page.statusCode()).isEqualTo(200);
				assertThat(page.body()).contains(thickness(Integer.parseInt(m.group(2))) + " mm");
			}
			assertThat(found).isGreaterThanOrEqualTo(confirmed.size());
		}
		finally {
			second.destroyForcibly();
			second.waitFor(30, TimeUnit.SECONDS);
		}
	}

	static String name(String run, int n) {
		return "Crash " + run + " #" + n;
	}

	/** A value that differs per save, so a record holding another save's values is caught. */
	static String thickness(int n) {
		return String.format(Locale.ROOT, "%.1f", 5 + n / 10.0).replaceAll("\\.0$", "");
	}

	static Map<String, String> form(String run, int n, String token) {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("_csrf", token);
		p.put("name", name(run, n));
		p.put("category", "meat");
		p.put("waterPct", "72");
		p.put("proteinPct", "21");
		p.put("fatPct", "5");
		p.put("reducingSugarPct", "0.1");
		p.put("sucrosePct", "0");
		p.put("starchPct", "0");
		p.put("fibrePct", "0");
		p.put("ashPct", "1.1");
		p.put("asparagineMgPerKg", "50");
		p.put("surfaceWaterGPerM2", "10");
		p.put("thicknessMm", thickness(n));
		p.put("ph", "");
		p.put("bicarbonateGPerKg", "0");
		p.put("acidGPerKg", "0");
		p.put("initialTemperature", "5");
		p.put("temperatureUnit", "C");
		p.put("notes", "crash test save " + n);
		return p;
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
			// exactly as a kitchen group runs it: the postgres profile, connection from the environment
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

	/** A signed-in browser session: cookies kept, redirects not followed. */
	static final class Client {

		final HttpClient http;

		final int port;

		private Client(int port) {
			this.port = port;
			this.http = HttpClient.newBuilder()
				.cookieHandler(new CookieManager())
				.followRedirects(HttpClient.Redirect.NEVER)
				.version(HttpClient.Version.HTTP_1_1)
				.connectTimeout(Duration.ofSeconds(5))
				.build();
		}

		static Client signIn(int port, String user, String password) throws Exception {
			Client c = new Client(port);
			String token = c.csrf("/signin");
			HttpResponse<String> r = c.post("/signin", Map.of("username", user, "password", password, "_csrf", token));
			assertThat(r.statusCode()).isEqualTo(302);
			assertThat(r.headers().firstValue("Location").orElse("")).doesNotContain("error");
			return c;
		}

		String csrf(String path) throws Exception {
			Matcher m = CSRF.matcher(get(path).body());
			assertThat(m.find()).as("a CSRF token on %s", path).isTrue();
			return m.group(1);
		}

		HttpResponse<String> get(String path) throws IOException, InterruptedException {
			return http.send(HttpRequest.newBuilder(uri(path)).timeout(Duration.ofSeconds(30)).build(),
					HttpResponse.BodyHandlers.ofString());
		}

		HttpResponse<String> post(String path, Map<String, String> form) throws IOException, InterruptedException {
			String body = form.entrySet()
				.stream()
				.map(e -> URLEncoder.encode(e.getKey(), StandardCharsets.UTF_8) + "="
						+ URLEncoder.encode(e.getValue(), StandardCharsets.UTF_8))
				.collect(Collectors.joining("&"));
			return http.send(HttpRequest.newBuilder(uri(path))
				.timeout(Duration.ofSeconds(30))
				.header("Content-Type", "application/x-www-form-urlencoded")
				.POST(HttpRequest.BodyPublishers.ofString(body))
				.build(), HttpResponse.BodyHandlers.ofString());
		}

		URI uri(String path) {
			return URI.create("http://127.0.0.1:" + port + path);
		}

	}

}
