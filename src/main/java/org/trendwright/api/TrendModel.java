package org.trendwright.api;

import java.util.List;
import java.util.Locale;
import java.util.OptionalInt;
import org.trendwright.core.analysis.ErrorTreatment;
import org.trendwright.core.analysis.TrendAnalysisSpec;
import org.trendwright.core.trend.TrendShape;
import org.trendwright.core.trend.TrendSpec;

/**
 * A deterministic trend model: {@code {"family": "trend", "shape": "linear", "scale": "log",
 * "seasonal": true, "errors": "newey-west"}}. Immutable and thread-safe.
 *
 * @param shape    "linear" (default) or "quadratic" in the period index t
 * @param scale    "level" (default) fits y, "log" fits ln y (constant growth when linear)
 * @param seasonal true adds one dummy per season after the first (default false)
 * @param errors   how the errors are treated for inference and forecasts: "classical" (default),
 *                 "newey-west" (HAC standard errors), "cochrane-orcutt" or "prais-winsten"
 *                 (feasible GLS for AR(1) errors)
 * @param hacLag   the Newey-West lag; null for the automatic rule (only with "newey-west")
 */
public record TrendModel(String shape, String scale, Boolean seasonal, String errors, Integer hacLag)
        implements ModelSpec {

    @Override
    public TrendModel normalized() {
        return new TrendModel(shape == null ? "linear" : lower(shape), scale == null ? "level" : lower(scale),
                seasonal != null && seasonal, errors == null ? "classical" : lower(errors), hacLag);
    }

    @Override
    public String family() {
        return "trend";
    }

    /** The core's analysis spec; refuses unknown options naming the field. */
    TrendAnalysisSpec toSpec(int horizon, List<Double> levels, double significance) {
        TrendModel n = normalized();
        TrendSpec trend = new TrendSpec(shape(n.shape), logScale(n.scale), n.seasonal);
        ErrorTreatment treatment = treatment(n.errors);
        if (hacLag != null && treatment != ErrorTreatment.NEWEY_WEST) {
            throw new BadRequestException("model.hacLag", "model.hacLag applies only with errors 'newey-west'.");
        }
        return new TrendAnalysisSpec(trend, treatment, hacLag == null ? OptionalInt.empty() : OptionalInt.of(hacLag),
                OptionalInt.empty(), horizon, levels, significance);
    }

    private TrendShape shape(String value) {
        return switch (value) {
            case "linear" -> TrendShape.LINEAR;
            case "quadratic" -> TrendShape.QUADRATIC;
            default -> throw new BadRequestException("model.shape", "model.shape must be 'linear' or 'quadratic',"
                    + " got '" + shape + "'.");
        };
    }

    private boolean logScale(String value) {
        return switch (value) {
            case "level" -> false;
            case "log" -> true;
            default -> throw new BadRequestException("model.scale", "model.scale must be 'level' or 'log', got '"
                    + scale + "'.");
        };
    }

    private ErrorTreatment treatment(String value) {
        return switch (value) {
            case "classical" -> ErrorTreatment.CLASSICAL;
            case "newey-west" -> ErrorTreatment.NEWEY_WEST;
            case "cochrane-orcutt" -> ErrorTreatment.COCHRANE_ORCUTT;
            case "prais-winsten" -> ErrorTreatment.PRAIS_WINSTEN;
            default -> throw new BadRequestException("model.errors", "model.errors must be 'classical',"
                    + " 'newey-west', 'cochrane-orcutt' or 'prais-winsten', got '" + errors + "'.");
        };
    }

    private static String lower(String text) {
        return text.trim().toLowerCase(Locale.ROOT);
    }
}
