package org.depotcast.forecasting;

import org.depotcast.core.forecast.FleetDemandVariance;
import org.depotcast.core.forecast.ServiceTiming;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The parts of each series' spread, gathered pump by pump beside the means, month by month and for the first 12
 * months together; the breakdowns' variance is worked from them by {@link FleetDemandVariance} once the series'
 * credibility is known. Three sources, taken as independent of each other:
 * <ul>
 * <li>Breakdowns given the rate: quasi-Poisson, variance = units per event × the fit's variance factor × mean.</li>
 * <li>The fitted rate's own uncertainty: the delta method on the coefficients' covariance, Var ≈ g'Σg with
 * g = Σ over the series' pumps of mean × covariate vector (the gradient of the expected units in β). Because g is
 * summed over the series' own pumps, a programme series (all depots' pumps) carries the correlation that the shared
 * coefficients put between depots, and a 12-month total the correlation between its months; neither is a sum of
 * separate variances. The credibility ratio's posterior variance (gamma–Poisson, see {@link FleetCredibility}) is
 * added the same way, as Var(θ) × mean².</li>
 * <li>Scheduled services: which pumps reach their interval depends on their future load ({@link ServiceTiming}), so
 * each pump's service is a Bernoulli event per month; a part's count is the kit quantity times it.</li>
 * </ul>
 */
final class DemandSpread {
    private final int horizon;
    private final Map<String, double[]> process = new HashMap<>();
    /** Per series, month m's gradient at [m × p, (m + 1) × p): one flat array, as there are tens of thousands. */
    private final Map<String, double[]> gradient = new HashMap<>();
    private final Map<String, double[]> serviceVariance = new HashMap<>();
    private final Map<String, double[]> serviceYearVariance = new HashMap<>();

    DemandSpread(int horizon) {
        this.horizon = horizon;
    }

    /**
     * One pump's expected breakdown units per month for a part, with the covariates in force each month
     * ({@code covariates[m]}, intercept not included) and φ = units per event × variance factor.
     */
    void addBreakdowns(List<String> keys, double[] units, double[][] covariates, double phi) {
        int p = covariates.length == 0 ? 1 : covariates[0].length + 1;
        for (String key : keys) {
            double[] proc = process.computeIfAbsent(key, k -> new double[horizon]);
            double[] g = gradient.computeIfAbsent(key, k -> new double[horizon * p]);
            for (int m = 0; m < horizon; m++) {
                proc[m] += units[m] * phi;
                g[m * p] += units[m];
                for (int j = 1; j < p; j++) {
                    g[m * p + j] += units[m] * covariates[m][j - 1];
                }
            }
        }
    }

    /** One pump's service outlook for a part needing {@code kitQuantity} units a service. */
    void addServices(List<String> keys, ServiceTiming.Outlook outlook, double kitQuantity) {
        double k2 = kitQuantity * kitQuantity;
        for (String key : keys) {
            double[] v = serviceVariance.computeIfAbsent(key, k -> new double[horizon]);
            for (int m = 0; m < horizon; m++) {
                v[m] += k2 * outlook.variance()[m];
            }
            serviceYearVariance.computeIfAbsent(key, k -> new double[1])[0] += k2 * outlook.yearVariance();
        }
    }

    /** Per month, Σ units × φ over the series' pumps; null for a series with no fleet expectation. */
    double[] process(String key) {
        return process.get(key);
    }

    /** Per month m, Σ units × (1, x) over the series' pumps at [m × p, (m + 1) × p) ({@link FleetDemandVariance}). */
    double[] gradient(String key) {
        return gradient.get(key);
    }

    /** Monthly variances and the 12-month total's (index horizon) of scheduled-service demand. */
    double[] serviceVariance(String key) {
        double[] out = new double[horizon + 1];
        double[] v = serviceVariance.get(key);
        if (v != null) {
            System.arraycopy(v, 0, out, 0, horizon);
            out[horizon] = serviceYearVariance.get(key)[0];
        }
        return out;
    }
}
