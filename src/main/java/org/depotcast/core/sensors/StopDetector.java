package org.depotcast.core.sensors;

/**
 * Tells from a pump's daily hours of use whether it is in normal use, has stopped, is declining, or has sent nothing.
 *
 * <p>Method: Page's one-sided cumulative sum (CUSUM) for a fall in the mean (E. S. Page, "Continuous inspection
 * schemes", Biometrika 41(1/2):100–115, 1954), on the pump's own pattern: the mean μ₀ and standard deviation σ of the
 * days in use (read, and above near nothing: see below) in the {@code baselineDays} before the last {@code watchDays}
 * (reaching further back past days not read, such as a recorded breakdown's, until it holds {@code baselineDays}
 * days read), so an earlier breakdown inside the baseline neither lowers the level watched nor widens σ. Over the watched days
 * S_t = max(0, S_{t−1} + (μ₀ − k) − x_t), a day with no reading leaving S unchanged; a fall is signalled when
 * S_t > h. The reference value k = σ/2 and the decision interval h = 4σ are the textbook choice for detecting a shift
 * of one standard deviation (Montgomery, Introduction to Statistical Quality Control, 6th ed., 2009, §9.1.3: k = 0.5σ
 * with h = 4σ or 5σ). σ is floored at max(0.25 h, 10 % of μ₀), so a pump with very even use is not flagged for a
 * small dip. The change is placed at the day after S last stood at 0 (Page's estimate of the change point). A last
 * day read that is near nothing is judged as a possible stop even before the sum signals: the sum, made for a shift of
 * one σ, needs two such days at a pump whose σ exceeds μ₀/4.5, while the probability below weighs the day itself.
 *
 * <p>After a signal: if the days read at the end are near nothing (at most {@code stopFraction} of μ₀, or 0.25 h),
 * the pump has <b>stopped</b>, from the first day of that run (a low day before it, such as a quiet weekday, may have
 * started the sum, so the run and not Page's change point dates the stop); if the last day read is back at half of
 * μ₀ or more, it was a dip and the pump is <b>in normal use</b>; otherwise its use is <b>declining</b>. A baseline with fewer than
 * {@code leastBaselineDays} days read (or in use), or with a mean of 0.25 h or less, is too little to judge a fall against. No reading in the last
 * {@code gapDays} days is <b>no data received</b> (a transmission gap), whatever came before: a sensor that stops
 * sending is not a pump that stops pumping.
 *
 * <p>The probability that a stopped pump is down, rather than idle, is the Bayesian change-point posterior of
 * {@link StopPosterior} (Shiryaev 1963) over the days since the pump was last read in use: a breakdown starting on a
 * day with the pump's own hazard π = 1 − exp(−λ μ₀), λ its breakdowns per operating hour from the fleet model and μ₀
 * its hours a day in use ({@code dailyBreakdownChance} when no rate is known), against an idle spell, whose start
 * chance is the pump's idle history (the {@code idleHistoryDays} before the watched days) shrunk towards the
 * programme's and whose length is the programme's ({@link IdleDayPrior}); a pump judged alone takes its days as
 * independent, each near nothing with chance (z + 1)/(m + 2) for z near-nothing days of m read (Laplace's rule). A
 * pump that never idles in a programme whose pumps rarely idle is probably down after one near-nothing day; a pump with
 * idle spells on record needs a run longer than its spells usually last.
 */
public final class StopDetector {
    /** What the series says, in plain words for the answer. */
    public enum State {
        IN_USE("in normal use"),
        STOPPED("stopped"),
        DECLINING("use declining"),
        NO_DATA("no data received"),
        TOO_LITTLE_DATA("too little use or data to judge");

        private final String words;

