package org.depotcast.sensors;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.logging.Log;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AuditService;
import org.depotcast.core.sensors.IdleDayPrior;
import org.depotcast.core.sensors.IdleDays;
import org.depotcast.core.sensors.RecordedDowntime;
import org.depotcast.core.sensors.StopDetector;
import org.depotcast.core.sensors.StopSettings;
import org.depotcast.fleet.RepairFacts;
import org.depotcast.fleet.RepairRecords;
import org.depotcast.fleet.RepairSpan;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Keeps the "probably down" flags in step with the sensors and the repairs: a pump the detector finds stopped
 * ({@link StopDetector}), with a probability of at least the programme's setting ({@link StopCertaintyService}, 0.5
 * unless the lead changed it) and no repair reported since the stop, is flagged. The setting governs opening only: a
 * flag already open when it is raised stays open. A flag closes when a repair is reported (REPAIR_REPORTED) or when
 * use comes back without one (FALSE_ALARM, counted in the report). The detector judges the days read less the downtime of breakdowns already
 * on record ({@link RecordedDowntime}), so an earlier repair's days are not taken for the pump idling. How often a
 * working pump idles is fitted over the pumps judged together ({@link IdleDayPrior}: a day's file of the programme, the
 * stop check); a refresh of fewer than {@value IdleDayPrior#LEAST_PUMPS} pumps (a single pump's file) has too few to
 * pool over and judges each pump alone (independent days by Laplace's rule), which needs more near-nothing days
 * before a flag of a pump that never idles. The hours of the broken days on record (left out of the days judged)
 * and of the idle days teach the prior how each kind of day looks. A pump's prior chance of a breakdown on a day is
 * its own rate from the latest finished forecast run ({@link BreakdownHazards}), else one a pump-year.
 */
@ApplicationScoped
public class StopFlagService {
    @ApplicationScoped
    static class StopFlags implements PanacheRepository<StopFlag> {
        List<StopFlag> open() {
            return list("state", StopFlag.State.OPEN);
        }

        List<StopFlag> ofPumps(Collection<Long> pumpIds) {
            return list("pumpId in ?1 order by flaggedOn desc", pumpIds);
        }

        /** Per pump, the days its flags (of any state) date a stop from, for stops from {@code from} on. */
        Map<Long, Set<LocalDate>> stopsFrom(LocalDate from) {
            Map<Long, Set<LocalDate>> stops = new HashMap<>();
            getEntityManager().createQuery("select f.pumpId, f.stoppedFrom from StopFlag f where f.stoppedFrom >= ?1",
                            Object[].class).setParameter(1, from).getResultStream()
                    .forEach(r -> stops.computeIfAbsent((Long) r[0], k -> new HashSet<>()).add((LocalDate) r[1]));
            return stops;
        }
    }

    private final StopFlags flags;
    private final SensorUsageQuery usage;
    private final RepairRecords repairs;
    private final AuditService audit;
    private final BreakdownHazards hazards;
    private final StopCertaintyService certainty;
    private static final StopSettings SETTINGS = StopSettings.DEFAULT;
    private final StopDetector detector = new StopDetector(SETTINGS);

    StopFlagService(StopFlags flags, SensorUsageQuery usage, RepairRecords repairs, AuditService audit,
                    BreakdownHazards hazards, StopCertaintyService certainty) {
        this.hazards = hazards;
        this.certainty = certainty;
        this.flags = flags;
        this.usage = usage;
        this.repairs = repairs;
        this.audit = audit;
    }

    /** Judges every pump read in the detector's window up to {@code asOf}. */
    @Transactional
    public int refreshAll(LocalDate asOf) {
        return refresh(usage.pumpsReadSince(asOf.minusDays(SETTINGS.windowDays() - 1L)), asOf);
    }

    /** Judges the given pumps as of {@code asOf}; returns the flags open afterwards among them. */
    @Transactional
    public int refresh(Collection<Long> pumpIds, LocalDate asOf) {
        int days = SETTINGS.historyDays();
        LocalDate firstDay = asOf.minusDays(days - 1L);
        Map<Long, double[]> windows = usage.windows(pumpIds, asOf, days);
        Map<Long, RepairFacts> facts = repairs.factsOfAll();
        Map<Long, List<RepairSpan>> breakdowns = repairs.breakdownsBetween(firstDay, asOf);
        Map<Long, StopFlag> open = new HashMap<>();
        flags.open().forEach(f -> open.put(f.pumpId, f));
        // A stop is flagged once: the flags already dating a stop inside the window, read in one query (a query per
        // pump raised flushed the session each time).
        Map<Long, Set<LocalDate>> flaggedStops = flags.stopsFrom(firstDay);
        // Each window is judged less its recorded downtime, in place: a pump with no breakdown in it keeps its own
        // array (a copy of every window judged was most of a day's file's garbage); the days as read are kept for
        // those with one, for the hours of their broken days.
        Map<Long, double[]> asRead = new HashMap<>();
        for (Map.Entry<Long, double[]> pump : windows.entrySet()) {
            List<RepairSpan> spans = breakdowns.get(pump.getKey());
            if (spans != null && !spans.isEmpty()) {
                asRead.put(pump.getKey(), pump.getValue());
                pump.setValue(RecordedDowntime.leaveOut(pump.getValue(), inWindow(spans, firstDay, days),
                        SETTINGS.stopFraction()));
            }
        }
        IdleDayPrior prior = pooledPrior(windows, asRead);
        Map<Long, StopDetector.Verdict> verdicts = verdicts(windows, prior, asOf);
        double least = certainty.leastProbability();
        int opened = 0, stillOpen = 0;
        for (Map.Entry<Long, double[]> pump : windows.entrySet()) {
            StopDetector.Verdict verdict = verdicts.get(pump.getKey());
            RepairFacts repair = facts.getOrDefault(pump.getKey(), RepairFacts.NONE);
            StopFlag flag = open.get(pump.getKey());
            if (flag != null) {
                stillOpen += follow(flag, verdict, repair, asOf) ? 1 : 0;
            } else if (verdict.probabilityDown() >= least && raise(pump.getKey(), verdict, repair, asOf,
                    flaggedStops.getOrDefault(pump.getKey(), Set.of()))) {
                opened++;
                stillOpen++;
            }
        }
        if (opened > 0) {
            Log.infof("sensors: %d pumps newly probably down as of %s (idle spells: %s)", opened, asOf, prior);
        }
        return stillOpen;
    }

    /**
     * Each pump's verdict. Only a stopped pump's probability needs its breakdown rate, so the pumps are judged with the
     * flat prior first and the few found stopped again with their own rate: a day's file of every pump reads the pump
     * records of those few, not of all.
     */
    private Map<Long, StopDetector.Verdict> verdicts(Map<Long, double[]> windows, IdleDayPrior prior, LocalDate asOf) {
        Map<Long, StopDetector.Verdict> verdicts = new HashMap<>();
        List<Long> stopped = new ArrayList<>();
        windows.forEach((pumpId, window) -> {
            StopDetector.Verdict verdict = detector.judge(window, prior);
            verdicts.put(pumpId, verdict);
            if (verdict.state() == StopDetector.State.STOPPED) {
                stopped.add(pumpId);
            }
        });
        hazards.perHour(stopped, asOf).forEach((pumpId, perHour) ->
                verdicts.put(pumpId, detector.judge(windows.get(pumpId), prior, perHour)));
        return verdicts;
    }

    /** The programme's idle-day prior fitted over the pumps judged; judged alone when too few to pool. */
    private IdleDayPrior pooledPrior(Map<Long, double[]> windows, Map<Long, double[]> asRead) {
        List<IdleDays> histories = new ArrayList<>(windows.size());
        for (Map.Entry<Long, double[]> window : windows.entrySet()) {
            IdleDays days = detector.idleDays(window.getValue(), asRead.getOrDefault(window.getKey(),
                    window.getValue()));
            if (days != null) {
                histories.add(days);
            }
        }
        return IdleDayPrior.pooled(histories);
    }

    /** Recorded breakdowns as days of the window from {@code firstDay}; one still open runs past its end. */
    private static List<RecordedDowntime.Breakdown> inWindow(List<RepairSpan> spans, LocalDate firstDay, int days) {
        List<RecordedDowntime.Breakdown> known = new ArrayList<>(spans.size());
        for (RepairSpan span : spans) {
            known.add(new RecordedDowntime.Breakdown((int) ChronoUnit.DAYS.between(firstDay, span.reportedOn()),
                    span.fixedOn() == null ? days : (int) ChronoUnit.DAYS.between(firstDay, span.fixedOn())));
        }
        return known;
    }

    /** Closes a flag on a repair reported since the stop, or on use returning; true while it stays open. */
    private boolean follow(StopFlag flag, StopDetector.Verdict verdict, RepairFacts repair, LocalDate asOf) {
        LocalDate repairReported = repair.openRepairRef() != null ? repair.openSince()
                : repair.lastFixedOn() != null && !repair.lastFixedOn().isBefore(flag.stoppedFrom)
                ? repair.lastFixedOn() : null;
        if (repairReported != null) {
            close(flag, StopFlag.State.REPAIR_REPORTED, repairReported);
            return false;
        }
        if (verdict.state() == StopDetector.State.IN_USE) {
            close(flag, StopFlag.State.FALSE_ALARM, asOf);
            return false;
        }
        if (verdict.state() == StopDetector.State.STOPPED) {
            flag.probability = probability(Math.max(verdict.probabilityDown(), flag.probability.doubleValue()));
        }
        return true;
    }

    /**
     * Opens a flag for a stop not flagged before ({@code flaggedStops}: the pump's flagged stop days); the caller has
     * checked its probability against the programme's setting.
     */
    private boolean raise(long pumpId, StopDetector.Verdict verdict, RepairFacts repair, LocalDate asOf,
                          Set<LocalDate> flaggedStops) {
        if (verdict.state() != StopDetector.State.STOPPED || repair.openRepairRef() != null) {
            return false;
        }
        LocalDate stoppedFrom = asOf.minusDays(SETTINGS.historyDays() - 1L - verdict.changeIndex());
        if ((repair.lastFixedOn() != null && !repair.lastFixedOn().isBefore(stoppedFrom))
                || flaggedStops.contains(stoppedFrom)) {
            return false;
        }
        StopFlag flag = new StopFlag();
        flag.pumpId = pumpId;
        flag.stoppedFrom = stoppedFrom;
        flag.flaggedOn = asOf;
        flag.probability = probability(verdict.probabilityDown());
        flag.baselineHours = BigDecimal.valueOf(verdict.baselineMean()).setScale(2, RoundingMode.HALF_UP);
        flag.state = StopFlag.State.OPEN;
        flags.persist(flag);
        audit.record("PUMP_PROBABLY_DOWN", "sensor_stop_flag", pumpId + "@" + stoppedFrom, null,
                Map.of("probability", flag.probability, "flaggedOn", asOf.toString()));
        return true;
    }

    private void close(StopFlag flag, StopFlag.State state, LocalDate on) {
        flag.state = state;
        flag.closedOn = on;
        audit.record("PUMP_FLAG_CLOSED", "sensor_stop_flag", flag.pumpId + "@" + flag.stoppedFrom,
                Map.of("state", StopFlag.State.OPEN.words), Map.of("state", state.words, "closedOn", on.toString()));
    }

    private static BigDecimal probability(double p) {
        return BigDecimal.valueOf(p).setScale(4, RoundingMode.HALF_UP);
    }

    List<StopFlag> flagsOf(Collection<Long> pumpIds) {
        return pumpIds.isEmpty() ? List.of() : flags.ofPumps(pumpIds);
    }
}
