package org.trendwright.core.analysis;

import java.util.List;
import java.util.Optional;
import org.trendwright.core.forecast.Forecast;
import org.trendwright.core.gls.Ar1GlsFit;
import org.trendwright.core.regression.Coefficient;
import org.trendwright.core.robust.HacInference;
import org.trendwright.core.trend.BackTransformed;
import org.trendwright.core.trend.TrendFit;

/**
 * Everything reported for one trend model: the least-squares fit, the coefficients under the
 * chosen error treatment, the forecast, the residual checks, and notes on anything skipped.
 * Immutable and thread-safe.
 *
 * @param spec            what was asked for
 * @param fit             the least-squares trend fit (always computed: the diagnostics test it)
 * @param coefficients    the coefficient table under the chosen treatment (classical, Newey-West
 *                        or GLS); on the log scale for a log-scale model
 * @param forecast        the forecast under the chosen treatment
 * @param backTransformed for a log-scale model, each forecast point's median, lognormal mean and
 *                        smearing mean (aligned with the forecast's points); empty otherwise
 * @param diagnostics     the residual checks of the least-squares fit; empty when the series has a
 *                        gap (they need consecutive periods: see notes)
 * @param hac             the Newey-West inference, when that treatment was asked for
 * @param gls             the feasible GLS fit, when a GLS treatment was asked for
 * @param notes           plain sentences on what was skipped or assumed
 */
public record TrendAnalysis(TrendAnalysisSpec spec, TrendFit fit, List<Coefficient> coefficients, Forecast forecast,
                            List<BackTransformed> backTransformed, Optional<ResidualDiagnostics> diagnostics,
                            Optional<HacInference> hac, Optional<Ar1GlsFit> gls, List<String> notes) {

    public TrendAnalysis {
        coefficients = List.copyOf(coefficients);
        backTransformed = List.copyOf(backTransformed);
        notes = List.copyOf(notes);
    }
}
