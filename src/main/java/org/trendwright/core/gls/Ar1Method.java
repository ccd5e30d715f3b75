package org.trendwright.core.gls;

/**
 * How feasible GLS for AR(1) errors treats the first observation.
 *
 * <ul>
 *   <li>{@link #COCHRANE_ORCUTT}: drops it. The quasi-differences y_t - rho y_{t-1} exist only for
 *       t = 2..n (Cochrane & Orcutt 1949, JASA 44).</li>
 *   <li>{@link #PRAIS_WINSTEN}: keeps it, scaled by sqrt(1 - rho^2) so that its error has the same
 *       variance as the quasi-differenced ones (Prais & Winsten 1954, Cowles Commission Discussion
 *       Paper 383). More efficient in short samples, and with trending regressors the first row
 *       can carry much information.</li>
 * </ul>
 */
public enum Ar1Method {
    COCHRANE_ORCUTT("Cochrane-Orcutt"),
    PRAIS_WINSTEN("Prais-Winsten");

    private final String label;

    Ar1Method(String label) {
        this.label = label;
    }

    /** The method's usual name, for reports. */
    public String label() {
        return label;
    }

    /** Number of rows of the transformed regression for n original rows. */
    int transformedRows(int n) {
        return this == PRAIS_WINSTEN ? n : n - 1;
    }
}
