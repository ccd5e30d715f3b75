package org.trendwright.page;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.ExpectedConditions;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;
import org.trendwright.testing.TeamAccess;

/**
 * Accessibility and layout of every main view, measured in a real headless Chromium: the axe-core
 * rules of {@link Axe#RULES} (WCAG AA contrast among them) on each view as shown, no sideways
 * scrolling of the body at a tablet width (768x1024) and a laptop width (1280x800), and a
 * keyboard-only walk from sign-in to a published brief in which every control reached is labelled
 * and shows a visible focus outline. Screenshots go to target/screenshots/.
 */
class PageAccessibilityBrowserTest {

    /** Widths every view must fit without horizontal scrolling: a portrait tablet and a small laptop (common practice). */
    private static final int[][] SIZES = {{768, 1024}, {1280, 800}};
    /**
     * WCAG 2.1 SC 1.4.11 (non-text contrast): a focus indicator needs 3:1 against what surrounds
     * it; the ratio uses the relative luminance of WCAG 2.1's definitions.
     */
    private static final double FOCUS_CONTRAST = 3.0;

    private static RunningServer server;

    @BeforeAll
    static void start() {
        assumeTrue(Browser.installed(), "Chromium is not installed (/usr/bin/chromium and /usr/bin/chromedriver);"
                + " install it with: apt-get update && apt-get install -y chromium chromium-driver");
        server = RunningServer.start(FreshStore.Kind.SQLITE);
    }

    @AfterAll
    static void stop() {
        if (server != null) {
            server.close();
        }
    }

    private static String base() {
        return "http://127.0.0.1:" + server.port();
    }

    @Test
    void every_main_view_passes_the_axe_rules_and_fits_a_tablet_and_a_laptop_width() throws IOException {
        List<String> problems = new ArrayList<>();
        try (Browser browser = Browser.open(1280, 800)) {
            browser.driver.get(base() + "/");
            browser.awaitReady();
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("signin-form")));
            judge(browser, "sign-in", problems);
            browser.signIn(base(), TeamAccess.ADMIN, TeamAccess.ADMIN_PASSWORD);

