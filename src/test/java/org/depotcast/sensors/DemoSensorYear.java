package org.depotcast.sensors;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.depotcast.core.sensors.IdleDayPrior;
import org.depotcast.core.sensors.IdleDays;
import org.depotcast.core.sensors.RecordedDowntime;
import org.depotcast.core.sensors.StopDetector;
import org.depotcast.core.sensors.StopSettings;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The demo programme's sensor year (to 2026-11-30) replayed day by day with the detector and the service's flag
 * rules, for the evidence tests. Day t is judged on the readings up to and including day t, less the downtime of
 * the breakdowns reported by day t ({@link RecordedDowntime}), as the service judges it, with the idle-day prior
 * fitted that day over all the sensor pumps judged ({@link IdleDayPrior}), as a day's file of every pump is judged. A flag opens as
 * {@link StopFlagService} opens one (stopped, probability ≥ 0.5, no repair open, the stop not begun on or before the
 * last fix), keeps the highest probability seen while open, and closes when a repair is open or use comes back.
 */
final class DemoSensorYear {
    static final LocalDate LAST_DAY = LocalDate.of(2026, 11, 30);
    static final int DAYS = 365;
    static final LocalDate FIRST = LAST_DAY.minusDays(DAYS - 1L);

    /** A recorded breakdown as days of the year: the stop the series shows, the report and the fix. */
    record Planted(int stop, int report, int fix) {
    }

    /**
     * A flag: opened on {@code openDay}, closed on {@code closeDay} ({@link #DAYS} if still open at the end); the
     * probability held on each day open (index 0 = the open day); {@code covering}: the planted breakdown whose stop
     * covers the open day, or −1 (a false alarm); {@code nearNothingDays} read when it opened and the pump's
     * {@code idleDaysOnRecord} in its idle history then.
     */
    record Flag(int openDay, int closeDay, int stoppedFrom, double[] probability, double baselineHoursPerDay,
                int covering, int nearNothingDays, int idleDaysOnRecord) {
        double probabilityOn(int day) {
            return probability[Math.min(day - openDay, probability.length - 1)];
        }
    }

    /** One sensor pump's year: its planted breakdowns, its flags in order, the days judged, its hours as read. */
    record PumpYear(String assetId, List<Planted> planted, List<Flag> flags, int daysJudged, double[] hours) {
    }

    /** How the chance of an idle day and of a breakdown are judged. */
    enum Rule {
        /**
         * The service's: an idle history of 112 days, idle spells pooled over the programme's sensor pumps each day,
         * the pump's own breakdown rate (here the planted rates stand in for the forecast run's fitted models).
         */
        POOLED(StopSettings.DEFAULT, true, true),
        /** The same with the flat prior of one breakdown a pump-year (the service with no finished forecast run). */
        POOLED_FLAT_PRIOR(StopSettings.DEFAULT, true, false),
        /** The rule of 2 Dec 2026: each pump alone, its 28 baseline days as independent days by Laplace's rule. */
        ALONE_28_DAYS(new StopSettings(28, 14, 3, 0.5, 4.0, 0.10, 10, 1.0 / 365, 28), false, false);

        final StopSettings settings;
        final boolean pooled;
        final boolean ownRate;

        Rule(StopSettings settings, boolean pooled, boolean ownRate) {
            this.settings = settings;
            this.pooled = pooled;
            this.ownRate = ownRate;
        }
    }

    /**
     * A sensor pump's year of hours, its planted breakdowns, its breakdowns per operating hour, its recorded load (hours
     * a day) and the settings its series was drawn from.
     */
    record SensorPump(String assetId, double[] hours, List<Planted> marks, double breakdownsPerHour, double load,
                      DemoSensorSeries.Settings drawn) {
    }

    private DemoSensorYear() {
    }

    static List<PumpYear> replay(long seed, DemoSensorSeries.ReportDelay delay) throws IOException {
        return replay(seed, delay, true, Rule.POOLED);
    }

