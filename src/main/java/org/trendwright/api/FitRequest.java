package org.trendwright.api;

import java.util.List;
import org.trendwright.core.TestResult;

/**
 * What to fit to a stored series version and how far to forecast. Immutable and thread-safe.
 *
 * @param model   the model (required)
 * @param horizon periods to forecast after the last observation, 1..{@value #MAX_HORIZON}
 *                (default {@value #DEFAULT_HORIZON})
 * @param levels  prediction-interval coverage levels in (0, 1) (default 0.80 and 0.95)
 * @param significanceLevel the level of the residual tests, in (0, 1) (default 0.05)
 */
public record FitRequest(ModelSpec model, Integer horizon, List<Double> levels, Double significanceLevel) {

    public static final int DEFAULT_HORIZON = 8;
    public static final int MAX_HORIZON = 1000;
    public static final List<Double> DEFAULT_LEVELS = List.of(0.8, 0.95);
    public static final double DEFAULT_SIGNIFICANCE = 0.05;

    /** The request with defaults filled in and checked; refuses a missing model or bad horizon. */
    public FitRequest normalized() {
        if (model == null) {
            throw new BadRequestException("model", "model is required, e.g. {\"family\": \"trend\", \"shape\":"
                    + " \"linear\"}.");
        }
        int h = horizon == null ? DEFAULT_HORIZON : horizon;
        if (h < 1 || h > MAX_HORIZON) {
            throw new BadRequestException("horizon", "horizon must lie in 1.." + MAX_HORIZON + ", got " + h + ".");
        }
        List<Double> l = levels == null || levels.isEmpty() ? DEFAULT_LEVELS : List.copyOf(levels);
        double significance = significanceLevel == null ? DEFAULT_SIGNIFICANCE : significanceLevel;
        // Checked here: the residual checks would otherwise turn a bad level into notes.
        TestResult.checkLevel(significance);
        return new FitRequest(model.normalized(), h, l.stream().sorted().distinct().toList(), significance);
    }
}
