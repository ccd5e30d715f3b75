package org.trendwright.bench;

import java.io.IOException;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Duration;
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
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;
import org.trendwright.app.Settings;
import org.trendwright.app.TrendwrightApp;

/**
 * The stateless fit endpoint, POST /api/fit, for a 120-point quarterly series (30 years, linear
 * trend with seasonal dummies, seeded AR(1) noise) under a seasonal linear trend model with the
 * default 8-step forecast. Each sample is one HTTP round trip on the loopback interface from a
 * single client thread, so the reported percentiles bound the server's own time from above.
 * Sample-time mode over 5 measured iterations of 8 s gives over 10,000 samples at a few
 * milliseconds each. At tear-down the server's own timer (http_server_requests for /api/fit) is
 * printed: count, sum and max, and the p50 and p99 read off its histogram (the upper bound of the
 * bucket holding that quantile; warm-up requests included).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 8)
@Fork(1)
public class StatelessFitBench {

    private Path folder;
    private TrendwrightApp app;
    private HttpClient client;
    private HttpRequest request;

    @Setup
    public void start() throws IOException {
        folder = Files.createTempDirectory("trendwright-bench-");
        Settings settings = Settings.from(new String[] {"--port=0", "--demo-data=false",
            "--data-dir=" + folder}, java.util.Map.of());
        app = TrendwrightApp.start(settings, org.trendwright.testing.TeamAccess.testSettings(), Clock.systemUTC());
        String token = org.trendwright.testing.TeamAccess.bootstrap(app.port());
        client = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).build();
        request = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + app.port() + "/api/fit"))
                .header("Content-Type", "application/json").header("Authorization", "Bearer " + token).timeout(Duration.ofSeconds(10))
                .POST(HttpRequest.BodyPublishers.ofString(body())).build();
    }

    /** 120 quarters from 1995-Q1: 100 + 0.8 t + a seasonal pattern + AR(1) noise (phi 0.5), seed 120. */
    static String body() {
        SplittableRandom random = new SplittableRandom(120);
        double[] season = {-4, 1, 3, 0};
        StringBuilder json = new StringBuilder("{\"series\": {\"name\": \"bench\", \"observations\": [");
        double noise = 0;
        for (int t = 1; t <= 120; t++) {
            noise = 0.5 * noise + 2 * gaussian(random);
            double value = 100 + 0.8 * t + season[(t - 1) % 4] + noise;
            json.append(t == 1 ? "" : ", ").append(String.format(Locale.ROOT,
                    "{\"period\": \"%d-Q%d\", \"value\": %.3f}", 1995 + (t - 1) / 4, (t - 1) % 4 + 1, value));
        }
        return json.append("]}, \"model\": {\"family\": \"trend\", \"seasonal\": true}}").toString();
    }

    /** A standard normal by Box-Muller (SplittableRandom has no nextGaussian on Java 17). */
    private static double gaussian(SplittableRandom random) {
        return Math.sqrt(-2 * Math.log(1 - random.nextDouble())) * Math.cos(2 * Math.PI * random.nextDouble());
    }

    @Benchmark
    public String statelessFit() throws IOException, InterruptedException {
        HttpResponse<String> response = client.send(request, HttpResponse.BodyHandlers.ofString());
        if (response.statusCode() != 200) {
            throw new IllegalStateException("POST /api/fit answered " + response.statusCode() + ": " + response.body());
        }
        return response.body();
    }

    /** The upper bound (le) of the first cumulative bucket holding at least q of all requests. */
    static String bucketQuantile(List<String> lines, double q) {
        List<String> buckets = lines.stream().filter(l -> l.contains("_bucket{")).toList();
        double total = Double.parseDouble(buckets.get(buckets.size() - 1).replaceAll(".* ", ""));
        for (String bucket : buckets) {
            if (Double.parseDouble(bucket.replaceAll(".* ", "")) >= q * total) {
                return bucket.replaceAll(".*le=\"([^\"]+)\".*", "$1");
            }
        }
        return "+Inf";
    }

    @TearDown
    public void stop() throws IOException, InterruptedException {
        String metrics = client.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + app.port() + "/metrics"))
                .build(), HttpResponse.BodyHandlers.ofString()).body();
        List<String> fit = metrics.lines().filter(l -> l.startsWith("http_server_requests_seconds")
                && l.contains("route=\"/api/fit\"")).toList();
        fit.stream().filter(l -> !l.contains("_bucket")).forEach(System.out::println);
        System.out.println("server p50 <= " + bucketQuantile(fit, 0.5) + " s, p99 <= " + bucketQuantile(fit, 0.99)
                + " s");
        app.close();
        try (var files = Files.walk(folder)) {
            files.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }
}
