package org.trendwright.demo;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Random;
import java.util.function.IntToDoubleFunction;

/**
 * Writes the invented demo scenario to demo-data/: Brindlewood Home Goods, a fictional
 * housewares maker, and its quarterly unit volumes (thousands) for six product lines from 2013-Q1
 * to 2024-Q4 (48 quarters). Each line is a deterministic path times seasonal factors plus AR(1)
 * noise e_t = phi e_(t-1) + sigma z_t (z standard normal from one seeded generator), so every
 * series has trend, seasonality and serially correlated errors:
 * <ul>
 *   <li>Kettles: linear growth, a fourth-quarter gift peak;</li>
 *   <li>Garden furniture: a strong spring-summer season on a slow linear trend;</li>
 *   <li>Enamel mugs: a quadratic path that rises and flattens;</li>
 *   <li>Smart plugs: exponential growth of about 6% a quarter (noise on the log scale);</li>
 *   <li>Water filters: a level break, up 35% from 2019-Q3 when a retail contract began;</li>
 *   <li>Tea towels: a slow decline with mild seasonality.</li>
 * </ul>
 * The files use different accepted layouts on purpose (wide with 2013-Q1; semicolon with
 * Q1 2013 and a byte-order mark; long format with quarter-end dates), so the demo also exercises
 * intake. Run {@code mvn -B -o test-compile exec:java}-style with this class as main, or simply
 * from the IDE, to rewrite the files; {@code DemoDataTest} checks the committed files equal its
 * output.
 */
public final class DemoDataGenerator {

    /** The seed of the one random generator; changing it changes every file. */
    public static final long SEED = 20_130_101L;
    static final int FIRST_YEAR = 2013;
    static final int QUARTERS = 48;

    private DemoDataGenerator() {
    }

    public static void main(String[] args) throws IOException {
        Path folder = Path.of(args.length > 0 ? args[0] : "demo-data");
        Files.createDirectories(folder);
        for (Map.Entry<String, byte[]> file : files().entrySet()) {
            Files.write(folder.resolve(file.getKey()), file.getValue());
        }
    }

    /** Every file name with its exact bytes, in a fixed order. */
    public static Map<String, byte[]> files() {
        Random random = new Random(SEED);
        double[] kettles = level(t -> 52 + 0.9 * t, new double[] {0.92, 0.95, 0.98, 1.15}, 0.6, 2.5, random);
        double[] garden = level(t -> 30 + 0.25 * t, new double[] {0.55, 1.55, 1.35, 0.55}, 0.5, 2.0, random);
        double[] mugs = level(t -> 20 + 1.6 * t - 0.022 * t * t, new double[] {0.97, 1.0, 0.98, 1.05}, 0.7, 1.2,
                random);
        double[] plugs = growth(Math.log(4.0), 0.058, new double[] {0.95, 0.97, 0.99, 1.09}, 0.5, 0.05, random);
        double[] filters = level(t -> (t >= 27 ? 1.35 : 1.0) * (40 + 0.3 * t), new double[] {1.0, 1.02, 1.0, 0.98},
                0.6, 1.5, random);
        double[] towels = level(t -> 70 - 0.45 * t, new double[] {0.97, 1.0, 0.96, 1.07}, 0.4, 1.8, random);
        Map<String, byte[]> files = new LinkedHashMap<>();
        files.put("brindlewood-core-lines.csv", utf8(wide(List.of("Kettles", "Garden furniture", "Enamel mugs"),
                List.of(kettles, garden, mugs))));
        files.put("brindlewood-smart-plugs.csv", bomUtf8(semicolon("Smart plugs", plugs)));
        files.put("brindlewood-long.csv", utf8(longFormat(List.of("Water filters", "Tea towels"),
                List.of(filters, towels))));
        files.put("manifest.txt", utf8(String.join("\n", List.of("brindlewood-core-lines.csv",
                "brindlewood-smart-plugs.csv", "brindlewood-long.csv")) + "\n"));
        return files;
    }

    /** path(t) * season(t) + AR(1) noise, t = 1..48, quarter 1 at t = 1. */
    private static double[] level(IntToDoubleFunction path, double[] season, double phi, double sigma,
                                  Random random) {
        double[] noise = ar1(phi, sigma, random);
        double[] values = new double[QUARTERS];
        for (int t = 1; t <= QUARTERS; t++) {
            values[t - 1] = path.applyAsDouble(t) * season[(t - 1) % 4] + noise[t - 1];
        }
        return values;
    }

    /** exp(a + b t + AR(1) noise) * season: constant growth of e^b - 1 per quarter. */
    private static double[] growth(double a, double b, double[] season, double phi, double sigma, Random random) {
        double[] noise = ar1(phi, sigma, random);
        double[] values = new double[QUARTERS];
        for (int t = 1; t <= QUARTERS; t++) {
            values[t - 1] = Math.exp(a + b * t + noise[t - 1]) * season[(t - 1) % 4];
        }
        return values;
    }

    /** AR(1) noise started at 0 and run 50 steps before the first kept value, so it is stationary. */
    private static double[] ar1(double phi, double sigma, Random random) {
        double e = 0;
        for (int i = 0; i < 50; i++) {
            e = phi * e + sigma * random.nextGaussian();
        }
        double[] noise = new double[QUARTERS];
        for (int i = 0; i < QUARTERS; i++) {
            e = phi * e + sigma * random.nextGaussian();
            noise[i] = e;
        }
        return noise;
    }

    private static String wide(List<String> names, List<double[]> series) {
        StringBuilder csv = new StringBuilder("quarter," + String.join(",", names) + "\r\n");
        for (int i = 0; i < QUARTERS; i++) {
            csv.append(FIRST_YEAR + i / 4).append("-Q").append(i % 4 + 1);
            for (double[] values : series) {
                csv.append(',').append(number(values[i]));
            }
            csv.append("\r\n");
        }
        return csv.toString();
    }

    private static String semicolon(String name, double[] values) {
        StringBuilder csv = new StringBuilder("period;" + name + "\n");
        for (int i = 0; i < QUARTERS; i++) {
            csv.append('Q').append(i % 4 + 1).append(' ').append(FIRST_YEAR + i / 4).append(';')
                    .append(number(values[i])).append('\n');
        }
        return csv.toString();
    }

    private static String longFormat(List<String> names, List<double[]> series) {
        List<String> lines = new ArrayList<>(List.of("series,period,value"));
        String[] quarterEnds = {"03-31", "06-30", "09-30", "12-31"};
        for (int s = 0; s < names.size(); s++) {
            for (int i = 0; i < QUARTERS; i++) {
                lines.add(names.get(s) + "," + (FIRST_YEAR + i / 4) + "-" + quarterEnds[i % 4] + ","
                        + number(series.get(s)[i]));
            }
        }
        return String.join("\n", lines) + "\n";
    }

    private static String number(double value) {
        return String.format(Locale.ROOT, "%.1f", value);
    }

    private static byte[] utf8(String text) {
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private static byte[] bomUtf8(String text) {
        return utf8("\uFEFF" + text);
    }
}
