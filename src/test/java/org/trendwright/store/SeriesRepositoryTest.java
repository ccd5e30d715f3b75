package org.trendwright.store;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedClass;
import org.junit.jupiter.params.provider.EnumSource;
import org.trendwright.series.Frequency;
import org.trendwright.series.Period;
import org.trendwright.series.Point;
import org.trendwright.series.SeriesDraft;
import org.trendwright.series.SeriesVersion;
import org.trendwright.series.StoredUpload;
import org.trendwright.series.VersionConflictException;
import org.trendwright.testing.FreshStore;
import org.trendwright.testing.OpenedStore;

/** The repository on SQLite and PostgreSQL, each test on a fresh store with real migrations. */
@ParameterizedClass
@EnumSource(FreshStore.Kind.class)
class SeriesRepositoryTest {

    private static final Clock CLOCK = Clock.fixed(Instant.parse("2025-03-01T12:00:00Z"), ZoneOffset.UTC);

    private final FreshStore.Kind kind;
    private OpenedStore opened;
    private Database database;
    private SeriesRepository repository;

    SeriesRepositoryTest(FreshStore.Kind kind) {
        this.kind = kind;
    }

    @BeforeEach
    void open() {
        opened = OpenedStore.of(kind);
        database = opened.database();
        repository = new SeriesRepository(database, CLOCK);
    }

    @AfterEach
    void close() {
        if (opened != null) { // null when the PostgreSQL variant was skipped
            opened.close();
        }
    }

    private static SeriesDraft annual(String name, double... values) {
        List<Point> points = new ArrayList<>();
        for (int i = 0; i < values.length; i++) {
            points.add(new Point(Period.year(2020 + i), values[i]));
        }
        return new SeriesDraft(name, Frequency.ANNUAL, points);
    }

    @Test
    void stores_values_exactly_and_timestamps_from_the_clock() {
        double awkward = 0.1 + 0.2;
        SeriesDraft draft = annual("A", awkward, -1e-300, 1.7976931348623157e308, -0.0, Double.MIN_VALUE);
        long id = repository.createAll(List.of(draft)).series().get(0).id();
        SeriesVersion read = repository.latest(id);
        assertEquals(draft.points(), read.points());
        assertEquals(Instant.parse("2025-03-01T12:00:00Z"), read.createdAt());
    }

    @Test
    void a_failure_inside_an_upload_rolls_back_every_series_of_it() {
        SeriesDraft broken = new SeriesDraft("broken", Frequency.ANNUAL, List.of());
        assertThrows(RuntimeException.class, () -> repository.createAll(List.of(annual("A", 1, 2), broken)));
        assertEquals(List.of(), repository.list());
    }

    @Test
    void an_upload_names_the_series_it_created_while_they_exist() {
        StoredUpload first = repository.createAll(List.of(annual("A", 1, 2), annual("B", 3, 4)));
        StoredUpload second = repository.createAll(List.of(annual("C", 5, 6)));
        List<Long> firstIds = first.series().stream().map(s -> s.id()).toList();
        assertEquals(Optional.of(firstIds), repository.uploadSeries(first.uploadId()));
        assertEquals(Optional.of(List.of(second.series().get(0).id())), repository.uploadSeries(second.uploadId()));
        repository.delete(firstIds.get(0), 1);
        assertEquals(Optional.of(firstIds.subList(1, 2)), repository.uploadSeries(first.uploadId()));
        assertEquals(Optional.empty(), repository.uploadSeries(second.uploadId() + 1000));
    }

    @Test
    void reports_the_series_stored_after_each_batch() {
        List<SeriesDraft> drafts = new ArrayList<>();
        for (int i = 0; i < SeriesRepository.BATCH_SIZE * 2 + 5; i++) {
            drafts.add(annual("S" + i, i, i + 1));
        }
        List<Integer> reports = new ArrayList<>();
        repository.createAll(drafts, reports::add);
        assertEquals(List.of(100, 200, 205), reports);
    }

    @Test
    void of_writers_racing_from_the_same_version_exactly_one_wins() throws Exception {
        long id = repository.createAll(List.of(annual("A", 1, 2))).series().get(0).id();
        ExecutorService pool = Executors.newFixedThreadPool(4);
        List<Callable<Integer>> writers = new ArrayList<>();
        for (int w = 0; w < 4; w++) {
            double value = 10 + w;
            writers.add(() -> repository.addVersion(id, 1, current -> {
                List<Point> points = new ArrayList<>(current.points());
                points.add(new Point(Period.year(2022), value));
                return points;
            }).version());
        }
        int won = 0;
        int refused = 0;
        for (Future<Integer> result : pool.invokeAll(writers)) {
            try {
                assertEquals(2, result.get());
                won++;
            } catch (java.util.concurrent.ExecutionException e) {
                assertEquals(VersionConflictException.class, e.getCause().getClass());
                refused++;
            }
        }
        pool.shutdown();
        assertEquals(1, won);
        assertEquals(3, refused);
        assertEquals(2, repository.latest(id).version());
        assertEquals(List.of(1, 2), repository.versions(id).stream().map(v -> v.version()).toList());
    }
}