    static List<PumpYear> replay(long seed, DemoSensorSeries.ReportDelay delay, boolean leaveOutRecorded)
            throws IOException {
        return replay(seed, delay, leaveOutRecorded, Rule.POOLED);
    }

    /**
     * @param leaveOutRecorded false judges the days as read, recorded breakdowns included (the rule before
     *                         {@link RecordedDowntime}), for comparison
     */
    static List<PumpYear> replay(long seed, DemoSensorSeries.ReportDelay delay, boolean leaveOutRecorded, Rule rule)
            throws IOException {
        return replay(seed, delay, leaveOutRecorded, rule, StopCertaintyService.DEFAULT);
    }

    /** @param leastProbability the probability a flag opens at (the service's default, {@link StopCertaintyService#DEFAULT}) */
    static List<PumpYear> replay(long seed, DemoSensorSeries.ReportDelay delay, boolean leaveOutRecorded, Rule rule,
                                 double leastProbability) throws IOException {
        return replay(seed, delay, leaveOutRecorded, rule, leastProbability, null);
    }

    /**
     * The service's rule with each pump's breakdowns per operating hour given by asset id (a forecast's fitted models,
     * as {@link BreakdownHazards} reads them) instead of the planted rates.
     */
    static List<PumpYear> replayWithRates(long seed, DemoSensorSeries.ReportDelay delay,
                                          Map<String, Double> ratesByAsset) throws IOException {
        return replay(seed, delay, true, Rule.POOLED, StopCertaintyService.DEFAULT, ratesByAsset);
    }

    private static List<PumpYear> replay(long seed, DemoSensorSeries.ReportDelay delay, boolean leaveOutRecorded,
                                         Rule rule, double leastProbability, Map<String, Double> ratesByAsset)
            throws IOException {
        List<SensorPump> pumps = pumps(seed, delay, ratesByAsset);
        StopDetector detector = new StopDetector(rule.settings);
        IdleDayPrior[] priors = priors(pumps, detector, rule, leaveOutRecorded);
        List<PumpYear> year = new ArrayList<>();
        for (SensorPump pump : pumps) {
            year.add(judge(pump, detector, rule, priors, leaveOutRecorded, leastProbability));
        }
        return year;
    }

    /** The demo's sensor pumps for a seed and report delay, with the planted rates unless rates are given. */
    static List<SensorPump> pumps(long seed, DemoSensorSeries.ReportDelay delay, Map<String, Double> ratesByAsset)
            throws IOException {
        Map<String, List<DemoSensorSeries.Stop>> stops = breakdowns(FIRST.minusDays(60));
        Map<String, Double> loads = latestLoads();
        List<CSVRecord> planted = csv("planted-rates.csv");
        List<SensorPump> pumps = new ArrayList<>();
        for (CSVRecord pump : csv("pumps.csv")) {
            String asset = pump.get("asset_id");
            if (pump.get("status").equals("DECOMMISSIONED") || !DemoSensorSeries.hasSensor(asset, seed)) {
                continue;
            }
            List<DemoSensorSeries.Stop> own = stops.getOrDefault(asset, List.of());
            double load = loads.getOrDefault(asset, Double.parseDouble(pump.get("usage_hours_per_day")));
            DemoSensorSeries.Series series = DemoSensorSeries.of(asset, seed, load, FIRST, DAYS, own, delay);
            List<Planted> marks = new ArrayList<>();
            for (int i = 0; i < own.size(); i++) {
                DemoSensorSeries.Stop s = own.get(i);
                marks.add(new Planted(index(series.stoppedFrom().get(i)), index(s.reportedOn()),
                        s.fixedOn() == null ? DAYS : index(s.fixedOn())));
            }
            double perHour = ratesByAsset != null ? ratesByAsset.get(asset) : plantedRate(planted,
                    Double.parseDouble(pump.get("depth_m")), LocalDate.parse(pump.get("installed_on")));
            pumps.add(new SensorPump(asset, series.hours(), marks, perHour, load, series.settings()));
        }
        return pumps;
    }

