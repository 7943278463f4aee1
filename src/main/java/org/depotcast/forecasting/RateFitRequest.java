package org.depotcast.forecasting;

import jakarta.validation.Valid;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;

import java.util.List;
import java.util.Map;

/** Rows for a stateless Poisson regression: count ~ Poisson(exposure × exp(β₀ + Σ β·covariate)). */
public record RateFitRequest(@NotEmpty List<@Valid @NotNull Row> rows) {
    public record Row(@NotNull @PositiveOrZero Double count, @NotNull @Positive Double exposure,
                      Map<String, Double> covariates) {
    }
}
