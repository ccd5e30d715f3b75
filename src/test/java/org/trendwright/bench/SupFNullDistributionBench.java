package org.trendwright.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.trendwright.core.breaks.BreakSearch;
import org.trendwright.core.breaks.SupFNullDistribution;
import org.trendwright.core.breaks.SupFTest;
import org.trendwright.core.regression.Design;

/**
 * The design-specific sup-F p-value: {@code simulateNull} is
 * {@link SupFNullDistribution#forDesign(Design)} (the design's factors plus the default number of
 * replications), {@code completeTest} is {@link SupFTest#test(Design, double[], double)} (the
 * search on the data plus that simulation). Shapes "n x k": k = 2 is constant + t, k = 3 adds t^2,
 * k = 13 is constant + t + 11 monthly dummies. Targets: 30 ms at 120 x 2 and 150 ms at 200 x 2 on
 * one core. Results and the command are in src/docs/benchmarks.md.
 */
@State(Scope.Benchmark)
@BenchmarkMode({Mode.AverageTime, Mode.SampleTime})
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SupFNullDistributionBench {

    @Param({"120x2", "200x2", "200x3", "600x13", "1000x2"})
    public String shape;

    private Design design;
    private double[] y;

    @Setup
    public void setUp() {
        String[] parts = shape.split("x");
        int n = Integer.parseInt(parts[0]);
        int k = Integer.parseInt(parts[1]);
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        for (int power = 0; power <= Math.min(k - 1, 2); power++) {
            double[] column = new double[n];
            for (int t = 0; t < n; t++) {
                column[t] = Math.pow(t + 1, power);
            }
            columns.add(column);
            names.add("t^" + power);
        }
        for (int month = 1; columns.size() < k; month++) {
            double[] dummy = new double[n];
            for (int t = month; t < n; t += 12) {
                dummy[t] = 1;
            }
            columns.add(dummy);
            names.add("month " + (month + 1));
        }
        design = new Design(columns, names, true);
        y = demoSeries(n);
    }

    /** Invented demo series: 50 + 0.3 t plus seeded N(0, 1) noise. */
    private static double[] demoSeries(int n) {
        SplittableRandom random = new SplittableRandom(20261203L);
        double[] values = new double[n];
        for (int t = 0; t < n; t++) {
            values[t] = 50 + 0.3 * (t + 1) + random.nextGaussian();
        }
        return values;
    }

    @Benchmark
    public SupFNullDistribution simulateNull() {
        return SupFNullDistribution.forDesign(design);
    }

    @Benchmark
    public BreakSearch completeTest() {
        return SupFTest.test(design, y, 0.05);
    }
}
