package com.crustplan.browser;

import java.io.File;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;

import org.junit.jupiter.api.Assumptions;
import org.openqa.selenium.By;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.TakesScreenshot;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * Headless Debian Chromium for the browser tests. Where Chromium or its driver is missing
 * (a laptop without them) the tests are skipped with a message; CI installs both
 * (.ci/run).
 */
final class Browser {

	static final File CHROMIUM = new File("/usr/bin/chromium");

	static final File DRIVER = new File("/usr/bin/chromedriver");

	private Browser() {
	}

	static WebDriver start() {
		Assumptions.assumeTrue(CHROMIUM.canExecute() && DRIVER.canExecute(),
				"Browser tests skipped: /usr/bin/chromium and /usr/bin/chromedriver are needed "
						+ "(apt-get install chromium chromium-driver)");
		ChromeOptions options = new ChromeOptions();
		options.setBinary(CHROMIUM);
		options.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
				"--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
				"--window-size=1280,900");
		ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER).build();
		WebDriver driver = new ChromeDriver(service, options);
		driver.manage().timeouts().implicitlyWait(Duration.ofSeconds(2));
		return driver;
	}

	/** Signs in through the sign-in page and waits until it has been left. */
	static void signIn(WebDriver driver, String baseUrl, String user, String password) {
		driver.get(baseUrl + "/signin");
		driver.findElement(By.id("username")).sendKeys(user);
		driver.findElement(By.id("password")).sendKeys(password);
		driver.findElement(By.cssSelector("form.stack button[type=submit]")).click();
		new WebDriverWait(driver, Duration.ofSeconds(10)).until(d -> !d.getCurrentUrl().contains("/signin"));
	}

	/** A full-page PNG under target/screenshots/, for a person to look at. */
	static Path screenshot(WebDriver driver, String name) throws IOException {
		Path dir = Path.of("target", "screenshots");
		Files.createDirectories(dir);
		Path file = dir.resolve(name + ".png");
		byte[] png = ((TakesScreenshot) driver).getScreenshotAs(OutputType.BYTES);
		Files.write(file, png);
		return file;
	}

}
