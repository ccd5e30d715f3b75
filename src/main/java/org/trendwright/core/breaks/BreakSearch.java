package org.trendwright.core.breaks;

import org.trendwright.core.TestResult;

/**
 * The outcome of a search for one break at an unknown row ({@link SupFTest}). Immutable and
 * thread-safe: array accessors return copies.
 *
 * @param test                the sup-F test: statistic sup F, p-value from the design's own
 *                            simulated null distribution ({@link SupFNullDistribution})
 * @param breakRow            the candidate m with the largest Chow F, the most likely break: the new
 *                            regime starts at row m + 1 (counting rows from 1)
 * @param candidateRows       every break row m searched, in increasing order
 * @param fStatistics         the Chow F statistic at each candidate row, for charting
 * @param pValueStandardError the Monte Carlo standard error of the test's p-value,
 *                            sqrt(p (1 - p) / R)
 * @param replications        R, the number of simulated null values behind the p-value
 * @param asymptoticPValue    the p-value from Andrews' (1993) limit, P(W &gt; k sup F), for
 *                            comparison only: it is too small for trend designs (see {@link SupFTest})
 */
public record BreakSearch(TestResult test, int breakRow, int[] candidateRows, double[] fStatistics,
                          double pValueStandardError, int replications, double asymptoticPValue) {

    public BreakSearch {
        candidateRows = candidateRows.clone();
        fStatistics = fStatistics.clone();
    }

    @Override
    public int[] candidateRows() {
        return candidateRows.clone();
    }

    @Override
    public double[] fStatistics() {
        return fStatistics.clone();
    }

    /** The largest Chow F over the candidates, the test statistic. */
    public double supF() {
        return test.statistic();
    }
}
