package org.trendwright.core;

import java.util.List;

/**
 * The uniform summary every test in the core returns: what was tested, the statistic, its
 * reference distribution and degrees of freedom, the p-value, the decision at the chosen level and
 * one plain sentence on what the outcome means for the forecast.
 *
 * <p>Immutable and thread-safe.
 *
 * @param test             the test's usual name, e.g. "Breusch-Godfrey LM (order 4)"
 * @param nullHypothesis   the null hypothesis in words
 * @param statistic        the test statistic
 * @param distribution     the reference distribution, e.g. "chi-square", "F", "exact", "Dickey-Fuller"
 * @param degreesOfFreedom degrees of freedom of that distribution (empty when it has none)
 * @param pValue           the p-value, in [0, 1]
 * @param level            the significance level the decision was taken at, in (0, 1)
 * @param decision         reject or do not reject the null at {@code level}
 * @param reading          one plain sentence on what this means for the forecast
 */
public record TestResult(String test, String nullHypothesis, double statistic, String distribution,
                         List<Double> degreesOfFreedom, double pValue, double level, Decision decision,
                         String reading) {

    public TestResult {
        degreesOfFreedom = List.copyOf(degreesOfFreedom);
        checkLevel(level);
    }

    /** Checks that a significance level lies strictly between 0 and 1. */
    public static void checkLevel(double level) {
        if (!(level > 0 && level < 1)) {
            throw new InvalidSpecificationException("A significance level must lie strictly between 0 and 1, got "
                    + level + "; 0.05 is the usual choice.");
        }
    }

    /** Rejects when the p-value is below the level. */
    public static Decision decide(double pValue, double level) {
        return pValue < level ? Decision.REJECT : Decision.DO_NOT_REJECT;
    }

    /** True when the null hypothesis was rejected at the chosen level. */
    public boolean rejected() {
        return decision == Decision.REJECT;
    }
}
