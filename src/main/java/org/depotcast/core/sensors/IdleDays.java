package org.depotcast.core.sensors;

import java.util.Arrays;

/**
 * The idle history before the watched days: days read, near-nothing days among them, and the length of each spell
 * of near-nothing days (days with no reading neither break nor lengthen a spell).
 */
public record IdleDays(int read, int idle, int[] spells) {
    /** Counted over the idle history before the watched days; a day at or under {@code nearNothing} is near nothing. */
    static IdleDays count(double[] hours, double nearNothing, StopSettings settings) {
        int to = hours.length - settings.watchDays();
        int from = Math.max(0, to - settings.idleHistoryDays());
        int idle = 0, read = 0, spell = 0, count = 0;
        int[] spells = new int[to - from];
        for (int i = from; i < to; i++) {
            if (Double.isNaN(hours[i])) {
                continue;
            }
            read++;
            if (hours[i] <= nearNothing) {
                idle++;
                spell++;
            } else if (spell > 0) {
                spells[count++] = spell;
                spell = 0;
            }
        }
        if (spell > 0) {
            spells[count++] = spell;
        }
        return new IdleDays(read, idle, Arrays.copyOf(spells, count));
    }
}
