package org.trendwright.page;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.net.URI;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Dimension;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.openqa.selenium.support.ui.Select;
import org.trendwright.app.TrendwrightApp;
import org.trendwright.store.Database;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;
import org.trendwright.testing.TeamAccess;

/**
 * The page end to end in a real headless Chromium against a really started server: upload with
 * preview, fit, charts drawn, model change, comparison, script-injection attempts kept inert,
 * and the public brief in a fresh anonymous browser. Reported as skipped (not passed) when
 * Chromium is not installed. Screenshots go to target/screenshots/.
 */
class PageBrowserTest {

    private static RunningServer server;
    private static Browser browser;

    @BeforeAll
    static void start() {
        assumeTrue(Browser.installed(), "Chromium is not installed (/usr/bin/chromium and /usr/bin/chromedriver);"
                + " install it with: apt-get update && apt-get install -y chromium chromium-driver");
        server = RunningServer.start(FreshStore.Kind.SQLITE);
        browser = Browser.open(1280, 800);
        signIn();
    }

    /** Signs the browser in as the test server's first admin through the sign-in screen. */
    private static void signIn() {
        browser.signIn(base(), TeamAccess.ADMIN, TeamAccess.ADMIN_PASSWORD);
    }

    @AfterAll
    static void stop() {
        if (browser != null) {
            browser.close();
        }
        if (server != null) {
            server.close();
        }
    }

    private static String base() {
        return "http://127.0.0.1:" + server.port();
    }

    /** Loads the page afresh (a blank page first: the same address with a new hash would not reload). */
    /**
     * Waits for the model comparison, which the view runs after the fit, to render its table: its
     * rows push the publish button down, and a click that lands while they arrive can miss it.
     */
    private static void awaitComparison() {
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#comparison-table tr.recommended")));
    }

    private static void visit(String hash) {
        browser.driver.get("about:blank");
        browser.driver.get(base() + "/" + hash);
        browser.awaitReady();
    }

