package org.trendwright.core;

/** The outcome of a hypothesis test at a chosen significance level. */
public enum Decision {
    /** The evidence is strong enough to reject the null hypothesis at the chosen level. */
    REJECT,
    /** The evidence is not strong enough to reject the null hypothesis at the chosen level. */
    DO_NOT_REJECT
}