            browser.find("#main a[href='#/upload']").click();
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("drop-zone")));
            // Line 4 holds a value that is not a number: the preview marks it in the colours of a problem.
            browser.find("#file-input").sendKeys(DemoSeries.csvFile(DemoSeries.quarterlySales()
                    .replace("\n2016-Q3,", "\n2016-Q3,12O.5x\n2016-Q3-bad,")).toString());
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#preview-table tr.problem")));
            judge(browser, "upload-preview-problems", problems);
            browser.find("#upload-cancel").click();
            browser.find("#file-input").sendKeys(DemoSeries.csvFile(DemoSeries.quarterlySales()).toString());
            browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("preview-summary"), "quarterly"));
            judge(browser, "upload-preview", problems);

            browser.find("#upload-save").click();
            browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "trend"));
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#comparison-table tr.recommended")));
            browser.find("#publish-button").click();
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("brief-link-row")));
            String link = browser.find("#brief-link").getAttribute("value");
            judge(browser, "series-view-with-comparison", problems);

            visit(browser, "#/");
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#series-table a.series-link")));
            judge(browser, "series-list", problems);
            visit(browser, "#/briefs");
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.cssSelector("#briefs-table tbody tr")));
            judge(browser, "briefs", problems);
            visit(browser, "#/members");
            browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("members-table"), TeamAccess.ADMIN));
            judge(browser, "members", problems);
            visit(browser, "#/tokens");
            browser.find("#token-name").sendKeys("report export");
            browser.find("#token-form button[type=submit]").click();
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("new-token-row")));
            judge(browser, "tokens", problems);

            try (Browser reader = Browser.open(1280, 800)) {
                reader.driver.get(link);
                reader.awaitReady();
                browser.await(d -> reader.inkedPixels("brief-chart") > 2000);
                judge(reader, "brief", problems);
            }
        }
        assertTrue(problems.isEmpty(), Axe.describe() + " found:\n" + String.join("\n", problems));
    }

    @Test
    void the_axe_rules_report_a_planted_faint_text_and_a_nameless_button() {
        try (Browser browser = Browser.open(1280, 800)) {
            browser.driver.get(base() + "/");
            browser.awaitReady();
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("signin-form")));
            browser.js("const main = document.getElementById('main');"
                    + "const p = document.createElement('p'); p.id = 'planted-faint'; p.textContent = 'Faint text';"
                    + "p.style.color = '#aaaaaa'; p.style.background = '#ffffff'; main.append(p);"
                    + "const b = document.createElement('button'); b.id = 'planted-nameless'; main.append(b);");
            List<String> found = Axe.violations(browser);
            // #aaaaaa on white is 2.32:1 by the WCAG 2.1 relative-luminance formula, below AA's 4.5:1 (SC 1.4.3).
            assertTrue(found.stream().anyMatch(v -> v.startsWith("color-contrast") && v.contains("#planted-faint")), found::toString);
            assertTrue(found.stream().anyMatch(v -> v.startsWith("button-name") && v.contains("#planted-nameless")), found::toString);
            assertEquals(2, found.size(), found::toString);
        }
    }

    /** Loads the page afresh at a route and waits until it is ready. */
    private static void visit(Browser browser, String hash) {
        browser.driver.get("about:blank");
        browser.driver.get(base() + "/" + hash);
        browser.awaitReady();
    }

    /** Runs axe on the view as shown, then checks and photographs it at each of {@link #SIZES}. */
    private static void judge(Browser browser, String view, List<String> problems) {
        browser.resize(1280, 800);
        Axe.violations(browser).forEach(v -> problems.add(view + ": " + v));
        for (int[] size : SIZES) {
            browser.resize(size[0], size[1]);
            long overflow = browser.horizontalOverflow();
            if (overflow > 0) {
                problems.add(view + ": the body scrolls sideways by " + overflow + " px at " + size[0] + "x" + size[1]);
            }
            browser.screenshot(view + "-" + size[0] + "x" + size[1]);
        }
        browser.resize(1280, 800);
    }

    @Test
    void a_keyboard_alone_signs_in_uploads_opens_a_series_changes_the_model_and_publishes() throws IOException {
        List<String> problems = new ArrayList<>();
        List<String> reached = new ArrayList<>();
        try (Browser browser = Browser.open(1280, 800)) {
            Keyboard keys = new Keyboard(browser, reached, problems);
            browser.driver.get(base() + "/");
            browser.awaitReady();
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("signin-form")));
            keys.tabTo("#signin-username");
            keys.type(TeamAccess.ADMIN);
            keys.tabTo("#signin-password");
            keys.type(TeamAccess.ADMIN_PASSWORD);
            keys.press(Keys.ENTER);
            browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("session-user"), TeamAccess.ADMIN));

            keys.shiftTabTo("a[data-nav=upload]");
            keys.press(Keys.ENTER);
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("view-upload")));
            keys.tabTo("#file-input");
            // The one exception to the keyboard: a file chooser is the operating system's dialog.
            browser.find("#file-input").sendKeys(DemoSeries.csvFile(DemoSeries.quarterlySales()
                    .replace("store_sales", "keyboard_sales")).toString());
            browser.await(ExpectedConditions.textToBePresentInElementLocated(By.id("preview-summary"), "quarterly"));
            keys.tabTo("#upload-save");
            keys.press(Keys.ENTER);
            browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "trend"));

            // Back to the list by Shift+Tab to the navigation, then the series opened from the list.
            keys.shiftTabTo("a[data-nav=list]");
            keys.press(Keys.ENTER);
            keys.tabTo("#series-table a.series-link");
            assertEquals("keyboard_sales", browser.find("#series-table a.series-link").getText());
            keys.press(Keys.ENTER);
            browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "trend"));

            keys.tabTo("#m-family");
            keys.press(Keys.ARROW_DOWN);
            browser.await(ExpectedConditions.attributeContains(By.id("results"), "data-fitted", "autoregression"));
            keys.tabTo("#brief-note");
            keys.type("Keyboard only.");
            keys.tabTo("#publish-button");
            keys.press(Keys.SPACE);
            browser.await(ExpectedConditions.visibilityOfElementLocated(By.id("brief-link-row")));
            keys.tabTo("#copy-link");
            browser.screenshot("keyboard-published");
        }
        assertTrue(reached.size() >= 20, "the walk reached only " + reached.size() + " controls: " + reached);
        assertTrue(problems.isEmpty(), String.join("\n", problems) + "\nreached: " + reached);
    }

    /**
     * Moves the focus with Tab, Shift+Tab, Enter, Space and arrow keys only (Selenium Actions, as
     * a person's keyboard would), and checks every control the focus reaches: it has an accessible
     * name, and the focus shows as an outline at least 2 px wide with 3:1 contrast to its surroundings.
     */
    private static final class Keyboard {

        /**
         * The focused element's description: a CSS-ish name, its accessible name (aria-labelledby,
         * aria-label, its labels, or the text of a button or link, in that order as in the W3C
         * accessible name computation), and the outline that shows the focus. For a visually hidden
         * input (the file chooser) the outline is the one its visible container draws around it.
         */
        private static final String FOCUS = """
                const a = document.activeElement;
                if (!a || a === document.body || a === document.documentElement) return null;
                const text = (n) => (n ? n.textContent : '').replace(/\\s+/g, ' ').trim();
                let name = '';
                if (a.getAttribute('aria-labelledby')) name = a.getAttribute('aria-labelledby').split(/\\s+/)
                    .map((id) => text(document.getElementById(id))).join(' ').trim();
                if (!name && a.getAttribute('aria-label')) name = a.getAttribute('aria-label').trim();
                if (!name && a.labels && a.labels.length) name = [...a.labels].map(text).join(' ').trim();
                if (!name && a.matches('a[href], button, summary')) name = text(a);
                let shown = a;
                if (parseFloat(getComputedStyle(a).opacity) === 0) {
                  shown = a.parentElement;
                  while (shown && getComputedStyle(shown).outlineStyle === 'none') shown = shown.parentElement;
                }
                const style = shown ? getComputedStyle(shown) : null;
                const rgb = (c) => (c.match(/[\\d.]+/g) || []).map(Number);
                const luminance = ([r, g, b]) => {
                  const lin = (v) => { v /= 255; return v <= 0.03928 ? v / 12.92 : Math.pow((v + 0.055) / 1.055, 2.4); };
                  return 0.2126 * lin(r) + 0.7152 * lin(g) + 0.0722 * lin(b);
                };
                let back = shown ? shown.parentElement : null;
                while (back && (rgb(getComputedStyle(back).backgroundColor)[3] === 0
                    || getComputedStyle(back).backgroundColor === 'transparent')) back = back.parentElement;
                const backColour = back ? rgb(getComputedStyle(back).backgroundColor) : [255, 255, 255];
                let contrast = 0;
                if (style && style.outlineStyle !== 'none') {
                  const [l1, l2] = [luminance(rgb(style.outlineColor)), luminance(backColour)].sort((x, y) => y - x);
                  contrast = (l1 + 0.05) / (l2 + 0.05);
                }
                return { id: a.tagName.toLowerCase() + (a.id ? '#' + a.id : '') + (a.dataset.nav ? '[nav=' + a.dataset.nav + ']' : ''),
                  name, outline: style ? style.outlineStyle + ' ' + style.outlineWidth : 'none',
                  width: style ? parseFloat(style.outlineWidth) : 0, contrast, matches: a.matches(arguments[0]) };
                """;
        private static final int MAX_STEPS = 80;

        private final Browser browser;
        private final List<String> reached;
        private final List<String> problems;

        Keyboard(Browser browser, List<String> reached, List<String> problems) {
            this.browser = browser;
            this.reached = reached;
            this.problems = problems;
        }

        void tabTo(String css) {
            moveTo(css, false);
        }

        void shiftTabTo(String css) {
            moveTo(css, true);
        }

        /** Presses Tab (or Shift+Tab) until the element matching css has the focus, checking each stop. */
        private void moveTo(String css, boolean backwards) {
            @SuppressWarnings("unchecked")
            Map<String, Object> start = (Map<String, Object>) browser.js(FOCUS, css);
            if (start != null && Boolean.TRUE.equals(start.get("matches"))) {
                check(start);
                return;
            }
            for (int step = 0; step < MAX_STEPS; step++) {
                if (backwards) {
                    new Actions(browser.driver).keyDown(Keys.SHIFT).sendKeys(Keys.TAB).keyUp(Keys.SHIFT).perform();
                } else {
                    press(Keys.TAB);
                }
                @SuppressWarnings("unchecked")
                Map<String, Object> focus = (Map<String, Object>) browser.js(FOCUS, css);
                if (focus == null) {
                    continue;
                }
                check(focus);
                if (Boolean.TRUE.equals(focus.get("matches"))) {
                    return;
                }
            }
            throw new AssertionError(css + " was not reached in " + MAX_STEPS + " presses of "
                    + (backwards ? "Shift+Tab" : "Tab") + "; reached: " + reached);
        }

        private void check(Map<String, Object> focus) {
            String id = (String) focus.get("id");
            reached.add(id);
            if (((String) focus.get("name")).isEmpty()) {
                problems.add(id + " has no accessible name");
            }
            double width = ((Number) focus.get("width")).doubleValue();
            double contrast = ((Number) focus.get("contrast")).doubleValue();
            if (width < 2 || contrast < FOCUS_CONTRAST) {
                problems.add(id + " shows its focus as outline '" + focus.get("outline") + "' with contrast "
                        + String.format(java.util.Locale.ROOT, "%.2f", contrast) + ":1");
            }
        }

        void press(CharSequence key) {
            new Actions(browser.driver).sendKeys(key).perform();
        }

        void type(String text) {
            new Actions(browser.driver).sendKeys(text).perform();
        }
    }
}
