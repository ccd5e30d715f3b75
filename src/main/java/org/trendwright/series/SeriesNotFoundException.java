package org.trendwright.series;

/** No series with the id, or no such version of it. */
public final class SeriesNotFoundException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public SeriesNotFoundException(long id) {
        super("There is no series " + id + "; list the series with GET /api/series.");
    }

    public SeriesNotFoundException(long id, int version) {
        super("Series " + id + " has no version " + version + "; list its versions with GET /api/series/" + id
                + "/versions.");
    }
}
