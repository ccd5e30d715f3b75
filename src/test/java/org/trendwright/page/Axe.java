package org.trendwright.page;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.Properties;

/**
 * Runs the axe-core accessibility engine (from its webjar, test scope) inside the page a
 * {@link Browser} shows. The engine is injected through WebDriver (which the page's
 * Content-Security-Policy does not govern) and judges the rendered page: contrast is computed
 * from the colours the browser actually painted. Hidden views are not judged, so each view is
 * checked while it is shown. Not thread-safe (one browser).
 */
final class Axe {

    /**
     * The rules every main view must pass. color-contrast is WCAG 2.1 SC 1.4.3 (AA: 4.5:1 for text,
     * 3:1 for large text); label, select-name and aria-input-field-name are SC 1.3.1/4.1.2 for form
     * fields; button-name, link-name and input-button-name SC 4.1.2/2.4.4; image-alt and role-img-alt
     * SC 1.1.1 (the charts are canvases with role img); document-title and html-has-lang SC 2.4.2/3.1.1.
     * Rule names as in the axe-core rule list (docs/rule-descriptions.md of axe-core).
     */
    static final List<String> RULES = List.of("color-contrast", "label", "select-name", "aria-input-field-name",
            "button-name", "link-name", "input-button-name", "image-alt", "role-img-alt", "document-title",
            "html-has-lang");

    private static final String SOURCE = engineSource();

    private Axe() {
    }

    /** The engine's version, read from the webjar's Maven properties. */
    static String version() {
        Properties properties = new Properties();
        try (InputStream in = Axe.class.getResourceAsStream("/META-INF/maven/org.webjars.npm/axe-core/pom.properties")) {
            if (in == null) {
                throw new IllegalStateException("The axe-core webjar is not on the test classpath (see the pom)");
            }
            properties.load(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return properties.getProperty("version");
    }

    private static String engineSource() {
        String path = "/META-INF/resources/webjars/axe-core/" + version() + "/axe.min.js";
        try (InputStream in = Axe.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("axe.min.js is missing from the axe-core webjar at " + path);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The violations of {@link #RULES} on the page as shown, one line each: rule, impact, the
     * selector of the offending node and axe's own summary of what to fix. Empty when none.
     */
    static List<String> violations(Browser browser) {
        if (!Boolean.TRUE.equals(browser.js("return typeof window.axe === 'object'"))) {
            // Run as WebDriver script (as axe's own Selenium binding does), not as a page <script>,
            // which the page's Content-Security-Policy would rightly block and count.
            browser.js(SOURCE);
        }
        Object found = browser.driver.executeAsyncScript("const done = arguments[arguments.length - 1];"
                + "axe.run(document, { runOnly: { type: 'rule', values: arguments[0] }, resultTypes: ['violations'] })"
                + ".then(r => done(r.violations.flatMap(v => v.nodes.map(n => v.id + ' (' + v.impact + ') at '"
                + " + n.target.join(' ') + ': ' + n.failureSummary.replace(/\\s+/g, ' ')))))"
                + ".catch(e => done(['axe failed: ' + e]));", RULES);
        @SuppressWarnings("unchecked")
        List<String> lines = (List<String>) found;
        return lines;
    }

    /** How many rules ran and which engine ran them, for a test's message. */
    static Map<String, Object> describe() {
        return Map.of("engine", "axe-core " + version(), "rules", RULES);
    }
}
