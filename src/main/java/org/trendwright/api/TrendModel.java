package org.trendwright.api;

import java.util.Locale;
import org.trendwright.core.trend.TrendShape;
import org.trendwright.core.trend.TrendSpec;

/**
 * A deterministic trend model: {@code {"family": "trend", "shape": "linear", "scale": "log",
 * "seasonal": true}}. Immutable and thread-safe.
 *
 * @param shape    "linear" (default) or "quadratic" in the period index t
 * @param scale    "level" (default) fits y, "log" fits ln y (constant growth when linear)
 * @param seasonal true adds one dummy per season after the first (default false)
 */
public record TrendModel(String shape, String scale, Boolean seasonal) implements ModelSpec {

    @Override
    public TrendModel normalized() {
        return new TrendModel(shape == null ? "linear" : lower(shape), scale == null ? "level" : lower(scale),
                seasonal != null && seasonal);
    }

    @Override
    public String family() {
        return "trend";
    }

    /** The core's spec; refuses unknown shapes and scales naming the field. */
    TrendSpec toSpec() {
        TrendModel n = normalized();
        TrendShape trendShape = switch (n.shape) {
            case "linear" -> TrendShape.LINEAR;
            case "quadratic" -> TrendShape.QUADRATIC;
            default -> throw new BadRequestException("model.shape", "model.shape must be 'linear' or 'quadratic',"
                    + " got '" + shape + "'.");
        };
        boolean log = switch (n.scale) {
            case "level" -> false;
            case "log" -> true;
            default -> throw new BadRequestException("model.scale", "model.scale must be 'level' or 'log', got '"
                    + scale + "'.");
        };
        return new TrendSpec(trendShape, log, n.seasonal);
    }

    private static String lower(String text) {
        return text.trim().toLowerCase(Locale.ROOT);
    }
}
