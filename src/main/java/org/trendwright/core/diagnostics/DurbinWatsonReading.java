package org.trendwright.core.diagnostics;

import java.util.Locale;

/** The plain-language sentence of a {@link DurbinWatsonResult}. Stateless and thread-safe. */
final class DurbinWatsonReading {

    private DurbinWatsonReading() {
    }

    static String of(DurbinWatsonResult r) {
        return switch (r.verdict()) {
            case POSITIVE_SERIAL_CORRELATION -> "Successive residuals are positively correlated ("
                    + numbers(r, "p = " + p(r.pValuePositive()) + " against positive correlation")
                    + "), so the reported standard errors are too small and the prediction intervals too narrow;"
                    + " consider an AR model for the errors, HAC (Newey-West) standard errors or GLS.";
            case NEGATIVE_SERIAL_CORRELATION -> "Successive residuals are negatively correlated ("
                    + numbers(r, "p = " + p(r.pValueNegative()) + " against negative correlation")
                    + "): they alternate in sign more than chance allows, which often points to a mis-specified"
                    + " model, and the reported standard errors are unreliable; check the model and consider an AR"
                    + " model for the errors or HAC standard errors.";
            case NONE_DETECTED -> "No first-order serial correlation detected ("
                    + numbers(r, "p = " + p(r.pValuePositive()) + " against positive and " + p(r.pValueNegative())
                    + " against negative correlation")
                    + "), so this test gives no reason to distrust the reported standard errors and prediction"
                    + " intervals.";
        };
    }

    /** "d = 1.234, exact p = ...", with the bounds note when the bounds could not decide. */
    private static String numbers(DurbinWatsonResult r, String pValues) {
        String text = String.format(Locale.ROOT, "d = %.3f, exact %s", r.statistic(), pValues);
        if (!r.interceptIncluded()) {
            return text + "; the dL/dU bounds do not apply without an intercept";
        }
        return r.inconclusiveByBounds() ? text + "; inconclusive by the bounds, so the exact test decides" : text;
    }

    private static String p(double p) {
        return p < 1e-4 ? "< 0.0001" : String.format(Locale.ROOT, "%.4f", p);
    }
}
