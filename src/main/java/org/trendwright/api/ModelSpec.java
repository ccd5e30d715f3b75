package org.trendwright.api;

import com.fasterxml.jackson.annotation.JsonSubTypes;
import com.fasterxml.jackson.annotation.JsonTypeInfo;

/**
 * The model a fit request names, told apart by its {@code family} member. Each family is a
 * record with its own options and their defaults; a new family of the core becomes one more
 * record here and one more fitter in {@link FitService}.
 */
@JsonTypeInfo(use = JsonTypeInfo.Id.NAME, include = JsonTypeInfo.As.PROPERTY, property = "family")
@JsonSubTypes({@JsonSubTypes.Type(value = TrendModel.class, name = "trend"),
    @JsonSubTypes.Type(value = ArModel.class, name = "autoregression")})
public sealed interface ModelSpec permits TrendModel, ArModel {

    /** This spec with every default filled in, so equal models have equal JSON (the cache key). */
    ModelSpec normalized();

    /** The family name, as in the JSON {@code family} member. */
    String family();
}
