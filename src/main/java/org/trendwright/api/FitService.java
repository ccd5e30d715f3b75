package org.trendwright.api;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.micrometer.core.instrument.MeterRegistry;
import io.micrometer.core.instrument.Timer;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Supplier;
import org.trendwright.core.ModelException;
import org.trendwright.core.NonPositiveValueException;
import org.trendwright.core.Observations;
import org.trendwright.series.Frequency;
import org.trendwright.series.Period;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.SeriesVersions;
import org.trendwright.store.FitResultRepository;

/**
 * Runs fits and keeps the results of stored versions: a (series version, normalized model request)
 * pair is computed once, its JSON stored, and every later request for the pair answered with the
 * stored JSON unchanged. Concurrent requests for the same pair in one instance wait for the one
 * computing it; two instances on one PostgreSQL store may each compute it once, and the first
 * stored answer wins. The stateless fit computes every time and stores nothing. Fit counts and
 * times are recorded as the timer {@code trendwright.fits} (tags family, cache, outcome).
 * Thread-safe.
 */
final class FitService {

    /** A fit answer as JSON text, and whether it came from the store. */
    record Answer(String json, boolean cached) {
    }

    private final FitResultRepository results;
    private final ObjectMapper mapper;
    private final MeterRegistry registry;
    /** Fits being computed now, so that concurrent requests for one pair compute it once. */
    private final ConcurrentHashMap<String, CompletableFuture<String>> inFlight = new ConcurrentHashMap<>();

    FitService(FitResultRepository results, ObjectMapper mapper, MeterRegistry registry) {
        this.results = results;
        this.mapper = mapper;
        this.registry = registry;
    }

    Answer stored(SeriesVersion version, FitRequest raw) {
        FitRequest request = raw.normalized();
        String key = json(request);
        String family = family(request.model());
        long start = System.nanoTime();
        Optional<String> hit = results.find(version.seriesId(), version.version(), key);
        if (hit.isPresent()) {
            // A hit is counted with the time of the look-up that replaced the fit.
            timer(family, "hit", "fitted").record(System.nanoTime() - start, java.util.concurrent.TimeUnit.NANOSECONDS);
            return new Answer(hit.get(), true);
        }
        String flight = version.seriesId() + "/" + version.version() + "/" + key;
        CompletableFuture<String> mine = new CompletableFuture<>();
        CompletableFuture<String> running = inFlight.putIfAbsent(flight, mine);
        if (running != null) {
            return new Answer(awaitOther(running), true);
        }
        try {
            FitResponse.SeriesRef ref = ref(version.seriesId(), version.version(), version.name(),
                    version.frequency(), version.points());
            String json = json(timed(family, "miss", () -> fit(ref, version.frequency(), version.points(), request)));
            results.save(version.seriesId(), version.version(), key, json);
            mine.complete(json);
            return new Answer(json, false);
        } catch (RuntimeException e) {
            mine.completeExceptionally(e);
            throw e;
        } finally {
            inFlight.remove(flight, mine);
        }
    }

    /** The answer another request of this instance is computing for the same pair, or its failure. */
    private static String awaitOther(CompletableFuture<String> running) {
        try {
            return running.join();
        } catch (CompletionException e) {
            throw e.getCause() instanceof RuntimeException cause ? cause : e;
        }
    }

    /**
     * The fit of a posted series as JSON text, computed every time and stored nowhere. It is
     * serialised here, inside the caller's turn at the fit gate, so that the gate bounds all of a
     * fit's CPU work and fits finish in the order they were admitted.
     */
    String stateless(String name, Frequency frequency, List<Point> points, FitRequest raw) {
        FitRequest request = raw.normalized();
        FitResponse.SeriesRef ref = ref(null, null, name, frequency, points);
        return json(timed(family(request.model()), "none", () -> fit(ref, frequency, points, request)));
    }

    private static FitResponse fit(FitResponse.SeriesRef ref, Frequency frequency, List<Point> points,
                                   FitRequest request) {
        Observations series = SeriesVersions.observations(frequency, points);
        if (request.model() instanceof TrendModel trend) {
            try {
                return TrendResponses.fit(ref, points.get(0).period(), series, trend, request);
            } catch (NonPositiveValueException e) {
                throw namingThePeriod(e, points.get(0).period());
            }
        }
        if (request.model() instanceof ArModel ar) {
            return ArResponses.fit(ref, points.get(0).period(), series, ar, request);
        }
        throw new IllegalStateException("No fitter for model family " + request.model().family());
    }

    /** The core names the period by its index t; the user knows it by its label (2019-Q3). */
    private static NonPositiveValueException namingThePeriod(NonPositiveValueException e, Period first) {
        String label = SeriesVersions.periodAt(first, e.time()).label();
        return new NonPositiveValueException(e.getMessage().replace("at t = " + e.time(),
                "for period " + label + " (t = " + e.time() + ")"), e.time());
    }

    private static FitResponse.SeriesRef ref(Long id, Integer version, String name, Frequency frequency,
                                             List<Point> points) {
        Observations series = SeriesVersions.observations(frequency, points);
        return new FitResponse.SeriesRef(id, version, name, frequency.jsonName(), frequency.periodsPerYear(),
                points.get(0).period().label(), points.get(points.size() - 1).period().label(), points.size(),
                series.hasGaps());
    }

    private FitResponse timed(String family, String cache, Supplier<FitResponse> work) {
        long start = System.nanoTime();
        try {
            FitResponse response = work.get();
            timer(family, cache, "fitted").record(System.nanoTime() - start, java.util.concurrent.TimeUnit.NANOSECONDS);
            return response;
        } catch (ModelException | BadRequestException e) {
            timer(family, cache, "refused").record(System.nanoTime() - start, java.util.concurrent.TimeUnit.NANOSECONDS);
            throw e;
        }
    }

    private Timer timer(String family, String cache, String outcome) {
        return Timer.builder("trendwright.fits").description("Model fits: count and time spent fitting")
                .tags("family", family, "cache", cache, "outcome", outcome).register(registry);
    }

    private static String family(ModelSpec model) {
        return model.family();
    }

    private String json(Object value) {
        try {
            return mapper.writeValueAsString(value);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("A fit result could not be written as JSON", e);
        }
    }
}
