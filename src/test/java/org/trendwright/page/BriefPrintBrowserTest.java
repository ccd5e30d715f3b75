package org.trendwright.page;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.rendering.ImageType;
import org.apache.pdfbox.rendering.PDFRenderer;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.openqa.selenium.print.PageSize;
import org.openqa.selenium.print.PrintOptions;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.RunningServer;

/**
 * The public brief printed to PDF by headless Chromium (WebDriver's print, as a reader's "Save as
 * PDF" does) on A4 and on US Letter, at 100% scale (shrink-to-fit off, so an overflow is not hidden
 * by scaling). The PDF is read back with PDFBox: the chart, the forecast table with its last
 * column and the caution are on the paper, no glyph or ink reaches past the right margin, and the
 * page count is small. PDFs and PNG renderings go to target/screenshots/.
 */
class BriefPrintBrowserTest {

    private static final float POINTS_PER_MM = 72f / 25.4f;
    /** Ink closer than this to the right edge of the paper counts as clipped: the page margins are 14 mm. */
    private static final float RIGHT_CLEARANCE_MM = 5f;
    private static final int RENDER_DPI = 96;

    private static RunningServer server;
    private static Browser reader;
    private static List<String> lastColumn;
    private static String lastHeader;

    @BeforeAll
    static void publishAndOpen() {
        assumeTrue(Browser.installed(), "Chromium is not installed (/usr/bin/chromium and /usr/bin/chromedriver);"
                + " install it with: apt-get update && apt-get install -y chromium chromium-driver");
        server = RunningServer.start(FreshStore.Kind.SQLITE);
        String created = server.given().contentType("text/csv").body(DemoSeries.quarterlySales())
                .post("/api/series").then().statusCode(201).extract().path("series[0].id").toString();
        String url = server.given().contentType("application/json")
                .body(Map.of("version", 1, "model", Map.of("family", "trend", "shape", "linear", "seasonal", true),
                        "horizon", 8, "note", "For the spring stock plan; the 95% band is the one to plan against."))
                .post("/api/series/" + (long) Double.parseDouble(created) + "/briefs")
                .then().statusCode(201).extract().path("url");
        reader = Browser.open(1280, 800);
        reader.driver.get("http://127.0.0.1:" + server.port() + url);
        reader.awaitReady();
        @SuppressWarnings("unchecked")
        List<String> cells = (List<String>) reader.js("return [...document.querySelectorAll('#brief-forecast tbody tr')]"
                + ".map(r => r.lastElementChild.textContent)");
        lastColumn = cells;
        lastHeader = (String) reader.js("return document.querySelector('#brief-forecast thead th:last-child').textContent");
    }

    @AfterAll
    static void stop() {
        if (reader != null) {
            reader.close();
        }
        if (server != null) {
            server.close();
        }
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"a4", "letter"})
    void prints_the_chart_the_whole_forecast_table_and_the_caution_within_the_paper(String paper) throws IOException {
        PageSize size = paper.equals("a4") ? PageSize.ISO_A4 : PageSize.US_LETTER;
        PrintOptions options = new PrintOptions();
        options.setPageSize(size);
        options.setShrinkToFit(false);
        byte[] pdf = Base64.getDecoder().decode(reader.driver.print(options).getContent());
        Files.createDirectories(Browser.SCREENSHOTS);
        Files.write(Browser.SCREENSHOTS.resolve("brief-" + paper + ".pdf"), pdf);

        try (PDDocument document = Loader.loadPDF(pdf)) {
            int pages = document.getNumberOfPages();
            // Chart, caution, 8 forecast rows, the checks and tracking: one to three pages (common practice).
            assertTrue(pages >= 1 && pages <= 3, paper + " printed on " + pages + " pages");
            float width = document.getPage(0).getMediaBox().getWidth();
            // A4 is 210 mm wide, US Letter 8.5 in (ISO 216; ANSI/ASME Y14.1).
            assertEquals(size.getWidth() * 10 * POINTS_PER_MM, width, 1.0, "paper width in points");

            String text = new PDFTextStripper().getText(document).replace('\u00a0', ' ').replaceAll("\\s+", " ");
            assertTrue(text.contains("Prediction intervals assume the model holds"), "the caution is not printed");
            assertTrue(text.contains("A forecast is not a guarantee"), "the caution is not printed whole");
            assertTrue(text.contains(lastHeader), "the header of the last column (" + lastHeader + ") is not printed");
            assertEquals(8, lastColumn.size());
            for (String cell : lastColumn) {
                assertTrue(text.contains(cell), "the last column's cell '" + cell + "' is not printed");
            }
            float rightmost = rightmostGlyph(document);
            assertTrue(rightmost <= width - RIGHT_CLEARANCE_MM * POINTS_PER_MM,
                    paper + ": text reaches " + rightmost + " pt of a " + width + " pt wide page");
            long chartInk = 0;
            for (int page = 0; page < pages; page++) {
                BufferedImage image = new PDFRenderer(document).renderImageWithDPI(page, RENDER_DPI, ImageType.RGB);
                ImageIO.write(image, "png", Browser.SCREENSHOTS.resolve("brief-" + paper + "-page" + (page + 1) + ".png").toFile());
                int clearance = Math.round(RIGHT_CLEARANCE_MM / 25.4f * RENDER_DPI);
                assertFalse(inkFrom(image, image.getWidth() - clearance), paper + " page " + (page + 1)
                        + " has ink within " + RIGHT_CLEARANCE_MM + " mm of the right edge: something is clipped");
                chartInk += colouredPixels(image);
            }
            // The chart is the only coloured thing on the printed brief (print.css prints the rest in black).
            assertTrue(chartInk > 3000, paper + ": the chart is missing from the print (" + chartInk + " coloured pixels)");
        }
    }

    /** The largest x + width of any glyph on any page, in points. */
    private static float rightmostGlyph(PDDocument document) throws IOException {
        List<Float> rights = new ArrayList<>();
        PDFTextStripper stripper = new PDFTextStripper() {
            @Override
            protected void writeString(String string, List<TextPosition> positions) {
                for (TextPosition p : positions) {
                    rights.add(p.getXDirAdj() + p.getWidthDirAdj());
                }
            }
        };
        stripper.getText(document);
        return rights.stream().max(Float::compare).orElseThrow(() -> new AssertionError("the PDF has no text"));
    }

    /** Whether any pixel from column {@code fromX} to the right edge is darker than near-white. */
    private static boolean inkFrom(BufferedImage image, int fromX) {
        for (int x = Math.max(0, fromX); x < image.getWidth(); x++) {
            for (int y = 0; y < image.getHeight(); y++) {
                int rgb = image.getRGB(x, y);
                if (((rgb >> 16) & 0xff) < 235 || ((rgb >> 8) & 0xff) < 235 || (rgb & 0xff) < 235) {
                    return true;
                }
            }
        }
        return false;
    }

    /** Pixels whose channels differ by more than 60 of 255: colour, not black, grey or white. */
    private static long colouredPixels(BufferedImage image) {
        long count = 0;
        for (int y = 0; y < image.getHeight(); y++) {
            for (int x = 0; x < image.getWidth(); x++) {
                int rgb = image.getRGB(x, y);
                int r = (rgb >> 16) & 0xff;
                int g = (rgb >> 8) & 0xff;
                int b = rgb & 0xff;
                if (Math.max(r, Math.max(g, b)) - Math.min(r, Math.min(g, b)) > 60) {
                    count++;
                }
            }
        }
        return count;
    }
}
