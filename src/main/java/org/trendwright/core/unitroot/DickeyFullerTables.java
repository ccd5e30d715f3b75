package org.trendwright.core.unitroot;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * The simulated tau tables, read once from the class-path resource {@value #RESOURCE} in this
 * package. The file is written by {@code org.trendwright.core.unitroot.DickeyFullerTableGenerator}
 * under src/test/java, whose Javadoc states the simulation design, the seed and the command; its
 * header lines (starting with #) repeat them.
 *
 * <p>Layout: a header {@code kind,terms,T,p1,p2,...}, then one row per (kind, terms, T) with
 * kind "quantile" (the p-quantiles of tau) or "standard_error" (their Monte-Carlo standard errors).
 *
 * <p>Immutable after loading and thread-safe (initialised by the class-holder idiom). A missing
 * or malformed resource is a packaging defect, not a user error, and raises
 * {@link IllegalStateException}.
 */
final class DickeyFullerTables {

    static final String RESOURCE = "dickey-fuller-tau-quantiles.csv";

    private final double[] probabilities;
    private final double[] probits;
    private final int[] sizes;
    private final Map<DeterministicTerms, double[][]> quantiles;
    private final Map<DeterministicTerms, double[][]> standardErrors;

    private DickeyFullerTables(double[] probabilities, int[] sizes, Map<DeterministicTerms, double[][]> quantiles,
                               Map<DeterministicTerms, double[][]> standardErrors) {
        this.probabilities = probabilities;
        this.sizes = sizes;
        this.quantiles = quantiles;
        this.standardErrors = standardErrors;
        NormalDistribution normal = new NormalDistribution(null, 0, 1);
        this.probits = new double[probabilities.length];
        for (int i = 0; i < probabilities.length; i++) {
            probits[i] = normal.inverseCumulativeProbability(probabilities[i]);
        }
    }

    private static final class Holder {
        static final DickeyFullerTables INSTANCE = load();
    }

    static DickeyFullerTables get() {
        return Holder.INSTANCE;
    }

    double[] probabilities() {
        return probabilities.clone();
    }

    double[] probits() {
        return probits.clone();
    }

    int smallestSize() {
        return sizes[0];
    }

    /**
     * The quantile column for T regression observations: linear in 1/T between the bracketing
     * tabulated sizes, extrapolated beyond the largest, then made non-decreasing in p.
     */
    double[] quantiles(DeterministicTerms terms, int observations) {
        double[][] table = quantiles.get(terms);
        int s = lowerBracket(observations);
        double w = weight(observations, s);
        double[] column = new double[probabilities.length];
        for (int i = 0; i < column.length; i++) {
            column[i] = w * table[s][i] + (1 - w) * table[s + 1][i];
            if (i > 0 && column[i] < column[i - 1]) {
                // Only an extrapolated column can lose monotonicity; sorted tables stay ordered under interpolation.
                column[i] = column[i - 1];
            }
        }
        return column;
    }

    /** The Monte-Carlo standard errors of {@link #quantiles}, combined as sqrt(w²a² + (1 − w)²b²). */
    double[] standardErrors(DeterministicTerms terms, int observations) {
        double[][] table = standardErrors.get(terms);
        int s = lowerBracket(observations);
        double w = weight(observations, s);
        double[] column = new double[probabilities.length];
        for (int i = 0; i < column.length; i++) {
            column[i] = Math.hypot(w * table[s][i], (1 - w) * table[s + 1][i]);
        }
        return column;
    }

    /** Index s of the tabulated size at or below T (the last-but-one when T exceeds every size). */
    private int lowerBracket(int observations) {
        int s = 0;
        while (s < sizes.length - 2 && sizes[s + 1] <= observations) {
            s++;
        }
        return s;
    }

    /** Weight of size s (and 1 − w of size s + 1) for interpolation linear in 1/T. */
    private double weight(int observations, int s) {
        double lower = 1.0 / sizes[s];
        double upper = 1.0 / sizes[s + 1];
        return (1.0 / observations - upper) / (lower - upper);
    }

    private static DickeyFullerTables load() {
        try (InputStream in = DickeyFullerTables.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("The Dickey-Fuller table resource " + RESOURCE
                        + " is missing from the class path; rebuild the package.");
            }
            return parse(new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8)));
        } catch (IOException e) {
            throw new UncheckedIOException("Cannot read the Dickey-Fuller table resource " + RESOURCE, e);
        }
    }

    private static DickeyFullerTables parse(BufferedReader reader) throws IOException {
        List<String[]> rows = new ArrayList<>();
        for (String line = reader.readLine(); line != null; line = reader.readLine()) {
            if (!line.isBlank() && !line.startsWith("#")) {
                rows.add(line.split(","));
            }
        }
        String[] header = rows.remove(0);
        double[] probabilities = new double[header.length - 3];
        for (int i = 0; i < probabilities.length; i++) {
            probabilities[i] = Double.parseDouble(header[i + 3]);
        }
        int[] sizes = rows.stream().filter(r -> r[0].equals("quantile") && r[1].equals("CONSTANT"))
                .mapToInt(r -> Integer.parseInt(r[2])).toArray();
        return new DickeyFullerTables(probabilities, sizes, block(rows, "quantile", sizes, probabilities.length),
                block(rows, "standard_error", sizes, probabilities.length));
    }

    private static Map<DeterministicTerms, double[][]> block(List<String[]> rows, String kind, int[] sizes, int width) {
        Map<DeterministicTerms, double[][]> tables = new EnumMap<>(DeterministicTerms.class);
        for (DeterministicTerms terms : DeterministicTerms.values()) {
            tables.put(terms, new double[sizes.length][]);
        }
        for (String[] row : rows) {
            if (row[0].equals(kind)) {
                int s = Arrays.binarySearch(sizes, Integer.parseInt(row[2]));
                double[] values = new double[width];
                for (int i = 0; i < width; i++) {
                    values[i] = Double.parseDouble(row[i + 3]);
                }
                tables.get(DeterministicTerms.valueOf(row[1]))[s] = values;
            }
        }
        tables.forEach((terms, table) -> checkComplete(kind, terms, table));
        return tables;
    }

    private static void checkComplete(String kind, DeterministicTerms terms, double[][] table) {
        for (double[] row : table) {
            if (row == null) {
                throw new IllegalStateException("The Dickey-Fuller table resource " + RESOURCE + " lacks a "
                        + kind + " row for " + terms + "; regenerate it with DickeyFullerTableGenerator.");
            }
        }
    }
}
