package org.trendwright.team;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * How a brief's forecast fared against the actuals that arrived after it: for every forecast
 * period the series' latest version now holds, the forecast, the actual, the error
 * (actual - forecast) and whether the actual fell inside the published 80% and 95% intervals;
 * then the running mean absolute error and mean absolute percentage error over those periods
 * (Hyndman &amp; Koehler 2006, "Another look at measures of forecast accuracy", Int. J. Forecasting
 * 22). MAPE leaves out periods whose actual is 0 (it is undefined there) and is null when none
 * remain; both are null before any actual arrives. Computed at read time, never stored.
 * Immutable and thread-safe.
 *
 * @param latestVersion the series version the actuals were read from (null when the series is gone)
 * @param periods       one row per forecast period with an actual
 * @param mae           mean |actual - forecast|
 * @param mape          mean |actual - forecast| / |actual| x 100, in percent
 * @param outside95     how many actuals fell outside the 95% interval
 */
public record BriefTracking(Integer latestVersion, List<Row> periods, Double mae, Double mape, int outside95) {

    /** One forecast period with its actual; a flag is null when the brief has no interval at that level. */
    public record Row(String period, double forecast, double actual, double error, Boolean inside80,
                      Boolean inside95) {
    }

    public BriefTracking {
        periods = List.copyOf(periods);
    }

    /** Tracking of a series that no longer exists: nothing to compare with. */
    public static BriefTracking seriesGone() {
        return new BriefTracking(null, List.of(), null, null, 0);
    }

    /**
     * Compares the frozen forecast (the fit's chart: forecastPeriods, forecast, bands of level,
     * lower, upper on the original scale) with the actuals by period label.
     */
    public static BriefTracking of(JsonNode chart, int latestVersion, Map<String, Double> actuals) {
        List<Row> rows = new ArrayList<>();
        JsonNode periods = chart.path("forecastPeriods");
        for (int i = 0; i < periods.size(); i++) {
            Double actual = actuals.get(periods.get(i).asText());
            JsonNode forecast = chart.path("forecast").path(i);
            if (actual != null && forecast.isNumber()) {
                rows.add(new Row(periods.get(i).asText(), forecast.asDouble(), actual, actual - forecast.asDouble(),
                        inside(chart, 0.80, i, actual), inside(chart, 0.95, i, actual)));
            }
        }
        return new BriefTracking(latestVersion, rows, mae(rows), mape(rows),
                (int) rows.stream().filter(r -> Boolean.FALSE.equals(r.inside95())).count());
    }

    private static Boolean inside(JsonNode chart, double level, int i, double actual) {
        for (JsonNode band : chart.path("bands")) {
            // Levels are stored as parsed from JSON; 1e-9 tells 0.8 from any other level a request can name.
            if (Math.abs(band.path("level").asDouble() - level) < 1e-9) {
                JsonNode lower = band.path("lower").path(i);
                JsonNode upper = band.path("upper").path(i);
                return lower.isNumber() && upper.isNumber() ? actual >= lower.asDouble() && actual <= upper.asDouble()
                        : null;
            }
        }
        return null;
    }

    private static Double mae(List<Row> rows) {
        return rows.isEmpty() ? null : rows.stream().mapToDouble(r -> Math.abs(r.error())).average().orElseThrow();
    }

    private static Double mape(List<Row> rows) {
        var defined = rows.stream().filter(r -> r.actual() != 0).mapToDouble(r -> Math.abs(r.error() / r.actual()));
        var average = defined.average();
        return average.isPresent() ? 100 * average.getAsDouble() : null;
    }
}
