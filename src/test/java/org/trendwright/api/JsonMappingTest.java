package org.trendwright.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.time.Instant;
import java.util.List;
import org.junit.jupiter.api.Test;

/** The JSON contract of JsonMapping: non-finite numbers as null, ISO-8601 instants, strict reading. */
class JsonMappingTest {

    private final ObjectMapper mapper = JsonMapping.create();

    record Sample(double plain, Double boxed, double[] array, List<Double> list, Instant at) {
    }

    @Test
    void writes_non_finite_numbers_as_null_and_instants_as_iso_8601() throws JsonProcessingException {
        Sample sample = new Sample(Double.NaN, Double.POSITIVE_INFINITY, new double[] {1.5, Double.NEGATIVE_INFINITY},
                List.of(Double.NaN, 2.0), Instant.parse("2025-01-31T09:15:00Z"));
        assertEquals("{\"plain\":null,\"boxed\":null,\"array\":[1.5,null],\"list\":[null,2.0],"
                + "\"at\":\"2025-01-31T09:15:00Z\"}", mapper.writeValueAsString(sample));
    }

    @Test
    void reads_requests_strictly() {
        assertThrows(JsonProcessingException.class, () -> mapper.readValue(
                "{\"model\": {\"family\": \"trend\"}, \"extra\": 1}", FitRequest.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readValue(
                "{\"model\": {\"family\": \"trend\"}, \"horizon\": \"8\"}", FitRequest.class));
        assertThrows(JsonProcessingException.class, () -> mapper.readValue(
                "{\"model\": {\"family\": \"trend\"}, \"levels\": [NaN]}", FitRequest.class));
    }

    @Test
    void equal_models_normalize_to_the_same_cache_key() throws JsonProcessingException {
        FitRequest terse = mapper.readValue("{\"model\": {\"family\": \"trend\"}}", FitRequest.class);
        FitRequest spelled = mapper.readValue("{\"model\": {\"family\": \"trend\", \"shape\": \"Linear\","
                + " \"scale\": \"level\", \"seasonal\": false}, \"horizon\": 8, \"levels\": [0.95, 0.8]}",
                FitRequest.class);
        assertEquals(mapper.writeValueAsString(terse.normalized()), mapper.writeValueAsString(spelled.normalized()));
        assertEquals("{\"model\":{\"family\":\"trend\",\"shape\":\"linear\",\"scale\":\"level\",\"seasonal\":false,"
                + "\"errors\":\"classical\",\"hacLag\":null},"
                + "\"horizon\":8,\"levels\":[0.8,0.95],\"significanceLevel\":0.05}", mapper.writeValueAsString(terse.normalized()));
    }
}
