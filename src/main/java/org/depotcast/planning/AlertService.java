package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.access.AuditService;
import org.depotcast.access.CurrentUser;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.repairs.PartsWaitService;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.time.Clock;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reorder alerts: one per part and location, recomputed from stock, forecasts and waiting pumps each time, and the
 * officers' acknowledgements and snoozes that quieten them. Reads stock only; planning never changes it.
 */
@ApplicationScoped
public class AlertService {
    private final PlanningService planning;
    private final PartService parts;
    private final LocationService locations;
    private final PartsWaitService partsWaits;
    private final AlertActionRepository actions;
    private final CurrentUser currentUser;
    private final PlanningSettings settings;
    private final AccessScope scope;
    private final AuditService audit;
    private final Clock clock;

    AlertService(PlanningService planning, PartService parts, LocationService locations, PartsWaitService partsWaits,
                 AlertActionRepository actions, CurrentUser currentUser, PlanningSettings settings, AccessScope scope,
                 AuditService audit, Clock clock) {
        this.planning = planning;
        this.parts = parts;
        this.locations = locations;
        this.partsWaits = partsWaits;
        this.actions = actions;
        this.currentUser = currentUser;
        this.settings = settings;
        this.scope = scope;
        this.audit = audit;
        this.clock = clock;
    }

    /**
     * One alert per part and location (the named one, or every depot and the central store the caller sees, and a
     * mechanic's own kit), each with every reason that applies, worst expected pump-days without water first.
     * 409 before the first forecast run.
     */
    @Transactional
    public List<ReorderAlert> alerts(String locationCode, AlertKind onlyKind, boolean includeSnoozed) {
        planning.requireForecasts();
        LocalDate today = LocalDate.now(clock);
        Map<String, AlertAction> latest = latestActions(locationCode);
        Map<String, List<ReorderAlert.WaitingPump>> waiting = waitingPumps(today);
        List<ReorderAlert> alerts = new ArrayList<>();
        for (LocationSummary location : alertLocations(locationCode)) {
            for (ReorderAlert raised : raiseAt(location, waiting)) {
                ReorderAlert alert = AlertActionFold.apply(raised,
                        latest.get(raised.partNumber() + "|" + location.code()), today, reviewDays(location));
                if ((onlyKind == null || alert.has(onlyKind)) && (includeSnoozed || alert.snoozedUntil() == null)) {
                    alerts.add(alert);
                }
            }
        }
        alerts.sort(Comparator.comparingDouble(ReorderAlert::pumpDaysAtRisk).reversed()
                .thenComparing(ReorderAlert::locationCode).thenComparing(ReorderAlert::partNumber));
        return alerts;
    }

    private List<LocationSummary> alertLocations(String locationCode) {
        if (locationCode != null) {
            LocationSummary location = locations.requireSummary("location", locationCode);
            scope.require(location.id(), location.code());
            return List.of(location);
        }
        var visible = scope.current();
        List<LocationSummary> where = new ArrayList<>();
        locations.summariesOfKind(LocationKind.CENTRAL_STORE).stream().filter(l -> visible.sees(l.id()))
                .forEach(where::add);
        locations.summariesOfKind(LocationKind.DEPOT).stream().filter(l -> visible.sees(l.id())).forEach(where::add);
        if (visible.mechanic() != null) {
            locations.kitSummaryOf(visible.mechanic()).ifPresent(where::add);
        }
        return where;
    }

    /** The alerts raised at one location; a kit's are ranked by breakdown risk alone. */
    private List<ReorderAlert> raiseAt(LocationSummary location, Map<String, List<ReorderAlert.WaitingPump>> waiting) {
        Map<String, StockPolicy> breakdowns = new HashMap<>();
        if (location.kind() == LocationKind.KIT) {
            planning.policiesAt(location, true).forEach(p -> breakdowns.put(p.partNumber(), p));
        }
        List<ReorderAlert> raised = new ArrayList<>();
        for (StockPolicy p : planning.policiesAt(location, false)) {
            ReorderAlert alert = AlertRules.raise(p,
                    waiting.getOrDefault(location.code() + "|" + p.partNumber(), List.of()), breakdowns.get(p.partNumber()));
            if (alert != null) {
                raised.add(alert);
            }
        }
        return raised;
    }

