package com.crustplan.browser;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Base64;
import java.util.Map;

import javax.imageio.ImageIO;

import com.google.zxing.BinaryBitmap;
import com.google.zxing.DecodeHintType;
import com.google.zxing.RGBLuminanceSource;
import com.google.zxing.ReaderException;
import com.google.zxing.common.HybridBinarizer;
import com.google.zxing.qrcode.QRCodeReader;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.rendering.ImageType;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.PrintsPage;
import org.openqa.selenium.WebDriver;
import org.openqa.selenium.print.PageSize;
import org.openqa.selenium.print.PrintOptions;
import org.openqa.selenium.support.ui.WebDriverWait;
import org.springframework.beans.factory.annotation.Autowired;
import org.springframework.boot.test.web.server.LocalServerPort;

import com.crustplan.CrustplanTest;
import com.crustplan.DemoData;
import com.crustplan.plan.PlanInputs;
import com.crustplan.plan.PlanService;
import com.crustplan.plan.SavedPlanService;
import com.crustplan.setup.SetupForm;
import com.crustplan.setup.SetupService;
import com.crustplan.surface.SurfaceForm;
import com.crustplan.surface.SurfaceService;
import com.crustplan.system.TemperatureUnit;

/**
 * The station card printed by Chromium's own print-to-PDF, as a cook's browser prints it
 * by default (background graphics off): one page on ISO 216 A5 and A6 paper, with the
 * target colour in the PDF's pixels. Also the saved plan page's print form: no menu, no
 * Sign out, no Delete.
 */
@CrustplanTest
class StationCardInBrowserTest {

	/** ISO 216 A5, 148 × 210 mm, in the centimetres WebDriver print takes. */
	static final PageSize A5 = new PageSize(21.0, 14.8);

	/** ISO 216 A6, 105 × 148 mm. */
	static final PageSize A6 = new PageSize(14.8, 10.5);

	/** PDF points per millimetre (72 pt to the inch, ISO 32000-1 user space). */
	static final double PT_PER_MM = 72 / 25.4;

	/**
	 * A pixel counts as the swatch's colour within this many 8-bit steps per channel: PDF
	 * colour conversion and anti-aliased edges move a flat fill by a step or two.
	 */
	static final int COLOUR_STEPS = 6;

	static final String[] DEMO_PLANS = { "Thick steak: sear, oven to 52 °C, rest", "Chips: blanch, rest, finish",
			"Sourdough: steam, then dry bake", "Steak: sear both sides, butter baste" };

	@LocalServerPort
	int port;

	@Autowired
	SurfaceService surfaces;

	@Autowired
	SetupService setups;

	@Autowired
	PlanService planner;

	@Autowired
	SavedPlanService saved;

	/** A one-setup plan saved as the plan page saves it. */
	long saveOneSetup(String surface, String setup, String stage) {
		PlanInputs in = new PlanInputs(SurfaceForm.of(surfaces.get(demo.surface(surface)), TemperatureUnit.CELSIUS),
				SetupForm.of(setups.get(demo.setup(setup)), TemperatureUnit.CELSIUS), stage, null, 60);
		return saved.save(surface + " card", surface, setup, in, planner.plan(in), "chef").getId();
	}

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

	/** The open page printed as the browser's print command would, backgrounds off. */
	byte[] print(PageSize size) {
		PrintOptions options = new PrintOptions();
		options.setPageSize(size);
		options.setBackground(false);
		options.setShrinkToFit(false);
		return Base64.getDecoder().decode(((PrintsPage) driver).print(options).getContent());
	}

	static Path keep(String name, byte[] pdf) throws Exception {
		Path dir = Path.of("target", "screenshots");
		Files.createDirectories(dir);
		Files.write(dir.resolve(name + ".pdf"), pdf);
		try (PDDocument doc = Loader.loadPDF(pdf)) {
			for (int p = 0; p < doc.getNumberOfPages(); p++) {
				ImageIO.write(new PDFRenderer(doc).renderImageWithDPI(p, 110, ImageType.RGB), "png",
						dir.resolve(name + "-pdf" + (p == 0 ? "" : "-" + (p + 1)) + ".png").toFile());
			}
		}
		return dir.resolve(name + ".pdf");
	}

	static long pixelsOf(BufferedImage image, String hex) {
		int r = Integer.parseInt(hex.substring(1, 3), 16);
		int g = Integer.parseInt(hex.substring(3, 5), 16);
		int b = Integer.parseInt(hex.substring(5, 7), 16);
		long n = 0;
		for (int y = 0; y < image.getHeight(); y++) {
			for (int x = 0; x < image.getWidth(); x++) {
				int p = image.getRGB(x, y);
				if (Math.abs(((p >> 16) & 0xff) - r) <= COLOUR_STEPS && Math.abs(((p >> 8) & 0xff) - g) <= COLOUR_STEPS
						&& Math.abs((p & 0xff) - b) <= COLOUR_STEPS) {
					n++;
				}
			}
		}
		return n;
	}

	/** The QR code on a rendered page, as ZXing reads it (300 dpi: an office printer). */
	static String readQr(BufferedImage image, String what) {
		int[] rgb = image.getRGB(0, 0, image.getWidth(), image.getHeight(), null, 0, image.getWidth());
		BinaryBitmap bitmap = new BinaryBitmap(
				new HybridBinarizer(new RGBLuminanceSource(image.getWidth(), image.getHeight(), rgb)));
		try {
			return new QRCodeReader().decode(bitmap, Map.of(DecodeHintType.TRY_HARDER, true)).getText();
		}
		catch (ReaderException e) {
			throw new AssertionError(what + ": no QR code read from the printed page", e);
		}
	}

