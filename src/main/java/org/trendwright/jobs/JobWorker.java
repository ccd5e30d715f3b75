package org.trendwright.jobs;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.UUID;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;
import org.trendwright.series.SeriesNotFoundException;
import org.trendwright.series.SeriesVersion;
import org.trendwright.store.JobRepository;
import org.trendwright.store.SeriesRepository;

/**
 * The background workers of one instance: each thread claims a small batch of job items with a
 * lease, judges every series ({@link SeriesVerdicts}) and stores the verdicts, until it is closed.
 * Nothing needed for correctness is held in memory: after a crash the leases run out and any
 * instance (this one restarted, or another on the same PostgreSQL) claims the items again. Thread-safe.
 */
public final class JobWorker implements AutoCloseable {

    /** Items one claim takes: small enough that instances share a job evenly. */
    static final int BATCH = 16;
    /** Pause of an idle worker before it looks for work again. */
    static final long IDLE_MILLIS = 200;

    private static final Logger LOG = LoggerFactory.getLogger(JobWorker.class);

    private final JobRepository jobs;
    private final SeriesRepository series;
    private final Duration lease;
    private final ExecutorService threads;
    private volatile boolean running = true;

    /**
     * Starts {@code threadCount} workers (0 starts none: this instance only serves the API) once
     * {@code storeReady} completes.
     */
    public JobWorker(JobRepository jobs, SeriesRepository series, int threadCount, Duration lease,
                     CompletableFuture<?> storeReady) {
        this.jobs = jobs;
        this.series = series;
        this.lease = lease;
        this.threads = Executors.newFixedThreadPool(Math.max(1, threadCount), r -> {
            Thread t = new Thread(r, "trendwright-job-worker");
            t.setDaemon(true);
            return t;
        });
        String instance = UUID.randomUUID().toString().substring(0, 8);
        for (int i = 0; i < threadCount; i++) {
            String name = instance + "-" + i;
            threads.execute(() -> {
                storeReady.join();
                loop(name);
            });
        }
    }

    private void loop(String worker) {
        while (running) {
            try {
                if (!workOnce(worker)) {
                    Thread.sleep(IDLE_MILLIS);
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                return;
            } catch (RuntimeException e) {
                // A store outage: the claimed items' leases run out and they are claimed again later.
                if (running) {
                    LOG.warn("event=job-worker-error worker={} message={} cause={}", worker, e.getMessage(),
                            e.getCause() == null ? "" : e.getCause().getMessage());
                }
                sleepQuietly();
            }
        }
    }

    /** Claims and judges one batch; false when there was nothing to do. */
    boolean workOnce(String worker) {
        List<JobItem> items = jobs.claim(worker, BATCH, lease);
        if (items.isEmpty()) {
            return false;
        }
        for (long jobId : items.stream().mapToLong(JobItem::jobId).distinct().toArray()) {
            List<SeriesVerdict> verdicts = new ArrayList<>();
            for (JobItem item : items) {
                if (item.jobId() == jobId && running) {
                    verdicts.add(judge(item));
                }
            }
            jobs.complete(worker, jobId, verdicts);
        }
        return true;
    }

    private SeriesVerdict judge(JobItem item) {
        try {
            SeriesVersion version = series.version(item.seriesId(), item.version());
            return SeriesVerdicts.judge(version);
        } catch (SeriesNotFoundException e) {
            return SeriesVerdict.failed(item.seriesId(), item.version(), "The series was deleted before it was"
                    + " fitted.");
        }
    }

    private void sleepQuietly() {
        try {
            Thread.sleep(IDLE_MILLIS * 5);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    /** Stops claiming; batches in progress are abandoned to their leases. */
    @Override
    public void close() {
        running = false;
        threads.shutdownNow();
        try {
            threads.awaitTermination(5, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