    /** Broken pumps waiting for parts today, keyed "depotCode|partNumber", longest wait first. */
    private Map<String, List<ReorderAlert.WaitingPump>> waitingPumps(LocalDate today) {
        Map<String, List<ReorderAlert.WaitingPump>> waiting = new HashMap<>();
        for (PartsWaitService.PumpWait w : partsWaits.waitingNow(today)) {
            waiting.computeIfAbsent(w.depotCode() + "|" + w.partNumber(), k -> new ArrayList<>())
                    .add(new ReorderAlert.WaitingPump(w.assetId(), w.daysWaiting(), w.repairRef()));
        }
        return waiting;
    }

    /** The latest action per "partNumber|locationCode". */
    private Map<String, AlertAction> latestActions(String locationCode) {
        Map<Long, String> partNumbers = new HashMap<>();
        parts.summaries().forEach(p -> partNumbers.put(p.id(), p.partNumber()));
        Map<String, AlertAction> latest = new HashMap<>();
        for (AlertAction a : actions.at(locationCode)) {
            latest.put(partNumbers.get(a.partId) + "|" + a.locationCode, a);
        }
        return latest;
    }

    /** An acknowledgement holds until the location's next review. */
    private int reviewDays(LocationSummary location) {
        return location.kind() == LocationKind.CENTRAL_STORE ? settings.centralReviewDays() : settings.depotReviewDays();
    }

    /** One recorded acknowledgement or snooze; 404 when there is none, 403 when its location is out of scope. */
    @Transactional
    public AlertAction action(long id) {
        AlertAction action = actions.findByIdOptional(id)
                .orElseThrow(() -> new EntityMissingException(null, "alert action", id));
        LocationSummary location = locations.requireSummary(null, action.locationCode);
        scope.require(location.id(), location.code());
        return action;
    }

    /**
     * Acknowledges or snoozes the alert of a part at a location: the action covers every reason the alert has now
     * (see {@link AlertActionFold}). 404 when the part has no alert there (or, with {@code kind}, no such reason).
     */
    @Transactional
    public AlertAction act(String partNumber, String locationCode, AlertKind kind, AlertAction.Action action,
                           LocalDate snoozeUntil, String note) {
        planning.requireForecasts();
        PartSummary part = parts.requireSummary("partNumber", partNumber);
        LocationSummary location = locations.requireSummary("location", locationCode);
        scope.require(location.id(), location.code());
        if (action == AlertAction.Action.SNOOZE && (snoozeUntil == null || !snoozeUntil.isAfter(LocalDate.now(clock)))) {
            throw new BusinessRuleException("snoozeUntil", "a snooze needs a date after today");
        }
        ReorderAlert alert = raiseAt(location, waitingPumps(LocalDate.now(clock))).stream()
                .filter(a -> a.partNumber().equals(part.partNumber())).findFirst()
                .filter(a -> kind == null || a.has(kind))
                .orElseThrow(() -> new EntityMissingException(null, "alert", part.partNumber() + " at " + locationCode
                        + (kind == null ? "" : " (" + kind + ")")));
        AlertAction record = new AlertAction();
        record.partId = part.id();
        record.locationCode = locationCode;
        record.alertKind = alert.kind();
        record.reasons = AlertActionFold.join(alert.reasons());
        record.action = action;
        record.snoozedUntil = action == AlertAction.Action.SNOOZE ? snoozeUntil : null;
        record.note = note;
        record.actor = currentUser.name();
        record.actedAt = OffsetDateTime.now(clock);
        actions.persist(record);
        audit.record("ALERT_" + action.name(), "alert", partNumber + "@" + locationCode, null,
                java.util.Map.of("reasons", record.reasons, "snoozedUntil", String.valueOf(record.snoozedUntil),
                        "note", String.valueOf(note)));
        return record;
    }
}
