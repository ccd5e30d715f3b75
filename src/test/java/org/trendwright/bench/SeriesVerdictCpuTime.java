package org.trendwright.bench;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.trendwright.jobs.SeriesVerdicts;
import org.trendwright.series.Frequency;
import org.trendwright.series.Period;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesVersion;

/**
 * What one batch-job item costs in the statistics alone: {@link SeriesVerdicts#judge} on seeded
 * quarterly random walks with drift (80 quarters, step 0.5 + N(0, 1), rounded to 3 decimals, as
 * src/test/bench/batch-job.sh uploads), in thread CPU time, which a shared machine inflates far
 * less than wall time. After {@code warm-up} series, the best and the median of nine passes of
 * {@code batch} series, in milliseconds per series. Run with
 * {@code java -cp target/test-classes:target/classes:<test class path> org.trendwright.bench.SeriesVerdictCpuTime}.
 */
public final class SeriesVerdictCpuTime {

    private static final int QUARTERS = 80;

    private SeriesVerdictCpuTime() {
    }

    public static void main(String[] args) {
        int warmUp = args.length > 0 ? Integer.parseInt(args[0]) : 20_000;
        int batch = args.length > 1 ? Integer.parseInt(args[1]) : 2_000;
        List<SeriesVersion> series = randomWalks(1_000, new Random(2026_12_02L));
        ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        long failed = 0;
        for (int i = 0; i < warmUp; i++) {
            failed += SeriesVerdicts.judge(series.get(i % series.size())).failure() == null ? 0 : 1;
        }
        double[] passes = new double[9];
        for (int pass = 0; pass < passes.length; pass++) {
            long start = threads.getCurrentThreadCpuTime();
            for (int i = 0; i < batch; i++) {
                failed += SeriesVerdicts.judge(series.get(i % series.size())).failure() == null ? 0 : 1;
            }
            passes[pass] = (threads.getCurrentThreadCpuTime() - start) / 1e6 / batch;
        }
        java.util.Arrays.sort(passes);
        System.out.printf("SeriesVerdicts.judge, %d quarters: best %.3f ms, median %.3f ms CPU per series"
                + " (failed verdicts: %d)%n", QUARTERS, passes[0], passes[passes.length / 2], failed);
    }

    private static List<SeriesVersion> randomWalks(int count, Random random) {
        List<SeriesVersion> walks = new ArrayList<>(count);
        for (int s = 0; s < count; s++) {
            List<Point> points = new ArrayList<>(QUARTERS);
            double level = 100;
            for (int t = 0; t < QUARTERS; t++) {
                level += 0.5 + random.nextGaussian();
                points.add(new Point(Period.quarter(2000 + t / 4, t % 4 + 1), Math.round(level * 1000) / 1000.0));
            }
            walks.add(new SeriesVersion(s + 1, "walk " + (s + 1), 1, Frequency.QUARTERLY, Instant.EPOCH, points));
        }
        return walks;
    }
}
