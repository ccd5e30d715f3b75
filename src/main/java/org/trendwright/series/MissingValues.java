package org.trendwright.series;

import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/** What an upload asks to happen with an empty value or a skipped period. */
public enum MissingValues {
    /** Refuse the upload, naming the first empty cell or skipped period (the default). */
    REFUSE,
    /** Keep the period's place as a gap: nothing is stored for it, later periods keep their index. */
    GAP;

    /** The option by its API name ("refuse" or "gap"), ignoring case. */
    public static Optional<MissingValues> fromName(String name) {
        return Arrays.stream(values()).filter(v -> v.name().equalsIgnoreCase(name.trim())).findFirst();
    }

    public String apiName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
