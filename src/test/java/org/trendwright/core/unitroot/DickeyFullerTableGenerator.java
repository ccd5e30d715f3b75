package org.trendwright.core.unitroot;

import java.io.IOException;
import java.math.BigDecimal;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

/**
 * Writes the null distribution tables of the Dickey-Fuller tau statistic that
 * {@code DickeyFullerDistribution} reads: src/main/resources/org/trendwright/core/unitroot/
 * dickey-fuller-tau-quantiles.csv.
 *
 * <p>Method (Dickey & Fuller 1979, JASA 74; the same design as Fuller 1976, Table 8.5.2, and
 * MacKinnon 1996/2010): for each sample size T in {@link #SAMPLE_SIZES}, {@link #REPLICATIONS}
 * Gaussian random walks y_0 = 0, y_t = y_{t−1} + e_t, e_t ~ N(0, 1), t = 1..T, are drawn. For each
 * walk the regression Δy_t = [α] + [βt] + γ y_{t−1} + e_t on its T observations is fitted for the
 * three {@link DeterministicTerms} cases, and tau = γ̂ / se(γ̂) is kept. The same walks serve all
 * three cases. T therefore counts the observations in the test regression, as in MacKinnon (2010).
 * The lagged differences of the augmented regression are not simulated: their coefficients do
 * not change the asymptotic distribution (Said & Dickey 1984, Biometrika 71).
 *
 * <p>Each table row holds the empirical quantiles x_(⌈pR⌉) of the R sorted statistics at the
 * probabilities {@link #PROBABILITIES}, and a second row the Monte-Carlo standard error of each,
 * sqrt(p(1 − p)/R) / f(q_p), with the density f estimated from the spacing of order statistics
 * 2m / (R (x_(i+m) − x_(i−m))), m = ⌊√R / 2⌋ (Siddiqui 1960, J. Res. NBS 64B; Bloch & Gastwirth
 * 1968, Ann. Math. Statist. 39).
 *
 * <p>Reproducible: the walks for sample size T come from {@code new SplittableRandom(SEED + T)}
 * and the JDK's {@code nextGaussian()} (the modified ziggurat of Java 17). Run with
 * <pre>
 * mvn -B -o -q -Pbench test-compile exec:java \
 *     -Dexec.mainClass=org.trendwright.core.unitroot.DickeyFullerTableGenerator
 * </pre>
 * (about two minutes on two cores); an optional argument names another output file.
 */
public final class DickeyFullerTableGenerator {

    /** Master seed; the walks for sample size T use SEED + T. */
    static final long SEED = 19_790_601L;
    /** Random walks per sample size. */
    static final int REPLICATIONS = 1_000_000;
    /** Observations T in the test regression. */
    static final int[] SAMPLE_SIZES = {20, 25, 30, 40, 50, 75, 100, 150, 250, 500, 1000};
    /** Probabilities at which quantiles are tabulated; dense in the tails where tests are decided. */
    static final double[] PROBABILITIES = {
        0.0005, 0.001, 0.0025, 0.005, 0.0075, 0.01, 0.015, 0.02, 0.025, 0.03, 0.04, 0.05, 0.06, 0.07,
        0.08, 0.09, 0.10, 0.125, 0.15, 0.175, 0.20, 0.25, 0.30, 0.35, 0.40, 0.45, 0.50, 0.55, 0.60, 0.65,
        0.70, 0.75, 0.80, 0.825, 0.85, 0.875, 0.90, 0.91, 0.92, 0.93, 0.94, 0.95, 0.96, 0.97, 0.975, 0.98,
        0.985, 0.99, 0.9925, 0.995, 0.9975, 0.999, 0.9995};

    static final String DEFAULT_OUTPUT =
            "src/main/resources/org/trendwright/core/unitroot/" + DickeyFullerTables.RESOURCE;

    private DickeyFullerTableGenerator() {
    }

    public static void main(String[] args) throws IOException, InterruptedException, ExecutionException {
        Path output = Path.of(args.length > 0 ? args[0] : DEFAULT_OUTPUT);
        long start = System.nanoTime();
        List<double[][]> tables = simulateAll();
        write(output, tables);
        System.out.printf(Locale.ROOT, "Wrote %s in %.0f s%n", output, (System.nanoTime() - start) / 1e9);
    }

    /** One entry per sample size: [terms.ordinal()][replication], each row sorted. */
    private static List<double[][]> simulateAll() throws InterruptedException, ExecutionException {
        ExecutorService pool = Executors.newFixedThreadPool(Runtime.getRuntime().availableProcessors());
        try {
            List<Future<double[][]>> futures = new ArrayList<>();
            for (int t : SAMPLE_SIZES) {
                futures.add(pool.submit(() -> simulate(t)));
            }
            List<double[][]> tables = new ArrayList<>();
            for (Future<double[][]> future : futures) {
                tables.add(future.get());
            }
            return tables;
        } finally {
            pool.shutdown();
        }
    }

    static double[][] simulate(int sampleSize) {
        SplittableRandom random = new SplittableRandom(SEED + sampleSize);
        DeterministicTerms[] cases = DeterministicTerms.values();
        double[][] taus = new double[cases.length][REPLICATIONS];
        double[] walk = new double[sampleSize + 1];
        for (int r = 0; r < REPLICATIONS; r++) {
            for (int t = 1; t <= sampleSize; t++) {
                walk[t] = walk[t - 1] + random.nextGaussian();
            }
            for (DeterministicTerms terms : cases) {
                taus[terms.ordinal()][r] = tau(walk, terms);
            }
        }
        for (double[] row : taus) {
            Arrays.sort(row);
        }
        return taus;
    }

