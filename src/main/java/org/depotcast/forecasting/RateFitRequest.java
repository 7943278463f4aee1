package org.depotcast.forecasting;

import jakarta.validation.constraints.Size;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.Bounds;
import jakarta.validation.Valid;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.PositiveOrZero;

import java.util.List;
import java.util.Map;

/** Rows for a stateless Poisson regression: count ~ Poisson(exposure × exp(β₀ + Σ β·covariate)). */
public record RateFitRequest(@NotEmpty @Size(max = Bounds.RATE_FIT_ROWS_MAX) List<@Valid @NotNull Row> rows) {
    public record Row(@NotNull @PositiveOrZero @DecimalMax(Bounds.SERIES_VALUE_MAX) Double count,
                      @NotNull @Positive @DecimalMax(Bounds.EXPOSURE_MAX) Double exposure,
                      @Size(max = 20) Map<@Size(max = 60) String,
                              @NotNull @DecimalMin("-" + Bounds.COVARIATE_ABS_MAX) @DecimalMax(Bounds.COVARIATE_ABS_MAX)
                              Double> covariates) {
    }
}
