package org.trendwright.core.analysis;

/** How a trend model treats its errors when reporting inference and forecasts. */
public enum ErrorTreatment {
    /** Ordinary least squares with the classical standard errors (independent errors assumed). */
    CLASSICAL,
    /** Least-squares coefficients with Newey-West (1987) standard errors, robust to serial correlation. */
    NEWEY_WEST,
    /** Feasible GLS for AR(1) errors, iterated Cochrane-Orcutt (drops the first observation). */
    COCHRANE_ORCUTT,
    /** Feasible GLS for AR(1) errors, Prais-Winsten (keeps the first observation). */
    PRAIS_WINSTEN
}
