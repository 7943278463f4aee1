package org.depotcast.sensors;

import org.depotcast.core.sensors.StopDetector;
import org.depotcast.core.sensors.StopSettings;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The detector replayed day by day over the demo programme's sensor year (the demo's pumps and recorded breakdowns,
 * the year to 2026-11-30), for sensor seeds 14 (the demo's) and 15 and both report delays the generator knows: for
 * each planted breakdown, the days from its stop to the flag and whether the flag came before the report; flags on
 * days with no planted stop are false alarms, per 1,000 pump-months judged. Day t is judged on the readings up to and
 * including day t (a day's file arrives that evening); "before the report" means on a day strictly before the report
 * day. A planted breakdown is judged when its stop has the detector's full 42-day window before it and its report
 * falls in the year. A flag opens as {@link StopFlagService} opens one (stopped, probability ≥ 0.5, no repair open,
 * the stop not begun on or before the last fix), judging the days read less the downtime of breakdowns already on
 * record ({@link org.depotcast.core.sensors.RecordedDowntime}), with the idle spells pooled over the sensor pumps
 * judged that day ({@link org.depotcast.core.sensors.IdleDayPrior}), and closes when a repair is open or use comes
 * back. The rule of 2 Dec 2026 (each pump alone, its 28 baseline days as independent days) is replayed beside it on
 * the same series. Figures print as EVIDENCE lines.
 */
class StopDetectionEvidenceTest {
    private static final int DAYS = DemoSensorYear.DAYS;

    @Test
    void theDetectorFlagsPlantedBreakdownsEarlyWithFewFalseAlarms() throws IOException {
        for (DemoSensorSeries.ReportDelay delay : DemoSensorSeries.ReportDelay.values()) {
            for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
                double[] before = statistics(DemoSensorYear.replay(seed, delay, true,
                        DemoSensorYear.Rule.ALONE_28_DAYS));
                double[] flat = statistics(DemoSensorYear.replay(seed, delay, true,
                        DemoSensorYear.Rule.POOLED_FLAT_PRIOR));
                List<DemoSensorYear.PumpYear> year = DemoSensorYear.replay(seed, delay);
                double[] figures = statistics(year);
                System.out.printf("EVIDENCE %s, seed %d, with the flat prior of one breakdown a pump-year instead of "
                                + "the pump's own rate: median %.1f, %.1f %% (%.1f %%), %.2f%n", delay, seed, flat[1],
                        100 * flat[2], 100 * flat[5], flat[3]);
                System.out.printf("EVIDENCE %s, seed %d: %d planted breakdowns judged, median %.1f days from stop to "
                                + "flag, %.1f %% flagged before the report (%.1f %% of the %d reported 2 or more days "
                                + "after the stop; %.1f %% of the %d stops of their own, not begun while another "
                                + "breakdown of the pump stood), %.2f false alarms per 1,000 pump-months (%.0f "
                                + "pump-months); the rule of 2 Dec (28 days, Laplace): median %.1f, %.1f %% (%.1f %%), "
                                + "%.2f%n", delay, seed, (int) figures[0], figures[1], 100 * figures[2],
                        100 * figures[5], (int) figures[6], 100 * figures[8], (int) figures[7], figures[3], figures[4],
                        before[1], 100 * before[2], 100 * before[5], before[3]);
                int[][] decided = daysToDecide(year);
                System.out.printf("EVIDENCE %s, seed %d, flags by the pump's idle days on record: none on record: "
                                + "%d opened after 1 near-nothing day, %d after 2, %d after 3 or more (%d false "
                                + "alarms); some on record: %d, %d, %d (%d false alarms)%n", delay, seed,
                        decided[0][0], decided[0][1], decided[0][2], decided[0][3], decided[1][0], decided[1][1],
                        decided[1][2], decided[1][3]);
                assertTrue(figures[0] >= 30, "enough planted breakdowns to judge: " + figures[0]);
                assertTrue(figures[1] <= 2, "median days to the flag: " + figures[1]);
                // The demo's working pumps have idle spells of 1–3 days (seed-data/README.md), so run length alone
                // cannot tell a 2-day spell from a stop; the hours of near-nothing days can, where idle and broken
                // days look different (on the demo: broken days mostly nothing at all, idle ones a few minutes).
                // Guards on both seeds (measured 74–75 % and 9–10 under the demo's delay, README): at least half the
                // false alarms of the rule of 2 Dec, and not fewer stops flagged first.
                assertTrue(figures[3] <= 0.5 * before[3], "false alarms: " + before[3] + " → " + figures[3]);
                assertTrue(figures[2] >= before[2] - 0.01, "flagged before the report: " + before[2] + " → "
                        + figures[2]);
                assertTrue(figures[5] >= 0.75, "share flagged before the report, reported 2+ days on: " + figures[5]);
                assertTrue(figures[3] <= 12, "false alarms per 1,000 pump-months: " + figures[3]);
                // One near-nothing day is enough at pumps with no idle day on record, and now at some with spells on
                // record when the day's hours look broken.
                assertTrue(decided[0][0] >= 30, "one-day flags at pumps that do not idle: " + decided[0][0]);
            }
        }
    }

    /**
     * What the flag's threshold trades, under the demo's delay: the share flagged before the report and the false
     * alarms when flags open at a probability of 0.5 (the service's), 0.8 or 0.95; and whether the probabilities mean
     * what they say: at 0.5, the mean probability of the flags opened against the share that covered a planted stop.
     */
    @Test
    void aHigherThresholdTradesEarlyFlagsForFewerFalseAlarms() throws IOException {
        DemoSensorSeries.ReportDelay delay = DemoSensorSeries.ReportDelay.CARETAKER_TO_MECHANIC;
        for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
            double[] previous = null;
            for (double least : new double[]{0.5, 0.8, 0.9, 0.95}) {
                List<DemoSensorYear.PumpYear> year = DemoSensorYear.replay(seed, delay, true,
                        DemoSensorYear.Rule.POOLED, least);
                double[] figures = statistics(year);
                double probability = 0;
                int flags = 0, covering = 0;
                for (DemoSensorYear.PumpYear pump : year) {
                    for (DemoSensorYear.Flag flag : pump.flags()) {
                        probability += flag.probability()[0];
                        flags++;
                        covering += flag.covering() >= 0 ? 1 : 0;
                    }
                }
                System.out.printf("EVIDENCE %s, seed %d, flags opening at %.2f: median %.1f days, %.1f %% flagged "
                                + "before the report (%.1f %% of those reported 2+ days on), %.2f false alarms per "
                                + "1,000 pump-months; %d flags of mean probability %.3f, %.3f of them on a planted "
                                + "stop; %.1f %% of the %d stops of their own flagged before the report%n", delay,
                        seed, least, figures[1], 100 * figures[2], 100 * figures[5], figures[3], flags,
                        probability / flags, (double) covering / flags, 100 * figures[8], (int) figures[7]);
                if (least == 0.9) {
                    // The highest share flagged first within the 2 false alarms per 1,000 pump-months on the
                    // demo's series (measured 1.85 / 1.36 with 69.8 / 70.7 % flagged first, README).
                    assertTrue(figures[3] <= 2 && figures[2] >= 0.65, "at 0.9: " + figures[2] + ", " + figures[3]);
                }
                if (least == 0.95) {
                    // A stricter flag keeps false alarms within the 2 per 1,000 pump-months and still flags
                    // most stops first (65–66 % on the demo's series).
                    assertTrue(figures[3] <= 2 && figures[2] >= 0.6, "at 0.95: " + figures[2] + ", " + figures[3]);
                }
                if (previous != null) {
                    assertTrue(figures[3] <= previous[3] && figures[2] <= previous[2] + 1e-9,
                            "a higher threshold raises fewer flags, false or true");
                }
                previous = figures;
            }
        }
    }

    /**
     * The most any detector reading these series could flag before the report: a planted breakdown can be flagged
     * first only if at least one day from its stop to the day before its report was read (not reported the same day,
     * not lost in a transmission gap) and it did not begin while another breakdown of the pump stood. The 80 %
     * counts all planted breakdowns judged, so this bound says how far it is within reach on the demo's series.
     */
    @Test
    void noDetectorCanFlagMoreThanTheStopsReadBeforeTheirReport() throws IOException {
        DemoSensorSeries.ReportDelay delay = DemoSensorSeries.ReportDelay.CARETAKER_TO_MECHANIC;
        for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
            List<DemoSensorYear.PumpYear> year = DemoSensorYear.replay(seed, delay);
            int window = StopSettings.DEFAULT.windowDays(), judged = 0, readBefore = 0, sameDay = 0, within = 0;
            for (DemoSensorYear.PumpYear pump : year) {
                List<DemoSensorYear.Planted> marks = pump.planted();
                for (int i = 0; i < marks.size(); i++) {
                    DemoSensorYear.Planted m = marks.get(i);
                    if (m.stop() < window || m.report() >= DAYS) {
                        continue;
                    }
                    judged++;
                    boolean read = false;
                    for (int t = m.stop(); t < m.report(); t++) {
                        read |= !Double.isNaN(pump.hours()[t]);
                    }
                    sameDay += m.report() == m.stop() ? 1 : 0;
                    within += withinAnother(marks, i) ? 1 : 0;
                    readBefore += read && !withinAnother(marks, i) ? 1 : 0;
                }
            }
            double[] figures = statistics(year);
            double bound = (double) readBefore / judged;
            System.out.printf("EVIDENCE %s, seed %d: of %d planted breakdowns judged, %d reported the day they "
                            + "stopped, %d stopped while another of the pump stood, %d (%.1f %%) read on a day before "
                            + "their report: the most any detector could flag first; the service's %.1f %% is %.1f %% "
                            + "of that%n", delay, seed, judged, sameDay, within, readBefore, 100 * bound,
                    100 * figures[2], 100 * figures[2] / bound);
            assertEquals(judged, (int) figures[0], "the same planted breakdowns judged");
            assertTrue(figures[2] <= bound, "no detector flags first a stop with no reading before its report");
            assertTrue(sameDay > 0 && within > 0 && bound < 0.9, "the bound leaves stops out: " + bound);
        }
    }

    /** The same replay judging the days as read, recorded breakdowns included (the rule before RecordedDowntime). */
    @Test
    void leavingOutRecordedBreakdownsFlagsMoreStopsBeforeTheirReport() throws IOException {
        for (long seed : new long[]{DemoSensorReadings.SEED, 15}) {
            DemoSensorSeries.ReportDelay delay = DemoSensorSeries.ReportDelay.CARETAKER_TO_MECHANIC;
            double[] asRead = statistics(DemoSensorYear.replay(seed, delay, false));
            double[] leftOut = statistics(DemoSensorYear.replay(seed, delay, true));
            System.out.printf("EVIDENCE %s, seed %d, recorded breakdowns judged as read: %.1f %% flagged before the "
                            + "report (%.1f %% of those reported 2+ days after the stop), %.2f false alarms per 1,000 "
                            + "pump-months; left out (the service): %.1f %% (%.1f %%), %.2f%n", delay, seed,
                    100 * asRead[2], 100 * asRead[5], asRead[3], 100 * leftOut[2], 100 * leftOut[5], leftOut[3]);
            assertTrue(asRead[0] == leftOut[0] && asRead[0] >= 30, "the same planted breakdowns judged");
            // The reason the service leaves them out; a replay where it flagged fewer stops first would argue against.
            assertTrue(leftOut[2] >= asRead[2], "share flagged before the report: " + asRead[2] + " → " + leftOut[2]);
        }
    }

    @Test
    void aDemoSeriesIsReproducibleAndShowsItsBreakdownAsUseNearNothingUntilTheFix() {
        LocalDate first = LocalDate.of(2025, 12, 1);
        var stops = List.of(new DemoSensorSeries.Stop(LocalDate.of(2026, 3, 10), LocalDate.of(2026, 3, 20)));
        DemoSensorSeries.Series a = DemoSensorSeries.of("OB-00001", 14, 5, first, DAYS, stops);
        DemoSensorSeries.Series b = DemoSensorSeries.of("OB-00001", 14, 5, first, DAYS, stops);
        assertTrue(Arrays.equals(a.hours(), b.hours()) && a.stoppedFrom().equals(b.stoppedFrom()), "same seed, same series");
        LocalDate stopped = a.stoppedFrom().get(0);
        assertTrue(!stopped.isAfter(LocalDate.of(2026, 3, 10)) && !stopped.isBefore(LocalDate.of(2026, 2, 24)));
        for (LocalDate day = stopped; day.isBefore(LocalDate.of(2026, 3, 20)); day = day.plusDays(1)) {
            double h = a.hours()[index(first, day)];
            assertTrue(Double.isNaN(h) || h <= 0.1, day + ": " + h);
        }
        double after = a.hours()[index(first, LocalDate.of(2026, 3, 25))];
        assertTrue(Double.isNaN(after) || after > 0.5, "use comes back after the fix: " + after);
    }

    /**
     * Flags opened, by whether the pump had idle days in its history then (row 0 none, row 1 some): how many opened
     * after 1, 2, 3+ near-nothing days, and how many were false alarms.
     */
    private static int[][] daysToDecide(List<DemoSensorYear.PumpYear> year) {
        int[][] counts = new int[2][4];
        for (DemoSensorYear.PumpYear pump : year) {
            for (DemoSensorYear.Flag flag : pump.flags()) {
                int[] row = counts[flag.idleDaysOnRecord() == 0 ? 0 : 1];
                row[Math.min(3, flag.nearNothingDays()) - 1]++;
                row[3] += flag.covering() < 0 ? 1 : 0;
            }
        }
        return counts;
    }

    /**
     * {planted judged, median delay, share before report, false alarms per 1,000 pump-months, pump-months, share
     * before report of those reported 2+ days after the stop, how many those are, how many judged are stops of their
     * own ({@link #withinAnother}), the share of those flagged before the report}.
     */
    static double[] statistics(List<DemoSensorYear.PumpYear> year) {
        int window = StopSettings.DEFAULT.windowDays();
        List<Integer> delays = new ArrayList<>();
        int planted = 0, beforeReport = 0, falseAlarms = 0, laterReported = 0, laterBeforeReport = 0;
        int ownStops = 0, ownBeforeReport = 0;
        double pumpDays = 0;
        for (DemoSensorYear.PumpYear pump : year) {
            pumpDays += pump.daysJudged();
            List<DemoSensorYear.Planted> marks = pump.planted();
            boolean[] caught = new boolean[marks.size()];
            for (DemoSensorYear.Flag flag : pump.flags()) {
                int t = flag.openDay();
                if (flag.covering() < 0) {
                    falseAlarms++;
                } else if (!caught[flag.covering()]) {
                    caught[flag.covering()] = true;
                    DemoSensorYear.Planted m = marks.get(flag.covering());
                    if (m.stop() >= window && m.report() < DAYS) {
                        delays.add(t - m.stop());
                        beforeReport += t < m.report() ? 1 : 0;
                        laterBeforeReport += t < m.report() && m.report() - m.stop() >= 2 ? 1 : 0;
                        ownBeforeReport += t < m.report() && !withinAnother(marks, flag.covering()) ? 1 : 0;
                    }
                }
            }
            for (int i = 0; i < marks.size(); i++) {
                DemoSensorYear.Planted m = marks.get(i);
                // Judged: its stop has a full baseline before it and its report falls in the year.
                planted += m.stop() >= window && m.report() < DAYS ? 1 : 0;
                ownStops += m.stop() >= window && m.report() < DAYS && !withinAnother(marks, i) ? 1 : 0;
                laterReported += m.stop() >= window && m.report() < DAYS && m.report() - m.stop() >= 2 ? 1 : 0;
            }
        }
        double pumpMonths = pumpDays / 30.4375;
        int[] sorted = delays.stream().mapToInt(Integer::intValue).sorted().toArray();
        double median = sorted.length == 0 ? Double.NaN : sorted.length % 2 == 1 ? sorted[sorted.length / 2]
                : (sorted[sorted.length / 2 - 1] + sorted[sorted.length / 2]) / 2.0;
        return new double[]{planted, median, planted == 0 ? 0 : (double) beforeReport / planted,
                1000 * falseAlarms / pumpMonths, pumpMonths,
                laterReported == 0 ? 0 : (double) laterBeforeReport / laterReported, laterReported, ownStops,
                ownStops == 0 ? 0 : (double) ownBeforeReport / ownStops};
    }

    /**
     * Whether breakdown {@code i}'s stop falls while another of the same pump's breakdowns already stood (from its stop
     * to its fix, the fix day included): the demo's records hold such breakdowns, a second part reported broken while
     * the pump was down, and the generator starts a stop no earlier than the previous fix. The sensor shows no use
     * between the two, so no detector can see the second stop, and the service opens no flag at a pump with a repair
     * open.
     */
    private static boolean withinAnother(List<DemoSensorYear.Planted> marks, int i) {
        DemoSensorYear.Planted m = marks.get(i);
        for (int j = 0; j < marks.size(); j++) {
            DemoSensorYear.Planted other = marks.get(j);
            if (j != i && other.stop() <= m.stop() && m.stop() <= other.fix()) {
                return true;
            }
        }
        return false;
    }

    private static int index(LocalDate first, LocalDate day) {
        return (int) (day.toEpochDay() - first.toEpochDay());
    }
}
