package org.trendwright.bench;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
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
import org.trendwright.series.CsvIntake;
import org.trendwright.series.IntakeLimits;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesInput;

/**
 * The intake's own share of a large upload, without HTTP or the store: reading a long-format CSV
 * of 1,000,000 rows (1,000 series x 1,000 months, seeded random walks, about 22 MB) from a stream
 * into per-series arrays, and checking every series into a draft, in a JVM with a 256 MB heap.
 * The whole path through the server is measured by src/test/bench/csv-intake.sh.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 5)
@Fork(value = 1, jvmArgsAppend = "-Xmx256m")
public class CsvIntakeBench {

    private byte[] body;
    private final IntakeOptions options = IntakeOptions.defaults(IntakeLimits.DEFAULT);

    @Setup
    public void setUp() {
        SplittableRandom random = new SplittableRandom(7);
        StringBuilder csv = new StringBuilder(23_000_000).append("series,period,value\n");
        for (int s = 0; s < 1000; s++) {
            double level = 100;
            for (int t = 0; t < 1000; t++) {
                level += 0.5 + random.nextGaussian();
                csv.append(String.format(Locale.ROOT, "s%04d,%d-%02d,%.3f%n", s, 1900 + t / 12, t % 12 + 1, level));
            }
        }
        body = csv.toString().getBytes(StandardCharsets.UTF_8);
    }

    @Benchmark
    public int readAndCheckAMillionRows() {
        List<SeriesInput> series = CsvIntake.read(new ByteArrayInputStream(body), options, rows -> { });
        int observations = 0;
        for (SeriesInput input : series) {
            observations += SeriesAssembly.create(input, options).size();
        }
        return observations;
    }
}
