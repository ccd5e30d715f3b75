package org.trendwright.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendSpec;
import org.trendwright.core.trend.Trends;
import org.trendwright.series.CsvIntake;
import org.trendwright.series.IntakeLimits;
import org.trendwright.series.IntakeOptions;
import org.trendwright.series.SeriesAssembly;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesVersions;

/** The committed demo files are exactly what the seeded generator writes, and show what they claim. */
class DemoDataTest {

    @Test
    void the_committed_files_equal_the_generators_output() throws IOException {
        for (Map.Entry<String, byte[]> file : DemoDataGenerator.files().entrySet()) {
            assertArrayEquals(file.getValue(), Files.readAllBytes(Path.of("demo-data", file.getKey())),
                    file.getKey() + " differs from DemoDataGenerator's output; rerun the generator");
        }
    }

    @Test
    void smart_plugs_grow_at_about_the_generated_rate() {
        byte[] csv = DemoDataGenerator.files().get("brindlewood-smart-plugs.csv");
        IntakeOptions options = IntakeOptions.defaults(IntakeLimits.DEFAULT);
        SeriesDraft plugs = SeriesAssembly.create(CsvIntake.read(csv, options).get(0), options);
        TrendFit fit = Trends.fit(SeriesVersions.observations(plugs.frequency(), plugs.points()),
                TrendSpec.logLinear().withSeasonalDummies(true));
        // Seeded simulation: the generator's slope 0.058 is growth e^0.058 - 1 = 5.97% a quarter. AR(1)
        // log noise (phi 0.5, sigma 0.05) has standard deviation 0.05/sqrt(1 - 0.25) = 0.058; over
        // t = 1..48 (sum of squared deviations 9212) the slope's standard error is about
        // 0.058/sqrt(9212) * sqrt((1 + phi)/(1 - phi)) = 0.0010, so 0.006 allows about six of them.
        assertEquals(Math.expm1(0.058), fit.growthRate().orElseThrow().perPeriod(), 0.006);
    }
}
