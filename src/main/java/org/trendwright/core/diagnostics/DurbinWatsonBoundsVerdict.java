package org.trendwright.core.diagnostics;

/**
 * What Durbin &amp; Watson's bounds test says about one direction of serial correlation (Durbin &amp;
 * Watson 1951, Biometrika 38, 159-178). Against positive correlation: d &lt; dL rejects, d &gt; dU
 * does not, and dL &lt;= d &lt;= dU is inconclusive; against negative correlation the same with
 * 4 - d in place of d.
 */
public enum DurbinWatsonBoundsVerdict {
    /** d is beyond dL (or 4 - d below dL): no design with this n and k' could make it insignificant. */
    REJECT,
    /** d lies between the bounds: the verdict depends on the design, so only the exact test decides. */
    INCONCLUSIVE,
    /** d is beyond dU: no design with this n and k' could make it significant. */
    DO_NOT_REJECT,
    /** The design does not span the constant, so the bounds do not hold and only the exact test applies. */
    NOT_APPLICABLE
}
