package org.trendwright.bench;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;
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
import org.openjdk.jmh.infra.Blackhole;
import org.trendwright.core.diagnostics.DurbinWatson;
import org.trendwright.core.diagnostics.DurbinWatsonDistribution;
import org.trendwright.core.diagnostics.DurbinWatsonResult;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;
import org.trendwright.core.regression.OlsFit;

/**
 * The exact Durbin-Watson p-value for a trend design (constant + t, and constant + t + t^2) at
 * n = 1,000 and n = 5,000: the eigenvalues of M A M for the design and both one-sided
 * probabilities. Targets: 20 ms at n = 1,000 and 500 ms at n = 5,000. {@code completeTest} adds
 * the bounds at 5% and 1%. Results and the command are in src/docs/benchmarks.md.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class DurbinWatsonBenchmark {

    @Param({"1000", "5000"})
    int observations;

    /** 1: constant + t; 2: constant + t + t^2. */
    @Param({"1", "2"})
    int degree;

    private Design design;
    private OlsFit fit;
    private double statistic;

    @Setup
    public void prepare() {
        List<double[]> columns = new ArrayList<>();
        List<String> names = new ArrayList<>();
        double[] constant = new double[observations];
        Arrays.fill(constant, 1);
        columns.add(constant);
        names.add("constant");
        for (int power = 1; power <= degree; power++) {
            double[] column = new double[observations];
            for (int t = 0; t < observations; t++) {
                column[t] = Math.pow(t + 1, power);
            }
            columns.add(column);
            names.add(power == 1 ? "t" : "t" + power);
        }
        design = new Design(columns, names, true);
        fit = LeastSquares.fit(design, trendWithAr1Errors(observations));
        statistic = DurbinWatson.statistic(fit.residuals());
    }

    /** Invented demo series: 10 + 0.5 t plus seeded AR(1) errors with phi = 0.2. */
    private static double[] trendWithAr1Errors(int n) {
        Random random = new Random(42);
        double[] y = new double[n];
        double u = 0;
        for (int t = 0; t < n; t++) {
            u = 0.2 * u + random.nextGaussian();
            y[t] = 10 + 0.5 * (t + 1) + u;
        }
        return y;
    }

    @Benchmark
    public void exactPValue(Blackhole sink) {
        DurbinWatsonDistribution distribution = DurbinWatsonDistribution.forDesign(design);
        sink.consume(distribution.probabilityAtMost(statistic));
        sink.consume(distribution.probabilityAtLeast(statistic));
    }

    @Benchmark
    public DurbinWatsonResult completeTest() {
        return DurbinWatson.test(fit, 0.05);
    }
}
