package org.trendwright.api;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.List;

/**
 * A fit of posted data that stores nothing: the series in the shape of a JSON upload (name
 * optional) and the same model, horizon and levels as {@link FitRequest}.
 *
 * @param series  {"observations": [{"period": ..., "value": ...}], "frequency"?: ..., "name"?: ...}
 * @param model   the model
 * @param horizon periods to forecast
 * @param levels  interval levels
 * @param significanceLevel the level of the residual tests
 */
public record StatelessFitRequest(JsonNode series, ModelSpec model, Integer horizon, List<Double> levels,
                                  Double significanceLevel) {

    FitRequest fit() {
        return new FitRequest(model, horizon, levels, significanceLevel);
    }
}
