package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.RateCovariate;

import java.util.List;

/**
 * One component family's demand model, as declared in forecast-models/&lt;family&gt;.json.
 *
 * @param family                  the component family
 * @param covariates              GLM covariates ({@link RateCovariate})
 * @param priorEventsPer1000Hours breakdowns per 1,000 operating hours used when the history is too thin to fit
 * @param unitsPerEvent           units replaced per breakdown; null to estimate from the history
 * @param methodPolicy            "auto" (backtest decides between fleet and history), "fleet", or a series method
 * @param preventive              whether scheduled services add demand for this family's parts
 * @param source                  the file it came from
 */
public record ForecastModelDefinition(ComponentFamily family, List<RateCovariate> covariates, double priorEventsPer1000Hours,
                                      Double unitsPerEvent, String methodPolicy, boolean preventive, String source) {


    static ForecastModelDefinition defaultFor(ComponentFamily family) {
        return new ForecastModelDefinition(family, List.of(RateCovariate.LOG_DEPTH, RateCovariate.AGE_YEARS), 0.02, null,
                "auto", false, "(built-in default)");
    }
}
