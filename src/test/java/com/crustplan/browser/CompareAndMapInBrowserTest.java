package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * The risk map's "target reached" column in view without scrolling sideways at 1280 px
 * and whole at 800 px (a tablet); the compare and find-a-setting pages without sideways
 * overflow at 800 px.
 */
@CrustplanTest
class CompareAndMapInBrowserTest {

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

	void signIn() {
		Browser.signIn(driver, url(""), "chef", "chef-demo");
	}

	double js(String script, Object... args) {
		return ((Number) ((JavascriptExecutor) driver).executeScript(script, args)).doubleValue();
	}

	/** The viewport's width in CSS pixels, scrollbars excluded. */
	double viewport() {
		return js("return document.documentElement.clientWidth;");
	}

	@ParameterizedTest(name = "{0} on {1} at {3} px")
	@CsvSource(delimiter = '|',
			value = { "Onion halves, cut face down|Cast-iron skillet, medium-high|golden|1280",
					"Sourdough loaf|Deck oven, bread|golden|1280", "Chips, 10 mm, blanched|Fryer, chips|golden|1280",
					"Onion halves, cut face down|Cast-iron skillet, medium-high|golden|800",
					"Sourdough loaf|Deck oven, bread|golden|800" })
	void shouldKeepTheTargetReachedColumnInView(String surface, String setup, String stage, int width)
			throws Exception {
		signIn();
		driver.manage().window().setSize(new Dimension(width, 900));
		driver.get(url("/plan/risk-map?surfaceId=" + demo.surface(surface) + "&setupId=" + demo.setup(setup)
				+ "&targetStage=" + stage));
		WebElement head = driver.findElement(By.cssSelector("#risk-map thead th.risk-reached"));
		WebElement wrap = driver.findElement(By.cssSelector(".table-wrap"));
		double right = js("return arguments[0].getBoundingClientRect().right;", head);
		double left = js("return arguments[0].getBoundingClientRect().left;", head);
		double wrapRight = js("return arguments[0].getBoundingClientRect().right;", wrap);
		assertThat(left).isGreaterThanOrEqualTo(0);
		assertThat(right).as("right edge of 'Target reached'").isLessThanOrEqualTo(Math.min(viewport(), wrapRight));
		// every row's cell of the column whole too, not cut mid-cell
		for (WebElement td : driver.findElements(By.cssSelector("#risk-map tbody td.risk-reached"))) {
			assertThat(js("return arguments[0].getBoundingClientRect().right;", td)).isLessThanOrEqualTo(wrapRight);
		}
		// scrolled sideways, the set temperature and the target time stay put
		js("arguments[0].scrollLeft = 10000; return 0;", wrap);
		assertThat(js("return arguments[0].getBoundingClientRect().right;", head)).isCloseTo(right,
				org.assertj.core.data.Offset.offset(1.0));
		js("arguments[0].scrollLeft = 0; return 0;", wrap);
		Browser.screenshot(driver, "risk-map-" + demo.setup(setup) + "-" + width);
	}

	@Test
	void shouldCompareFromTheListAndHoldTheLayoutAt800Px() throws Exception {
		signIn();
		driver.manage().window().setSize(new Dimension(800, 1000));
		driver.get(url("/plans"));
		var boxes = driver.findElements(By.cssSelector("input[name=ids]"));
		assertThat(boxes).hasSizeGreaterThanOrEqualTo(2);
		boxes.get(0).click();
		boxes.get(1).click();
		driver.findElement(By.cssSelector("#compare-form button")).click();
		new WebDriverWait(driver, Duration.ofSeconds(20)).until(d -> d.getCurrentUrl().contains("/plans/compare"));
		new WebDriverWait(driver, Duration.ofSeconds(10))
			.until(d -> "true".equals(d.findElement(By.id("compare-charts")).getDomAttribute("data-rendered")));
		assertThat(driver.findElements(By.cssSelector("#compare-table thead th"))).hasSize(3);
		assertThat(js("return document.documentElement.scrollWidth;")).as("page width at 800 px")
			.isLessThanOrEqualTo(viewport());
		Browser.screenshot(driver, "compare-800");
		driver.get(url("/plans/search?surfaceId=" + demo.surface("Chips, 10 mm, blanched") + "&setupId="
				+ demo.setup("Fryer, chips") + "&targetStage=golden&withinMinutes=3&fromT=150&toT=170&stepT=10"));
		assertThat(driver.findElement(By.id("search-alternatives")).isDisplayed()).isTrue();
		assertThat(js("return document.documentElement.scrollWidth;")).isLessThanOrEqualTo(viewport());
		Browser.screenshot(driver, "search-800");
	}

}
