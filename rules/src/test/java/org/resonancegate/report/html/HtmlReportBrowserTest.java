package org.resonancegate.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.logging.Level;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.logging.LogEntry;
import org.openqa.selenium.logging.LogType;
import org.resonancegate.report.Results;
import org.resonancegate.report.SpecResult;
import org.resonancegate.report.SpecStatus;

/**
 * Opens the sample plant's report, with the proposed changes in place, in a real headless
 * Chromium: it must render without a console error, and every judged spec must show an
 * interference diagram and one response plot per amplitude curve, each with drawn lines.
 *
 * <p>The browser is Debian's: {@code apt-get install -y chromium chromium-driver}. Selenium is
 * pointed at that driver so it never downloads one. Without it the test fails and says how to
 * install it; only {@code -Dresonance-gate.browserTest=off}, for a machine where the packages
 * cannot be installed, turns it into a reported skip.
 *
 * <p>{@code -Dresonance-gate.screenshot=<file.png>} also saves a picture of the report's top and
 * of the first failing spec (the README's picture is made this way).
 */
class HtmlReportBrowserTest {

    private static final Path BROWSER = Path.of("/usr/bin/chromium");
    private static final Path DRIVER = Path.of("/usr/bin/chromedriver");
    private static final String INSTALL = "apt-get install -y chromium chromium-driver";

    private static ChromeDriver driver;

    @TempDir
    static Path dir;

    @BeforeAll
    static void start() throws IOException {
        Assumptions.assumeFalse("off".equals(System.getProperty("resonance-gate.browserTest")),
                "browser test switched off with -Dresonance-gate.browserTest=off");
        if (!Files.isExecutable(BROWSER) || !Files.isExecutable(DRIVER)) {
            fail("the HTML report's browser test needs Debian's Chromium and its driver at " + BROWSER + " and "
                    + DRIVER + "; install them with: " + INSTALL
                    + " (or, where that is impossible, run with -Dresonance-gate.browserTest=off)");
        }
        ChromeOptions options = new ChromeOptions();
        options.setBinary(BROWSER.toFile());
        options.addArguments("--headless", "--no-sandbox", "--disable-gpu", "--disable-background-networking",
                "--disable-component-update", "--no-first-run", "--window-size=1280,1700",
                "--user-data-dir=" + Files.createDirectories(dir.resolve("profile")));
        options.setCapability("goog:loggingPrefs", Map.of(LogType.BROWSER, "ALL"));
        ChromeDriverService service = new ChromeDriverService.Builder().usingDriverExecutable(DRIVER.toFile())
                .usingAnyFreePort().build();
        driver = new ChromeDriver(service, options);
        driver.manage().timeouts().pageLoadTimeout(Duration.ofSeconds(60));
    }

    @AfterAll
    static void stop() {
        if (driver != null) {
            driver.quit();
        }
    }

    @Test
    void sampleReportRendersWithBothPlotsForEverySpec() throws IOException {
        Results results = SamplePlant.proposed();
        Path page = dir.resolve(HtmlReport.FILE_NAME);
        HtmlReport.write(results, page);
        driver.get(page.toUri().toString());

        List<LogEntry> problems = driver.manage().logs().get(LogType.BROWSER).getAll().stream()
                .filter(e -> e.getLevel().intValue() >= Level.WARNING.intValue()).toList();
        assertTrue(problems.isEmpty(), "console: " + problems);
        assertEquals("Vibration check", driver.findElement(By.cssSelector("header h1")).getText());

        List<WebElement> sections = driver.findElements(By.cssSelector("section.spec"));
        assertEquals(results.specs().size(), sections.size());
        boolean failing = false;
        for (int i = 0; i < sections.size(); i++) {
            SpecResult spec = results.specs().get(i);
            WebElement section = sections.get(i);
            failing |= spec.status() == SpecStatus.FAIL;
            if (spec.status() == SpecStatus.ERROR) {
                continue;
            }
            String name = spec.file();
            List<WebElement> interference = section.findElements(By.cssSelector("figure.interference svg.chart"));
            assertEquals(1, interference.size(), name + ": interference diagram");
            drawn(interference.get(0), name + " interference");
            // every mode and every order line is drawn
            assertFalse(interference.get(0).findElements(By.cssSelector("line.mode")).isEmpty(), name);
            assertFalse(interference.get(0).findElements(By.cssSelector("polyline.exc")).isEmpty(), name);
            List<WebElement> responses = section.findElements(By.cssSelector("figure.response svg.chart"));
            assertEquals(spec.details().curves().size(), responses.size(), name + ": response plots");
            for (WebElement r : responses) {
                drawn(r, name + " response");
                assertEquals(1, r.findElements(By.cssSelector("polyline.curve:not(.over)")).size(), name);
            }
        }
        assertTrue(failing, "the proposed plant has a failing spec to show");
        String screenshot = System.getProperty("resonance-gate.screenshot", "");
        if (!screenshot.isEmpty()) {
            save(Path.of(screenshot));
        }
    }

    /** The chart is laid out with a real size and its lines have length on screen. */
    private static void drawn(WebElement svg, String what) {
        assertTrue(svg.getSize().getWidth() > 300 && svg.getSize().getHeight() > 100, what + " size " + svg.getSize());
        Object length = ((JavascriptExecutor) driver).executeScript(
                "let s = 0; for (const p of arguments[0].querySelectorAll('polyline')) s += p.getTotalLength(); return s;",
                svg);
        assertTrue(((Number) length).doubleValue() > 100, what + ": drawn length " + length);
    }

    /** The fan set SAF-4's section (the proposal with the most to show), else the first failing one, in view. */
    private static void save(Path target) throws IOException {
        WebElement failing = driver.findElements(By.cssSelector("section.spec.fail")).stream()
                .filter(s -> s.findElement(By.tagName("h2")).getText().contains("SAF-4")).findFirst()
                .orElseGet(() -> driver.findElement(By.cssSelector("section.spec.fail")));
        ((JavascriptExecutor) driver).executeScript("arguments[0].scrollIntoView(true); window.scrollBy(0, -8);",
                failing);
        Files.write(target, driver.getScreenshotAs(OutputType.BYTES));
    }
}