        State(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    /**
     * @param changeIndex        index of the first day of the fall (−1 when there is none)
     * @param probabilityDown    for STOPPED, the probability the pump is down rather than idle; else 0
     */
    public record Verdict(State state, int changeIndex, double baselineMean, double baselineSd, double levelSince,
                          double probabilityDown, int nearNothingDays) {
    }

    private static final double NEAR_NOTHING_HOURS = 0.25;
    private static final double LEAST_SIGMA_HOURS = 0.25;

    private final StopSettings settings;

    public StopDetector(StopSettings settings) {
        this.settings = settings;
    }

    /** {@link #judge(double[], IdleDayPrior)} for a pump judged alone ({@link IdleDayPrior#ALONE}). */
    public Verdict judge(double[] hours) {
        return judge(hours, IdleDayPrior.ALONE);
    }

    /**
     * @param hours the days up to the day judged, oldest first, hours of use a day, NaN for a day with no reading: at
     *              least {@link StopSettings#windowDays()} and at most {@link StopSettings#historyDays()} days (a pump
     *              read for a shorter time has a shorter idle history)
     * @param prior the programme's prior for the pump's chance of a near-nothing day
     */
    public Verdict judge(double[] hours, IdleDayPrior prior) {
        return judge(hours, prior, Double.NaN);
    }

    /**
     * {@link #judge(double[], IdleDayPrior)} with the pump's breakdowns per operating hour (the fleet model's rate for
     * it; NaN when none is known, for the settings' {@code dailyBreakdownChance}).
     */
    public Verdict judge(double[] hours, IdleDayPrior prior, double breakdownsPerHour) {
        checkLength(hours);
        if (DaysRead.none(hours, hours.length - settings.gapDays(), hours.length)) {
            return new Verdict(State.NO_DATA, -1, Double.NaN, Double.NaN, Double.NaN, 0, 0);
        }
        int to = hours.length - settings.watchDays();
        int from = baselineStart(hours, to);
        double nearNothing = nearNothing(hours, from, to);
        if (Double.isNaN(nearNothing)) {
            return new Verdict(State.TOO_LITTLE_DATA, -1, Double.NaN, Double.NaN, Double.NaN, 0, 0);
        }
        // The level in use is read from the days the pump was used: near-nothing days (an earlier breakdown in the
        // baseline) would pull the mean down and swell σ, so the sum would take days longer to see the next stop.
        // How often the pump idles is kept apart, for the probability below.
        double inUseSum = 0, inUseSumSq = 0;
        int inUse = 0;
        for (int i = from; i < to; i++) {
            if (!Double.isNaN(hours[i]) && hours[i] > nearNothing) {
                inUseSum += hours[i];
                inUseSumSq += hours[i] * hours[i];
                inUse++;
            }
        }
        if (inUse < settings.leastBaselineDays()) {
            return new Verdict(State.TOO_LITTLE_DATA, -1, Double.NaN, Double.NaN, Double.NaN, 0, 0);
        }
        double mean = inUseSum / inUse;
        double sd = Math.sqrt(Math.max(0, (inUseSumSq - inUse * mean * mean) / (inUse - 1)));
        double sigma = Math.max(sd, Math.max(LEAST_SIGMA_HOURS, 0.1 * mean));
        int change = cusumChange(hours, to, mean, sigma);
        if (change < 0) {
            // A near-nothing day is its own evidence, weighed below against how often the pump idles; the sum, made
            // for a shift of one σ, needs two such days before it signals at a pump whose σ exceeds μ₀/4.5 (a quiet
            // weekday is enough).
            change = DaysRead.lastNearNothing(hours, to, nearNothing);
            if (change < 0) {
                return new Verdict(State.IN_USE, -1, mean, sd, mean, 0, 0);
            }
        }
        double hazard = Double.isNaN(breakdownsPerHour) ? settings.dailyBreakdownChance()
                : StopPosterior.dailyChance(breakdownsPerHour, mean);
        return afterChange(hours, change, mean, sd, nearNothing, IdleDays.count(hours, nearNothing, settings), prior,
                hazard);
    }

    /**
     * The pump's near-nothing days in its idle history, as {@link #judge} counts them, for fitting the programme's
     * prior; null when its baseline is too little to judge.
     */
    public IdleDays idleDays(double[] hours) {
        return idleDays(hours, hours);
    }

    /**
     * As {@link #idleDays(double[])} for the days judged ({@code hours}, breakdowns on record left out), with the
     * hours of those broken days from the days as read ({@code asRead}).
     */
    public IdleDays idleDays(double[] hours, double[] asRead) {
        checkLength(hours);
        int to = hours.length - settings.watchDays();
        double nearNothing = nearNothing(hours, baselineStart(hours, to), to);
        return Double.isNaN(nearNothing) ? null : IdleDays.count(hours, asRead, nearNothing, settings);
    }

    private void checkLength(double[] hours) {
        if (hours.length < settings.windowDays() || hours.length > settings.historyDays()) {
            throw new IllegalArgumentException("hours must hold " + settings.windowDays() + " to "
                    + settings.historyDays() + " days: " + hours.length);
        }
    }

    /**
     * The first day of the baseline ending before {@code to}: the {@code baselineDays} before it, reaching further
     * back, as far as the days given go, past days not read until it holds {@code baselineDays} days read. Days a
     * recorded breakdown explains are not read ({@link RecordedDowntime}), so a pump that stops again a few weeks
     * after a long repair is judged against its use before that breakdown instead of against too little to judge.
     */
    private int baselineStart(double[] hours, int to) {
        int from = to - settings.baselineDays();
        int read = DaysRead.count(hours, from, to);
        while (from > 0 && read < settings.baselineDays()) {
            from--;
            read += Double.isNaN(hours[from]) ? 0 : 1;
        }
        return from;
    }

    /** Near nothing for this pump, from its baseline's days read; NaN when the baseline is too little to judge. */
    private double nearNothing(double[] hours, int from, int to) {
        double sum = 0;
        int read = 0;
        for (int i = from; i < to; i++) {
            if (!Double.isNaN(hours[i])) {
                sum += hours[i];
                read++;
            }
        }
        if (read < settings.leastBaselineDays() || sum / read <= NEAR_NOTHING_HOURS) {
            return Double.NaN;
        }
        return Math.max(NEAR_NOTHING_HOURS, settings.stopFraction() * sum / read);
    }

    /** The change point of the first CUSUM signal in the watched days, or −1 for none. */
    private int cusumChange(double[] hours, int from, double mean, double sigma) {
        double k = settings.kSigmas() * sigma;
        double h = settings.hSigmas() * sigma;
        double s = 0;
        int lastZero = from - 1;
        for (int t = from; t < hours.length; t++) {
            if (Double.isNaN(hours[t])) {
                continue;
            }
            s = Math.max(0, s + (mean - k) - hours[t]);
            if (s == 0) {
                lastZero = t;
            } else if (s > h) {
                return lastZero + 1;
            }
        }
        return -1;
    }

    private Verdict afterChange(double[] hours, int change, double mean, double sd, double nearNothing, IdleDays idle,
                                IdleDayPrior idlePrior, double hazard) {
        double sum = 0;
        int read = 0;
        for (int t = change; t < hours.length; t++) {
            if (!Double.isNaN(hours[t])) {
                sum += hours[t];
                read++;
            }
        }
        double level = read == 0 ? Double.NaN : sum / read;
        // The run of near-nothing days read at the end (days with no reading neither break nor lengthen it).
        int run = 0, runStart = -1, lastInUse = -1;
        for (int t = hours.length - 1; t >= 0 && lastInUse < 0; t--) {
            if (!Double.isNaN(hours[t]) && hours[t] > nearNothing) {
                lastInUse = t;
            } else if (!Double.isNaN(hours[t])) {
                run++;
                runStart = t;
            }
        }
        if (run > 0 && lastInUse >= 0) {
            double probability = StopPosterior.probabilityDown(hours, lastInUse, nearNothing, hazard, idlePrior,
                    idle);
            return new Verdict(State.STOPPED, runStart, mean, sd, level, probability, run);
        }
        if (DaysRead.last(hours) >= 0.5 * mean) {
            // Use has come back: a dip, not a fall.
            return new Verdict(State.IN_USE, change, mean, sd, level, 0, 0);
        }
        return new Verdict(State.DECLINING, change, mean, sd, level, 0, 0);
    }
}
