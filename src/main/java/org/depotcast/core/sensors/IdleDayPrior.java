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
 * <p>The hours of a near-nothing day are evidence too: a pump standing broken and a pump idling need not leave the
 * same trace (a broken pump may give nothing at all, an idle one a few minutes). The shares of near-nothing days in
 * each class of hours ({@link IdleDays#bin}) are learnt over the programme: days on record as broken (repair records)
 * and idle-history days, each a Dirichlet-multinomial posterior mean (n_b + α p_b)/(n + α) around the classes' share
 * over both kinds together, p_b = (n_b^idle + n_b^broken + 1)/(n^idle + n^broken + {@value IdleDays#BINS}) by Laplace's
 * rule, with α = {@value #HOURS_PRIOR_DAYS} days' worth; so with no broken day on record, or where both look alike,
 * the two shares agree and the hours weigh nothing. Judged alone, the hours weigh nothing.
 *
 * <p>A pump judged alone ({@link #ALONE}, and any pool of fewer than {@value #LEAST_PUMPS} pumps) has no programme to
 * learn spells from: its near-nothing days are taken as independent, each with its share by Laplace's rule of
 * succession, ((z + 1)/(m + 2))ⁿ for z such days of m read. That needs at least two days before a pump read for 28
 * days is probably down.
 */
public final class IdleDayPrior {
    /** A pump judged alone: independent days by Laplace's rule. */
    public static final IdleDayPrior ALONE = new IdleDayPrior(1, 1, null, null, null);
    /** Fewest pumps with days read to pool. */
    public static final int LEAST_PUMPS = 30;
    /** α, the days' worth of evidence the programme's mix of hours counts for in each kind's shares. */
    public static final double HOURS_PRIOR_DAYS = 10;

    private final double a;
    private final double b;
    /** lastingAtLeast[j]: the pooled spells that lasted j days or more; null when judged alone. */
    private final long[] lastingAtLeast;
    /** Shares of near-nothing days by class of hours when idle and when broken; null when judged alone. */
    private final double[] idleShare;
    private final double[] brokenShare;

    private IdleDayPrior(double a, double b, long[] lastingAtLeast, double[] idleShare, double[] brokenShare) {
        this.a = a;
        this.b = b;
        this.lastingAtLeast = lastingAtLeast;
        this.idleShare = idleShare;
        this.brokenShare = brokenShare;
    }

    /** The chance of a near-nothing day's class of hours at a pump idling; 1 when judged alone. */
    public double idleHoursChance(int bin) {
        return idleShare == null ? 1 : idleShare[bin];
    }

    /** The chance of a near-nothing day's class of hours at a pump standing broken; 1 when judged alone. */
    public double brokenHoursChance(int bin) {
        return brokenShare == null ? 1 : brokenShare[bin];
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

    /**
     * The chance that a working pump in use starts a spell of near-nothing days on a given day: the posterior mean
     * {@link #spellChance} when pooled; judged alone, Laplace's share of near-nothing days (z + 1)/(m + 2).
     */
    public double spellStartChance(IdleDays own) {
        return lastingAtLeast == null ? (own.idle() + 1.0) / (own.read() + 2.0) : spellChance(own);
    }

    /**
     * The chance that a spell that has lasted {@code days} days lasts another, L(days + 1)/L(days) when pooled;
     * judged alone, days are independent and it is the share of near-nothing days, (z + 1)/(m + 2).
     */
    public double continuing(IdleDays own, int days) {
        if (days < 1) {
            throw new IllegalArgumentException("days must be at least 1: " + days);
        }
        if (lastingAtLeast == null) {
            return (own.idle() + 1.0) / (own.read() + 2.0);
        }
        long reached = days < lastingAtLeast.length ? lastingAtLeast[days] : 0;
        long went = days + 1 < lastingAtLeast.length ? lastingAtLeast[days + 1] : 0;
        return (went + 1.0) / (reached + 2.0);
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
        long[] idleHours = new long[IdleDays.BINS], brokenHours = new long[IdleDays.BINS];
        for (IdleDays p : pumps) {
            for (int bin = 0; bin < IdleDays.BINS; bin++) {
                idleHours[bin] += p.idleHours()[bin];
                brokenHours[bin] += p.brokenHours()[bin];
            }
        }
        double[][] shares = hoursShares(idleHours, brokenHours);
        return new IdleDayPrior(mean * weight, (1 - mean) * weight, lastingAtLeast, shares[0], shares[1]);
    }

    /** Each kind's shares by class of hours, shrunk towards both kinds' shares together (class Javadoc). */
    private static double[][] hoursShares(long[] idle, long[] broken) {
        long idleDays = 0, brokenDays = 0;
        for (int bin = 0; bin < IdleDays.BINS; bin++) {
            idleDays += idle[bin];
            brokenDays += broken[bin];
        }
        double[][] shares = new double[2][IdleDays.BINS];
        for (int bin = 0; bin < IdleDays.BINS; bin++) {
            double both = (idle[bin] + broken[bin] + 1.0) / (idleDays + brokenDays + IdleDays.BINS);
            shares[0][bin] = (idle[bin] + HOURS_PRIOR_DAYS * both) / (idleDays + HOURS_PRIOR_DAYS);
            shares[1][bin] = (broken[bin] + HOURS_PRIOR_DAYS * both) / (brokenDays + HOURS_PRIOR_DAYS);
        }
        return shares;
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
                : String.format("spell start Beta(%.4f, %.2f), spells lasting 2+ days %.3f, 3+ %.3f, 4+ %.4f; "
                + "near-nothing days with nothing at all: idle %.3f, broken %.3f", a, b, lasting(2), lasting(3),
                lasting(4), idleShare[0], brokenShare[0]);
    }
}
