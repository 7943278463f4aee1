package org.depotcast.core.forecast;

/**
 * The smoothing recursions, on primitive arrays. Each returns the flat per-period forecast after the last
 * observation and, when {@code fitted} is given, writes the one-step-ahead forecast of every period made from the
 * periods before it (NaN where the method has no forecast yet).
 */
public final class Smoothing {
    private Smoothing() {
    }

    /**
     * Croston's method and its bias-corrected variants. Initialisation as R forecast 8.20 {@code croston()}: the size
     * estimate starts at the first non-zero demand, the interval estimate at that demand's 1-based position (leading
     * zeros count); both update at each later demand with the same α. Forecast = factor × ẑ / p̂, where factor is 1
     * (Croston), 1 − α/2 (SBA) or 1 − α/(2 − α) (SBJ). No demand at all gives 0.
     */
    public static double croston(double[] y, double alpha, ForecastMethod variant, double[] fitted) {
        Series.requireSmoothing("alpha", alpha);
        double factor = crostonFactor(variant, alpha);
        CrostonLevels levels = new CrostonLevels(alpha);
        for (int t = 0; t < y.length; t++) {
            if (fitted != null) {
                fitted[t] = levels.forecast(factor);
            }
            levels.observe(y[t]);
        }
        double last = levels.forecast(factor);
        return Double.isNaN(last) ? 0.0 : last;
    }

    private static double crostonFactor(ForecastMethod variant, double alpha) {
        return switch (variant) {
            case CROSTON -> 1.0;
            case SBA -> 1.0 - alpha / 2.0;
            case SBJ -> 1.0 - alpha / (2.0 - alpha);
            default -> throw new IllegalArgumentException("variant must be CROSTON, SBA or SBJ, was " + variant);
        };
    }

    /** How TSB's demand-probability estimate starts. */
    public enum TsbStart {
        /** p̂ = share of periods with demand over the whole history. */
        MEAN,
        /** p̂ = 1 if the first period has demand, else 0. */
        NAIVE
    }

    /**
     * TSB: every period p̂ += β(d − p̂), d = 1 if demand else 0; at demand ẑ += α(y − ẑ); forecast p̂ẑ. The estimates
     * are set at period 1 (ẑ = first non-zero demand, p̂ per {@code start}) and updated from period 2 on. Because p̂
     * decays through zero runs, the forecast falls for a part going out of use.
     */
    public static double tsb(double[] y, double alpha, double beta, TsbStart start, double[] fitted) {
        Series.requireSmoothing("alpha", alpha);
        Series.requireSmoothing("beta", beta);
        double z = 0, p;
        int demands = 0;
        for (double v : y) {
            if (v > 0) {
                if (demands == 0) {
                    z = v;
                }
                demands++;
            }
        }
        p = start == TsbStart.MEAN ? (double) demands / y.length : (y[0] > 0 ? 1.0 : 0.0);
        if (fitted != null) {
            fitted[0] = Double.NaN;
        }
        for (int t = 1; t < y.length; t++) {
            if (fitted != null) {
                fitted[t] = p * z;
            }
            if (y[t] > 0) {
                p += beta * (1 - p);
                z += alpha * (y[t] - z);
            } else {
                p -= beta * p;
            }
        }
        return p * z;
    }

    /** Simple exponential smoothing with the level starting at the first observation (R's {@code initial="simple"}). */
    public static double ses(double[] y, double alpha, double[] fitted) {
        Series.requireSmoothing("alpha", alpha);
        double level = y[0];
        if (fitted != null) {
            fitted[0] = Double.NaN;
        }
        for (int t = 1; t < y.length; t++) {
            if (fitted != null) {
                fitted[t] = level;
            }
            level += alpha * (y[t] - level);
        }
        return level;
    }

