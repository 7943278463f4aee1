package org.depotcast.core.sensors;

import java.util.Arrays;
import java.util.List;

/**
 * How likely a working pump is to show a run of n near-nothing days ending today, learnt from the programme's sensor
 * pumps: the chance of the run under "working", set against a breakdown's in {@link StopDetector}.
 *
 * <p>Pooled over a programme ({@link #pooled}): a working pump's near-nothing days come in spells (a market day, a
 * spell of rain), so the days of a spell are not independent, and the run is taken as a spell that started n − 1
 * days ago and lasted at least n days: chance s·L(n). The pump's chance s that a spell starts on a day is the
 * posterior mean (k + a)/(m + a + b) for its k spells in m days read, under a Beta(a, b) prior fitted over the
 * programme's pumps (empirical Bayes: C. N. Morris, "Parametric empirical Bayes inference: theory and applications",
 * JASA 78(381):47–55, 1983; G. Casella, "An introduction to empirical Bayes data analysis", The American Statistician
 * 39(2):83–87, 1985): its own record shrunk towards the programme's rate by a + b days' worth of the programme's
 * evidence, so a pump that never idles in a programme whose pumps rarely idle gets an s far below a breakdown's daily
 * chance. a + b come from the beta-binomial method of moments for unequal numbers of days (J. C. Kleinman, "Proportions
 * with extraneous variance: single and independent samples", JASA 68(341):46–54, 1973), each pump weighted by its days
 * read: with μ̂ = Σk/Σm, pᵢ = kᵢ/mᵢ, M = Σm and S = Σ mᵢ(pᵢ − μ̂)², E[S] = μ(1 − μ) Σ(1 − mᵢ/M)(1 + ρ(mᵢ − 1)), ρ = 1/(a + b + 1),
 * so ρ̂ = (S/(μ̂(1 − μ̂)) − Σ(1 − mᵢ/M)) / Σ(1 − mᵢ/M)(mᵢ − 1). The prior's mean is Laplace's rule over all the days,
 * (Σk + 1)/(Σm + 2), so a programme with no spell on record still gets a rate above 0; a + b = 1/ρ̂ − 1 is kept between
 * 1 and the median pump's days read, so the programme never counts for more than a pump's own record (the moment
 * estimate has no upper bound when pumps differ no more than chance says, ρ̂ ≤ 0). L(n), the share of spells lasting
 * at least n days, is the programme's, each step by Laplace's rule: L(1) = 1, L(n) = L(n − 1)·(N≥n + 1)/(N≥n−1 + 2),
 * N≥j the spells seen lasting j days or more; a run longer than any spell seen soon becomes unlikely for a working pump.
 *
 * <p>A pump judged alone ({@link #ALONE}, and any pool of fewer than {@value #LEAST_PUMPS} pumps) has no programme to
 * learn spells from: its near-nothing days are taken as independent, each with its share by Laplace's rule of
 * succession, ((z + 1)/(m + 2))ⁿ for z such days of m read. That needs at least two days before a pump read for 28
 * days is probably down.
 */
public final class IdleDayPrior {
    /** A pump judged alone: independent days by Laplace's rule. */
    public static final IdleDayPrior ALONE = new IdleDayPrior(1, 1, null);
    /** Fewest pumps with days read to pool. */
    public static final int LEAST_PUMPS = 30;

    private final double a;
    private final double b;
    /** lastingAtLeast[j]: the pooled spells that lasted j days or more; null when judged alone. */
    private final long[] lastingAtLeast;

    private IdleDayPrior(double a, double b, long[] lastingAtLeast) {
        this.a = a;
        this.b = b;
        this.lastingAtLeast = lastingAtLeast;
    }

    public double a() {
        return a;
    }

    public double b() {
        return b;
    }

    public boolean isPooled() {
        return lastingAtLeast != null;
    }

    /** The chance that a working pump with the given idle history shows a run of {@code run} near-nothing days. */
    public double chanceOfRun(IdleDays own, int run) {
        if (run < 1) {
            throw new IllegalArgumentException("run must be at least 1: " + run);
        }
        if (lastingAtLeast == null) {
            return Math.pow((own.idle() + 1.0) / (own.read() + 2.0), run);
        }
        return spellChance(own) * lasting(run);
    }

    /** The posterior mean chance that a spell starts on a given day, (k + a)/(m + a + b). */
    public double spellChance(IdleDays own) {
        return (own.spells().length + a) / (own.read() + a + b);
    }

    /** L(n): the share of the programme's spells lasting at least {@code days} days, by Laplace's rule at each step. */
    public double lasting(int days) {
        double share = 1;
        for (int j = 2; j <= days; j++) {
            long reached = j - 1 < lastingAtLeast.length ? lastingAtLeast[j - 1] : 0;
            long went = j < lastingAtLeast.length ? lastingAtLeast[j] : 0;
            share *= (went + 1.0) / (reached + 2.0);
        }
        return share;
    }

    /** Fits the prior over the pumps' idle histories; fewer than {@value #LEAST_PUMPS} with days read: {@link #ALONE}. */
    public static IdleDayPrior pooled(List<IdleDays> pumps) {
        int n = 0, longest = 0;
        long spells = 0, read = 0;
        int[] readOf = new int[pumps.size()];
        for (IdleDays p : pumps) {
            if (p.read() > 0) {
                readOf[n++] = p.read();
                spells += p.spells().length;
                read += p.read();
                for (int length : p.spells()) {
                    longest = Math.max(longest, length);
                }
            }
        }
        if (n < LEAST_PUMPS) {
            return ALONE;
        }
        long[] lastingAtLeast = new long[longest + 1];
        for (IdleDays p : pumps) {
            for (int length : p.spells()) {
                for (int j = 1; j <= length; j++) {
                    lastingAtLeast[j]++;
                }
            }
        }
        int[] sorted = Arrays.copyOf(readOf, n);
        Arrays.sort(sorted);
        double medianRead = n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2.0;
        double rho = intraPumpCorrelation(pumps, spells, read);
        double weight = rho > 0 ? Math.min(medianRead, Math.max(1, 1 / rho - 1)) : medianRead;
        double mean = (spells + 1.0) / (read + 2.0);
        return new IdleDayPrior(mean * weight, (1 - mean) * weight, lastingAtLeast);
    }

    /** Kleinman's moment estimate of ρ, or 0 when no pump or every pump had a spell on every day read. */
    private static double intraPumpCorrelation(List<IdleDays> pumps, long spells, long read) {
        if (spells == 0 || spells == read) {
            return 0;
        }
        double share = (double) spells / read;
        double s = 0, c0 = 0, c1 = 0;
        for (IdleDays p : pumps) {
            int m = p.read();
            if (m == 0) {
                continue;
            }
            double rate = (double) p.spells().length / m;
            double w = 1 - (double) m / read;
            s += m * (rate - share) * (rate - share);
            c0 += w;
            c1 += w * (m - 1);
        }
        return c1 <= 0 ? 0 : (s / (share * (1 - share)) - c0) / c1;
    }

    @Override
    public String toString() {
        return lastingAtLeast == null ? "judged alone (Laplace's rule, independent days)"
                : String.format("spell start Beta(%.4f, %.2f), spells lasting 2+ days %.3f, 3+ %.3f, 4+ %.4f", a, b,
                lasting(2), lasting(3), lasting(4));
    }
}
