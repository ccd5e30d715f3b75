package org.trendwright.bench;

import java.util.SplittableRandom;
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
import org.trendwright.core.Observations;
import org.trendwright.core.autoregression.SimulatedSeries;
import org.trendwright.core.unitroot.AdfResult;
import org.trendwright.core.unitroot.AdfSpec;
import org.trendwright.core.unitroot.AugmentedDickeyFuller;
import org.trendwright.core.unitroot.DeterministicTerms;

/**
 * Target: an augmented Dickey-Fuller test with lag selection in at most 5 ms. The series is a
 * seeded 500-point random walk; lags 0..17 (Schwert's maximum for n = 500) are compared by AIC on
 * a common sample, the chosen regression is fitted and the p-value read from the tables (loaded
 * once, in the first warm-up call).
 *
 * <p>Short runs are set here because the bench profile passes its property to JMH as a single
 * pattern, so options after the class name in -Dbench are not read as options. Sample-time mode
 * runs beside the average because on a loaded machine the median of single calls shows the cost
 * of a call better than the mean, which waits for the CPU.
 */
@State(Scope.Benchmark)
@BenchmarkMode({Mode.AverageTime, Mode.SampleTime})
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class AugmentedDickeyFullerBench {

    private Observations walk;

    @Setup
    public void prepare() {
        walk = Observations.annual(SimulatedSeries.randomWalk(new SplittableRandom(61), 0.1, 500));
    }

    @Benchmark
    public AdfResult constantLagsByAic() {
        return AugmentedDickeyFuller.test(walk, AdfSpec.of(DeterministicTerms.CONSTANT));
    }

    @Benchmark
    public AdfResult constantAndTrendLagsByAic() {
        return AugmentedDickeyFuller.test(walk, AdfSpec.of(DeterministicTerms.CONSTANT_AND_TREND));
    }

    /** The worst case for the final fit: all 17 lagged differences kept. */
    @Benchmark
    public AdfResult constantAndTrendFixed17Lags() {
        return AugmentedDickeyFuller.test(walk, AdfSpec.of(DeterministicTerms.CONSTANT_AND_TREND).withFixedLags(17));
    }
}
