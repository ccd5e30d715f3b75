package org.trendwright.api;

import java.time.Clock;
import java.time.Duration;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Pattern;

/**
 * How far the uploads in flight on this instance have got, by a key the client chooses and sends
 * with the upload ({@code POST /api/series?progress=KEY}) and then polls
 * ({@code GET /api/upload-progress/{key}}). Phases: receiving (rows read as the body streams in),
 * checking (series checked of the total), storing (series written of the total, in the one
 * transaction of the upload), then done or failed.
 *
 * <p>Progress is kept in memory only, since nothing depends on it for correctness: behind several
 * instances a poll answered by another instance than the one handling the upload finds no such
 * key (404), and the page then shows the bytes sent instead; route the polls to the same instance
 * (sticky sessions) to see the server's phases. Entries are dropped {@link #KEEP} after they
 * finish, and at most {@value #MAX_TRACKED} uploads are tracked at once (further uploads go
 * untracked). Only the member who started an upload may read its progress. Thread-safe.
 */
final class UploadProgress {

    /** A progress key: 16 to 64 letters, digits, '-' or '_' (a UUID fits). */
    static final Pattern KEY = Pattern.compile("[A-Za-z0-9_-]{16,64}");
    static final int MAX_TRACKED = 1_000;
    static final Duration KEEP = Duration.ofMinutes(10);

    /** Shares of the bar's 100 given to receiving and to checking; storing takes the rest. */
    private static final double RECEIVING_SHARE = 40;
    private static final double CHECKING_SHARE = 20;

    /** One upload's progress as JSON; counts that do not apply yet are 0, bytesTotal null when unknown. */
    record State(String key, String phase, long bytesRead, Long bytesTotal, long rowsRead, int seriesTotal,
                 int seriesChecked, int seriesStored, double percent, boolean finished) {
    }

    private final Map<String, Tracker> trackers = new ConcurrentHashMap<>();
    private final Clock clock;

    UploadProgress(Clock clock) {
        this.clock = clock;
    }

    /**
     * Starts tracking the upload of {@code key} for member {@code memberId}; a null key tracks
     * nothing. Refuses a malformed key, and a key whose upload is still in flight.
     */
    Tracker start(String key, Long memberId, Long bytesTotal) {
        if (key == null) {
            return new Tracker(null, memberId, bytesTotal);
        }
        requireWellFormed(key);
        long now = clock.millis();
        trackers.values().removeIf(t -> t.finishedAt > 0 && now - t.finishedAt > KEEP.toMillis());
        Tracker tracker = new Tracker(key, memberId, bytesTotal);
        if (trackers.size() >= MAX_TRACKED) {
            return new Tracker(null, memberId, bytesTotal);
        }
        return trackers.compute(key, (k, earlier) -> {
            if (earlier != null && earlier.finishedAt == 0) {
                throw new BadRequestException(409, "conflict", "progress", "An upload with progress key " + key
                        + " is still in flight; choose a new random key for each upload.");
            }
            return tracker;
        });
    }

    /** The progress of {@code key} if this instance tracks it for member {@code memberId}. */
    Optional<State> find(String key, Long memberId) {
        requireWellFormed(key);
        Tracker tracker = trackers.get(key);
        return tracker == null || !Objects.equals(tracker.memberId, memberId) ? Optional.empty()
                : Optional.of(tracker.state());
    }

    private static void requireWellFormed(String key) {
        if (!KEY.matcher(key).matches()) {
            throw new BadRequestException("progress", "A progress key must be 16 to 64 letters, digits, '-' or '_'"
                    + " (a random UUID fits), got '" + key + "'.");
        }
    }

    /** The progress of one upload, written by the request's thread and read by polls. Thread-safe. */
    final class Tracker {
        private final String key;
        private final Long memberId;
        private final Long bytesTotal;
        private volatile String phase = "receiving";
        private volatile long bytesRead;
        private volatile long rowsRead;
        private volatile int seriesTotal;
        private volatile int seriesChecked;
        private volatile int seriesStored;
        private volatile long finishedAt;

        private Tracker(String key, Long memberId, Long bytesTotal) {
            this.key = key;
            this.memberId = memberId;
            this.bytesTotal = bytesTotal;
        }

        void bytesRead(long bytes) {
            bytesRead = bytes;
        }

        void rowsRead(long rows) {
            rowsRead = rows;
        }

        void checked(int done, int total) {
            seriesTotal = total;
            seriesChecked = done;
            phase = "checking";
        }

        void stored(int done) {
            seriesStored = done;
            phase = "storing";
        }

        void done() {
            finish("done");
        }

        void failed() {
            finish("failed");
        }

        private void finish(String last) {
            phase = last;
            finishedAt = clock.millis();
        }

        State state() {
            return new State(key, phase, bytesRead, bytesTotal, rowsRead, seriesTotal, seriesChecked, seriesStored,
                    percent(), finishedAt > 0);
        }

        /** Receiving fills the first 40 (by bytes, when the length is known), checking 20, storing 40. */
        private double percent() {
            String now = phase;
            if (now.equals("done")) {
                return 100;
            }
            double received = bytesTotal == null || bytesTotal == 0 ? 0 : Math.min(1, (double) bytesRead / bytesTotal);
            double checked = seriesTotal == 0 ? 0 : (double) seriesChecked / seriesTotal;
            double stored = seriesTotal == 0 ? 0 : (double) seriesStored / seriesTotal;
            double value = switch (now) {
                case "receiving" -> RECEIVING_SHARE * received;
                case "checking" -> RECEIVING_SHARE + CHECKING_SHARE * checked;
                default -> RECEIVING_SHARE + CHECKING_SHARE + (100 - RECEIVING_SHARE - CHECKING_SHARE) * stored;
            };
            return Math.round(value * 10) / 10.0;
        }
    }
}
