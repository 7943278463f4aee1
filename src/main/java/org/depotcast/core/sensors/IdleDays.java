package org.depotcast.core.sensors;

import java.util.Arrays;

/**
 * The idle history before the watched days: days read, near-nothing days among them, and the length of each spell
 * of near-nothing days (days with no reading neither break nor lengthen a spell); and how the hours of near-nothing
 * days fell ({@link #bin}): those of the idle history ({@code idleHours}) and those of the pump's days on record as
 * broken, which the detector judges as not read ({@code brokenHours}).
 */
public record IdleDays(int read, int idle, int[] spells, int[] idleHours, int[] brokenHours) {
    /**
     * How many classes a near-nothing day's hours fall in: exactly nothing, up to a third of near nothing, up to two
     * thirds, up to near nothing.
     */
    public static final int BINS = 4;

    /** An idle history with no hours kept by class. */
    public IdleDays(int read, int idle, int[] spells) {
        this(read, idle, spells, new int[BINS], new int[BINS]);
    }

    /** The class of a near-nothing day's hours (see {@link #BINS}). */
    public static int bin(double hours, double nearNothing) {
        return hours <= 0 ? 0 : hours <= nearNothing / 3 ? 1 : hours <= 2 * nearNothing / 3 ? 2 : 3;
    }

    /** Counted over the idle history before the watched days; a day at or under {@code nearNothing} is near nothing. */
    static IdleDays count(double[] hours, double nearNothing, StopSettings settings) {
        return count(hours, hours, nearNothing, settings);
    }

    /**
     * As {@link #count(double[], double, StopSettings)}, with the hours of the near-nothing days that {@code judged}
     * leaves out of {@code asRead} (breakdowns on record) counted as broken days.
     */
    static IdleDays count(double[] judged, double[] asRead, double nearNothing, StopSettings settings) {
        int to = judged.length - settings.watchDays();
        int from = Math.max(0, to - settings.idleHistoryDays());
        int idle = 0, read = 0, spell = 0, count = 0;
        int[] spells = new int[to - from];
        int[] idleHours = new int[BINS], brokenHours = new int[BINS];
        for (int i = from; i < to; i++) {
            if (Double.isNaN(judged[i])) {
                continue;
            }
            read++;
            if (judged[i] <= nearNothing) {
                idle++;
                spell++;
                idleHours[bin(judged[i], nearNothing)]++;
            } else if (spell > 0) {
                spells[count++] = spell;
                spell = 0;
            }
        }
        if (spell > 0) {
            spells[count++] = spell;
        }
        for (int i = 0; i < judged.length && asRead != judged; i++) {
            if (Double.isNaN(judged[i]) && !Double.isNaN(asRead[i]) && asRead[i] <= nearNothing) {
                brokenHours[bin(asRead[i], nearNothing)]++;
            }
        }
        return new IdleDays(read, idle, Arrays.copyOf(spells, count), idleHours, brokenHours);
    }
}
