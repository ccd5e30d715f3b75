package org.trendwright.bench;

import java.util.concurrent.TimeUnit;
import org.apache.commons.math3.random.Well19937c;
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
import org.trendwright.core.diagnostics.ArchTest;
import org.trendwright.core.diagnostics.ArchTestResult;
import org.trendwright.core.diagnostics.BreuschGodfrey;
import org.trendwright.core.diagnostics.BreuschGodfreyResult;
import org.trendwright.core.diagnostics.LjungBox;
import org.trendwright.core.diagnostics.LjungBoxResult;
import org.trendwright.core.diagnostics.SimulatedTrend;
import org.trendwright.core.regression.OlsFit;
import org.trendwright.core.robust.HacInference;
import org.trendwright.core.robust.NeweyWest;

/**
 * Time of the residual diagnostics and Newey-West errors on 20 years of monthly data (n = 240), a
 * trend with AR(1) errors, as a planning-team request would run them after a trend fit.
 *
 * <p>Short runs are set here because the bench profile passes its property to JMH as a single
 * pattern, so options after the class name in -Dbench are not read as options.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class SerialCorrelationBench {

    private OlsFit fit;
    private double[] residuals;

    @Setup
    public void prepare() {
        fit = SimulatedTrend.fit(SimulatedTrend.autoregressive(new Well19937c(42), 240, 0.5));
        residuals = fit.residuals();
    }

    @Benchmark
    public BreuschGodfreyResult breuschGodfreyOrder12() {
        return BreuschGodfrey.testAtSeasonalOrder(fit, 12, 0.05);
    }

    @Benchmark
    public LjungBoxResult ljungBox24Lags() {
        return LjungBox.testWithDefaultLags(residuals, 12, 0, 0.05);
    }

    @Benchmark
    public ArchTestResult archOrder12() {
        return ArchTest.test(residuals, 12, 0.05);
    }

    @Benchmark
    public HacInference neweyWestAutomaticLag() {
        return NeweyWest.standardErrors(fit);
    }
}
