package org.depotcast.core.forecast;

import java.time.LocalDate;
import java.util.Locale;

/**
 * How far a series' own history moves the fleet rate ({@link CredibilityRate}): the posterior mean of true rate /
 * fleet rate, the credibility Z its history earns, and the ratio's posterior variance (gamma–Poisson: shape
 * 1/τ² + O/φ, rate 1/τ² + E/φ).
 *
 * @param ratio         posterior mean of true rate / fleet rate
 * @param credibility   weight Z given to the series' own history
 * @param ratioVariance posterior variance of the ratio (the rate's own uncertainty)
 * @param observed      units seen over the series' history; NaN when the series was not weighed
 * @param expected      units the fleet model expected over the same months; NaN when not weighed
 */
public record CredibilityWeight(double ratio, double credibility, double ratioVariance, double observed,
                                double expected) {
    /** The fleet rate as it is: ratio 1, no weight on the history, no spread. */
    public static final CredibilityWeight FLEET_ONLY = new CredibilityWeight(1, 0, 0, Double.NaN, Double.NaN);

    public CredibilityWeight {
        if (!(ratio >= 0) || !(credibility >= 0 && credibility <= 1) || !(ratioVariance >= 0)) {
            throw new IllegalArgumentException("ratio ≥ 0, credibility in [0, 1] and ratioVariance ≥ 0; were " + ratio
                    + ", " + credibility + ", " + ratioVariance);
        }
    }

    /** In words, for the forecast's method detail; {@code from} is the series' first month. */
    public String describe(LocalDate from) {
        if (Double.isNaN(expected)) {
            return "fleet model";
        }
        return String.format(Locale.ROOT, "fleet model x %.3f: credibility %.3f for %.1f units seen against %.1f "
                + "expected since %s", ratio, credibility, observed, expected, from);
    }
}
