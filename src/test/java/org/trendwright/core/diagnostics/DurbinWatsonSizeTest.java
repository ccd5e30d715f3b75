package org.trendwright.core.diagnostics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.trendwright.core.regression.Design;
import org.trendwright.core.regression.LeastSquares;

class DurbinWatsonSizeTest {

    /**
     * Seeded simulation of the null: iid normal errors around a quarterly trend with seasonal
     * dummies (n = 60, k = 5). The exact test against positive correlation at 5% must reject in
     * about 5% of 2,000 replications, since its p-value is exact for the design under the null
     * (Imhof 1961). Binomial SD 0.49%; we accept 3.5%-6.5% (about 3 SD).
     */
    @Test
    void exact_test_rejects_about_five_percent_of_independent_series() {
        Random random = new Random(1951);
        Design design = quarterlyTrend(60);
        int rejections = 0;
        for (int r = 0; r < 2000; r++) {
            double[] y = new double[60];
            for (int i = 0; i < 60; i++) {
                y[i] = random.nextGaussian();
            }
            DurbinWatsonResult result = DurbinWatson.test(LeastSquares.fit(design, y), 0.05);
            rejections += result.pValuePositive() < 0.05 ? 1 : 0;
        }
        double rate = rejections / 2000.0;
        assertTrue(rate > 0.035 && rate < 0.065, "rejection rate " + rate);
    }

    private static Design quarterlyTrend(int n) {
        List<double[]> columns = new ArrayList<>();
        double[] constant = new double[n];
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            constant[i] = 1;
            t[i] = i + 1;
        }
        columns.add(constant);
        columns.add(t);
        List<String> names = new ArrayList<>(List.of("constant", "t"));
        for (int season = 2; season <= 4; season++) {
            double[] dummy = new double[n];
            for (int i = 0; i < n; i++) {
                dummy[i] = i % 4 == season - 1 ? 1 : 0;
            }
            columns.add(dummy);
            names.add("season " + season);
        }
        return new Design(columns, names, true);
    }
}
