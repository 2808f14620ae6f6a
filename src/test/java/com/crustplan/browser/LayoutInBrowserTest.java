package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * The pages hold at tablet and desktop widths in both units: no element reaches past the
 * right edge of the viewport (a cut-off column, a sideways scroll, text running out of
 * its card). Screenshots of each page at 800 px go under target/screenshots/layout-*.png.
 */
@CrustplanTest
class LayoutInBrowserTest {

	/** A tablet held upright, a small laptop and a desktop (common practice). */
	static final int[] WIDTHS = { 800, 1024, 1280 };

	@LocalServerPort
	int port;

	@Autowired
	DemoData demo;

	WebDriver driver;

	@BeforeEach
	void start() {
		driver = Browser.start();
	}

	@AfterEach
	void stop() {
		if (driver != null) {
			driver.quit();
		}
	}

	String url(String path) {
		return "http://localhost:" + port + path;
	}

	/**
	 * What sticks out past the viewport's right edge: the page itself when it scrolls
	 * sideways, and each visible element whose box ends beyond the edge (a pixel of
	 * rounding allowed). Elements inside a hidden overflow are clipped and not seen.
	 */
	static final String OVERFLOW = """
			var framed = arguments[0], w = document.documentElement.clientWidth, out = [];
			function inFrame(el) {
			  for (var p = el.parentElement; p && p !== document.body; p = p.parentElement) {
			    var o = getComputedStyle(p).overflowX;
			    if ((o === 'auto' || o === 'scroll' || o === 'hidden') && p.getBoundingClientRect().right <= w + 1) { return true; }
			  }
			  return false;
			}
			if (document.documentElement.scrollWidth > w + 1) {
			  out.push('page scrolls sideways: ' + document.documentElement.scrollWidth + ' > ' + w);
			}
			document.querySelectorAll('body *').forEach(function (el) {
			  var r = el.getBoundingClientRect();
			  if (r.width === 0 || r.height === 0 || getComputedStyle(el).visibility === 'hidden') { return; }
			  if (r.right > w + 1 && !(framed && inFrame(el))) {
			    var name = el.tagName.toLowerCase() + (el.id ? '#' + el.id : '') + (el.className && typeof el.className === 'string' ? '.' + el.className.trim().split(/\\s+/).join('.') : '');
			    out.push(name + ' ' + Math.round(r.left) + '–' + Math.round(r.right) + ' "' + (el.textContent || '').trim().slice(0, 40) + '"');
			  }
			});
			return out.slice(0, 12);
			""";

	void signIn() {
		Browser.signIn(driver, url(""), "chef", "chef-demo");
	}

	void unit(String code) {
		driver.get(url("/surfaces"));
		driver.findElement(By.cssSelector("form.units button[value=" + code + "]")).click();
		new WebDriverWait(driver, Duration.ofSeconds(10))
			.until(d -> d.findElement(By.cssSelector("form.units button.on")).getDomAttribute("value").equals(code));
	}

	List<String> pages() {
		long chips = demo.surface("Chips, 10 mm, blanched");
		long fryer = demo.setup("Fryer, chips");
		long roast = demo.surface("Roast potatoes, parboiled with bicarbonate");
		long oven = demo.setup("Fan oven, dry, roast finish");
		return List.of("/surfaces", "/surfaces/" + chips, "/surfaces/" + chips + "/edit", "/setups", "/setups/" + fryer,
				"/plans", "/plans/" + demo.plan("Chips: blanch, rest, finish"),
				"/plan?surfaceId=" + chips + "&setupId=" + fryer + "&targetStage=golden",
				"/plan?surfaceId=" + roast + "&setupId=" + oven + "&targetStage=golden",
				"/plan/risk-map?surfaceId=" + chips + "&setupId=" + fryer + "&targetStage=golden");
	}

	/**
	 * Pages of features that may not be on this branch (the station card, the
	 * comparison): checked wherever the server has them.
	 */
	List<String> optionalPages() {
		long a = demo.plan("Chips: blanch, rest, finish");
		long b = demo.plan("Sourdough: steam, then dry bake");
		return List.of("/plans/" + a + "/card", "/plans/compare?ids=" + a + "," + b);
	}

