package org.trendwright.core.unitroot;

/**
 * The deterministic part of a Dickey-Fuller test regression (Dickey & Fuller 1979, JASA 74). Each
 * case has its own null distribution of the tau statistic, so the choice must match the
 * alternative one has in mind: a series that wanders around zero, around a fixed mean, or around a
 * linear trend.
 */
public enum DeterministicTerms {
    /** Δy_t = γ y_{t−1} + ...: under the alternative the series is stationary around zero. */
    NO_CONSTANT("no constant", 0),
    /** Δy_t = α + γ y_{t−1} + ...: under the alternative the series is stationary around a mean. */
    CONSTANT("constant", 1),
    /** Δy_t = α + βt + γ y_{t−1} + ...: under the alternative the series is stationary around a linear trend. */
    CONSTANT_AND_TREND("constant and trend", 2);

    private final String label;
    private final int count;

    DeterministicTerms(String label, int count) {
        this.label = label;
        this.count = count;
    }

    /** A short label for reports, e.g. "constant and trend". */
    public String label() {
        return label;
    }

    /** The number of deterministic regressors (0, 1 or 2). */
    public int count() {
        return count;
    }
}
