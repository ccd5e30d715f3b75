package org.trendwright.bench;

import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.trendwright.core.Observations;
import org.trendwright.core.analysis.TrendAnalyses;
import org.trendwright.core.analysis.TrendAnalysisSpec;
import org.trendwright.core.selection.ComparisonSpec;
import org.trendwright.core.selection.ModelSelection;
import org.trendwright.core.selection.StandardCandidates;
import org.trendwright.core.trend.TrendSpec;

/**
 * The two whole-job targets of the statistics core:
 * <ul>
 *   <li>{@code everyTrendModelWithDiagnostics}: a 200-point quarterly series, each of the four
 *       trend models (linear, log-linear, quadratic, linear with seasonal dummies) fitted with its
 *       8-quarter forecast and every residual check (exact Durbin-Watson with bounds,
 *       Breusch-Godfrey, Ljung-Box, ARCH, autocorrelations). Target 2 ms. The Durbin-Watson
 *       spectrum of each design is remembered after its first use, so this measures a service
 *       that meets the same series length again.</li>
 *   <li>{@code everyTrendModelWithDiagnosticsOnNewDesigns}: the same on series of
 *       {@value #NEW_DESIGN_LENGTHS} different lengths (200 to 231 quarters) in turn, i.e. 96
 *       designs, more than the 64 the spectrum memory keeps, so every design's spectrum is computed
 *       afresh (except that the log-linear trend reuses the linear trend's, which is the same
 *       design).</li>
 *   <li>{@code fullModelComparison}: a 120-point quarterly series, every default candidate (trends,
 *       trends with AR(1) errors, autoregressions) with a 4-quarter holdout, 8 rolling origins and
 *       the residual checks. Target 50 ms.</li>
 * </ul>
 * The series are seeded: a trend with a seasonal pattern and AR(1) noise (rho = 0.5).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@State(Scope.Benchmark)
@Fork(1)
@Warmup(iterations = 4, time = 1)
@Measurement(iterations = 6, time = 1)
public class AnalysisBenchmark {

    private static final List<TrendSpec> MODELS = List.of(TrendSpec.linear(), TrendSpec.logLinear(),
            TrendSpec.quadratic(), TrendSpec.linearSeasonal());

    static final int NEW_DESIGN_LENGTHS = 32;

    private Observations twoHundredQuarters;
    private Observations hundredTwentyQuarters;
    private final Observations[] differentLengths = new Observations[NEW_DESIGN_LENGTHS];
    private int nextLength;

    @Setup
    public void prepare() {
        twoHundredQuarters = quarterly(200, 17);
        hundredTwentyQuarters = quarterly(120, 23);
        for (int i = 0; i < NEW_DESIGN_LENGTHS; i++) {
            differentLengths[i] = quarterly(200 + i, 17);
        }
    }

    /** n quarters of a linear trend, a seasonal pattern and AR(1) noise (phi 0.5), seeded. */
    static Observations quarterly(int n, long seed) {
        Random random = new Random(seed);
        double[] seasons = {0, 12, -6, 20};
        double[] y = new double[n];
        double u = 0;
        for (int t = 1; t <= n; t++) {
            u = 0.5 * u + random.nextGaussian();
            y[t - 1] = 400 + 3 * t + seasons[(t - 1) % 4] + 8 * u;
        }
        return Observations.consecutive(y, 4, 1);
    }

    @Benchmark
    public void everyTrendModelWithDiagnostics(Blackhole sink) {
        for (TrendSpec model : MODELS) {
            sink.consume(TrendAnalyses.analyze(twoHundredQuarters, TrendAnalysisSpec.of(model)));
        }
    }

    @Benchmark
    public void everyTrendModelWithDiagnosticsOnNewDesigns(Blackhole sink) {
        Observations series = differentLengths[nextLength];
        nextLength = (nextLength + 1) % NEW_DESIGN_LENGTHS;
        for (TrendSpec model : MODELS) {
            sink.consume(TrendAnalyses.analyze(series, TrendAnalysisSpec.of(model)));
        }
    }

    @Benchmark
    public Object fullModelComparison() {
        return ModelSelection.compare(hundredTwentyQuarters,
                StandardCandidates.forSeries(hundredTwentyQuarters, 0.05), ComparisonSpec.defaultsFor(4));
    }
}
