package org.trendwright.core.trend;

/** The deterministic time path of a trend model, in the period index t = 1, 2, .... */
public enum TrendShape {
    /** b0 + b1 t. */
    LINEAR,
    /** b0 + b1 t + b2 t^2. */
    QUADRATIC
}
