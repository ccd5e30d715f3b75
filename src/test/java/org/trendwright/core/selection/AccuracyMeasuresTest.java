package org.trendwright.core.selection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.trendwright.core.Observations;

/** Definitions from Hyndman & Koehler (2006), "Another look at measures of forecast accuracy". */
class AccuracyMeasuresTest {

    /** Hand-computed (common practice): errors 10, -5, 0, 15 on actuals 100, 50, 80, 150. */
    @Test
    void computes_rmse_mae_and_mape_by_their_definitions() {
        AccuracyMeasures m = AccuracyMeasures.of(new double[] {100, 50, 80, 150}, new double[] {90, 55, 80, 135}, 5);
        assertEquals(Math.sqrt((100 + 25 + 0 + 225) / 4.0), m.rmse(), 1e-12);
        assertEquals(7.5, m.mae(), 1e-12);
        assertEquals(100 * (0.1 + 0.1 + 0 + 0.1) / 4, m.mape().orElseThrow(), 1e-12);
        assertEquals(7.5 / 5, m.mase().orElseThrow(), 1e-12);
        assertTrue(m.note().isEmpty());
    }

    @Test
    void refuses_mape_with_a_reason_when_an_actual_is_zero() {
        AccuracyMeasures m = AccuracyMeasures.of(new double[] {10, 0, 12}, new double[] {9, 1, 12}, 1);
        assertTrue(m.mape().isEmpty());
        assertTrue(m.note().contains("actual value is 0"), m.note());
        assertEquals(2 / 3.0, m.mae(), 1e-12);
    }

    /**
     * Hyndman & Koehler (2006), section 3.4: the scale is the in-sample MAE of the seasonal naive
     * forecast, so that forecast's own in-sample MASE is exactly 1.
     */
    @Test
    void the_seasonal_naive_forecast_scores_a_mase_of_one_in_sample() {
        double[] y = {12, 15, 11, 18, 13, 17, 12, 20, 15, 18, 14, 21};
        Observations series = Observations.consecutive(y, 4, 1);
        double scale = AccuracyMeasures.seasonalNaiveScale(series);
        double[] actual = new double[8];
        double[] naive = new double[8];
        for (int t = 4; t < 12; t++) {
            actual[t - 4] = y[t];
            naive[t - 4] = y[t - 4];
        }
        assertEquals(1.0, AccuracyMeasures.of(actual, naive, scale).mase().orElseThrow(), 1e-12);
    }

    @Test
    void reports_no_mase_when_the_training_data_repeat_exactly() {
        Observations series = Observations.consecutive(new double[] {5, 6, 7, 8, 5, 6, 7, 8}, 4, 1);
        AccuracyMeasures m = AccuracyMeasures.of(new double[] {5}, new double[] {6},
                AccuracyMeasures.seasonalNaiveScale(series));
        assertTrue(m.mase().isEmpty());
        assertTrue(m.note().contains("MASE"), m.note());
    }
}
