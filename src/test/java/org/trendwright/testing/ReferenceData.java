package org.trendwright.testing;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the published reference tables copied under src/test/resources/reference (see the
 * README there for each file's source). Plain comma-separated text with one header row.
 */
public final class ReferenceData {

    private ReferenceData() {
    }

    /** The data rows of a reference CSV, each split on commas, header dropped. */
    public static List<String[]> rows(String resource) {
        try (InputStream in = ReferenceData.class.getResourceAsStream("/reference/" + resource)) {
            if (in == null) {
                throw new IllegalArgumentException("No test resource reference/" + resource);
            }
            BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String[]> rows = new ArrayList<>();
            reader.readLine();
            for (String line = reader.readLine(); line != null; line = reader.readLine()) {
                if (!line.isBlank()) {
                    rows.add(line.split(",", -1));
                }
            }
            return rows;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A numeric column of a reference CSV. */
    public static double[] column(String resource, int index) {
        return rows(resource).stream().mapToDouble(r -> Double.parseDouble(r[index])).toArray();
    }

    /**
     * The log relative error, -log10(|estimate - certified| / |certified|), or of the absolute
     * error when the certified value is 0: the number of significant digits the estimate agrees
     * to (McCullough 1998, "Assessing the reliability of statistical software", Am. Stat. 52).
     * Capped at 15, the digits the certified values are printed to.
     */
    public static double logRelativeError(double estimate, double certified) {
        double error = certified == 0 ? Math.abs(estimate) : Math.abs(estimate - certified) / Math.abs(certified);
        return error == 0 ? 15 : Math.min(15, -Math.log10(error));
    }
}