    /** Each day's prior, fitted as the service fits it over every sensor pump judged that day. */
    private static IdleDayPrior[] priors(List<SensorPump> pumps, StopDetector detector, Rule rule,
                                         boolean leaveOutRecorded) {
        IdleDayPrior[] priors = new IdleDayPrior[DAYS];
        Arrays.fill(priors, IdleDayPrior.ALONE);
        if (!rule.pooled) {
            return priors;
        }
        List<List<IdleDays>> histories = new ArrayList<>();
        for (int t = 0; t < DAYS; t++) {
            histories.add(new ArrayList<>());
        }
        for (SensorPump pump : pumps) {
            for (int t = rule.settings.windowDays() - 1; t < DAYS; t++) {
                double[] asRead = Arrays.copyOfRange(pump.hours(), firstDayRead(t, rule), t + 1);
                IdleDays days = detector.idleDays(window(pump.hours(), pump.marks(), t, rule,
                        leaveOutRecorded), asRead);
                if (days != null) {
                    histories.get(t).add(days);
                }
            }
        }
        for (int t = rule.settings.windowDays() - 1; t < DAYS; t++) {
            priors[t] = IdleDayPrior.pooled(histories.get(t));
        }
        return priors;
    }

    /** Day {@code t} and the days before it the rule reads, less the breakdowns reported by day t if asked. */
    private static double[] window(double[] hours, List<Planted> marks, int t, Rule rule, boolean leaveOutRecorded) {
        int first = firstDayRead(t, rule);
        return RecordedDowntime.leaveOut(Arrays.copyOfRange(hours, first, t + 1),
                leaveOutRecorded ? reportedBy(marks, t, first) : List.of(), rule.settings.stopFraction());
    }

    private static int firstDayRead(int t, Rule rule) {
        return Math.max(0, t - rule.settings.historyDays() + 1);
    }

    private static PumpYear judge(SensorPump pump, StopDetector detector, Rule rule, IdleDayPrior[] priors,
                                  boolean leaveOutRecorded, double leastProbability) {
        double[] hours = pump.hours();
        List<Planted> marks = pump.marks();
        double perHour = rule.ownRate ? pump.breakdownsPerHour() : Double.NaN;
        int window = rule.settings.windowDays();
        List<Flag> flags = new ArrayList<>();
        int openDay = -1, stoppedFrom = 0, covering = -1, judged = 0, nearNothing = 0, idleOnRecord = 0;
        double baseline = 0;
        List<Double> probability = new ArrayList<>();
        for (int t = window - 1; t < DAYS; t++) {
            judged++;
            double[] days = window(hours, marks, t, rule, leaveOutRecorded);
            StopDetector.Verdict v = detector.judge(days, priors[t], perHour);
            boolean repairOpen = false;
            for (Planted m : marks) {
                repairOpen |= m.report() <= t && t < m.fix();
            }
            if (openDay >= 0) {
                if (repairOpen || v.state() == StopDetector.State.IN_USE) {
                    flags.add(flag(openDay, t, stoppedFrom, probability, baseline, covering, nearNothing,
                            idleOnRecord));
                    openDay = -1;
                } else {
                    double last = probability.get(probability.size() - 1);
                    probability.add(v.state() == StopDetector.State.STOPPED ? Math.max(last, v.probabilityDown()) : last);
                }
                continue;
            }
            int from = firstDayRead(t, rule) + v.changeIndex();
            if (v.state() != StopDetector.State.STOPPED || v.probabilityDown() < leastProbability
                    || repairOpen || stopBeganByLastFix(marks, t, from)) {
                continue;
            }
            openDay = t;
            stoppedFrom = from;
            baseline = v.baselineMean();
            nearNothing = v.nearNothingDays();
            idleOnRecord = detector.idleDays(days).idle();
            probability = new ArrayList<>(List.of(v.probabilityDown()));
            covering = -1;
            for (int i = 0; i < marks.size(); i++) {
                if (marks.get(i).stop() <= t && t < marks.get(i).fix()) {
                    covering = i;
                }
            }
        }
        if (openDay >= 0) {
            flags.add(flag(openDay, DAYS, stoppedFrom, probability, baseline, covering, nearNothing, idleOnRecord));
        }
        return new PumpYear(pump.assetId(), marks, flags, judged, hours);
    }

