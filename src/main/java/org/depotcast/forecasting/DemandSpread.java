package org.depotcast.forecasting;

import org.depotcast.core.forecast.PoissonFit;
import org.depotcast.core.forecast.ServiceTiming;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The spread of each series' forecast, gathered pump by pump beside the means, month by month and for the first 12
 * months together. Three sources, taken as independent of each other:
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
    private final int yearMonths;
    private final Map<String, double[]> process = new HashMap<>();
    /** Per series, month m's gradient at [m × p, (m + 1) × p): one flat array, as there are tens of thousands. */
    private final Map<String, double[]> gradient = new HashMap<>();
    private final Map<String, double[]> serviceVariance = new HashMap<>();
    private final Map<String, double[]> serviceYearVariance = new HashMap<>();

    DemandSpread(int horizon) {
        this.horizon = horizon;
        this.yearMonths = Math.min(12, horizon);
    }

    int yearMonths() {
        return yearMonths;
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

    /** Monthly variances (index 0..horizon−1) and the 12-month total's (index horizon) of breakdowns from the fleet. */
    double[] fleetVariance(String key, double[] mean, FleetCredibility.Weight weight, PoissonFit fit) {
        double[] out = new double[horizon + 1];
        double[] proc = process.get(key);
        double[] g = gradient.get(key);
        if (proc == null) {
            return out;
        }
        double theta = weight.ratio(), thetaVar = weight.ratioVariance();
        int p = g.length / horizon;
        double[] yearGradient = new double[p], month = new double[p];
        double yearMean = 0, yearProcess = 0;
        for (int m = 0; m < horizon; m++) {
            System.arraycopy(g, m * p, month, 0, p);
            double coefficients = fit == null ? 0 : fit.linearVariance(month);
            out[m] = theta * proc[m] + thetaVar * mean[m] * mean[m] + (theta * theta + thetaVar) * coefficients;
            if (m < yearMonths) {
                yearMean += mean[m];
                yearProcess += proc[m];
                for (int j = 0; j < p; j++) {
                    yearGradient[j] += month[j];
                }
            }
        }
        double coefficients = fit == null ? 0 : fit.linearVariance(yearGradient);
        out[horizon] = theta * yearProcess + thetaVar * yearMean * yearMean + (theta * theta + thetaVar) * coefficients;
        return out;
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
