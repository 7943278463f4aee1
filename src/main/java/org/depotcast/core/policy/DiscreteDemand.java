package org.depotcast.core.policy;

/** Shared sums for whole-unit demand distributions. */
final class DiscreteDemand {
    private DiscreteDemand() {
    }

    interface Pmf {
        double at(int k);
    }

    /** Smallest k with F(k) ≥ p, walking the pmf from 0 (lead-time demands for spare parts are small). */
    static int quantile(Pmf pmf, double p, double mean, double sd) {
        if (!(p > 0 && p < 1)) {
            throw new IllegalArgumentException("probability must be in (0, 1), was " + p);
        }
        double cumulative = 0;
        int limit = (int) Math.ceil(mean + 40 * sd + 50);
        for (int k = 0; k <= limit; k++) {
            cumulative += pmf.at(k);
            if (cumulative >= p - 1e-14) {
                return k;
            }
        }
        return limit;
    }

    /** G(x) = (mean − x) + Σ_{k<x} (x − k) p(k), exact for any whole x ≥ 0. */
    static double expectedShortfall(Pmf pmf, double mean, double x) {
        int whole = (int) Math.floor(x);
        if (whole <= 0) {
            return mean - Math.max(0, x);
        }
        double correction = 0;
        for (int k = 0; k < whole; k++) {
            correction += (whole - k) * pmf.at(k);
        }
        return Math.max(0, mean - whole + correction);
    }
}
