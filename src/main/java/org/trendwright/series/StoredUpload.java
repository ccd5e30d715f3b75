package org.trendwright.series;

import java.util.List;

/**
 * The series one upload created, under the upload's id. Immutable and thread-safe.
 *
 * @param uploadId the id of the upload (POST /api/jobs accepts it in place of the series ids)
 * @param series   the created series at version 1, in upload order
 */
public record StoredUpload(long uploadId, List<SeriesSummary> series) {

    public StoredUpload {
        series = List.copyOf(series);
    }
}
