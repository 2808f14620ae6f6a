package com.crustplan.persistence;

import static org.assertj.core.api.Assertions.assertThat;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.csrf;
import static org.springframework.security.test.web.servlet.request.SecurityMockMvcRequestPostProcessors.user;
import static org.springframework.test.web.servlet.request.MockMvcRequestBuilders.post;

import java.io.IOException;
import java.net.CookieManager;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;
import org.springframework.test.web.servlet.MockMvc;
import org.springframework.test.web.servlet.request.RequestPostProcessor;

import com.crustplan.api.StoredText;
import com.crustplan.CrustplanTest;
import com.crustplan.engine.food.FoodCategory;
import com.crustplan.surface.SavedSurface;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceRepository;
import com.crustplan.system.TemperatureUnit;

/**
 * Two chefs editing one surface never overwrite each other unseen, and collisions of
 * edits and deletes never answer 5xx. Thread and request counts are fixed, so each test
 * stops by itself.
 */
@CrustplanTest
class EditCollisionTest {

	static final RequestPostProcessor CHEF = user("chef").roles("CHEF");

	@Autowired
	MockMvc mvc;

	@Autowired
	SurfaceRepository surfaces;

	@LocalServerPort
	int port;

	long newSurface(String name) {
		return surfaces
			.save(SavedSurface.from(SurfaceForm.defaults(FoodCategory.POTATO, name, TemperatureUnit.CELSIUS)))
			.getId();
	}

	@Test
	void shouldShowTheSecondChefBothVersionsInsteadOfLosingTheFirstChefsChange() throws Exception {
		long id = newSurface("Shared wedges");
		Browser anna = new Browser(port);
		Browser ben = new Browser(port);
		anna.signIn("chef", "chef-demo");
		ben.signIn("chef", "chef-demo");
		String annasForm = anna.get("/surfaces/" + id + "/edit");
		String bensForm = ben.get("/surfaces/" + id + "/edit");
		String version = Browser.field(annasForm, "version");
		assertThat(Browser.field(bensForm, "version")).isEqualTo(version);

		// Anna saves first: 78 % water
		HttpResponse<String> first = anna.post("/surfaces/" + id + "/edit",
				potato("Shared wedges", "78", version, Browser.field(annasForm, "_csrf")));
		assertThat(first.statusCode()).isEqualTo(302);
		// Ben saves from his older form: 77 % water. Refused, in words, with both
		// versions
		HttpResponse<String> second = ben.post("/surfaces/" + id + "/edit",
				potato("Shared wedges", "77", version, Browser.field(bensForm, "_csrf")));
		assertThat(second.statusCode()).isEqualTo(200);
		assertThat(second.body()).contains("Someone else saved this surface", "your changes were not saved",
				"Your version", "Saved version", "water (%)");
		assertThat(second.body()).containsPattern("<td>77</td>\\s*<td>78</td>");
		// his typed values are still in the form
		assertThat(second.body()).contains("value=\"77\"");
		assertThat(surfaces.findById(id).orElseThrow().getWaterPct()).isEqualTo(78.0);

		// saving again from the re-rendered form (which now carries the saved version) is
		// his deliberate choice
		HttpResponse<String> again = ben.post("/surfaces/" + id + "/edit", potato("Shared wedges", "77",
				Browser.field(second.body(), "version"), Browser.field(second.body(), "_csrf")));
		assertThat(again.statusCode()).isEqualTo(302);
		assertThat(surfaces.findById(id).orElseThrow().getWaterPct()).isEqualTo(77.0);
	}

	@Test
	void shouldKeepTheValuesOfAnEditWhoseSurfaceWasDeletedMeanwhile() throws Exception {
		long id = newSurface("Soon gone");
		int version = surfaces.findById(id).orElseThrow().getVersion();
		surfaces.deleteById(id);
		String page = mvc
			.perform(StoredTextTest
				.potatoTo("/surfaces/" + id + "/edit", "name", "Soon gone, edited", "version", String.valueOf(version))
				.with(CHEF))
			.andReturn()
			.getResponse()
			.getContentAsString();
		assertThat(page).contains("was deleted by someone else", "Soon gone, edited", "action=\"/surfaces/new\"");
	}

	/**
	 * 40 edits of one surface from 8 threads, each from a freshly read version: saved or
	 * refused, never 5xx.
	 */
	@Test
	void shouldAnswerConcurrentEditsOfOneSurfaceWithoutServerErrors() throws Exception {
		long id = newSurface("Busy wedges");
		Map<Integer, AtomicInteger> statuses = run(40, 8, n -> {
			int v = surfaces.findById(id).orElseThrow().getVersion();
			return mvc
				.perform(
						StoredTextTest
							.potatoTo("/surfaces/" + id + "/edit", "name", "Busy wedges", "thicknessMm",
									String.valueOf(10 + n % 20), "version", String.valueOf(v))
							.with(CHEF))
				.andReturn()
				.getResponse()
				.getStatus();
		});
		System.out.printf("40 concurrent edits of one surface: %s (status: count)%n", statuses);
		assertThat(statuses.keySet()).as("statuses %s", statuses).allMatch(s -> s == 302 || s == 200);
		assertThat(statuses.get(302)).as("some edits are saved").isNotNull();
	}

