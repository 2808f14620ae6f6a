package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import tools.jackson.databind.json.JsonMapper;

/**
 * The packaged app on an H2 data folder that fills up or turns read-only: a small tmpfs
 * (Linux tmpfs(5), mounted with size= and remounted ro). Needs root and mount; skipped
 * with a message where the machine does not allow it. A full disk gives no 500 and turns
 * health DOWN; freeing space brings the app back without a restart; a read-only folder
 * stops the start with a message saying so.
 */
class DiskFaultsIT {

	static final JsonMapper JSON = JsonMapper.builder().build();

	Path mount;

	@BeforeEach
	void mountTmpfs() throws Exception {
		assumeTrue(System.getenv("CRUSTPLAN_TEST_PG_URL") == null || System.getenv("CRUSTPLAN_TEST_PG_URL").isBlank(),
				"disk faults are an H2 matter: skipped on PostgreSQL");
		mount = Path.of("target", "disk-faults-" + System.nanoTime()).toAbsolutePath();
		Files.createDirectories(mount);
		// 24 MB: room for the demo kitchen's database, small enough to fill in a second
		int rc = new ProcessBuilder("mount", "-t", "tmpfs", "-o", "size=24m", "tmpfs", mount.toString()).inheritIO()
			.start()
			.waitFor();
		assumeTrue(rc == 0, "cannot mount a tmpfs here (needs root and CAP_SYS_ADMIN): disk-full test skipped");
	}

	@AfterEach
	void unmount() throws Exception {
		if (mount != null) {
			new ProcessBuilder("umount", "-l", mount.toString()).inheritIO().start().waitFor();
		}
	}

	Map<String, Object> db() {
		Map<String, Object> p = new LinkedHashMap<>();
		p.put("spring.datasource.url",
				"jdbc:h2:file:" + mount.resolve("crustplan") + ";WRITE_DELAY=0;DB_CLOSE_ON_EXIT=FALSE");
		p.put("spring.datasource.username", "sa");
		p.put("spring.datasource.password", "");
		return p;
	}

	@Test
	void shouldReportAFullDiskAndRecoverWhenSpaceIsFreed() throws Exception {
		Path jar = Path.of(System.getProperty("crustplan.jar", "target/crustplan-0.1.0-SNAPSHOT.jar"));
		assumeTrue(Files.isRegularFile(jar), "the packaged jar is needed: run mvn verify");
		Map<String, Object> db = db();
		Process app = CrashSafetyIT.launch(jar, db, "disk-full");
		try {
			int port = (int) db.get("__port");
			CrashSafetyIT.Client chef = new CrashSafetyIT.Client(port, "chef", "chef-demo");
			String run = Long.toString(System.nanoTime(), 36);
			assertThat(chef.post("/api/v1/surfaces", JSON.writeValueAsString(CrashSafetyIT.body(run, 0))).statusCode())
				.isEqualTo(201);

			Path filler = mount.resolve("filler");
			fill(filler);
			Map<Integer, Integer> statuses = new LinkedHashMap<>();
			for (int n = 1; n <= 20; n++) {
				int s = chef.post("/api/v1/surfaces", JSON.writeValueAsString(CrashSafetyIT.body(run, n))).statusCode();
				statuses.merge(s, 1, Integer::sum);
			}
			int healthFull = health(port);
			System.out.printf("disk full: saves %s, health %d%n", statuses, healthFull);
			assertThat(statuses.keySet()).as("saves on a full disk %s", statuses).allMatch(s -> s == 201 || s == 503);
			assertThat(healthFull).as("health on a full disk").isEqualTo(503);

			Files.delete(filler);
			long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
			int after = 0;
			while (System.nanoTime() < deadline) {
				after = chef.post("/api/v1/surfaces", JSON.writeValueAsString(CrashSafetyIT.body(run, 99)))
					.statusCode();
				if (after == 201) {
					break;
				}
				Thread.sleep(500);
			}
			System.out.printf("space freed: save %d, health %d%n", after, health(port));
			assertThat(after).as("a save after space is freed, no restart").isEqualTo(201);
			assertThat(health(port)).isEqualTo(200);
		}
		finally {
			app.destroyForcibly();
			app.waitFor(30, TimeUnit.SECONDS);
		}
	}

	@Test
	void shouldRefuseToStartOnAReadOnlyDataFolderWithAClearMessage() throws Exception {
		Path jar = Path.of(System.getProperty("crustplan.jar", "target/crustplan-0.1.0-SNAPSHOT.jar"));
		assumeTrue(Files.isRegularFile(jar), "the packaged jar is needed: run mvn verify");
		Map<String, Object> db = db();
		Process first = CrashSafetyIT.launch(jar, db, "read-only-first");
		first.destroy();
		first.waitFor(60, TimeUnit.SECONDS);
		int rc = new ProcessBuilder("mount", "-o", "remount,ro", mount.toString()).inheritIO().start().waitFor();
		assumeTrue(rc == 0, "cannot remount the tmpfs read-only here: read-only test skipped");
		Path log = Path.of("target", "crash-read-only.log");
		Process second = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
				"-Xmx512m", "-jar", jar.toString(), "--server.port=0", "--spring.main.banner-mode=off",
				"--spring.datasource.url=" + db.get("spring.datasource.url"), "--spring.datasource.username=sa",
				"--spring.datasource.password=")
			.redirectErrorStream(true)
			.redirectOutput(log.toFile())
			.start();
		try {
			assertThat(second.waitFor(120, TimeUnit.SECONDS)).as("the start stops by itself").isTrue();
			assertThat(second.exitValue()).isNotZero();
			String out = Files.readString(log);
			System.out.println("read-only data folder: start refused; log says: "
					+ out.lines().filter(l -> l.contains("cannot write")).findFirst().orElse("(not found)"));
			assertThat(out).contains("cannot write to its database");
		}
		finally {
			second.destroyForcibly();
		}
	}

	static int health(int port) throws IOException, InterruptedException {
		return HttpClient.newHttpClient()
			.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/actuator/health")).build(),
					HttpResponse.BodyHandlers.ofString())
			.statusCode();
	}

	/** Writes until the file system says it is full (ENOSPC). */
	static void fill(Path filler) {
		byte[] chunk = new byte[64 * 1024];
		try (OutputStream out = Files.newOutputStream(filler)) {
			while (true) {
				out.write(chunk);
			}
		}
		catch (IOException full) {
			// No space left on device: the disk is full
		}
	}

}
