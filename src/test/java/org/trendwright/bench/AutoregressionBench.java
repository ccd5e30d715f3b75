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
import org.trendwright.core.autoregression.ArForecasts;
import org.trendwright.core.autoregression.ArSpec;
import org.trendwright.core.autoregression.Autoregression;
import org.trendwright.core.autoregression.LagSelection;
import org.trendwright.core.autoregression.SimulatedSeries;
import org.trendwright.core.forecast.Forecast;

/**
 * Target: an AR(p ≤ 8) fit and its 12-step forecast on 500 points in at most 1 ms. The series is
 * 125 years of a seeded quarterly AR(2) (0.5, 0.3) around 10.
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
public class AutoregressionBench {

    private Observations series;

    @Setup
    public void prepare() {
        double[] y = SimulatedSeries.autoregression(new SplittableRandom(60), 2, new double[] {0.5, 0.3}, 1, 500, 100);
        series = Observations.consecutive(y, 4, 1);
    }

    /** AR(8) on levels, fixed order, then 12 steps ahead. */
    @Benchmark
    public Forecast fixedOrder8AndForecast12() {
        return ArForecasts.forecast(Autoregression.fit(series, ArSpec.ofOrder(8)), 12);
    }

    /** Order 0..8 chosen by BIC on a common sample, refit, then 12 steps ahead. */
    @Benchmark
    public Forecast bicUpTo8AndForecast12() {
        return ArForecasts.forecast(Autoregression.fit(series, ArSpec.selectedBy(LagSelection.BIC, 8)), 12);
    }

    /** Order 0..8 by AIC on differences with the seasonal lag 4, forecasts integrated to levels. */
    @Benchmark
    public Forecast aicUpTo8OnDifferencesWithSeasonalLagAndForecast12() {
        ArSpec spec = ArSpec.selectedBy(LagSelection.AIC, 8).onDifferences().withSeasonalLag();
        return ArForecasts.forecast(Autoregression.fit(series, spec), 12);
    }
}
