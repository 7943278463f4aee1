package org.depotcast.forecasting;

import jakarta.validation.constraints.Size;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import org.depotcast.common.Bounds;
import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;

import java.util.List;

/** A planner's own series for a what-if forecast; alpha and beta are optimised when absent. */
public record SeriesRequest(@NotEmpty
                            @Size(max = Bounds.SERIES_PERIODS_MAX)
                            List<@NotNull @PositiveOrZero @DecimalMax(Bounds.SERIES_VALUE_MAX) Double> history,
                            @Size(max = 20) String method,
                            @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double alpha,
                            @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double beta,
                            @Min(1) @Max(60) Integer horizon) {
}