    /** Constant Poisson rate: the mean per period; fitted values are the expanding mean of earlier periods. */
    public static double poissonMean(double[] y, double[] fitted) {
        double sum = 0;
        for (int t = 0; t < y.length; t++) {
            if (fitted != null) {
                fitted[t] = t == 0 ? Double.NaN : sum / t;
            }
            sum += y[t];
        }
        return sum / y.length;
    }

    /**
     * Mean of the last {@code window} periods (all when fewer); fitted[t] is the mean of the {@code window} periods
     * before t (NaN at t = 0).
     */
    public static double movingMean(double[] y, int window, double[] fitted) {
        double sum = 0;
        for (int t = 0; t < y.length; t++) {
            if (fitted != null) {
                fitted[t] = t == 0 ? Double.NaN : sum / Math.min(t, window);
            }
            sum += y[t];
            if (t >= window) {
                sum -= y[t - window];
            }
        }
        return sum / Math.min(y.length, window);
    }

    /**
     * {@link #meanSquaredError} of {@link #croston} (and SBA, SBJ), {@link #tsb} (p̂ starting at the mean) or
     * {@link #ses} with these constants, without writing the fitted values: the same recursion and the same terms
     * summed in the same order, so exactly the same number. The smoothing-constant search runs it at every point of
     * its grid (a tenth of a forecast run's processor time went to writing and rereading the fitted values).
     */
    static double oneStepMse(double[] y, ForecastMethod method, double alpha, double beta) {
        return switch (method) {
            case CROSTON, SBA, SBJ -> crostonMse(y, alpha, method);
            case TSB -> tsbMse(y, alpha, beta);
            case SES -> sesMse(y, alpha);
            default -> throw new IllegalArgumentException("method must be CROSTON, SBA, SBJ, TSB or SES, was " + method);
        };
    }

    private static double crostonMse(double[] y, double alpha, ForecastMethod variant) {
        Series.requireSmoothing("alpha", alpha);
        double factor = crostonFactor(variant, alpha);
        CrostonLevels levels = new CrostonLevels(alpha);
        double sse = 0;
        int n = 0;
        for (double v : y) {
            double f = levels.forecast(factor);
            if (!Double.isNaN(f)) {
                double e = v - f;
                sse += e * e;
                n++;
            }
            levels.observe(v);
        }
        return n == 0 ? Double.NaN : sse / n;
    }

    private static double tsbMse(double[] y, double alpha, double beta) {
        Series.requireSmoothing("alpha", alpha);
        Series.requireSmoothing("beta", beta);
        double z = 0, sse = 0;
        int demands = 0, n = 0;
        for (double v : y) {
            if (v > 0) {
                if (demands == 0) {
                    z = v;
                }
                demands++;
            }
        }
        double p = (double) demands / y.length;
        for (int t = 1; t < y.length; t++) {
            double f = p * z;
            if (!Double.isNaN(f)) {
                double e = y[t] - f;
                sse += e * e;
                n++;
            }
            if (y[t] > 0) {
                p += beta * (1 - p);
                z += alpha * (y[t] - z);
            } else {
                p -= beta * p;
            }
        }
        return n == 0 ? Double.NaN : sse / n;
    }

    private static double sesMse(double[] y, double alpha) {
        Series.requireSmoothing("alpha", alpha);
        double level = y[0], sse = 0;
        int n = 0;
        for (int t = 1; t < y.length; t++) {
            if (!Double.isNaN(level)) {
                double e = y[t] - level;
                sse += e * e;
                n++;
            }
            level += alpha * (y[t] - level);
        }
        return n == 0 ? Double.NaN : sse / n;
    }

    /** Mean squared one-step error over the periods that have a fitted value; NaN if none. */
    static double meanSquaredError(double[] y, double[] fitted) {
        double sse = 0;
        int n = 0;
        for (int t = 0; t < y.length; t++) {
            if (!Double.isNaN(fitted[t])) {
                double e = y[t] - fitted[t];
                sse += e * e;
                n++;
            }
        }
        return n == 0 ? Double.NaN : sse / n;
    }
}
