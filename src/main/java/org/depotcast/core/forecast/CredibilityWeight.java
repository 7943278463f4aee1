package org.depotcast.core.forecast;

import java.time.LocalDate;
import java.time.format.TextStyle;
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

    /**
     * The weights of one group of series sharing the estimate of how far true rates stray from the fleet's
     * ({@link CredibilityRate#combine}): each series' ratio and credibility, and the ratio's gamma posterior variance
     * shape / rate² with shape 1/τ² + O/φ and rate 1/τ² + E/φ (0 when τ² = 0: the fleet rate stands).
     *
     * @param observed   units seen per series; {@code expected} what the fleet model expected over the same months
     * @param dispersion φ per series (units per event × the fit's variance factor)
     */
    public static CredibilityWeight[] ofGroup(double[] observed, double[] expected, double[] dispersion) {
        CredibilityRate.Result r = CredibilityRate.combine(observed, expected, dispersion);
        double inverse = r.priorVariance() == 0 ? Double.POSITIVE_INFINITY : 1 / r.priorVariance();
        CredibilityWeight[] weights = new CredibilityWeight[observed.length];
        for (int i = 0; i < weights.length; i++) {
            double shape = inverse + observed[i] / dispersion[i], rate = inverse + expected[i] / dispersion[i];
            double variance = Double.isInfinite(inverse) ? 0 : shape / (rate * rate);
            weights[i] = new CredibilityWeight(r.ratio()[i], r.credibility()[i], variance, observed[i], expected[i]);
        }
        return weights;
    }

    /**
     * In words, for the forecast's method detail (shown to the programme lead after "the forecast uses the fleet
     * model: "); {@code from} is the series' first month.
     */
    public String describe(LocalDate from) {
        if (Double.isNaN(expected)) {
            return "fleet model";
        }
        String since = from.getMonth().getDisplayName(TextStyle.FULL, Locale.ENGLISH) + " " + from.getYear();
        if (credibility == 0) {
            return String.format(Locale.ROOT, "its rate as it is, since the %s units used here from %s are within "
                    + "chance of the %s it expected", units(observed), since, units(expected));
        }
        return String.format(Locale.ROOT, "its rate × %.2f, because %s units were used here from %s where it expected "
                + "%s; this place's own history carries %.0f %% of the weight", ratio, units(observed), since,
                units(expected), 100 * credibility);
    }

    /** Whole units without decimals, others to one; thousands separated. */
    private static String units(double value) {
        return Math.rint(value) == value ? String.format(Locale.ROOT, "%,.0f", value)
                : String.format(Locale.ROOT, "%,.1f", value);
    }
}
