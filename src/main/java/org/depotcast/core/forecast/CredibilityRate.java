package org.depotcast.core.forecast;

/**
 * Combines a fleet model's expectation with each series' own history by credibility: the fleet rate is the prior
 * mean and the series' observed demand updates it, weighted by how much it has seen. Empirical-Bayes gamma–Poisson
 * (the conjugate form of Bühlmann credibility: Bühlmann 1967, "Experience rating and credibility", ASTIN Bulletin
 * 4(3):199–207; Bühlmann &amp; Straub 1970 for unequal exposures; the moment estimator as in Marshall 1991, Applied
 * Statistics 40(2):283–294, here centred on the fleet model's own expectation rather than the pooled ratio).
 *
 * <p>Series i has fleet-expected demand E_i over its history window and observed O_i (units); its true rate is
 * θ_i × the fleet's, θ_i ~ Gamma(mean 1, variance τ²), and given θ_i the observed units have mean θ_i·E_i and variance
 * φ·θ_i·E_i (φ = units per event × the fit's dispersion: demand comes in events of several units). Then
 * E[(O_i − E_i)²] = φ·E_i + τ²·E_i², so τ² = max(0, Σ[(O_i − E_i)² − φ·E_i] / Σ E_i²), and the posterior mean ratio is
 * θ̂_i = 1 + Z_i·(O_i/E_i − 1) with credibility Z_i = E_i·τ² / (E_i·τ² + φ) — Bühlmann's Z = n/(n + k) with
 * exposure n = E_i and k = φ/τ² (expected process variance over the variance of hypothetical means).
 * Where the fleet model already explains the differences between series, τ² is 0 and the fleet forecast stands.
 *
 * <p>τ² is used only when the series show more spread than chance: the moment estimate is positive for many groups
 * with no true spread (it is a difference of two noisy sums), and a series with a large expectation then takes its
 * own noise almost unshrunk (Z near 1 for large E_i). The check is the score test for extra-Poisson variation
 * (Dean 1992, "Testing for overdispersion in Poisson and binomial regression models", JASA 87:451–457), here with
 * φ: T = Σ[(O_i − E_i)² − φ_i·E_i] / √(Σ 2·φ_i²·E_i²), about N(0, 1) when τ² = 0; τ² is kept when T exceeds
 * √(ln n), the one-parameter BIC threshold (Schwarz 1978) for n series, as the fleet model's covariates are chosen.
 */
public final class CredibilityRate {
    private CredibilityRate() {
    }

    /** τ² and each series' credibility Z_i and posterior ratio θ̂_i. */
    public record Result(double priorVariance, double[] credibility, double[] ratio) {
    }

    /**
     * @param observed   units seen in each series' window (≥ 0)
     * @param expected   units the fleet model expected in the same windows (&gt; 0)
     * @param dispersion φ of each series: variance per unit of mean given θ (≥ 1 for whole events of ≥ 1 unit)
     */
    /** Dean's score statistic over BIC's threshold for one parameter: the spread is more than chance. */
    static boolean spreadShown(double excess, double nullVariance, int series) {
        return nullVariance > 0 && excess / Math.sqrt(nullVariance) > Math.sqrt(Math.log(series));
    }

    public static Result combine(double[] observed, double[] expected, double[] dispersion) {
        int n = observed.length;
        if (n == 0 || expected.length != n || dispersion.length != n) {
            throw new IllegalArgumentException("observed, expected and dispersion must have the same non-zero length");
        }
        double excess = 0, sumE2 = 0, nullVariance = 0;
        for (int i = 0; i < n; i++) {
            if (!(expected[i] > 0)) {
                throw new IllegalArgumentException("expected[" + i + "] must be > 0, was " + expected[i]);
            }
            if (!(observed[i] >= 0)) {
                throw new IllegalArgumentException("observed[" + i + "] must be ≥ 0, was " + observed[i]);
            }
            if (!(dispersion[i] > 0)) {
                throw new IllegalArgumentException("dispersion[" + i + "] must be > 0, was " + dispersion[i]);
            }
            double d = observed[i] - expected[i];
            excess += d * d - dispersion[i] * expected[i];
            sumE2 += expected[i] * expected[i];
            nullVariance += 2 * dispersion[i] * dispersion[i] * expected[i] * expected[i];
        }
        double tau2 = spreadShown(excess, nullVariance, n) ? excess / sumE2 : 0;
        double[] z = new double[n], ratio = new double[n];
        for (int i = 0; i < n; i++) {
            z[i] = tau2 == 0 ? 0 : expected[i] * tau2 / (expected[i] * tau2 + dispersion[i]);
            ratio[i] = 1 + z[i] * (observed[i] / expected[i] - 1);
        }
        return new Result(tau2, z, ratio);
    }
}
