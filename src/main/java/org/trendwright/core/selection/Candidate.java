package org.trendwright.core.selection;

import org.trendwright.core.Observations;

/**
 * A model that can be fitted to a training series and forecast from it: the unit that the model
 * comparison refits at every holdout split and forecast origin. Implementations are immutable
 * and thread-safe.
 */
public interface Candidate {

    /** A short name shown in the comparison table, e.g. "linear trend". */
    String name();

    /** Fits the model to {@code training}; throws a ModelException when the data cannot support it. */
    CandidateFit fit(Observations training);
}
