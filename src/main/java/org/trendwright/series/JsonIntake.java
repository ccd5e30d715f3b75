package org.trendwright.series;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.trendwright.series.IntakeException.Reason;

/**
 * Reads series from a parsed JSON body. One series:
 * <pre>
 * {"name": "Kettles", "frequency": "quarterly",
 *  "observations": [{"period": "2024-Q1", "value": 120.5}, {"period": "2024-Q2", "value": null}]}
 * </pre>
 * or several as {@code {"series": [ ... ]}}. {@code frequency} is optional; when given it must
 * match the frequency detected from the periods. A null or absent value is an empty cell (see
 * {@link MissingValues}). Messages name the JSON path. Stateless and thread-safe.
 */
public final class JsonIntake {

    private JsonIntake() {
    }

    /** All series of a create request. */
    public static List<SeriesInput> readMany(JsonNode body, IntakeOptions options) {
        requireObject(body, "the request body");
        JsonNode many = body.get("series");
        if (many == null) {
            return List.of(readOne(body, "", true));
        }
        if (!many.isArray() || many.isEmpty()) {
            throw invalid("series", "must be a non-empty array of series.");
        }
        if (many.size() > options.limits().maxSeriesPerUpload()) {
            throw new IntakeException(Reason.LIMIT_EXCEEDED, Where.field("series"), "the request holds "
                    + many.size() + " series; the limit per upload is " + options.limits().maxSeriesPerUpload() + ".");
        }
        List<SeriesInput> series = new ArrayList<>(many.size());
        for (int i = 0; i < many.size(); i++) {
            series.add(readOne(many.get(i), "series[" + i + "].", true));
        }
        return series;
    }

    /**
     * One series at JSON path {@code prefix} (e.g. "series[2]." or ""); the name is required only
     * when {@code needsName}.
     */
    public static SeriesInput readOne(JsonNode node, String prefix, boolean needsName) {
        requireObject(node, prefix.isEmpty() ? "the request body" : prefix.substring(0, prefix.length() - 1));
        String name = text(node, prefix, "name", needsName).orElse(null);
        JsonNode observations = node.get("observations");
        if (observations == null || !observations.isArray() || observations.isEmpty()) {
            throw invalid(prefix + "observations", "must be a non-empty array of {\"period\", \"value\"} objects.");
        }
        List<PeriodColumn.Cell> cells = new ArrayList<>(observations.size());
        for (int i = 0; i < observations.size(); i++) {
            String at = prefix + "observations[" + i + "]";
            requireObject(observations.get(i), at);
            cells.add(new PeriodColumn.Cell(text(observations.get(i), at + ".", "period", true).orElseThrow(),
                    Where.field(at + ".period")));
        }
        List<Period> periods = PeriodColumn.resolve(cells);
        checkFrequency(node, prefix, periods.get(0).frequency());
        List<SeriesInput.Change> changes = new ArrayList<>(periods.size());
        for (int i = 0; i < periods.size(); i++) {
            Where where = Where.field(prefix + "observations[" + i + "].value");
            changes.add(new SeriesInput.Change(periods.get(i), value(observations.get(i).get("value"), where), where));
        }
        return new SeriesInput(name, Where.field(prefix + "name"), changes);
    }

    private static void checkFrequency(JsonNode node, String prefix, Frequency detected) {
        Optional<String> given = text(node, prefix, "frequency", false);
        if (given.isEmpty()) {
            return;
        }
        Frequency frequency = Frequency.fromJsonName(given.get()).orElseThrow(() -> invalid(prefix + "frequency",
                "'" + given.get() + "' is no frequency; use annual, quarterly, monthly, weekly or daily."));
        if (frequency != detected) {
            throw new IntakeException(Reason.INCONSISTENT, Where.field(prefix + "frequency"), "the request says "
                    + frequency.jsonName() + " but the periods are " + detected.jsonName()
                    + "; correct the periods or leave out the frequency.");
        }
    }

    private static Double value(JsonNode value, Where where) {
        if (value == null || value.isNull()) {
            return null;
        }
        if (!value.isNumber()) {
            throw new IntakeException(Reason.INVALID_VALUE, where, "must be a number or null, got " + value + ".");
        }
        double number = value.doubleValue();
        // The node's text only for a refusal: writing a double out costs more than reading it,
        // and this runs once per value of every posted series.
        return Double.isFinite(number) ? number : ValueCell.finite(number, value.asText(), where);
    }

    private static Optional<String> text(JsonNode node, String prefix, String field, boolean required) {
        JsonNode value = node.get(field);
        if (value == null || value.isNull()) {
            if (required) {
                throw invalid(prefix + field, "is required.");
            }
            return Optional.empty();
        }
        if (!value.isTextual()) {
            throw invalid(prefix + field, "must be a string, got " + value + ".");
        }
        return Optional.of(value.asText());
    }

    private static void requireObject(JsonNode node, String what) {
        if (node == null || !node.isObject()) {
            throw new IntakeException(Reason.INVALID_VALUE, Where.field(what.startsWith("the ") ? "" : what),
                    what + " must be a JSON object.");
        }
    }

    private static IntakeException invalid(String path, String message) {
        return new IntakeException(Reason.INVALID_VALUE, Where.field(path), message);
    }
}
