package org.depotcast.core.forecast;

import org.apache.commons.math3.special.Erf;

/**
 * When a pump's next scheduled services fall, with its future daily load uncertain. {@link PreventiveSchedule} takes
 * the load at face value; here the operating hours to come are the expected ones times a usage multiplier U, log-normal
 * with mean 1 and log-scale standard deviation σ (ln U ~ N(−σ²/2, σ²)), one draw per pump over the horizon, so a pump
 * near its interval may cross it this month, next month or not this year.
 *
 * <p>The k-th coming service falls by the end of month m when U·C_m reaches its threshold K_k (C_m the expected
 * cumulative hours): P = Φ((ln(C_m/K_k) − σ²/2)/σ). Where the last service is unknown and the pump's place in its cycle
 * uniform (see {@link PreventiveSchedule#expectedServices}), the conditional probability clamp((h − K)/w, 0, 1) is
 * averaged over U with the log-normal partial expectation E[(U·C − K)⁺] = C·Φ(d₁) − K·Φ(d₂),
 * d₁ = (ln(C/K) + σ²/2)/σ, d₂ = d₁ − σ (the Black–Scholes 1973 call formula, J. Political Economy 81(3):637–654,
 * at zero rate). Each service is a Bernoulli event, so a month's count has variance Σ_k d_k(1 − d_k), d_k the
 * probability that service k falls in that month, and the first {@code yearMonths} months' count Σ_k F_k(1 − F_k).
 * Services of one pump are treated as independent of each other (they rarely fall twice in a year).
 */
public final class ServiceTiming {
    private static final double TINY = 1e-12;
    private static final int MAX_SERVICES = 1000;

    private ServiceTiming() {
    }

    /**
     * @param expected     expected services in each month
     * @param variance     variance of each month's count
     * @param yearVariance variance of the count over the first {@code yearMonths} months together
     */
    public record Outlook(double[] expected, double[] variance, double yearVariance) {
    }

    /**
     * @param hoursPerMonth      expected operating hours in each coming month
     * @param intervalHours      service interval (&gt; 0)
     * @param hoursSince         hours since the last service (known) or hours on record with no service (unknown)
     * @param lastServiceKnown   whether the last service (or the installation) is on record
     * @param usageLogSd         σ of the usage multiplier's logarithm (≥ 0; 0 gives {@link PreventiveSchedule}'s answer)
     * @param yearMonths         months counted together for {@code yearVariance}
     */
    public static Outlook outlook(double[] hoursPerMonth, double intervalHours, double hoursSince, boolean lastServiceKnown,
                                  double usageLogSd, int yearMonths) {
        if (!(intervalHours > 0) || !(hoursSince >= 0) || !(usageLogSd >= 0)) {
            throw new IllegalArgumentException("intervalHours must be > 0, hoursSince and usageLogSd ≥ 0; were "
                    + intervalHours + ", " + hoursSince + ", " + usageLogSd);
        }
        int n = hoursPerMonth.length;
        double[] cumulative = new double[n];
        for (int m = 0; m < n; m++) {
            cumulative[m] = (m == 0 ? 0 : cumulative[m - 1]) + hoursPerMonth[m];
        }
        double[] expected = new double[n], variance = new double[n];
        double yearVariance = 0;
        int year = Math.min(Math.max(yearMonths, 0), n);
        boolean uniform = !lastServiceKnown && hoursSince < intervalHours;
        // Overdue services (hours since ≥ interval) are certain in the first month, as PreventiveSchedule has it.
        double overdue = uniform ? 0 : Math.floor(hoursSince / intervalHours);
        if (n > 0) {
            expected[0] += overdue;
        }
        double firstThreshold = uniform ? 0 : intervalHours - (hoursSince - overdue * intervalHours);
        double window = intervalHours - hoursSince;
        for (int k = 0; k < MAX_SERVICES; k++) {
            double threshold = firstThreshold + k * intervalHours;
            double before = 0;
            for (int m = 0; m < n; m++) {
                double by = uniform ? uniformBy(cumulative[m], threshold, window, usageLogSd)
                        : crossedBy(cumulative[m], threshold, usageLogSd);
                double d = Math.max(0, by - before);
                expected[m] += d;
                variance[m] += d * (1 - d);
                before = by;
                if (m == year - 1) {
                    yearVariance += by * (1 - by);
                }
            }
            if (before < TINY) {
                break;
            }
        }
        return new Outlook(expected, variance, yearVariance);
    }

    /** P(U·c ≥ threshold). */
    static double crossedBy(double c, double threshold, double sigma) {
        if (threshold <= 0) {
            return 1;
        }
        if (c <= 0) {
            return 0;
        }
        if (sigma < TINY) {
            return c >= threshold ? 1 : 0;
        }
        return phi((Math.log(c / threshold) - sigma * sigma / 2) / sigma);
    }

    /** E[clamp((U·c − threshold)/window, 0, 1)]. */
    static double uniformBy(double c, double threshold, double window, double sigma) {
        return (excess(c, threshold, sigma) - excess(c, threshold + window, sigma)) / window;
    }

    /** E[(U·c − strike)⁺] for log-normal U with mean 1. */
    static double excess(double c, double strike, double sigma) {
        if (strike <= 0) {
            return c - strike;
        }
        if (c <= 0) {
            return 0;
        }
        if (sigma < TINY) {
            return Math.max(0, c - strike);
        }
        double d1 = (Math.log(c / strike) + sigma * sigma / 2) / sigma;
        return c * phi(d1) - strike * phi(d1 - sigma);
    }

    private static double phi(double z) {
        return 0.5 * Erf.erfc(-z / Math.sqrt(2));
    }
}
