package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

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
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/**
 * A chef plans a thick steak in steps (sear, oven to 52 °C core, rest) and reads the
 * bands and the timeline.
 */
@CrustplanTest
class PlanStepsInBrowserTest {

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

	void step(int i, String setup, String minutes, String core) {
		new Select(driver.findElement(By.id("steps" + i + "-setup"))).selectByContainsVisibleText(setup);
		if (minutes != null) {
			driver.findElement(By.id("steps" + i + "-minutes")).sendKeys(minutes);
		}
		if (core != null) {
			driver.findElement(By.id("steps" + i + "-core")).sendKeys(core);
		}
	}

	@Test
	void shouldPlanSearOvenRestAndShowBandsAndTimeline() throws Exception {
		signIn();
		driver.get(url("/plan"));
		new Select(driver.findElement(By.id("surfaceId"))).selectByVisibleText("Sirloin steak, 30 mm, patted dry");
		driver.findElement(By.cssSelector("#targetStage optgroup[data-category=meat] option[value=light-sear]"))
			.click();
		driver.findElement(By.id("coreTarget")).sendKeys("52");
		step(0, "Plancha, high", "3", null);
		driver.findElement(By.id("add-step")).click();
		step(1, "Fan oven, dry, roast finish", "40", "52");
		driver.findElement(By.id("add-step")).click();
		step(2, "Rest in kitchen air", "5", null);
		// the one-setup choice is not used once there are steps, and the page says so by
		// dimming it
		assertThat(driver.findElement(By.id("setupId")).findElement(By.xpath("..")).getDomAttribute("class"))
			.contains("unused");
		driver.findElement(By.id("run-plan")).click();

		WebElement charts = new WebDriverWait(driver, Duration.ofSeconds(30))
			.until(d -> d.findElement(By.id("charts")));
		new WebDriverWait(driver, Duration.ofSeconds(10))
			.until(d -> "true".equals(charts.getDomAttribute("data-rendered")));
		assertThat(charts.getDomAttribute("data-bands")).isEqualTo("3");
		// a band is painted where the oven step runs: sample the temperature chart inside
		// it
		Object shaded = ((JavascriptExecutor) driver).executeScript("""
				var c = document.getElementById('chart-temperature'), ch = Chart.getChart(c);
				var b = JSON.parse(document.getElementById('charts').dataset.plan).steps[1];
				var x = ch.scales.x.getPixelForValue((b.fromMin + b.toMin) / 2) * (c.width / c.clientWidth);
				var y = (ch.chartArea.bottom - 4) * (c.height / c.clientHeight);
				var p = c.getContext('2d').getImageData(Math.round(x), Math.round(y), 1, 1).data;
				return p[3] > 0 && p[2] > p[0];""");
		assertThat(shaded).as("oven band is blue-grey").isEqualTo(true);

		List<String> timeline = driver.findElements(By.cssSelector("#timeline li"))
			.stream()
			.map(WebElement::getText)
			.toList();
		assertThat(timeline).contains("0:00 Into the pan at 230 °C", "1:00 Flip", "2:00 Flip",
				"3:00 Into the oven at 180 °C");
		assertThat(timeline).anyMatch(t -> t.matches("\\d+:\\d{2} Probe the core: about 47 °C now, pull at 52 °C"));
		assertThat(timeline).anyMatch(t -> t.matches("\\d+:\\d{2} Pull at 52 °C core"));
		assertThat(timeline).anyMatch(t -> t.matches("\\d+:\\d{2} Out to rest in 25 °C air"));
		assertThat(timeline.get(timeline.size() - 1)).matches("\\d+:\\d{2} Done: core \\d+ °C, surface \\d+ °C");
		assertThat(driver.findElements(By.cssSelector("#steps-table tbody tr"))).hasSize(3);
		assertThat(driver.findElement(By.id("core-target-time")).getText()).matches("at \\d+:\\d{2}");

		driver.manage().window().setSize(new Dimension(1280, 3000));
		Browser.screenshot(driver, "plan-steps-1280");
		driver.manage().window().setSize(new Dimension(800, 4200));
		Browser.screenshot(driver, "plan-steps-800");
		Object overflow = ((JavascriptExecutor) driver)
			.executeScript("return document.documentElement.scrollWidth > window.innerWidth + 1;");
		assertThat(overflow).as("no sideways scrolling at 800 px").isEqualTo(false);
	}

}
