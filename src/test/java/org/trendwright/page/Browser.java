package org.trendwright.page;

import java.io.File;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.Comparator;
import java.util.stream.Stream;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.JavascriptExecutor;
import org.openqa.selenium.OutputType;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.chrome.ChromeDriver;
import org.openqa.selenium.chrome.ChromeDriverService;
import org.openqa.selenium.chrome.ChromeOptions;
import org.openqa.selenium.support.ui.ExpectedCondition;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.WebDriverWait;

/**
 * A headless Chromium from the system packages (/usr/bin/chromium, /usr/bin/chromedriver) with a
 * fresh profile, so each instance is an anonymous context without cookies. Selenium Manager is
 * never asked for a driver: the driver's path is given explicitly (and SE_OFFLINE is set by the pom).
 */
final class Browser implements AutoCloseable {

    static final Path CHROMIUM = Path.of("/usr/bin/chromium");
    static final Path CHROMEDRIVER = Path.of("/usr/bin/chromedriver");
    static final Path SCREENSHOTS = Path.of("target", "screenshots");

    final ChromeDriver driver;
    private final Path profile;

    private Browser(ChromeDriver driver, Path profile) {
        this.driver = driver;
        this.profile = profile;
    }

    static boolean installed() {
        return Files.isExecutable(CHROMIUM) && Files.isExecutable(CHROMEDRIVER);
    }

    static Browser open(int width, int height) {
        System.setProperty("webdriver.chrome.driver", CHROMEDRIVER.toString());
        try {
            Path profile = Files.createTempDirectory("trendwright-chromium-");
            ChromeOptions options = new ChromeOptions();
            options.setBinary(CHROMIUM.toFile());
            options.addArguments("--headless=new", "--no-sandbox", "--disable-gpu", "--disable-dev-shm-usage",
                    "--disable-background-networking", "--disable-component-update", "--disable-sync",
                    "--no-first-run", "--user-data-dir=" + profile, "--window-size=" + width + "," + height);
            ChromeDriverService service = new ChromeDriverService.Builder()
                    .usingDriverExecutable(new File(CHROMEDRIVER.toString())).usingAnyFreePort().build();
            return new Browser(new ChromeDriver(service, options), profile);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    WebElement find(String css) {
        return driver.findElement(By.cssSelector(css));
    }

    Object js(String script, Object... args) {
        return ((JavascriptExecutor) driver).executeScript(script, args);
    }

    <T> T await(ExpectedCondition<T> condition) {
        return new WebDriverWait(driver, Duration.ofSeconds(20)).until(condition);
    }

    void awaitReady() {
        await(d -> "true".equals(js("return document.body.dataset.ready")));
    }

    /**
     * Pixels of a canvas that are neither white nor transparent, read back with getImageData: a
     * chart that drew anything has many; an empty canvas (white background only) has none.
     */
    long inkedPixels(String canvasId) {
        Object count = js("const c = document.getElementById(arguments[0]);"
                + "const d = c.getContext('2d').getImageData(0, 0, c.width, c.height).data; let n = 0;"
                + "for (let i = 0; i < d.length; i += 4) { if (d[i + 3] > 0 && (d[i] < 240 || d[i + 1] < 240"
                + " || d[i + 2] < 240)) n++; } return n;", canvasId);
        return ((Number) count).longValue();
    }

    void screenshot(String name) {
        try {
            Files.createDirectories(SCREENSHOTS);
            File shot = driver.getScreenshotAs(OutputType.FILE);
            Files.copy(shot.toPath(), SCREENSHOTS.resolve(name + ".png"), StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A screenshot of the whole page height, not only the window. */
    void fullScreenshot(String name, int width) {
        long height = ((Number) js("return document.documentElement.scrollHeight")).longValue();
        driver.manage().window().setSize(new Dimension(width, (int) Math.min(height + 140, 6000)));
        screenshot(name);
    }

    /** Signs in through the sign-in screen of the page at {@code base} and waits for the session. */
    void signIn(String base, String username, String password) {
        driver.get(base + "/");
        awaitReady();
        await(ExpectedConditions.visibilityOfElementLocated(By.id("signin-form")));
        find("#signin-username").sendKeys(username);
        find("#signin-password").sendKeys(password);
        find("#signin-form button[type=submit]").click();
        await(ExpectedConditions.textToBePresentInElementLocated(By.id("session-user"), username));
    }

    /** Sets the size of the browser window, which in headless Chromium is the size of the viewport. */
    void resize(int width, int height) {
        driver.manage().window().setSize(new Dimension(width, height));
        await(d -> ((Number) js("return window.innerWidth")).intValue() == width);
    }

    /**
     * How far the page is wider than the viewport, in CSS pixels: scrollWidth of the document minus
     * innerWidth; zero or less when the body does not scroll sideways.
     */
    long horizontalOverflow() {
        // Charts redraw at the new width a few frames after a resize; judge the settled layout.
        driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + " requestAnimationFrame(() => requestAnimationFrame(() => setTimeout(done, 300)));");
        return ((Number) js("return document.documentElement.scrollWidth - window.innerWidth")).longValue();
    }

    @Override
    public void close() {
        driver.quit();
        try (Stream<Path> files = Files.walk(profile)) {
            files.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // A profile left in the temp directory does no harm to the test's outcome.
        }
    }
}
