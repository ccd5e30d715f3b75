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
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * Time of one {@link LeastSquares#fit} on a polynomial trend design: n rows, k columns
 * (1, t, t^2, ..., t^(k-1) with t = 1..n scaled to (0, 1]) and a seeded noisy response. 200 x 3 is
 * a quadratic trend on a typical series; 5000 x 10 the largest design other code fits.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class LeastSquaresBench {

    @Param({"200x3", "5000x10"})
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
        for (int power = 0; power < k; power++) {
            double[] column = new double[n];
            for (int i = 0; i < n; i++) {
                column[i] = Math.pow((i + 1.0) / n, power);
            }
            columns.add(column);
            names.add("t^" + power);
        }
        design = new Design(columns, names, true);
        SplittableRandom random = new SplittableRandom(20261202L);
        y = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = 100 + 5 * columns.get(Math.min(1, k - 1))[i] + random.nextGaussian();
        }
    }

    @Benchmark
    public OlsFit fit() {
        return LeastSquares.fit(design, y);
    }
}