	@Test
	void shouldAnswerConcurrentDeletesAndEditsRacingDeletesWithoutServerErrors() throws Exception {
		long id = newSurface("Delete me, all of you");
		Map<Integer, AtomicInteger> deletes = run(8, 8,
				n -> mvc.perform(post("/surfaces/{id}/delete", id).with(csrf()).with(CHEF))
					.andReturn()
					.getResponse()
					.getStatus());
		// each delete is done (302) or finds nothing left to delete (404 page): never a
		// 5xx
		assertThat(deletes.keySet()).as("statuses %s", deletes).allMatch(s -> s == 302 || s == 404);
		assertThat(surfaces.findById(id)).isEmpty();

		List<Long> ids = new ArrayList<>();
		for (int i = 0; i < 10; i++) {
			ids.add(newSurface("Edit or delete " + i));
		}
		Map<Integer, AtomicInteger> races = run(20, 8, n -> {
			long target = ids.get(n / 2);
			if (n % 2 == 0) {
				return mvc.perform(post("/surfaces/{id}/delete", target).with(csrf()).with(CHEF))
					.andReturn()
					.getResponse()
					.getStatus();
			}
			return mvc
				.perform(StoredTextTest.potatoTo("/surfaces/" + target + "/edit", "name", "Edited " + n, "version", "0")
					.with(CHEF))
				.andReturn()
				.getResponse()
				.getStatus();
		});
		System.out.printf("8 concurrent deletes: %s; 10 edits racing 10 deletes: %s%n", deletes, races);
		assertThat(races.keySet()).as("statuses %s", races).allMatch(s -> s == 302 || s == 200 || s == 404);
	}

	interface Call {

		int status(int n) throws Exception;

	}

	/**
	 * Runs {@code count} calls on {@code threads} threads; an exception thrown out of
	 * MockMvc counts as a 500.
	 */
	static Map<Integer, AtomicInteger> run(int count, int threads, Call call) throws Exception {
		Map<Integer, AtomicInteger> statuses = new ConcurrentHashMap<>();
		ExecutorService pool = Executors.newFixedThreadPool(threads);
		try {
			List<Future<?>> done = new ArrayList<>();
			for (int i = 0; i < count; i++) {
				int n = i;
				Callable<Object> task = () -> {
					int s;
					try {
						s = call.status(n);
					}
					catch (Exception e) {
						s = 500;
					}
					statuses.computeIfAbsent(s, k -> new AtomicInteger()).incrementAndGet();
					return null;
				};
				done.add(pool.submit(task));
			}
			for (Future<?> f : done) {
				f.get(120, TimeUnit.SECONDS);
			}
		}
		finally {
			pool.shutdownNow();
		}
		return statuses;
	}

	static Map<String, String> potato(String name, String waterPct, String version, String csrf) {
		Map<String, String> p = new LinkedHashMap<>();
		p.put("_csrf", csrf);
		p.put("version", version);
		p.put("name", name);
		p.put("category", "potato");
		p.put("waterPct", waterPct);
		p.put("proteinPct", "2");
		p.put("fatPct", "0.1");
		p.put("reducingSugarPct", "0.4");
		p.put("sucrosePct", "0.2");
		p.put("starchPct", "15.5");
		p.put("fibrePct", "1.8");
		p.put("ashPct", "1");
		p.put("asparagineMgPerKg", "3000");
		p.put("surfaceWaterGPerM2", "20");
		p.put("thicknessMm", "15");
		p.put("bicarbonateGPerKg", "0");
		p.put("acidGPerKg", "0");
		p.put("initialTemperature", "5");
		p.put("temperatureUnit", "C");
		return p;
	}

	/**
	 * A browser's session over real HTTP: its own cookies, CSRF tokens read from the
	 * pages.
	 */
	static final class Browser {

		final HttpClient http;

		final int port;

		Browser(int port) {
			this.port = port;
			this.http = HttpClient.newBuilder()
				.cookieHandler(new CookieManager())
				.followRedirects(HttpClient.Redirect.NEVER)
				.connectTimeout(Duration.ofSeconds(5))
				.build();
		}

		void signIn(String user, String password) throws Exception {
			String page = get("/signin");
			HttpResponse<String> r = post("/signin",
					Map.of("username", user, "password", password, "_csrf", field(page, "_csrf")));
			assertThat(r.statusCode()).as("sign-in of %s", user).isEqualTo(302);
			assertThat(r.headers().firstValue("Location").orElse("")).doesNotContain("error");
		}

		String get(String path) throws IOException, InterruptedException {
			HttpResponse<String> r = http.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + path))
				.timeout(Duration.ofSeconds(30))
				.build(), HttpResponse.BodyHandlers.ofString());
			assertThat(r.statusCode()).as("GET %s", path).isEqualTo(200);
			return r.body();
		}

		HttpResponse<String> post(String path, Map<String, String> form) throws IOException, InterruptedException {
			String body = form.entrySet()
				.stream()
				.map(e -> URLEncoder.encode(e.getKey(), StandardCharsets.UTF_8) + "="
						+ URLEncoder.encode(e.getValue(), StandardCharsets.UTF_8))
				.collect(Collectors.joining("&"));
			return http.send(HttpRequest.newBuilder(URI.create("http://localhost:" + port + path))
				.timeout(Duration.ofSeconds(30))
				.header("Content-Type", "application/x-www-form-urlencoded")
				.POST(HttpRequest.BodyPublishers.ofString(body))
				.build(), HttpResponse.BodyHandlers.ofString());
		}

		/** The value of the hidden input {@code name} on a page. */
		static String field(String page, String name) {
			Matcher m = Pattern.compile("<input[^>]*name=\"" + Pattern.quote(name) + "\"[^>]*value=\"([^\"]*)\"")
				.matcher(page);
			assertThat(m.find()).as("hidden field %s on the page", name).isTrue();
			return m.group(1);
		}

	}

}
