package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.time.Duration;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.Alert;
import org.openqa.selenium.By;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;
import com.crustplan.engine.food.FoodCategory;

/**
 * A new category on the surface form brings its composition with it: at once over the old
 * category's values, after asking over values the chef typed.
 */
@CrustplanTest
class CategorySwitchInBrowserTest {

	@LocalServerPort
	int port;

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

	String value(String id) {
		return driver.findElement(By.id(id)).getDomProperty("value");
	}

	String plain(double v) {
		return v == Math.rint(v) ? String.valueOf((long) v) : String.valueOf(v);
	}

	@Test
	void shouldRefillAtOnceOverTheOldDefaultsAndAskOverTypedValues() {
		signIn();
		driver.get(url("/surfaces/new?category=meat"));
		// untouched meat defaults: potato's composition comes at once
		new Select(driver.findElement(By.id("category"))).selectByValue("potato");
		assertThat(value("asparagineMgPerKg")).isEqualTo(plain(FoodCategory.POTATO.defaultAsparagineMgPerKg()));
		// a typed value: the page asks first; cancel keeps it
		WebElement asn = driver.findElement(By.id("asparagineMgPerKg"));
		asn.clear();
		asn.sendKeys("2500");
		new Select(driver.findElement(By.id("category"))).selectByValue("bread");
		Alert ask = new WebDriverWait(driver, Duration.ofSeconds(5)).until(ExpectedConditions.alertIsPresent());
		assertThat(ask.getText()).contains("typical values");
		ask.dismiss();
		assertThat(value("asparagineMgPerKg")).isEqualTo("2500");
		// asked again on the next switch, and accepted: the new category's values
		new Select(driver.findElement(By.id("category"))).selectByValue("vegetable");
		new WebDriverWait(driver, Duration.ofSeconds(5)).until(ExpectedConditions.alertIsPresent()).accept();
		assertThat(value("asparagineMgPerKg")).isEqualTo(plain(FoodCategory.VEGETABLE.defaultAsparagineMgPerKg()));
	}

}
