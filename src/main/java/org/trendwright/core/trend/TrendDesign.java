package org.trendwright.core.trend;

import java.util.ArrayList;
import java.util.List;
import org.trendwright.core.InvalidSpecificationException;
import org.trendwright.core.Observations;
import org.trendwright.core.regression.Design;

/**
 * The regressors of a trend model as functions of the period index t: a constant, t, t^2 for the
 * quadratic shape, and a 0/1 dummy for each season after the first. The same rule builds the
 * in-sample design and the row of any future period, so a forecast uses exactly the fitted model.
 *
 * <p>Immutable and thread-safe.
 */
record TrendDesign(TrendSpec spec, int periodsPerYear, int firstSeason) {

    TrendDesign {
        if (spec.seasonalDummies() && periodsPerYear < 2) {
            throw new InvalidSpecificationException("Seasonal dummies need a series with at least two periods per"
                    + " year; this series has " + periodsPerYear + ". Fit the model without seasonal dummies.");
        }
    }

    static TrendDesign of(TrendSpec spec, Observations series) {
        return new TrendDesign(spec, series.periodsPerYear(), series.firstSeason());
    }

    /** Number of regressors k: constant, t, t^2 for the quadratic shape, a dummy per season after the first. */
    int width() {
        return 2 + (spec.shape() == TrendShape.QUADRATIC ? 1 : 0) + (spec.seasonalDummies() ? periodsPerYear - 1 : 0);
    }

    List<String> names() {
        List<String> names = new ArrayList<>(List.of("constant", "t"));
        if (spec.shape() == TrendShape.QUADRATIC) {
            names.add("t^2");
        }
        if (spec.seasonalDummies()) {
            for (int season = 2; season <= periodsPerYear; season++) {
                names.add("season " + season);
            }
        }
        return names;
    }

    /** The regressor row x(t) for period index t. */
    double[] row(int t) {
        double[] row = new double[width()];
        for (int j = 0; j < row.length; j++) {
            row[j] = regressor(t, j);
        }
        return row;
    }

    /** The design for the observed periods. */
    Design design(int[] times) {
        return Design.generate(times.length, names(), true, (j, values) -> {
            for (int i = 0; i < values.length; i++) {
                values[i] = regressor(times[i], j);
            }
        });
    }

    /**
     * Regressor j at period index t: 1 for the constant, t, t^2 for the quadratic shape, then the
     * 0/1 dummy of each season after the first.
     */
    private double regressor(int t, int j) {
        if (j == 0) {
            return 1;
        }
        if (j == 1) {
            return t;
        }
        int firstDummy = 2;
        if (spec.shape() == TrendShape.QUADRATIC) {
            if (j == 2) {
                return (double) t * t;
            }
            firstDummy = 3;
        }
        int season = Math.floorMod(firstSeason - 1 + t - 1, periodsPerYear) + 1;
        return season == j - firstDummy + 2 ? 1 : 0;
    }
}