    @Test
    void uploads_with_a_preview_fits_draws_the_charts_and_refits_on_a_model_change() throws IOException {
        browser.driver.manage().window().setSize(new Dimension(1280, 800));
        visit("#/upload");
        // Line 4 holds a value that is not a number; the preview must mark that line and refuse to save.
        browser.find("#file-input").sendKeys(DemoSeries.csvFile(DemoSeries.quarterlySales().replace("\n2016-Q3,", "\n2016-Q3,12O.5x\n2016-Q3-bad,"))
                .toString());
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#preview-table tr.problem")));
        List<WebElement> marked = browser.driver.findElements(By.cssSelector("#preview-table tr.problem"));
        assertEquals("4", marked.get(0).findElement(By.tagName("th")).getText());
        assertFalse(browser.find("#upload-save").isEnabled());
        browser.fullScreenshot("upload-preview-problems", 1280);
        browser.driver.manage().window().setSize(new Dimension(1280, 800));

        browser.find("#upload-cancel").click();
        browser.find("#file-input").sendKeys(DemoSeries.csvFile(DemoSeries.quarterlySales()).toString());
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("preview-summary"), "quarterly"));
        assertTrue(browser.driver.findElements(By.cssSelector("#preview-table tr.problem")).isEmpty());
        browser.screenshot("upload-preview");

        browser.find("#upload-save").click();
        browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "linear"));
        assertEquals("store_sales", browser.find("#series-title").getText());
        assertTrue(browser.inkedPixels("forecast-chart") > 2000, "the forecast chart drew nothing");
        assertTrue(browser.inkedPixels("residual-chart") > 500, "the residual chart drew nothing");
        assertTrue(browser.inkedPixels("acf-chart") > 500, "the autocorrelation chart drew nothing");
        assertFalse(browser.driver.findElements(By.cssSelector("#diagnostics-table tbody tr")).isEmpty());
        assertEquals(8, browser.driver.findElements(By.cssSelector("#forecast-table tbody tr")).size());
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#comparison-table tr.recommended")));

        new Select(browser.find("#m-scale")).selectByValue("log");
        browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "\"scale\":\"log\""));
        new Select(browser.find("#m-family")).selectByValue("autoregression");
        browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "autoregression"));
        assertTrue(browser.inkedPixels("forecast-chart") > 2000, "the forecast chart of the new model drew nothing");
        assertEquals("ready", labelsAndPolicy());
        Object pngBytes = browser.driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "import('/js/charts.js').then(m => m.png(document.getElementById('forecast-chart')))"
                + ".then(b => done(b.type + ' ' + b.size));");
        assertTrue(String.valueOf(pngBytes).startsWith("image/png "), String.valueOf(pngBytes));
        browser.fullScreenshot("series-view", 1280);
        browser.driver.manage().window().setSize(new Dimension(768, 1024));
        browser.screenshot("series-view-tablet");

        browser.driver.manage().window().setSize(new Dimension(768, 1024));
        visit("#/");
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#series-table a.series-link")));
        browser.screenshot("series-list-tablet");
    }

    /**
     * The bar follows the server's own report of a multi-series upload, not only the bytes sent.
     * The server works through 300 series faster than the page polls, so to see its report for
     * sure the test holds back the upload's answer in the page for 3 s (as a slow network would):
     * meanwhile the page's polls must find the server done and show its count of stored series.
     */
    @Test
    void the_upload_bar_shows_the_servers_count_of_stored_series() throws Exception {
        browser.driver.manage().window().setSize(new Dimension(1280, 800));
        visit("#/upload");
        browser.find("#file-input").sendKeys(DemoSeries.csvFile(wideSeries(300, 12)).toString());
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("preview-summary"), "quarterly"));
        browser.js("window.barTexts = [];"
                + "const text = document.getElementById('upload-progress-text');"
                + "new MutationObserver(() => window.barTexts.push(text.textContent))"
                + ".observe(text, {childList: true, characterData: true, subtree: true});"
                + "const add = XMLHttpRequest.prototype.addEventListener;"
                + "XMLHttpRequest.prototype.addEventListener = function (type, listener) {"
                + "  if (type !== 'load') return add.call(this, type, listener);"
                + "  return add.call(this, type, (e) => setTimeout(() => listener.call(this, e), 3000));"
                + "};");
        browser.find("#upload-save").click();
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("upload-progress-text"),
                "Stored 300 series"));
        browser.screenshot("upload-progress-stored");
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#series-table a.series-link")));
        @SuppressWarnings("unchecked")
        List<String> texts = (List<String>) browser.js("return window.barTexts;");
        assertEquals("0% – Sending the file", texts.get(0), texts.toString());
        assertTrue(texts.contains("100% – Stored 300 series"), texts.toString());
        assertEquals("100% – 300 series saved", texts.get(texts.size() - 1), texts.toString());
        List<Integer> percents = texts.stream().map(t -> Integer.parseInt(t.substring(0, t.indexOf('%')))).toList();
        for (int i = 1; i < percents.size(); i++) {
            assertTrue(percents.get(i) >= percents.get(i - 1), "the bar went back: " + texts);
        }
    }

    /** A wide CSV of {@code count} quarterly series (invented values) of {@code length} quarters. */
    private static String wideSeries(int count, int length) {
        StringBuilder csv = new StringBuilder("period");
        for (int s = 0; s < count; s++) {
            csv.append(",series ").append(s);
        }
        for (int t = 0; t < length; t++) {
            csv.append('\n').append(2016 + t / 4).append("-Q").append(t % 4 + 1);
            for (int s = 0; s < count; s++) {
                csv.append(',').append(100 + s + t);
            }
        }
        return csv.append('\n').toString();
    }

    @Test
    void shows_a_series_named_like_markup_as_text_and_runs_nothing() throws IOException {
        String name = "<img src=x onerror=window.__pwned=1>";
        server.given().contentType("text/csv").queryParam("name", name)
                .body("year,v\n2001,1\n2002,2.5\n2003,2.9\n2004,4.2\n2005,5.1\n2006,5.8\n2007,7.3\n")
                .post("/api/series").then().statusCode(201);
        browser.driver.manage().window().setSize(new Dimension(1280, 800));
        visit("#/");
        browser.find("#series-search").sendKeys("img");
        WebElement link = browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#series-table a.series-link")));
        assertEquals(name, link.getText());
        link.click();
        browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "trend"));
        assertEquals(name, browser.find("#series-title").getText());

        visit("#/upload");
        // Set as a paste would: typing a tab with sendKeys would move the focus instead.
        browser.js("arguments[0].value = arguments[1]", browser.find("#paste-input"),
                "period\t" + name + "\n2024-01\t1\n2024-02\t2\n");
        browser.find("#paste-preview").click();
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("preview-summary"), name));
        assertTrue(browser.driver.findElements(By.cssSelector("#main img")).isEmpty(), "markup from data became an element");
        assertNull(browser.js("return window.__pwned"));
    }

    @Test
    void publishes_a_brief_that_a_fresh_anonymous_browser_opens_prints_and_tracks() {
        String created = server.given().contentType("text/csv").body(DemoSeries.quarterlySales().replace("store_sales", "brief_sales"))
                .post("/api/series").then().statusCode(201).extract().path("series[0].id").toString();
        long id = (long) Double.parseDouble(created);
        browser.driver.manage().window().setSize(new Dimension(1280, 800));
        visit("#/series/" + id);
        browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "trend"));
        String note = "Plan on the 80% band. <b onmouseover=window.__pwned=1>bold?</b>";
        browser.find("#brief-note").sendKeys(note);
        awaitComparison();
        browser.find("#publish-button").click();
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("brief-link-row")));
        String link = browser.find("#brief-link").getAttribute("value");
        assertTrue(link.startsWith(base() + "/b/"), link);

        // Actuals for the first two forecast periods arrive after publication.
        String etag = server.given().get("/api/series/" + id).then().extract().header("ETag");
        server.given().contentType("text/csv").header("If-Match", etag)
                .body("period,brief_sales\n2025-Q1,151.5\n2025-Q2,400\n").post("/api/series/" + id + "/versions")
                .then().statusCode(201);

        try (Browser reader = Browser.open(1280, 800)) {
            reader.driver.get(link);
            reader.awaitReady();
            assertEquals("Forecast: brief_sales", reader.find("#brief-title").getText());
            assertEquals(note, reader.find("#brief-note-text").getText());
            assertTrue(reader.inkedPixels("brief-chart") > 2000, "the brief's chart drew nothing");
            assertEquals(8, reader.driver.findElements(By.cssSelector("#brief-forecast tbody tr")).size());
            assertFalse(reader.driver.findElements(By.cssSelector("#brief-checks li")).isEmpty());
            List<WebElement> tracked = reader.driver.findElements(By.cssSelector("#brief-tracking tbody tr"));
            assertEquals(2, tracked.size());
            // 400 lies far above any interval of a series near 150.
            assertTrue(tracked.get(1).getText().contains("Outside"), tracked.get(1).getText());
            assertNull(reader.js("return window.__pwned"));
            assertTrue(reader.driver.findElements(By.cssSelector("#brief b")).isEmpty(), "the note became markup");
            reader.fullScreenshot("brief", 1280);
            reader.driver.executeCdpCommand("Emulation.setEmulatedMedia", java.util.Map.of("media", "print"));
            reader.driver.manage().window().setSize(new Dimension(794, 1123));
            reader.screenshot("brief-print-a4");
            assertFalse(reader.find("#print-button").isDisplayed(), "the print button is printed");
        }
    }

    @Test
    void lists_a_published_brief_copies_its_link_and_revokes_it_so_that_the_link_answers_as_gone() {
        String created = server.given().contentType("text/csv").body(DemoSeries.quarterlySales().replace("store_sales", "listed_sales"))
                .post("/api/series").then().statusCode(201).extract().path("series[0].id").toString();
        long id = (long) Double.parseDouble(created);
        browser.resize(1280, 800);
        visit("#/series/" + id);
        browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "trend"));
        awaitComparison();
        browser.find("#publish-button").click();
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("brief-link-row")));
        String link = browser.find("#brief-link").getAttribute("value");
        String path = URI.create(link).getPath();

        // An actual far outside any interval of a series near 150 arrives for the first forecast period.
        String etag = server.given().get("/api/series/" + id).then().extract().header("ETag");
        server.given().contentType("text/csv").header("If-Match", etag)
                .body("period,listed_sales\n2025-Q1,400\n").post("/api/series/" + id + "/versions").then().statusCode(201);

        visit("#/briefs");
        WebElement row = briefRow(browser, path);
        assertEquals("Forecast: listed_sales", row.findElement(By.cssSelector(".brief-name")).getText());
        assertEquals("listed_sales, version 1", row.findElement(By.cssSelector(".brief-series")).getText());
        assertEquals("by " + TeamAccess.ADMIN, row.findElement(By.cssSelector(".brief-author")).getText());
        String briefId = row.getAttribute("data-brief");
        String text = row.getText();
        assertTrue(text.contains("Shared") && text.contains("1 actual(s) outside the 95% interval"), text);
        browser.driver.executeCdpCommand("Browser.grantPermissions", Map.of("origin", base(),
                "permissions", List.of("clipboardReadWrite", "clipboardSanitizedWrite")));
        row.findElement(By.xpath(".//button[text()='Copy link']")).click();
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("briefs-message"), "Link copied"));
        assertEquals(link, browser.driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "navigator.clipboard.readText().then(done, e => done('clipboard: ' + e));"));
        browser.screenshot("briefs");

        server.given().contentType("application/json")
                .body(Map.of("username", "reader", "password", "reader-password-1", "role", "viewer"))
                .post("/api/members").then().statusCode(201);
        try (Browser viewer = Browser.open(1280, 800)) {
            viewer.signIn(base(), "reader", "reader-password-1");
            viewer.driver.get(base() + "/#/briefs");
            WebElement seen = briefRow(viewer, path);
            assertTrue(viewer.find("#briefs-readonly").isDisplayed(), "a viewer is not told that access is read-only");
            assertTrue(seen.findElements(By.xpath(".//button[starts-with(., 'Revoke')]")).isEmpty(),
                    "a read-only member is offered to revoke");
            assertFalse(seen.findElements(By.xpath(".//button[text()='Copy link']")).isEmpty());
        }

        // Declining the confirmation leaves the brief shared.
        row.findElement(By.xpath(".//button[text()='Revoke']")).click();
        browser.await(ExpectedConditions.alertIsPresent()).dismiss();
        server.anonymous().get("/api/public/briefs/" + path.substring(3)).then().statusCode(200);
        row.findElement(By.xpath(".//button[text()='Revoke']")).click();
        browser.await(ExpectedConditions.alertIsPresent()).accept();
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("briefs-message"), "Revoked"));
        WebElement revoked = browser.find("#briefs-table tr[data-brief='" + briefId + "']");
        assertTrue(revoked.getText().contains("Revoked"), revoked.getText());
        assertTrue(revoked.findElements(By.tagName("button")).isEmpty(), "a revoked brief still offers actions");

        try (Browser reader = Browser.open(1280, 800)) {
            reader.driver.get(link);
            reader.awaitReady();
            assertEquals("This brief does not exist or was withdrawn.", reader.find("#brief-message").getText());
            assertFalse(reader.find("#brief").isDisplayed(), "a revoked brief is still shown");
        }
        server.anonymous().get("/api/public/briefs/" + path.substring(3)).then().statusCode(404);
    }

    /** The row of the briefs screen whose link opens {@code path}. */
    private static WebElement briefRow(Browser in, String path) {
        return in.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#briefs-table a[href='" + path + "']")))
                .findElement(By.xpath("./ancestor::tr"));
    }

    @Test
    void adds_a_member_and_makes_a_token_that_is_shown_once() {
        browser.driver.manage().window().setSize(new Dimension(1280, 800));
        visit("#/members");
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("members-table"), TeamAccess.ADMIN));
        browser.find("#member-username").sendKeys("planner");
        browser.find("#member-password").sendKeys("planner-password-1");
        new Select(browser.find("#member-role")).selectByValue("editor");
        browser.find("#member-form button[type=submit]").click();
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("members-table"), "planner"));
        assertEquals("editor", server.given().get("/api/members").then().extract().jsonPath()
                .getString("items.find { it.username == 'planner' }.role"));
        browser.screenshot("members");

        visit("#/tokens");
        browser.find("#token-name").sendKeys("nightly export");
        browser.find("#token-form button[type=submit]").click();
        browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("new-token-row")));
        String token = browser.find("#new-token").getAttribute("value");
        server.anonymous().header("Authorization", "Bearer " + token).get("/api/series").then().statusCode(200);
        browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("tokens-table"), "nightly export"));
        visit("#/tokens");
        assertFalse(browser.find("#new-token-row").isDisplayed(), "the token is shown a second time");
    }

    @Test
    void creates_the_first_admin_on_the_setup_screen_of_a_new_server() {
        try (FreshStore store = FreshStore.create(FreshStore.Kind.SQLITE); Database database = store.open();
             TrendwrightApp fresh = TrendwrightApp.start(RunningServer.testSettings(), TeamAccess.testSettings(),
                     database, Clock.systemUTC());
             Browser newcomer = Browser.open(1280, 800)) {
            newcomer.driver.get("http://127.0.0.1:" + fresh.port() + "/setup");
            newcomer.find("#setup-code").sendKeys(TeamAccess.SETUP_CODE);
            newcomer.find("#setup-username").sendKeys("first-admin");
            newcomer.find("#setup-password").sendKeys("first-password-1");
            newcomer.find("#setup-password-again").sendKeys("first-password-1");
            newcomer.screenshot("setup");
            newcomer.find("#setup-form button[type=submit]").click();
            newcomer.await(ExpectedConditions.textToBePresentInElementLocated(By.id("session-user"), "first-admin (admin)"));
        }
    }

    /**
     * Every form control has a label, and the CSP blocked nothing; "ready" when both hold,
     * otherwise what is wrong.
     */
    private static String labelsAndPolicy() {
        return (String) browser.js("const bad = [...document.querySelectorAll('input, select, textarea')]"
                + ".filter(c => c.type !== 'hidden' && c.labels.length === 0 && !c.getAttribute('aria-label'))"
                + ".map(c => c.id); if (bad.length) return 'unlabelled: ' + bad.join(', ');"
                + "return document.body.dataset.cspViolations ? 'CSP violations: ' + document.body.dataset.cspViolations"
                + " : 'ready';");
    }
}
