package org.trendwright.api;

import java.util.Locale;
import org.trendwright.core.autoregression.ArSpec;
import org.trendwright.core.autoregression.LagSelection;

/**
 * An autoregression with a constant: {@code {"family": "autoregression", "order": 4, "selection":
 * "aic", "differenced": false, "seasonalLag": true}}. Immutable and thread-safe.
 *
 * @param order       the order p, or with "aic"/"bic" the largest order tried (default 4)
 * @param selection   "fixed" (default), "aic" or "bic"
 * @param differenced fit the first differences and integrate the forecast (default false)
 * @param seasonalLag add the lag of one year (4 quarterly, 12 monthly) to lags 1..p (default false)
 */
public record ArModel(Integer order, String selection, Boolean differenced, Boolean seasonalLag) implements ModelSpec {

    static final int DEFAULT_ORDER = 4;

    @Override
    public ArModel normalized() {
        return new ArModel(order == null ? DEFAULT_ORDER : order,
                selection == null ? "fixed" : selection.trim().toLowerCase(Locale.ROOT),
                differenced != null && differenced, seasonalLag != null && seasonalLag);
    }

    @Override
    public String family() {
        return "autoregression";
    }

    /** The core's spec; refuses an unknown selection or a negative order naming the field. */
    ArSpec toSpec() {
        ArModel n = normalized();
        if (n.order < 0) {
            throw new BadRequestException("model.order", "model.order must be 0 or more, got " + n.order + ".");
        }
        LagSelection lagSelection = switch (n.selection) {
            case "fixed" -> LagSelection.FIXED;
            case "aic" -> LagSelection.AIC;
            case "bic" -> LagSelection.BIC;
            default -> throw new BadRequestException("model.selection", "model.selection must be 'fixed', 'aic'"
                    + " or 'bic', got '" + selection + "'.");
        };
        return new ArSpec(n.order, lagSelection, n.differenced, n.seasonalLag);
    }
}
