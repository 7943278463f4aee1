package org.depotcast.core.forecast;

import java.util.List;
import java.util.Map;

/**
 * A component family's breakdown rate per operating hour across the fleet: a Poisson regression with operating hours
 * as exposure (Nelder &amp; Wedderburn 1972), log λ = β₀ + Σ βⱼ xⱼ with the covariates {@code covariates}, or a
 * declared prior rate when the history was too thin to fit; each depot's shrunk observed/expected ratio
 * (Marshall 1991) scales the rate of its pumps. Expected breakdown units of a pump over a period are
 * λ(x) × hours × depot ratio × units per event. The forecast run and the spend projection both compute demand here.
 *
 * @param covariates    the terms after the intercept, in the fit's order
 * @param fit           the fitted regression, null when the prior is used
 * @param priorPerHour  breakdowns per operating hour used without a fit
 * @param unitsPerEvent units replaced per breakdown
 * @param events        breakdowns in the rows fitted
 * @param exposureHours operating hours in the rows fitted
 * @param depotRatios   shrunk ratio per depot id; a depot not in it has ratio 1 (and a prior has none)
 */
public record FleetRateModel(List<RateCovariate> covariates, PoissonFit fit, double priorPerHour, double unitsPerEvent,
                             int events, double exposureHours, Map<Long, Double> depotRatios) {
    /** σ of the log rate without a fit: a wide, stated range (about ×/÷ 1.65 at one σ). */
    public static final double PRIOR_LOG_SD = 0.5;

    public FleetRateModel {
        covariates = List.copyOf(covariates);
        depotRatios = Map.copyOf(depotRatios);
        if (fit != null && fit.coefficients().length != covariates.size() + 1) {
            throw new IllegalArgumentException("fit must have " + (covariates.size() + 1) + " coefficients, had "
                    + fit.coefficients().length);
        }
        if (!(priorPerHour > 0) || !(unitsPerEvent > 0)) {
            throw new IllegalArgumentException("priorPerHour and unitsPerEvent must be > 0; were " + priorPerHour
                    + ", " + unitsPerEvent);
        }
        for (Map.Entry<Long, Double> ratio : depotRatios.entrySet()) {
            if (!(ratio.getValue() >= 0) || Double.isInfinite(ratio.getValue())) {
                throw new IllegalArgumentException("depotRatios of depot " + ratio.getKey() + " must be finite and ≥ 0, was "
                        + ratio.getValue());
            }
        }
    }

    public boolean fitted() {
        return fit != null;
    }

    /** "fit" or "prior". */
    public String source() {
        return fit == null ? "prior" : "fit";
    }

    /** The design row of a pump of this depth, age and daily load (intercept not included). */
    public double[] covariateValues(double depthM, double ageYears, double hoursPerDay) {
        return RateCovariate.values(covariates, depthM, ageYears, hoursPerDay);
    }

    /** Breakdowns per operating hour at the design row {@code x}, before the depot ratio. */
    public double ratePerHour(double[] x) {
        return fit == null ? priorPerHour : fit.expected(x, 1.0);
    }

    /** Breakdowns per operating hour of a pump of this depth, age and daily load, before the depot ratio. */
    public double ratePerHour(double depthM, double ageYears, double hoursPerDay) {
        return ratePerHour(covariateValues(depthM, ageYears, hoursPerDay));
    }

    public double depotRatio(long depotId) {
        return depotRatios.getOrDefault(depotId, 1.0);
    }

    /** Breakdowns per operating hour of one pump at its depot: the profile's rate times the depot's ratio. */
    public double ratePerHourAtDepot(long depotId, double depthM, double ageYears, double hoursPerDay) {
        return ratePerHour(depthM, ageYears, hoursPerDay) * depotRatio(depotId);
    }

    /** Expected breakdown units in each of a pump's coming months, its depot's ratio applied. */
    public double[] expectedUnits(long depotId, double depthM, PumpMonths months) {
        double[] units = new double[months.months()];
        double scale = depotRatio(depotId) * unitsPerEvent;
        for (int m = 0; m < units.length; m++) {
            if (months.hours()[m] > 0) {
                units[m] = ratePerHour(depthM, months.ageYears()[m], months.hoursPerDay()) * months.hours()[m] * scale;
            }
        }
        return units;
    }

    /**
     * Expected breakdown units of a pump over one past period in which it ran {@code hours} operating hours across
     * {@code days} days (its mean daily load hours / days), aged {@code ageYears} at the period's middle, its depot's
     * ratio applied: what the fleet model expected of a history month.
     */
    public double expectedUnits(long depotId, double depthM, double ageYears, double hours, double days) {
        if (!(days > 0) || !(hours >= 0)) {
            throw new IllegalArgumentException("days must be > 0 and hours ≥ 0; were " + days + ", " + hours);
        }
        return ratePerHour(depthM, ageYears, hours / days) * hours * unitsPerEvent * depotRatio(depotId);
    }

    /** The design rows of a pump's coming months, one per month. */
    public double[][] covariateRows(double depthM, PumpMonths months) {
        double[][] rows = new double[months.months()][];
        for (int m = 0; m < rows.length; m++) {
            rows[m] = covariateValues(depthM, months.ageYears()[m], months.hoursPerDay());
        }
        return rows;
    }

    /**
     * Standard error of log λ(x) from the coefficients' uncertainty, by the delta method: √(g'Σg) with g = (1, x)
     * and Σ the covariance inflated by the variance factor (Oehlert 1992); {@link #PRIOR_LOG_SD} for a prior.
     */
    public double logRateStandardError(double[] x) {
        if (fit == null) {
            return PRIOR_LOG_SD;
        }
        double[] gradient = new double[x.length + 1];
        gradient[0] = 1;
        System.arraycopy(x, 0, gradient, 1, x.length);
        return Math.sqrt(fit.linearVariance(gradient));
    }

    /**
     * Standard error of the log of a sum of expected units (many pumps, many months) from the coefficients'
     * uncertainty, by the delta method: √(g'Σg) / mean, g = Σ units × (1, x) the sum's gradient in β and Σ the
     * inflated covariance (Oehlert 1992); {@link #PRIOR_LOG_SD} for a prior or an empty sum.
     */
    public double logTotalStandardError(double[] gradient, double mean) {
        if (fit == null || !(mean > 0)) {
            return PRIOR_LOG_SD;
        }
        return Math.sqrt(fit.linearVariance(gradient)) / mean;
    }

    /** The fit's variance factor: Pearson dispersion when overdispersed (quasi-Poisson), else 1. */
    public double varianceFactor() {
        return fit == null ? 1 : fit.varianceFactor();
    }

    /** φ of breakdown units: variance / mean = units per event × the variance factor. */
    public double unitDispersion() {
        return unitsPerEvent * varianceFactor();
    }
}
