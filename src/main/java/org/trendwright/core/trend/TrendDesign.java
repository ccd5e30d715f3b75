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

    /** Number of regressors k. */
    int width() {
        // The size of names(), counted without building the names: row(t) asks for it at every row.
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
        row[0] = 1;
        row[1] = t;
        int next = 2;
        if (spec.shape() == TrendShape.QUADRATIC) {
            row[next++] = (double) t * t;
        }
        if (spec.seasonalDummies()) {
            int season = Math.floorMod(firstSeason - 1 + t - 1, periodsPerYear) + 1;
            if (season > 1) {
                row[next + season - 2] = 1;
            }
        }
        return row;
    }

    /** The design for the observed periods. */
    Design design(int[] times) {
        int k = width();
        List<double[]> columns = new ArrayList<>(k);
        for (int j = 0; j < k; j++) {
            columns.add(new double[times.length]);
        }
        for (int i = 0; i < times.length; i++) {
            double[] row = row(times[i]);
            for (int j = 0; j < k; j++) {
                columns.get(j)[i] = row[j];
            }
        }
        return new Design(columns, names(), true);
    }
}
