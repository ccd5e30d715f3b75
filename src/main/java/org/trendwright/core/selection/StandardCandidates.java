package org.trendwright.core.selection;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.trendwright.core.Observations;
import org.trendwright.core.TestResult;
import org.trendwright.core.analysis.TrendAnalyses;
import org.trendwright.core.autoregression.ArSpec;
import org.trendwright.core.autoregression.LagSelection;
import org.trendwright.core.trend.TrendFit;
import org.trendwright.core.trend.TrendSpec;

/**
 * The candidates Trendwright compares by default: the trend models (linear, quadratic,
 * log-linear when every value is positive, each with seasonal dummies too when the series has
 * seasons), the linear and log-linear trends with AR(1) errors, and autoregressions with their
 * order chosen by BIC on the levels and on the differences (with the seasonal lag for quarterly
 * and monthly data). Autoregressions and AR(1) errors need consecutive periods and are left out
 * for a series with gaps.
 *
 * <p>Stateless and thread-safe.
 */
public final class StandardCandidates {

    /** The largest AR order considered; more rarely pays on business series of a few dozen years. */
    static final int MAX_AR_ORDER = 8;

    private StandardCandidates() {
    }

    /** The default candidates for this series, with residual checks at {@code level}. */
    public static List<Candidate> forSeries(Observations series, double level) {
        boolean positive = allPositive(series);
        boolean seasonal = series.periodsPerYear() > 1;
        Function<TrendFit, List<TestResult>> checks = fit -> TrendAnalyses.serialCorrelationChecks(fit, level);
        List<TrendSpec> trends = new ArrayList<>(List.of(TrendSpec.linear(), TrendSpec.quadratic()));
        if (positive) {
            trends.add(TrendSpec.logLinear());
        }
        List<Candidate> candidates = new ArrayList<>();
        for (TrendSpec trend : trends) {
            candidates.add(new TrendCandidate(trend, checks));
            if (seasonal) {
                candidates.add(new TrendCandidate(trend.withSeasonalDummies(true), checks));
            }
        }
        if (!series.hasGaps()) {
            candidates.add(new GlsTrendCandidate(TrendSpec.linear().withSeasonalDummies(seasonal), level));
            if (positive) {
                candidates.add(new GlsTrendCandidate(TrendSpec.logLinear().withSeasonalDummies(seasonal), level));
            }
            candidates.addAll(autoregressions(series, level));
        }
        return candidates;
    }

    private static List<Candidate> autoregressions(Observations series, double level) {
        int maxOrder = Math.max(1, Math.min(MAX_AR_ORDER, series.size() / 10));
        ArSpec levels = ArSpec.selectedBy(LagSelection.BIC, maxOrder);
        ArSpec differences = levels.onDifferences();
        boolean seasonalLag = series.periodsPerYear() == 4 || series.periodsPerYear() == 12;
        if (seasonalLag && maxOrder < series.periodsPerYear()) {
            levels = levels.withSeasonalLag();
            differences = differences.withSeasonalLag();
        }
        return List.of(new ArCandidate(levels, level), new ArCandidate(differences, level));
    }

    private static boolean allPositive(Observations series) {
        for (int i = 0; i < series.size(); i++) {
            if (series.valueAt(i) <= 0) {
                return false;
            }
        }
        return true;
    }
}
