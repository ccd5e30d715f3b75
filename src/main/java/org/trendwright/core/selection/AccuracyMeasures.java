package org.trendwright.core.selection;

import java.util.Optional;
import org.trendwright.core.Observations;

/**
 * Out-of-sample accuracy of forecasts against actuals (Hyndman & Koehler 2006, "Another look at
 * measures of forecast accuracy", International Journal of Forecasting 22, 679-688). With errors
 * e_i = y_i - f_i over m forecasts:
 * <ul>
 *   <li>RMSE = sqrt(mean e_i^2) and MAE = mean |e_i|, in the series' units;</li>
 *   <li>MAPE = 100 mean |e_i / y_i| in percent, undefined when an actual is 0 (then empty, with
 *       the reason in {@code mapeNote});</li>
 *   <li>MASE = MAE / q, with q the in-sample mean absolute error of the seasonal naive forecast
 *       y_t = y_{t-s} on the training data (s the periods per year; s = 1 gives the naive
 *       forecast). MASE below 1 beats that benchmark. Undefined (empty, with the reason) when the
 *       training data repeat exactly so that q = 0.</li>
 * </ul>
 *
 * @param forecasts number of forecast errors the measures average over
 * @param rmse      root mean squared error
 * @param mae       mean absolute error
 * @param mape      mean absolute percentage error, when defined
 * @param mase      mean absolute scaled error, when defined
 * @param note      why MAPE or MASE is missing, or empty
 */
public record AccuracyMeasures(int forecasts, double rmse, double mae, Optional<Double> mape,
                               Optional<Double> mase, String note) {

    /** Measures for the given actuals and forecasts, scaled by the naive in-sample error q. */
    public static AccuracyMeasures of(double[] actual, double[] forecast, double naiveScale) {
        int m = actual.length;
        double squares = 0;
        double absolutes = 0;
        double percentages = 0;
        boolean zeroActual = false;
        for (int i = 0; i < m; i++) {
            double e = actual[i] - forecast[i];
            squares += e * e;
            absolutes += Math.abs(e);
            if (actual[i] == 0) {
                zeroActual = true;
            } else {
                percentages += Math.abs(e / actual[i]);
            }
        }
        double mae = absolutes / m;
        StringBuilder note = new StringBuilder();
        if (zeroActual) {
            note.append("MAPE is not reported because an actual value is 0 (a percentage error of it is undefined). ");
        }
        if (!(naiveScale > 0)) {
            note.append("MASE is not reported because the training data repeat exactly from season to season,"
                    + " so the seasonal naive forecast has no error to scale by. ");
        }
        return new AccuracyMeasures(m, Math.sqrt(squares / m), mae,
                zeroActual ? Optional.empty() : Optional.of(100 * percentages / m),
                naiveScale > 0 ? Optional.of(mae / naiveScale) : Optional.empty(), note.toString().trim());
    }

    /**
     * The in-sample mean absolute error of the seasonal naive forecast, q = mean of
     * |y_t - y_{t-s}| over the periods t whose value and value s periods earlier are both observed
     * (Hyndman & Koehler 2006, section 3.4). NaN when no such pair exists.
     */
    public static double seasonalNaiveScale(Observations training) {
        int s = training.periodsPerYear();
        double[] byTime = new double[training.lastTime() + 1];
        boolean[] observed = new boolean[byTime.length];
        for (int i = 0; i < training.size(); i++) {
            byTime[training.timeAt(i)] = training.valueAt(i);
            observed[training.timeAt(i)] = true;
        }
        double sum = 0;
        int pairs = 0;
        for (int t = s + 1; t < byTime.length; t++) {
            if (observed[t] && observed[t - s]) {
                sum += Math.abs(byTime[t] - byTime[t - s]);
                pairs++;
            }
        }
        return pairs == 0 ? Double.NaN : sum / pairs;
    }
}
