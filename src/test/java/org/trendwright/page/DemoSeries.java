package org.trendwright.page;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

/** Test data for the browser tests: a seeded simulated series, as CSV text or as a file to upload. */
final class DemoSeries {

    private DemoSeries() {
    }

    /** 36 quarters of a seeded upward trend (1.5 a quarter) with a seasonal swing and N(0, 2²) noise. */
    static String quarterlySales() {
        Random random = new Random(42L);
        StringBuilder csv = new StringBuilder("period,store_sales\n");
        for (int t = 0; t < 36; t++) {
            double season = new double[] {-6, 2, 5, -1}[t % 4];
            csv.append(2016 + t / 4).append("-Q").append(t % 4 + 1).append(',')
                    .append(String.format(Locale.ROOT, "%.2f", 100 + 1.5 * t + season + 2 * random.nextGaussian()))
                    .append('\n');
        }
        return csv.toString();
    }

    /** The text in a temporary .csv file, deleted when the JVM exits. */
    static Path csvFile(String text) throws IOException {
        Path file = Files.createTempFile("trendwright-upload-", ".csv");
        file.toFile().deleteOnExit();
        return Files.writeString(file, text, StandardCharsets.UTF_8);
    }
}
