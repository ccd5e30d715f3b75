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
import org.trendwright.core.breaks.SupFTest;
import org.trendwright.core.gls.Ar1Gls;
import org.trendwright.core.gls.Ar1GlsFit;
import org.trendwright.core.regression.Design;

/**
 * Time of one iterated Prais-Winsten fit and one sup-F break search on a monthly trend with
 * seasonal dummies: n rows, columns constant, t and (seasons - 1) dummies, seeded AR(1) errors
 * with rho = 0.6. "200x1" is a plain linear trend (k = 2) on 200 periods; "600x12" is 50 years
 * of monthly data with 11 dummies (k = 13).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class GlsBreaksBench {

    @Param({"200x1", "600x12"})
    public String shape;

    private Design design;
    private double[] y;

    @Setup
    public void setUp() {
        String[] parts = shape.split("x");
        int n = Integer.parseInt(parts[0]);
        int seasons = Integer.parseInt(parts[1]);
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double[] constant = new double[n];
        double[] time = new double[n];
        for (int i = 0; i < n; i++) {
            constant[i] = 1;
            time[i] = i + 1;
        }
        columns.add(constant);
        columns.add(time);
        names.add("constant");
        names.add("t");
        for (int s = 1; s < seasons; s++) {
            double[] dummy = new double[n];
            for (int i = s; i < n; i += seasons) {
                dummy[i] = 1;
            }
            columns.add(dummy);
            names.add("season " + (s + 1));
        }
        design = new Design(columns, names, true);
        SplittableRandom random = new SplittableRandom(20250606L);
        y = new double[n];
        double u = 0;
        for (int i = 0; i < n; i++) {
            u = 0.6 * u + random.nextGaussian();
            y[i] = 50 + 0.3 * (i + 1) + u;
        }
    }

    @Benchmark
    public Ar1GlsFit praisWinsten() {
        return Ar1Gls.praisWinsten(design, y);
    }

    @Benchmark
    public BreakSearch supF() {
        return SupFTest.test(design, y, 0.05);
    }
}