	@Test
	void shouldPrintEveryDemoCardOnOnePageAtA5AndA6WithTheTargetColourInThePixels() throws Exception {
		signIn();
		String[] names = new String[DEMO_PLANS.length + 2];
		long[] ids = new long[names.length];
		for (int i = 0; i < DEMO_PLANS.length; i++) {
			names[i] = DEMO_PLANS[i];
			ids[i] = demo.plan(DEMO_PLANS[i]);
		}
		// one-setup plans: a fryer and an oven, with their own cautions and code minimum
		names[DEMO_PLANS.length] = "chips in one fry";
		ids[DEMO_PLANS.length] = saveOneSetup("Chips, 10 mm, blanched", "Fryer, chips", "golden");
		names[DEMO_PLANS.length + 1] = "chicken thighs in the oven";
		ids[DEMO_PLANS.length + 1] = saveOneSetup("Chicken thigh, skin on", "Combi oven, dry fan", "golden");
		for (int i = 0; i < names.length; i++) {
			long id = ids[i];
			for (String size : new String[] { "a5", "a6" }) {
				driver.get(url("/plans/" + id + "/card" + (size.equals("a6") ? "?size=a6" : "")));
				String hex = driver.findElement(By.cssSelector("#card-colours .c-target svg"))
					.getDomAttribute("data-hex");
				String planUrl = driver.findElement(By.cssSelector(".card-foot .plan-link")).getText();
				byte[] pdf = print(size.equals("a5") ? A5 : A6);
				keep("card-" + i + "-" + size, pdf);
				try (PDDocument doc = Loader.loadPDF(pdf)) {
					assertThat(doc.getNumberOfPages()).as(names[i] + " at " + size + ": one page").isEqualTo(1);
					PDRectangle media = doc.getPage(0).getMediaBox();
					assertThat(media.getWidth() / PT_PER_MM).as("paper width, mm (ISO 216)")
						.isCloseTo(size.equals("a5") ? 148 : 105, org.assertj.core.data.Offset.offset(1.0));
					String text = new PDFTextStripper().getText(doc);
					assertThat(text).contains("°C").contains("°F").contains("Station card");
					// 110 dpi: the target swatch is about 2 × 1 cm at A6, some 4000
					// pixels
					BufferedImage page = new PDFRenderer(doc).renderImageWithDPI(0, 110, ImageType.RGB);
					assertThat(pixelsOf(page, hex)).as(names[i] + " at " + size + ": target " + hex + " printed")
						.isGreaterThan(1000);
					// the QR code, read back from the printed page by ZXing's own reader
					assertThat(readQr(new PDFRenderer(doc).renderImageWithDPI(0, 300, ImageType.RGB),
							names[i] + " at " + size))
						.as(names[i] + " at " + size + ": QR code")
						.isEqualTo(planUrl);
				}
			}
		}
	}

	@Test
	void shouldPrintTheSavedPlanPageWithoutMenuSignOutUnitSwitchOrDelete() throws Exception {
		signIn();
		long id = demo.plan("Chips: blanch, rest, finish");
		driver.get(url("/plans/" + id));
		new WebDriverWait(driver, Duration.ofSeconds(20))
			.until(d -> "true".equals(d.findElement(By.id("charts")).getDomAttribute("data-rendered")));
		assertThat(driver.findElement(By.id("card-link")).getDomAttribute("href")).endsWith("/plans/" + id + "/card");
		String targetHex = (String) ((JavascriptExecutor) driver)
			.executeScript("var s = document.querySelector('#swatches li.target .swatch'); if (!s) return null;"
					+ "var m = getComputedStyle(s).backgroundColor.match(/\\d+/g);"
					+ "return '#' + m.slice(0, 3).map(function (v) { return (+v).toString(16).padStart(2, '0'); }).join('');");
		byte[] pdf = print(PageSize.ISO_A4);
		keep("plan-page-a4", pdf);
		try (PDDocument doc = Loader.loadPDF(pdf)) {
			String text = new PDFTextStripper().getText(doc);
			assertThat(text).doesNotContain("Sign out")
				.doesNotContain("Delete")
				.doesNotContain("Plan a cook")
				.doesNotContain("Station card for the line")
				.contains("Colour over time");
			if (targetHex != null) {
				BufferedImage first = new PDFRenderer(doc).renderImageWithDPI(0, 110, ImageType.RGB);
				assertThat(pixelsOf(first, targetHex)).as("target swatch " + targetHex + " printed").isGreaterThan(500);
			}
			System.out.println("saved plan page prints on " + doc.getNumberOfPages() + " A4 pages");
		}
	}

	@Test
	void shouldShowTheCardAt1280And800WithoutSidewaysScrolling() throws Exception {
		signIn();
		long id = demo.plan("Thick steak: sear, oven to 52 °C, rest");
		for (int width : new int[] { 1280, 800 }) {
			driver.manage().window().setSize(new Dimension(width, 1600));
			driver.get(url("/plans/" + id + "/card"));
			assertThat(driver.findElement(By.id("print-card")).isDisplayed()).as("Print button with script").isTrue();
			Browser.screenshot(driver, "card-" + width);
			Object overflow = ((JavascriptExecutor) driver)
				.executeScript("return document.documentElement.scrollWidth > window.innerWidth + 1;");
			assertThat(overflow).as("no sideways scrolling at " + width + " px").isEqualTo(false);
		}
	}

}
