package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;

/**
 * A chef signs in, plans chips in the demo kitchen's fryer, and sees charts and swatches
 * drawn.
 */
@CrustplanTest
class PlanInBrowserTest {

	@LocalServerPort
	int port;

	@org.springframework.beans.factory.annotation.Autowired
	com.crustplan.DemoData demo;

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

	void signIn(String user, String password) {
		Browser.signIn(driver, url(""), user, password);
	}

	@Test
	void shouldPlanFromDemoDataAndDrawChartsAndSwatches() throws Exception {
		signIn("chef", "chef-demo");
		driver.get(url("/plan"));
		new Select(driver.findElement(By.id("surfaceId"))).selectByVisibleText("Chips, 10 mm, blanched");
		new Select(driver.findElement(By.id("setupId"))).selectByContainsVisibleText("Fryer, chips");
		// the page offers only the stages of the chosen surface's category
		driver.findElement(By.cssSelector("#targetStage optgroup[data-category=potato] option[value=golden]")).click();
		driver.findElement(By.id("run-plan")).click();

		WebElement charts = new WebDriverWait(driver, Duration.ofSeconds(20))
			.until(d -> d.findElement(By.id("charts")));
		new WebDriverWait(driver, Duration.ofSeconds(10))
			.until(d -> "true".equals(charts.getDomAttribute("data-rendered")));

		List<WebElement> canvases = driver.findElements(By.cssSelector("#charts canvas"));
		assertThat(canvases).hasSize(3);
		for (WebElement c : canvases) {
			// Chart.js sizes the canvas to its box; a chart that failed to draw leaves it
			// 0 × 0
			Dimension size = c.getSize();
			assertThat(size.getWidth()).isGreaterThan(200);
			assertThat(size.getHeight()).isGreaterThan(150);
			// some pixels drawn: a blank canvas is all transparent
			Object painted = ((JavascriptExecutor) driver)
				.executeScript("var c=arguments[0],x=c.getContext('2d').getImageData(0,0,c.width,c.height).data;"
						+ "for(var i=3;i<x.length;i+=4){if(x[i]>0)return true;}return false;", c);
			assertThat(painted).isEqualTo(true);
		}
		List<WebElement> swatches = driver.findElements(By.cssSelector("#swatches li .swatch"));
		assertThat(swatches).hasSizeGreaterThanOrEqualTo(5);
		assertThat(swatches.get(0).getCssValue("background-color")).startsWith("rgb");
		assertThat(driver.findElements(By.cssSelector("#swatches li.target"))).hasSize(1);
		assertThat(driver.findElement(By.id("time-to-target")).getText()).matches("\\d+ min \\d{2} s|\\d+ s");

		((JavascriptExecutor) driver).executeScript("document.body.style.zoom='1'");
		driver.manage().window().setSize(new Dimension(1280, 2600));
		Path shot = Browser.screenshot(driver, "plan-chips-fryer");
		assertThat(Files.size(shot)).isGreaterThan(10_000);

		// the plan's risk map: one row per set temperature, cells coloured, the target
		// cell outlined
		driver.findElement(By.id("risk-map-link")).click();
		assertThat(driver.findElements(By.cssSelector("#risk-map tbody tr"))).hasSizeGreaterThanOrEqualTo(9);
		assertThat(driver.findElements(By.cssSelector("#risk-map td.risk-target"))).isNotEmpty();
		driver.manage().window().setSize(new Dimension(1280, 1100));
		Browser.screenshot(driver, "risk-map-chips-fryer");
	}

	@Test
	void shouldSwitchToFahrenheitAndFitATablet() throws Exception {
		signIn("chef", "chef-demo");
		driver.manage().window().setSize(new Dimension(820, 1180));
		driver.get(url("/plan?surfaceId=" + demo.surface("Sirloin steak, 30 mm, patted dry") + "&setupId="
				+ demo.setup("Plancha, high") + "&targetStage=browned"));
		driver.findElement(By.cssSelector("form.units button[value=F]")).click();
		new WebDriverWait(driver, Duration.ofSeconds(20))
			.until(d -> "true".equals(d.findElement(By.id("charts")).getDomAttribute("data-rendered")));
		// the page came back to the same plan, now in °F
		assertThat(driver.findElement(By.cssSelector(".summary .facts")).getText()).contains("°F");
		assertThat(driver.findElement(By.id("charts")).getDomAttribute("data-plan")).contains("\"unit\":\"°F\"");
		Object overflow = ((JavascriptExecutor) driver)
			.executeScript("return document.documentElement.scrollWidth > window.innerWidth + 1;");
		assertThat(overflow).as("no sideways scrolling on a tablet").isEqualTo(false);
		driver.manage().window().setSize(new Dimension(820, 3400));
		Browser.screenshot(driver, "plan-tablet-fahrenheit");
		driver.findElement(By.cssSelector("form.units button[value=C]")).click();
	}

	@Test
	void shouldShowSurfacesFormAndModelPagesForScreenshots() throws Exception {
		signIn("chef", "chef-demo");
		driver.manage().window().setSize(new Dimension(1280, 1400));
		driver.get(url("/surfaces"));
		assertThat(driver.findElements(By.cssSelector("tbody tr")).size()).isGreaterThanOrEqualTo(8);
		Browser.screenshot(driver, "surfaces");
		driver.get(url("/surfaces/new?category=potato"));
		assertThat(driver.findElement(By.id("waterPct")).getDomProperty("value")).isEqualTo("79");
		Browser.screenshot(driver, "surface-form");
		driver.get(url("/setups"));
		Browser.screenshot(driver, "setups");
		driver.get(url("/model"));
		assertThat(driver.findElements(By.cssSelector("table.params tbody tr")).size()).isGreaterThan(20);
		Browser.screenshot(driver, "model");
		driver.get(url("/signin"));
		Browser.screenshot(driver, "signin");
	}

}
