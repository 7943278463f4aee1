package org.depotcast.core.sensors;

/** The {@link StopDetector}'s windows and thresholds, with the defaults its Javadoc names. */
public record StopSettings(int baselineDays, int watchDays, int gapDays, double kSigmas, double hSigmas,
                       double stopFraction, int leastBaselineDays, double dailyBreakdownChance,
                       int idleHistoryDays) {
    public static final StopSettings DEFAULT = new StopSettings(28, 14, 3, 0.5, 4.0, 0.10, 10, 1.0 / 365, 112);

    public StopSettings {
        if (baselineDays < 1 || watchDays < 1 || gapDays < 1 || leastBaselineDays < 2) {
            throw new IllegalArgumentException("windows must be positive: baseline " + baselineDays + ", watch "
                    + watchDays + ", gap " + gapDays + ", least baseline " + leastBaselineDays);
        }
        if (!(dailyBreakdownChance > 0 && dailyBreakdownChance < 1)) {
            throw new IllegalArgumentException("dailyBreakdownChance must be in (0, 1): " + dailyBreakdownChance);
        }
        if (idleHistoryDays < baselineDays) {
            throw new IllegalArgumentException("idleHistoryDays must be at least baselineDays: " + idleHistoryDays);
        }
    }

    /** The days the CUSUM reads: the baseline and the watched days. */
    public int windowDays() {
        return baselineDays + watchDays;
    }

    /** The most days a judgement reads: the idle history and the watched days. */
    public int historyDays() {
        return idleHistoryDays + watchDays;
    }
}
