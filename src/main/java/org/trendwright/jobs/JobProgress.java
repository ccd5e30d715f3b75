package org.trendwright.jobs;

import java.time.Duration;
import java.time.Instant;

/**
 * How far a batch fitting job has come. Immutable.
 *
 * @param id        the job
 * @param total     series in the job
 * @param done      series judged (a verdict or a failure stored)
 * @param failed    of those, series that could not be judged
 * @param createdAt when the job was created
 * @param now       when this progress was read
 */
public record JobProgress(long id, int total, int done, int failed, Instant createdAt, Instant now) {

    /** Share of the series judged, 0..100. */
    public double percent() {
        return total == 0 ? 100 : 100.0 * done / total;
    }

    /** True when every series has been judged. */
    public boolean finished() {
        return done >= total;
    }

    /**
     * Estimated seconds until the job is done, from the average rate since it was created; null
     * before the first series is done (no rate yet), 0 when finished.
     */
    public Double secondsLeft() {
        if (finished()) {
            return 0.0;
        }
        if (done == 0) {
            return null;
        }
        double elapsed = Duration.between(createdAt, now).toMillis() / 1000.0;
        return elapsed * (total - done) / done;
    }
}
