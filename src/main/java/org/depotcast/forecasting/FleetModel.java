package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.PoissonFit;

import java.util.List;
import java.util.Map;

/**
 * A component family's breakdown rate per operating hour, fitted on the fleet (or the declared prior when the
 * history is too thin), with each depot's empirical-Bayes rate ratio.
 *
 * @param fit          the Poisson regression, null when the prior is used
 * @param depotRatio   shrunk observed/expected ratio per depot id (1 where unknown)
 */
record FleetModel(ComponentFamily family, List<ForecastModelDefinition.Covariate> covariates, PoissonFit fit,
                  double priorPerHour, double unitsPerEvent, int events, double exposureHours,
                  Map<Long, Double> depotRatio) {

    String source() {
        return fit == null ? "prior" : "fit";
    }

    double ratePerHour(double[] covariateValues) {
        return fit == null ? priorPerHour : fit.expected(covariateValues, 1.0);
    }

    double depotRatio(long depotId) {
        return depotRatio.getOrDefault(depotId, 1.0);
    }

    static double[] covariateValues(List<ForecastModelDefinition.Covariate> covariates, double depthM, double ageYears,
                                    double usageHours) {
        double[] values = new double[covariates.size()];
        for (int i = 0; i < values.length; i++) {
            values[i] = switch (covariates.get(i)) {
                case LOG_DEPTH -> Math.log(depthM / 30.0);
                case AGE_YEARS -> ageYears;
                case USAGE_HOURS -> usageHours;
            };
        }
        return values;
    }
}
