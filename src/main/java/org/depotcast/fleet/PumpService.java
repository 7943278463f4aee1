package org.depotcast.fleet;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.EntityMissingException;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.LocationSummary;

import java.time.Clock;
import java.time.LocalDate;
import java.util.List;
import java.util.Optional;

/** The register of installed pumps and their usage readings. */
@ApplicationScoped
public class PumpService {
    private final PumpRepository pumps;
    private final PumpModelService models;
    private final LocationService locations;
    private final AccessScope scope;
    private final org.depotcast.access.AuditService audit;
    private final RepairRecords repairs;
    private final Clock clock;

    PumpService(PumpRepository pumps, PumpModelService models, LocationService locations, AccessScope scope,
                org.depotcast.access.AuditService audit, RepairRecords repairs, Clock clock) {
        this.audit = audit;
        this.repairs = repairs;
        this.scope = scope;
        this.pumps = pumps;
        this.models = models;
        this.locations = locations;
        this.clock = clock;
    }

    /** Pumps the caller may see: all for leads and admins, their depots' for officers, assigned ones for mechanics. */
    public List<Pump> search(String depotCode, PumpStatus status) {
        Long depotId = null;
        if (depotCode != null) {
            LocationSummary depot = locations.requireSummary("depot", depotCode);
            scope.require(depot.id(), depot.code());
            depotId = depot.id();
        }
        AccessScope.Scope visible = scope.current();
        return pumps.search(depotId, status).stream().filter(p -> visible(visible, p)).toList();
    }

    /** The codes of every pump model and depot by id, read once for the answers about one pump or a list. */
    PumpCodes codes() {
        return new PumpCodes(models.codesById(), locations.codesById());
    }

    /** Pumps as the API shows them, the model and depot codes read once for the whole list. */
    List<PumpResponse> responses(List<Pump> list) {
        PumpCodes codes = codes();
        return list.stream().map(codes::response).toList();
    }

    PumpResponse response(Pump pump) {
        return codes().response(pump);
    }

    public boolean visible(Pump pump) {
        return visible(scope.current(), pump);
    }

    /** The caller's visibility as a filter, resolved once for a whole list. */
    public java.util.function.Predicate<Pump> visibleFilter() {
        AccessScope.Scope current = scope.current();
        return pump -> visible(current, pump);
    }

    private static boolean visible(AccessScope.Scope scope, Pump pump) {
        return scope.everything() || visible(scope, pump.assignedMechanic, pump.depotId);
    }

    /** Whether a pump assigned to this mechanic at this depot is the caller's to see. */
    static boolean visible(AccessScope.Scope scope, String assignedMechanic, long depotId) {
        if (scope.everything()) {
            return true;
        }
        return scope.mechanic() != null ? scope.mechanic().equals(assignedMechanic) : scope.sees(depotId);
    }

    /** The pump, or 404 when unknown, 403 when outside the caller's depots or assignments. */
    public Pump requireVisible(String field, String assetId) {
        Pump pump = require(field, assetId);
        if (!visible(pump)) {
            throw new io.quarkus.security.ForbiddenException("pump '" + assetId + "' is outside your depots or assignments");
        }
        return pump;
    }

    /** Every pump as a plain row, for programme-wide planning runs. */
    public List<PumpPlanningRow> planningRows() {
        return pumps.planningRows();
    }

    /** Every pump as a record, for sensor intake (tens of thousands of pumps, no entities). */
    public List<PumpIntakeRow> intakeRows() {
        return pumps.intakeRows();
    }

    public List<Pump> all() {
        return pumps.search(null, null);
    }

    Pump byId(long id) {
        return pumps.findById(id);
    }

    public Optional<Pump> find(String assetId) {
        return pumps.byAssetId(assetId);
    }

    public Pump require(String field, String assetId) {
        return pumps.byAssetId(assetId).orElseThrow(() -> new EntityMissingException(field, "pump", assetId));
    }

    @Transactional
    public Pump register(PumpRequest request) {
        if (pumps.byAssetId(request.assetId()).isPresent()) {
            throw new ConflictException("assetId", "pump '" + request.assetId() + "' is already registered");
        }
        return save(new Pump(), request, modelId("modelCode", request.modelCode()),
                depot("depotCode", request.depotCode()));
    }

    /** Registers a new pump or replaces every field of a registered one; both of its depots must be the caller's. */
    Pump save(Pump pump, PumpRequest request, long modelId, LocationSummary depot) {
        apply(pump, request, modelId, depot);
        if (pump.id == null) {
            pumps.persist(pump);
        }
        return pump;
    }

