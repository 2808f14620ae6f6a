package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;

/** Sign in, create a surface, plan and save with it; a cook is refused an edit. */
@CrustplanTest
class KitchenWorkflowInBrowserTest {

	@LocalServerPort
	int port;

	@Autowired
	DemoData demo;

	WebDriver driver;

	@BeforeEach
	void start() {
		driver = Browser.start();
		driver.manage().window().setSize(new Dimension(1280, 1400));
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

	WebDriverWait waiting() {
		return new WebDriverWait(driver, Duration.ofSeconds(20));
	}

	void signIn(String user, String password) {
		driver.get(url("/signin"));
		driver.findElement(By.id("username")).sendKeys(user);
		driver.findElement(By.id("password")).sendKeys(password);
		driver.findElement(By.cssSelector("form.stack button[type=submit]")).click();
		waiting().until(d -> !d.getCurrentUrl().contains("/signin"));
	}

	void type(String id, String value) {
		WebElement e = driver.findElement(By.id(id));
		e.clear();
		e.sendKeys(value);
	}

	@Test
	void shouldRefuseAWrongPasswordThenSignIn() throws Exception {
		driver.get(url("/signin"));
		driver.findElement(By.id("username")).sendKeys("chef");
		driver.findElement(By.id("password")).sendKeys("not the password");
		driver.findElement(By.cssSelector("form.stack button[type=submit]")).click();
		waiting().until(d -> d.getCurrentUrl().contains("error"));
		assertThat(driver.findElement(By.cssSelector(".alert")).getText()).contains("do not match");
		Browser.screenshot(driver, "signin-refused");
		signIn("chef", "chef-demo");
		assertThat(driver.findElement(By.cssSelector(".who")).getText()).contains("chef");
	}

	@Test
	void shouldCreateASurfaceThenPlanAndSaveWithIt() throws Exception {
		signIn("chef", "chef-demo");
		driver.get(url("/surfaces/new"));
		new Select(driver.findElement(By.id("category"))).selectByValue("vegetable");
		driver.findElement(By.id("fill-defaults")).click();
		// the typical vegetable water, 89 % (the category's default composition), filled
		// in by the button
		assertThat(driver.findElement(By.id("waterPct")).getDomProperty("value")).isEqualTo("89");
		type("name", "Shallot halves (browser test)");
		type("thicknessMm", "18");
		Browser.screenshot(driver, "surface-new-filled");
		driver.findElement(By.cssSelector("#surface-form button[type=submit]")).click();
		waiting().until(d -> d.findElements(By.cssSelector(".flash")).size() > 0);
		assertThat(driver.findElement(By.cssSelector(".flash")).getText()).contains("Shallot halves (browser test)");
		assertThat(driver.findElement(By.tagName("h1")).getText()).isEqualTo("Shallot halves (browser test)");
		Browser.screenshot(driver, "surface-show");

		driver.findElement(By.linkText("Plan with this surface")).click();
		new Select(driver.findElement(By.id("setupId"))).selectByContainsVisibleText("Cast-iron skillet");
		driver.findElement(By.cssSelector("#targetStage optgroup[data-category=vegetable] option[value=golden]"))
			.click();
		driver.findElement(By.id("run-plan")).click();
		waiting().until(d -> "true".equals(d.findElement(By.id("charts")).getDomAttribute("data-rendered")));
		type("name", "Shallots for the tart");
		driver.findElement(By.cssSelector("#save-plan button[type=submit]")).click();
		waiting().until(d -> d.getCurrentUrl().matches(".*/plans/\\d+$"));
		assertThat(driver.findElement(By.cssSelector(".flash")).getText()).contains("Shallots for the tart");
		assertThat(driver.findElements(By.cssSelector("#swatches li"))).hasSizeGreaterThanOrEqualTo(5);
		driver.manage().window().setSize(new Dimension(1280, 2600));
		Browser.screenshot(driver, "plan-saved");
	}

	@Test
	void shouldLetTheAdministratorManageUsers() throws Exception {
		signIn("admin", "admin-test-passphrase");
		driver.findElement(By.linkText("Users")).click();
		assertThat(driver.findElement(By.tagName("h1")).getText()).isEqualTo("Users");
		driver.findElement(By.linkText("New user")).click();
		type("username", "pastry");
		new Select(driver.findElement(By.id("role"))).selectByValue("COOK");
		type("password", "croissant dough 24h");
		driver.findElement(By.cssSelector("form.entry button[type=submit]")).click();
		waiting().until(d -> d.findElements(By.cssSelector(".flash")).size() > 0);
		assertThat(driver.findElement(By.cssSelector("tbody")).getText()).contains("pastry");
		Browser.screenshot(driver, "admin-users");
	}

	@Test
	void shouldRefuseACookAnEdit() throws Exception {
		signIn("cook", "cook-demo");
		long id = demo.surface("Sirloin steak, 30 mm, patted dry");
		driver.get(url("/surfaces/" + id));
		// a cook sees the surface but no edit controls
		assertThat(driver.findElements(By.linkText("Edit"))).isEmpty();
		driver.get(url("/surfaces/" + id + "/edit"));
		assertThat(driver.findElement(By.tagName("h1")).getText()).isEqualTo("Your role does not allow this");
		Browser.screenshot(driver, "cook-refused-edit");
	}

}
