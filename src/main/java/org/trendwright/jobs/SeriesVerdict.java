package org.trendwright.jobs;

/**
 * One series' result in a batch fitting job. When the series could not be judged, {@code failure}
 * says why and the other findings are null. Immutable.
 *
 * @param seriesId          the series
 * @param version           the version that was fitted
 * @param recommendedModel  the candidate the out-of-sample comparison recommends
 * @param serialCorrelation true when a serial-correlation check (Durbin-Watson, Breusch-Godfrey,
 *                          Ljung-Box) of the recommended model's residuals rejected at 5%
 * @param unitRoot          true when the augmented Dickey-Fuller screen did not reject a unit root at
 *                          5%; null when the screen could not run
 * @param trendBreak        true when the sup-F screen found a break in the linear trend at 5%; null
 *                          when the screen could not run
 * @param nextForecast      the recommended model's forecast of the next period
 * @param failure           why the series could not be judged, or null
 */
public record SeriesVerdict(long seriesId, int version, String recommendedModel, Boolean serialCorrelation,
                            Boolean unitRoot, Boolean trendBreak, Double nextForecast, String failure) {

    /** A series that could not be judged. */
    public static SeriesVerdict failed(long seriesId, int version, String failure) {
        return new SeriesVerdict(seriesId, version, null, null, null, null, null, failure);
    }
}