    /** Changes only the fields sent (see {@link PumpUpdate}); the pump's depot before and after must be the caller's. */
    @Transactional
    public Pump update(String assetId, PumpUpdate u) {
        Pump pump = requireVisible(null, assetId);
        if (u.assetId() != null && !assetId.equals(u.assetId())) {
            throw new ConflictException("assetId", "the asset id in the body must match the one in the path");
        }
        PumpResponse before = response(pump);
        if (u.modelCode() != null) {
            pump.modelId = modelId("modelCode", u.modelCode());
        }
        if (u.depotCode() != null) {
            LocationSummary depot = depot("depotCode", u.depotCode());
            scope.require(depot.id(), depot.code());
            pump.depotId = depot.id();
        }
        pump.depthM = u.depthM() != null ? u.depthM() : pump.depthM;
        pump.installedOn = u.installedOn() != null ? u.installedOn() : pump.installedOn;
        pump.latitude = u.latitude() != null ? u.latitude() : pump.latitude;
        pump.longitude = u.longitude() != null ? u.longitude() : pump.longitude;
        if (u.assignedMechanic() != null) {
            pump.assignedMechanic = u.assignedMechanic().isBlank() ? null : u.assignedMechanic().strip();
        }
        if (u.status() != null || u.statusSince() != null) {
            PumpStatus status = u.status() != null ? u.status() : pump.status;
            change(pump, status, u.statusSince() != null ? u.statusSince()
                    : status == pump.status ? pump.statusSince : null, u.statusNote());
        }
        if (u.usageHoursPerDay() != null) {
            pump.usageHoursPerDay = u.usageHoursPerDay();
            pump.usageSource = u.usageSource() == null ? UsageSource.SURVEYED : u.usageSource();
        } else if (u.usageSource() != null) {
            pump.usageSource = u.usageSource();
        }
        if (pump.statusSince != null && pump.statusSince.isBefore(pump.installedOn)) {
            throw new BusinessRuleException("statusSince", "is before the pump was installed on " + pump.installedOn);
        }
        audit.record("PUMP_UPDATED", "pump", assetId, before, u);
        return pump;
    }

    /** Sets a status chosen by a person; WORKING is refused while a breakdown repair of the pump is open. */
    void change(Pump pump, PumpStatus status, LocalDate since, String note) {
        if (status == PumpStatus.WORKING && pump.id != null) {
            RepairFacts facts = repairs.factsOf(pump.id);
            if (facts.openRepairRef() != null) {
                throw new BusinessRuleException("status", "repair '" + facts.openRepairRef() + "' of this pump is still "
                        + "open: record its fix date on the repair and the pump becomes WORKING");
            }
        }
        if (status != PumpStatus.WORKING && since == null) {
            throw new BusinessRuleException("statusSince", "a " + status + " pump needs the date it became so");
        }
        pump.setStatus(status, since == null ? LocalDate.now(clock) : since, note);
    }

    /** The id of the pump model with this code; a 422 naming {@code field} when there is none. */
    long modelId(String field, String code) {
        return models.requireSummary(field, code).id();
    }

    LocationSummary depot(String field, String code) {
        LocationSummary location = locations.requireSummary(field, code);
        if (location.kind() != LocationKind.DEPOT) {
            throw new BusinessRuleException(field, "'" + code + "' is a " + location.kind() + ", not a depot");
        }
        return location;
    }

    /**
     * The depot a pump leaves and the depot it goes to must both be the caller's, on every path that places a pump
     * (registration, a JSON update, an import row): reading another depot's pump is refused, so is moving it.
     */
    private void requireMayPlace(Pump pump, LocationSummary depot) {
        if (pump.id != null && !visible(pump)) {
            throw new io.quarkus.security.ForbiddenException("pump '" + pump.assetId + "' is at depot '"
                    + locations.codesById().get(pump.depotId) + "', outside the locations assigned to you");
        }
        scope.require(depot.id(), depot.code());
    }

    private void apply(Pump pump, PumpRequest r, long modelId, LocationSummary depot) {
        requireMayPlace(pump, depot);
        audit.record(pump.id == null ? "PUMP_REGISTERED" : "PUMP_UPDATED", "pump", r.assetId(),
                pump.id == null ? null : response(pump), r);
        pump.assetId = r.assetId();
        pump.modelId = modelId;
        pump.depthM = r.depthM();
        pump.installedOn = r.installedOn();
        pump.latitude = r.latitude();
        pump.longitude = r.longitude();
        pump.depotId = depot.id();
        pump.assignedMechanic = r.assignedMechanic();
        PumpStatus status = r.status() == null ? PumpStatus.WORKING : r.status();
        if (status != PumpStatus.WORKING && r.statusSince() == null) {
            throw new BusinessRuleException("statusSince", "a " + status + " pump needs the date it became so");
        }
        pump.setStatus(status, r.statusSince(), null);
        if (r.usageHoursPerDay() == null) {
            pump.usageHoursPerDay = Pump.DEFAULT_HOURS_PER_DAY;
            pump.usageSource = UsageSource.DEFAULT;
        } else {
            pump.usageHoursPerDay = r.usageHoursPerDay();
            pump.usageSource = r.usageSource() == null ? UsageSource.SURVEYED : r.usageSource();
        }
    }
}
