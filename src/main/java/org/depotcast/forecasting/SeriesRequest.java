package org.depotcast.forecasting;

import jakarta.validation.constraints.NotEmpty;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.PositiveOrZero;

import java.util.List;

/** A planner's own series for a what-if forecast; alpha and beta are optimised when absent. */
public record SeriesRequest(@NotEmpty List<@NotNull @PositiveOrZero Double> history, String method, Double alpha,
                            Double beta, Integer horizon) {
}