	boolean served(String page) {
		Object status = ((JavascriptExecutor) driver).executeAsyncScript(
				"var done = arguments[arguments.length - 1]; fetch(arguments[0]).then(function (r) { done(r.status); }, function () { done(0); });",
				url(page));
		return ((Number) status).intValue() == 200;
	}

	/**
	 * Pages whose one wide grid may still scroll inside its own frame: the page itself
	 * must not scroll sideways and nothing outside the frame may stick out. The risk
	 * map's grid is being reworked for readability; once it fits, it leaves this list.
	 */
	static boolean framed(String page) {
		return page.startsWith("/plan/risk-map");
	}

	@Test
	void noPageOverflowsTheViewportAtTabletOrDesktopWidthInEitherUnit() throws Exception {
		signIn();
		driver.manage().timeouts().scriptTimeout(Duration.ofSeconds(30));
		List<String> all = new ArrayList<>(pages());
		driver.get(url("/plans"));
		for (String page : optionalPages()) {
			if (served(page)) {
				all.add(page);
			}
		}
		List<String> problems = new ArrayList<>();
		for (String code : new String[] { "C", "F" }) {
			unit(code);
			for (int width : WIDTHS) {
				driver.manage().window().setSize(new Dimension(width, 1000));
				for (String page : all) {
					driver.get(url(page));
					new WebDriverWait(driver, Duration.ofSeconds(20))
						.until(d -> ((JavascriptExecutor) d).executeScript("return document.readyState")
							.equals("complete"));
					@SuppressWarnings("unchecked")
					List<String> out = (List<String>) ((JavascriptExecutor) driver).executeScript(OVERFLOW,
							framed(page));
					if (!out.isEmpty()) {
						problems.add(width + " px, °" + code + ", " + page + ": " + String.join("; ", out));
					}
					if (width == 800) {
						String name = "layout-" + code + "-"
								+ page.toLowerCase(java.util.Locale.ROOT)
									.replaceAll("[^a-z0-9]+", "-")
									.replaceAll("^-|-$", "");
						driver.manage().window().setSize(new Dimension(800, fullHeight()));
						Browser.screenshot(driver, name.length() > 80 ? name.substring(0, 80) : name);
						driver.manage().window().setSize(new Dimension(800, 1000));
					}
				}
			}
		}
		assertThat(problems).as("elements past the right edge").isEmpty();
	}

	/**
	 * A native select cannot wrap: every option's text, measured in the select's own
	 * font, fits inside the box less its padding and the drop-down arrow (20 px, an
	 * allowance for Chromium's arrow).
	 */
	static final String SELECT_CUTS = """
			var out = [];
			document.querySelectorAll('form select').forEach(function (s) {
			  var cs = getComputedStyle(s), c = document.createElement('canvas').getContext('2d');
			  c.font = cs.font;
			  var room = s.clientWidth - parseFloat(cs.paddingLeft) - parseFloat(cs.paddingRight) - 20;
			  for (var i = 0; i < s.options.length; i++) {
			    var w = c.measureText(s.options[i].text).width;
			    if (w > room) { out.push('#' + s.id + ' "' + s.options[i].text + '" ' + Math.round(w) + ' > ' + Math.round(room) + ' px'); }
			  }
			});
			return out;
			""";

	@Test
	void shouldShowTheWholeTextOfEveryOptionOnTheSurfaceFormAtTabletAndDesktopWidth() {
		signIn();
		List<String> problems = new ArrayList<>();
		for (int width : new int[] { 800, 1280 }) {
			driver.manage().window().setSize(new Dimension(width, 1000));
			for (String page : List.of("/surfaces/new",
					"/surfaces/" + demo.surface("Roast potatoes, parboiled with bicarbonate") + "/edit")) {
				driver.get(url(page));
				@SuppressWarnings("unchecked")
				List<String> out = (List<String>) ((JavascriptExecutor) driver).executeScript(SELECT_CUTS);
				out.forEach(o -> problems.add(width + " px, " + page + ": " + o));
			}
		}
		assertThat(problems).as("option text cut off").isEmpty();
	}

	int fullHeight() {
		Object h = ((JavascriptExecutor) driver).executeScript("return document.documentElement.scrollHeight");
		return (int) Math.min(6000, ((Number) h).longValue() + 40);
	}

}