    /**
     * tau of the Dickey-Fuller regression without lagged differences on the walk y_0..y_T, by the
     * Frisch-Waugh-Lovell theorem: the level x_t = y_{t−1} and the change z_t = Δy_t are both
     * regressed on the deterministic terms first; then γ̂ = Σx̃z̃ / Σx̃², RSS = Σz̃² − γ̂ Σx̃z̃,
     * s² = RSS / (T − k) with k = terms + 1, and tau = γ̂ √(Σx̃²) / s.
     */
    static double tau(double[] walk, DeterministicTerms terms) {
        int n = walk.length - 1;
        double[] x = Arrays.copyOfRange(walk, 0, n);
        double[] z = new double[n];
        for (int t = 0; t < n; t++) {
            z[t] = walk[t + 1] - walk[t];
        }
        removeDeterministic(x, terms);
        removeDeterministic(z, terms);
        double sxx = 0;
        double sxz = 0;
        double szz = 0;
        for (int t = 0; t < n; t++) {
            sxx += x[t] * x[t];
            sxz += x[t] * z[t];
            szz += z[t] * z[t];
        }
        double gamma = sxz / sxx;
        double variance = (szz - gamma * sxz) / (n - terms.count() - 1);
        return gamma * Math.sqrt(sxx / variance);
    }

    /** Replaces v by its residual from a regression on the deterministic terms (1, and t). */
    private static void removeDeterministic(double[] v, DeterministicTerms terms) {
        if (terms == DeterministicTerms.NO_CONSTANT) {
            return;
        }
        int n = v.length;
        double mean = 0;
        for (double value : v) {
            mean += value;
        }
        mean /= n;
        double slope = 0;
        if (terms == DeterministicTerms.CONSTANT_AND_TREND) {
            // The centred time index (t − t̄) is orthogonal to the constant, so the two projections separate.
            double centre = (n - 1) / 2.0;
            double sxy = 0;
            double sxx = 0;
            for (int t = 0; t < n; t++) {
                sxy += (t - centre) * v[t];
                sxx += (t - centre) * (t - centre);
            }
            slope = sxy / sxx;
        }
        double centre = (n - 1) / 2.0;
        for (int t = 0; t < n; t++) {
            v[t] -= mean + slope * (t - centre);
        }
    }

    /** The quantile x_(⌈pR⌉) of a sorted sample. */
    static double quantile(double[] sorted, double p) {
        return sorted[orderIndex(sorted.length, p)];
    }

    /** Monte-Carlo standard error of that quantile (Siddiqui-Bloch-Gastwirth density estimate). */
    static double standardError(double[] sorted, double p) {
        int count = sorted.length;
        int i = orderIndex(count, p);
        int m = Math.max(1, Math.min((int) (Math.sqrt(count) / 2), Math.min(i, count - 1 - i)));
        double density = 2.0 * m / (count * (sorted[i + m] - sorted[i - m]));
        return Math.sqrt(p * (1 - p) / count) / density;
    }

    private static int orderIndex(int count, double p) {
        return Math.max(0, (int) Math.ceil(p * count) - 1);
    }

    private static void write(Path output, List<double[][]> tables) throws IOException {
        Files.createDirectories(output.toAbsolutePath().getParent());
        try (PrintWriter out = new PrintWriter(Files.newBufferedWriter(output, StandardCharsets.UTF_8))) {
            writeHeader(out);
            for (String kind : List.of("quantile", "standard_error")) {
                for (DeterministicTerms terms : DeterministicTerms.values()) {
                    for (int s = 0; s < SAMPLE_SIZES.length; s++) {
                        writeRow(out, kind, terms, SAMPLE_SIZES[s], tables.get(s)[terms.ordinal()]);
                    }
                }
            }
        }
    }

    private static void writeHeader(PrintWriter out) {
        out.println("# Null distribution of the Dickey-Fuller tau statistic (Dickey & Fuller 1979), simulated.");
        out.println("# Written by " + DickeyFullerTableGenerator.class.getName() + " (src/test/java); do not edit.");
        out.printf(Locale.ROOT, "# seed %d (walks for sample size T use seed + T), %d Gaussian random walks per T,%n",
                SEED, REPLICATIONS);
        out.println("# java.util.SplittableRandom.nextGaussian() on Java "
                + System.getProperty("java.specification.version") + ". T = observations in the test regression.");
        out.println("# kind quantile: x_(ceil(pR)); kind standard_error: its Monte-Carlo standard error.");
        out.println("# Regenerate: mvn -B -o -q test-compile && java -cp target/classes:target/test-classes "
                + DickeyFullerTableGenerator.class.getName());
        StringBuilder header = new StringBuilder("kind,terms,T");
        for (double p : PROBABILITIES) {
            header.append(',').append(BigDecimal.valueOf(p).stripTrailingZeros().toPlainString());
        }
        out.println(header);
    }

    private static void writeRow(PrintWriter out, String kind, DeterministicTerms terms, int sampleSize,
                                 double[] sorted) {
        StringBuilder row = new StringBuilder(kind + "," + terms.name() + "," + sampleSize);
        for (double p : PROBABILITIES) {
            double value = kind.equals("quantile") ? quantile(sorted, p) : standardError(sorted, p);
            row.append(',').append(String.format(Locale.ROOT, kind.equals("quantile") ? "%.4f" : "%.5f", value));
        }
        out.println(row);
    }
}
