package org.depotcast.core.sensors;

/**
 * Tells from a pump's daily hours of use whether it is in normal use, has stopped, is declining, or has sent nothing.
 *
 * <p>Method: Page's one-sided cumulative sum (CUSUM) for a fall in the mean (E. S. Page, "Continuous inspection
 * schemes", Biometrika 41(1/2):100–115, 1954), on the pump's own pattern: the mean μ₀ and standard deviation σ of the
 * days in use (read, and above near nothing: see below) in the {@code baselineDays} before the last {@code watchDays},
 * so an earlier breakdown inside the baseline neither lowers the level watched nor widens σ. Over the watched days
 * S_t = max(0, S_{t−1} + (μ₀ − k) − x_t), a day with no reading leaving S unchanged; a fall is signalled when
 * S_t > h. The reference value k = σ/2 and the decision interval h = 4σ are the textbook choice for detecting a shift
 * of one standard deviation (Montgomery, Introduction to Statistical Quality Control, 6th ed., 2009, §9.1.3: k = 0.5σ
 * with h = 4σ or 5σ). σ is floored at max(0.25 h, 10 % of μ₀), so a pump with very even use is not flagged for a
 * small dip. The change is placed at the day after S last stood at 0 (Page's estimate of the change point).
 *
 * <p>After a signal: if the days read at the end are near nothing (at most {@code stopFraction} of μ₀, or 0.25 h),
 * the pump has <b>stopped</b>, from the first day of that run (a low day before it, such as a quiet weekday, may have
 * started the sum, so the run and not Page's change point dates the stop); if the last day read is back at half of
 * μ₀ or more, it was a dip and the pump is <b>in normal use</b>; otherwise its use is <b>declining</b>. A baseline with fewer than
 * {@code leastBaselineDays} days read (or in use), or with a mean of 0.25 h or less, is too little to judge a fall against. No reading in the last
 * {@code gapDays} days is <b>no data received</b> (a transmission gap), whatever came before: a sensor that stops
 * sending is not a pump that stops pumping.
 *
 * <p>The probability that a stopped pump is down, rather than idle, is Bayes' rule over the run of near-nothing days:
 * P = π / (π + (1 − π) qⁿ), with n the near-nothing days read at the end, q the share of near-nothing days in the pump's own
 * baseline by Laplace's rule of succession ((z + 1)/(m + 2) for z such days out of m read), and π the prior chance
 * that a breakdown starts on a given day ({@code dailyBreakdownChance}). Each idle day is taken as independent.
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

    /** Settings with the defaults the Javadoc names. */
    public record Settings(int baselineDays, int watchDays, int gapDays, double kSigmas, double hSigmas,
                           double stopFraction, int leastBaselineDays, double dailyBreakdownChance) {
        public static final Settings DEFAULT = new Settings(28, 14, 3, 0.5, 4.0, 0.10, 10, 1.0 / 365);

        public Settings {
            if (baselineDays < 1 || watchDays < 1 || gapDays < 1 || leastBaselineDays < 2) {
                throw new IllegalArgumentException("windows must be positive: baseline " + baselineDays + ", watch "
                        + watchDays + ", gap " + gapDays + ", least baseline " + leastBaselineDays);
            }
            if (!(dailyBreakdownChance > 0 && dailyBreakdownChance < 1)) {
                throw new IllegalArgumentException("dailyBreakdownChance must be in (0, 1): " + dailyBreakdownChance);
            }
        }

        public int windowDays() {
            return baselineDays + watchDays;
        }
    }

    private static final double NEAR_NOTHING_HOURS = 0.25;
    private static final double LEAST_SIGMA_HOURS = 0.25;

    private final Settings settings;

    public StopDetector(Settings settings) {
        this.settings = settings;
    }

    /**
     * @param hours the last {@link Settings#windowDays()} days up to the day judged, oldest first, hours of use a day;
     *              NaN for a day with no reading
     */
    public Verdict judge(double[] hours) {
        if (hours.length != settings.windowDays()) {
            throw new IllegalArgumentException("hours must hold " + settings.windowDays() + " days: " + hours.length);
        }
        int base = settings.baselineDays();
        if (noneRead(hours, hours.length - settings.gapDays(), hours.length)) {
            return new Verdict(State.NO_DATA, -1, Double.NaN, Double.NaN, Double.NaN, 0, 0);
        }
        double sum = 0;
        int read = 0;
        for (int i = 0; i < base; i++) {
            if (!Double.isNaN(hours[i])) {
                sum += hours[i];
                read++;
            }
        }
        if (read < settings.leastBaselineDays() || sum / read <= NEAR_NOTHING_HOURS) {
            return new Verdict(State.TOO_LITTLE_DATA, -1, Double.NaN, Double.NaN, Double.NaN, 0, 0);
        }
        double nearNothing = Math.max(NEAR_NOTHING_HOURS, settings.stopFraction() * sum / read);
        // The level in use is read from the days the pump was used: near-nothing days (an earlier breakdown in the
        // baseline) would pull the mean down and swell σ, so the sum would take days longer to see the next stop.
        // How often the pump idles is kept apart, for the probability below.
        double inUseSum = 0, inUseSumSq = 0;
        int inUse = 0, idle = 0;
        for (int i = 0; i < base; i++) {
            if (Double.isNaN(hours[i])) {
                continue;
            }
            if (hours[i] <= nearNothing) {
                idle++;
            } else {
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
        int change = cusumChange(hours, base, mean, sigma);
        if (change < 0) {
            return new Verdict(State.IN_USE, -1, mean, sd, mean, 0, 0);
        }
        return afterChange(hours, change, mean, sd, nearNothing, (idle + 1.0) / (read + 2.0));
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

    private Verdict afterChange(double[] hours, int change, double mean, double sd, double nearNothing, double q) {
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
        int run = 0, runStart = -1;
        for (int t = hours.length - 1; t >= 0; t--) {
            if (Double.isNaN(hours[t])) {
                continue;
            }
            if (hours[t] > nearNothing) {
                break;
            }
            run++;
            runStart = t;
        }
        if (run > 0) {
            double prior = settings.dailyBreakdownChance();
            double probability = prior / (prior + (1 - prior) * Math.pow(q, run));
            return new Verdict(State.STOPPED, runStart, mean, sd, level, probability, run);
        }
        if (lastRead(hours) >= 0.5 * mean) {
            // Use has come back: a dip, not a fall.
            return new Verdict(State.IN_USE, change, mean, sd, level, 0, 0);
        }
        return new Verdict(State.DECLINING, change, mean, sd, level, 0, 0);
    }

    private static double lastRead(double[] hours) {
        for (int i = hours.length - 1; i >= 0; i--) {
            if (!Double.isNaN(hours[i])) {
                return hours[i];
            }
        }
        return Double.NaN;
    }

    private static boolean noneRead(double[] hours, int from, int to) {
        for (int i = Math.max(0, from); i < to; i++) {
            if (!Double.isNaN(hours[i])) {
                return false;
            }
        }
        return true;
    }
}
