package org.trendwright.core.trend;

/**
 * Which trend model to fit.
 *
 * @param shape           linear or quadratic in t
 * @param logScale        fit ln y instead of y (the log-linear, constant-growth model when linear)
 * @param seasonalDummies add one dummy per season except the first (s - 1 dummies for s periods
 *                        per year), so the first season is the base and each dummy is that
 *                        season's shift from it
 */
public record TrendSpec(TrendShape shape, boolean logScale, boolean seasonalDummies) {

    /** y = b0 + b1 t. */
    public static TrendSpec linear() {
        return new TrendSpec(TrendShape.LINEAR, false, false);
    }

    /** ln y = b0 + b1 t: constant growth of e^b1 - 1 per period. */
    public static TrendSpec logLinear() {
        return new TrendSpec(TrendShape.LINEAR, true, false);
    }

    /** y = b0 + b1 t + b2 t^2. */
    public static TrendSpec quadratic() {
        return new TrendSpec(TrendShape.QUADRATIC, false, false);
    }

    /** y = b0 + b1 t + seasonal shifts. */
    public static TrendSpec linearSeasonal() {
        return new TrendSpec(TrendShape.LINEAR, false, true);
    }

    /** This model with seasonal dummies switched on or off. */
    public TrendSpec withSeasonalDummies(boolean on) {
        return new TrendSpec(shape, logScale, on);
    }

    /** A short human description, e.g. "log-linear trend with seasonal dummies". */
    public String description() {
        String base = switch (shape) {
            case LINEAR -> logScale ? "log-linear trend" : "linear trend";
            case QUADRATIC -> logScale ? "log-quadratic trend" : "quadratic trend";
        };
        return seasonalDummies ? base + " with seasonal dummies" : base;
    }
}
