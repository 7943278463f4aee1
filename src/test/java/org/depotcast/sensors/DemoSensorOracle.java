package org.depotcast.sensors;

import org.depotcast.core.sensors.StopSettings;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * A detector that knows how the demo drew each sensor pump's year ({@link DemoSensorSeries.Settings}: its level,
 * quiet weekday, decline, whether and how often it idles, and the exact chances of each reading on a normal, an idle
 * and a broken day), for a bound on what any detector could do with the same readings: the exact forward filter
 * (hidden Markov model) over the generator's own states, opening and closing flags as the replay of the service does.
 * Nothing in the service uses it; it answers whether a better rule could meet the targets where the service's
 * does not.
 *
 * <p>States of a day: normal and a spell may start the next day (N), normal right after a spell (A, the generator
 * starts no spell then), in day j of an idle spell of L days (L = 1, 2, 3 with chances 0.6, 0.3, 0.1), broken (B,
 * from the stop to the fix; a day's chance of a stop is the pump's planted hazard 1 − exp(−λ·load)). Readings: normal
 * days lognormal around the day's expected hours (σ 0.15) rounded to 0.01 h; idle days round(U·25)/100 h; broken days
 * nothing with chance 0.7, else round(U·10)/100 h; a day with no reading weighs every state alike. On the day of a
 * fix the pump is known to be working again.
 */
final class DemoSensorOracle {
    private static final double[] SPELL_LENGTH = {0.6, 0.3, 0.1};

    private DemoSensorOracle() {
    }

    /** The demo's year judged by the oracle, flags opening at {@code leastProbability}, as {@link DemoSensorYear}. */
    static List<DemoSensorYear.PumpYear> replay(long seed, DemoSensorSeries.ReportDelay delay, double leastProbability)
            throws IOException {
        List<DemoSensorYear.PumpYear> year = new ArrayList<>();
        for (DemoSensorYear.SensorPump pump : DemoSensorYear.pumps(seed, delay, null)) {
            year.add(judge(pump, leastProbability));
        }
        return year;
    }

    private static DemoSensorYear.PumpYear judge(DemoSensorYear.SensorPump pump, double leastProbability) {
        double[] down = posteriorDown(pump);
        int window = StopSettings.DEFAULT.windowDays(), openDay = -1, covering = -1;
        List<DemoSensorYear.Flag> flags = new ArrayList<>();
        for (int t = window - 1; t < DemoSensorYear.DAYS; t++) {
            boolean repairOpen = false;
            for (DemoSensorYear.Planted m : pump.marks()) {
                repairOpen |= m.report() <= t && t < m.fix();
            }
            if (openDay >= 0) {
                if (repairOpen || down[t] < 0.05) {
                    flags.add(flag(openDay, t, covering, down[openDay]));
                    openDay = -1;
                }
                continue;
            }
            if (!repairOpen && down[t] >= leastProbability) {
                openDay = t;
                covering = -1;
                for (int i = 0; i < pump.marks().size(); i++) {
                    DemoSensorYear.Planted m = pump.marks().get(i);
                    covering = m.stop() <= t && t < m.fix() ? i : covering;
                }
            }
        }
        if (openDay >= 0) {
            flags.add(flag(openDay, DemoSensorYear.DAYS, covering, down[openDay]));
        }
        return new DemoSensorYear.PumpYear(pump.assetId(), pump.marks(), flags, DemoSensorYear.DAYS - window + 1,
                pump.hours());
    }

    private static DemoSensorYear.Flag flag(int openDay, int closeDay, int covering, double probability) {
        return new DemoSensorYear.Flag(openDay, closeDay, openDay, new double[]{probability}, Double.NaN, covering, 0,
                0);
    }

    /** P(broken on day t | readings up to t) for every day, by the forward recursion over the states above. */
    static double[] posteriorDown(DemoSensorYear.SensorPump pump) {
        DemoSensorSeries.Settings drawn = pump.drawn();
        double hazard = -Math.expm1(-pump.breakdownsPerHour() * pump.load());
        double start = drawn.spellsPerDay();
        double[] hours = pump.hours();
        double[] out = new double[hours.length];
        double normal = 1, after = 0, broken = 0;
        double[][] idle = new double[3][3];
        for (int t = 0; t < hours.length; t++) {
            if (fixedOn(pump, t)) {
                normal = 1;
                after = 0;
                broken = 0;
                idle = new double[3][3];
            } else if (t > 0) {
                double alive = 1 - hazard, working = normal + after;
                double[][] next = new double[3][3];
                double ended = 0;
                for (int l = 0; l < 3; l++) {
                    ended += idle[l][l];
                    next[l][0] = alive * start * SPELL_LENGTH[l] * working;
                    for (int j = 1; j <= l; j++) {
                        next[l][j] = alive * idle[l][j - 1];
                    }
                }
                double all = working;
                for (double[] spell : idle) {
                    for (double day : spell) {
                        all += day;
                    }
                }
                broken += hazard * all;
                normal = alive * (1 - start) * working;
                after = alive * ended;
                idle = next;
            }
            double x = hours[t];
            if (!Double.isNaN(x)) {
                double asNormal = normalChance(x, drawn.expected(DemoSensorYear.FIRST, t));
                normal *= asNormal;
                after *= asNormal;
                broken *= brokenChance(x);
                for (double[] spell : idle) {
                    for (int j = 0; j < spell.length; j++) {
                        spell[j] *= idleChance(x);
                    }
                }
            }
            double total = normal + after + broken;
            for (double[] spell : idle) {
                for (double day : spell) {
                    total += day;
                }
            }
            normal /= total;
            after /= total;
            broken /= total;
            for (double[] spell : idle) {
                for (int j = 0; j < spell.length; j++) {
                    spell[j] /= total;
                }
            }
            out[t] = broken;
        }
        return out;
    }

    private static boolean fixedOn(DemoSensorYear.SensorPump pump, int t) {
        for (DemoSensorYear.Planted m : pump.marks()) {
            if (m.fix() == t) {
                return true;
            }
        }
        return false;
    }

    /** The chance of a reading of x hours (to 0.01 h) on a normal day expecting e hours: lognormal, σ 0.15. */
    private static double normalChance(double x, double e) {
        double lo = Math.max(1e-9, x - 0.005), hi = x + 0.005;
        return Math.max(1e-300, cdf(Math.log(hi / e) / 0.15) - cdf(Math.log(lo / e) / 0.15));
    }

    private static double cdf(double z) {
        return 0.5 * org.apache.commons.math3.special.Erf.erfc(-z / Math.sqrt(2));
    }

    /** round(U·25)/100: 0 and 0.25 h with chance 1/50, each hundredth between with 1/25. */
    private static double idleChance(double x) {
        long c = Math.round(x * 100);
        return c < 0 || c > 25 ? 0 : c == 0 || c == 25 ? 0.02 : 0.04;
    }

    /** Nothing with chance 0.7, else round(U·10)/100. */
    private static double brokenChance(double x) {
        long c = Math.round(x * 100);
        return c < 0 || c > 10 ? 0 : 0.7 * (c == 0 ? 1 : 0) + 0.3 * (c == 0 || c == 10 ? 0.05 : 0.1);
    }
}