    /** The breakdowns reported by day {@code today}, as days of the window starting on day {@code first}. */
    private static List<RecordedDowntime.Breakdown> reportedBy(List<Planted> marks, int today, int first) {
        List<RecordedDowntime.Breakdown> known = new ArrayList<>();
        for (Planted m : marks) {
            if (m.report() <= today) {
                known.add(new RecordedDowntime.Breakdown(m.report() - first, m.fix() - first));
            }
        }
        return known;
    }

    private static Flag flag(int openDay, int closeDay, int stoppedFrom, List<Double> probability, double baseline,
                             int covering, int nearNothing, int idleOnRecord) {
        return new Flag(openDay, closeDay, stoppedFrom, probability.stream().mapToDouble(Double::doubleValue).toArray(),
                baseline, covering, nearNothing, idleOnRecord);
    }

    /** As {@link StopFlagService} rules: a stop that began on or before the last fix is that repair's, not a new one. */
    private static boolean stopBeganByLastFix(List<Planted> marks, int today, int stoppedFrom) {
        for (Planted m : marks) {
            if (m.fix() <= today && m.fix() >= stoppedFrom) {
                return true;
            }
        }
        return false;
    }

    /**
     * The pump's planted breakdowns per operating hour (seed-data/README.md), summed over the families, at its age in
     * the middle of the year: r30/1000 × (depth/30)^d × exp(a × age).
     */
    private static double plantedRate(List<CSVRecord> families, double depthM, LocalDate installedOn) {
        double ageYears = Math.max(0, (FIRST.plusDays(DAYS / 2).toEpochDay() - installedOn.toEpochDay()) / 365.25);
        double perHour = 0;
        for (CSVRecord f : families) {
            perHour += Double.parseDouble(f.get("events_per_1000h_at_30m_new")) / 1000
                    * Math.pow(depthM / 30, Double.parseDouble(f.get("depth_exponent")))
                    * Math.exp(Double.parseDouble(f.get("age_coefficient_per_year")) * ageYears);
        }
        return perHour;
    }

    /** The pump's load as the demo holds it after loading: its newest usage reading. */
    private static Map<String, Double> latestLoads() throws IOException {
        Map<String, Double> loads = new HashMap<>();
        Map<String, LocalDate> newest = new HashMap<>();
        for (CSVRecord r : csv("usage-readings.csv")) {
            LocalDate on = LocalDate.parse(r.get("read_on"));
            if (newest.getOrDefault(r.get("asset_id"), LocalDate.MIN).isBefore(on)) {
                newest.put(r.get("asset_id"), on);
                loads.put(r.get("asset_id"), Double.parseDouble(r.get("hours_per_day")));
            }
        }
        return loads;
    }

    static int index(LocalDate day) {
        return (int) (day.toEpochDay() - FIRST.toEpochDay());
    }

    private static Map<String, List<DemoSensorSeries.Stop>> breakdowns(LocalDate since) throws IOException {
        Map<String, List<DemoSensorSeries.Stop>> stops = new HashMap<>();
        Set<String> seen = new HashSet<>();
        for (CSVRecord r : csv("repairs.csv")) {
            LocalDate reported = LocalDate.parse(r.get("reported_on"));
            if (!r.get("kind").equals("BREAKDOWN") || reported.isBefore(since) || !seen.add(r.get("repair_ref"))) {
                continue;
            }
            String fixed = r.get("fixed_on");
            stops.computeIfAbsent(r.get("asset_id"), k -> new ArrayList<>()).add(new DemoSensorSeries.Stop(reported,
                    fixed.isBlank() ? null : LocalDate.parse(fixed)));
        }
        return stops;
    }

    static List<CSVRecord> csv(String file) throws IOException {
        try (Reader in = Files.newBufferedReader(Path.of("seed-data", file))) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }
}
