package org.trendwright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.util.List;
import org.trendwright.core.Observations;
import org.trendwright.core.analysis.TrendAnalyses;
import org.trendwright.core.analysis.TrendAnalysisSpec;
import org.trendwright.core.trend.TrendSpec;

/**
 * The work of {@link AnalysisBenchmark}'s two trend-model benchmarks measured as thread CPU time,
 * which a shared machine inflates far less than wall time: after {@code warm-up} calls, the best
 * of seven batches of {@code batch} calls, in microseconds per call (all four models). Run with
 * {@code java -cp target/test-classes:target/classes:<test class path> org.trendwright.bench.AnalysisCpuTime}.
 */
public final class AnalysisCpuTime {

    private static final List<TrendSpec> MODELS = List.of(TrendSpec.linear(), TrendSpec.logLinear(),
            TrendSpec.quadratic(), TrendSpec.linearSeasonal());

    private AnalysisCpuTime() {
    }

    public static void main(String[] args) {
        int warmUp = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        int batch = args.length > 1 ? Integer.parseInt(args[1]) : 500;
        Observations twoHundred = AnalysisBenchmark.quarterly(200, 17);
        Observations[] lengths = new Observations[AnalysisBenchmark.NEW_DESIGN_LENGTHS];
        for (int i = 0; i < lengths.length; i++) {
            lengths[i] = AnalysisBenchmark.quarterly(200 + i, 17);
        }
        int[] next = {0};
        Runnable remembered = () -> everyModel(twoHundred);
        Runnable fresh = () -> {
            everyModel(lengths[next[0]]);
            next[0] = (next[0] + 1) % lengths.length;
        };
        report("everyTrendModelWithDiagnostics", remembered, warmUp, batch);
        report("everyTrendModelWithDiagnosticsOnNewDesigns", fresh, warmUp / 4, batch / 4);
    }

    private static void everyModel(Observations series) {
        for (TrendSpec model : MODELS) {
            TrendAnalyses.analyze(series, TrendAnalysisSpec.of(model));
        }
    }

    private static void report(String name, Runnable work, int warmUp, int batch) {
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        for (int i = 0; i < warmUp; i++) {
            work.run();
        }
        double best = Double.MAX_VALUE;
        for (int round = 0; round < 7; round++) {
            long start = threads.getCurrentThreadCpuTime();
            for (int i = 0; i < batch; i++) {
                work.run();
            }
            best = Math.min(best, (threads.getCurrentThreadCpuTime() - start) / 1e3 / batch);
        }
        System.out.printf("%s: %.0f us CPU per call (best of 7 batches of %d after %d warm-up calls)%n", name, best,
                batch, warmUp);
    }
}
