package org.trendwright.core.breaks;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.trendwright.core.regression.Design;

/**
 * Measures the rejection rates under the null quoted in {@link SupFTest}'s Javadoc: for trend
 * designs, the share of seeded series y = 1 + 0.1 t + e, e iid N(0, 1), whose asymptotic and
 * design-specific sup-F p-values fall below 5% and 10%.
 *
 * <p>Run from the worktree after {@code mvn -o -q test-compile}:
 * <pre>
 *   java -cp target/test-classes:target/classes:$HOME/.m2/repository/org/apache/commons/commons-math3/3.6.1/commons-math3-3.6.1.jar \
 *       org.trendwright.core.breaks.SupFSizeMeasurement 20261203 10000
 * </pre>
 * (seed, series per design). Each design's null is simulated once, with the default number of
 * replications and with 19,999, and every series is tested against both.
 */
final class SupFSizeMeasurement {

    private SupFSizeMeasurement() {
    }

    public static void main(String[] args) {
        long seed = Long.parseLong(args[0]);
        int series = Integer.parseInt(args[1]);
        System.out.println("design, n, series, R, asymptotic 5%, asymptotic 10%, default-R 5%, default-R 10%,"
                + " R=19999 5%, R=19999 10%");
        for (int n : new int[] {100, 200, 1000}) {
            measure("constant + t", polynomialTrend(n, 1), seed + n, series);
        }
        measure("constant + t + t^2", polynomialTrend(200, 2), seed + 2, series);
        measure("constant + t + 3 quarterly dummies", BreakSeries.trend(120).withColumns(quarterDummies(120),
                List.of("q2", "q3", "q4")), seed + 3, series);
    }

    private static void measure(String name, Design design, long seed, int series) {
        SupFNullDistribution standard = SupFNullDistribution.forDesign(design);
        SupFNullDistribution large = SupFNullDistribution.forDesign(design, 19_999);
        SplittableRandom random = new SplittableRandom(seed);
        int[] rejections = new int[6];
        for (int s = 0; s < series; s++) {
            double[] y = BreakSeries.shiftedTrend(design.rows(), 0, 0, random);
            BreakSearch search = SupFTest.test(design, y, 0.05, standard);
            double[] p = {search.asymptoticPValue(), search.test().pValue(), large.pValue(search.supF())};
            for (int i = 0; i < 3; i++) {
                rejections[2 * i] += p[i] < 0.05 ? 1 : 0;
                rejections[2 * i + 1] += p[i] < 0.10 ? 1 : 0;
            }
        }
        StringBuilder line = new StringBuilder(String.format(Locale.ROOT, "%s, %d, %d, %d", name, design.rows(),
                series, standard.replications()));
        for (int count : rejections) {
            line.append(String.format(Locale.ROOT, ", %.4f", count / (double) series));
        }
        System.out.println(line);
    }

    private static Design polynomialTrend(int n, int degree) {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int power = 0; power <= degree; power++) {
            double[] column = new double[n];
            for (int t = 0; t < n; t++) {
                column[t] = Math.pow(t + 1, power);
            }
            columns.add(column);
            names.add("t^" + power);
        }
        return new Design(columns, names, true);
    }

    private static List<double[]> quarterDummies(int n) {
        List<double[]> dummies = new ArrayList<>();
        for (int quarter = 1; quarter < 4; quarter++) {
            double[] dummy = new double[n];
            for (int t = quarter; t < n; t += 4) {
                dummy[t] = 1;
            }
            dummies.add(dummy);
        }
        return dummies;
    }
}
