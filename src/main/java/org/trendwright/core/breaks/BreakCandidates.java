package org.trendwright.core.breaks;

import org.trendwright.core.InsufficientDataException;

/**
 * The break rows a sup-F search tries: every m with 0.15 n &lt;= m &lt;= 0.85 n, i.e. ceil(0.15 n)
 * .. floor(0.85 n) (Andrews 1993, Econometrica 61, trimming pi0 = 0.15), where m counts the rows
 * before the break. Shared by the search on the data and the simulation of its null distribution,
 * which must try exactly the same rows. Stateless and thread-safe.
 */
final class BreakCandidates {

    private BreakCandidates() {
    }

    /** ceil(0.15 n), the shortest first segment; integer arithmetic avoids 0.15 n's rounding. */
    static int first(int n) {
        return (15 * n + 99) / 100;
    }

    /** floor(0.85 n), the longest first segment. */
    static int last(int n) {
        return 85 * n / 100;
    }

    /**
     * Refuses a sample whose shortest segment would hold k rows or fewer.
     *
     * @throws InsufficientDataException naming the smallest n that would do
     */
    static void checkSize(int n, int k) {
        if (first(n) <= k) {
            int needed = n;
            while (first(needed) <= k) {
                needed++;
            }
            throw InsufficientDataException.forModel("A sup-F break search on " + k + " regressors (15% of the"
                    + " sample must exceed " + k + " rows)", needed, n);
        }
    }
}
