package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;

import java.io.InputStream;
import java.math.BigDecimal;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

/** Stock locations: the central store, district depots and mechanics' kits. */
@ApplicationScoped
public class LocationService {
    static final List<String> CSV_COLUMNS = List.of("code", "name", "kind", "parent_code", "latitude", "longitude",
            "mechanic_username");

    private final LocationRepository locations;
    private final org.depotcast.access.AuditService audit;
    private final CsvImporter importer;

    LocationService(LocationRepository locations, org.depotcast.access.AuditService audit, CsvImporter importer) {
        this.importer = importer;
        this.locations = locations;
        this.audit = audit;
    }

    public List<Location> all() {
        return locations.allByCode();
    }

    public List<Location> ofKind(LocationKind kind) {
        return locations.ofKind(kind);
    }

    /** The locations of a kind as records, in the same order as {@link #ofKind}. */
    @Transactional
    public List<LocationSummary> summariesOfKind(LocationKind kind) {
        return locations.ofKind(kind).stream().map(LocationSummary::from).toList();
    }

    /** Every location as a record, in code order. */
    @Transactional
    public List<LocationSummary> summaries() {
        return locations.allByCode().stream().map(LocationSummary::from).toList();
    }

    /** Every location as a record, keyed by id. */
    @Transactional
    public Map<Long, LocationSummary> summariesById() {
        Map<Long, LocationSummary> byId = new java.util.HashMap<>();
        locations.allByCode().forEach(location -> byId.put(location.id, LocationSummary.from(location)));
        return byId;
    }

    /** Every location's code keyed by its id (one light query: no entities, no parents). */
    @Transactional
    public Map<Long, String> codesById() {
        return locations.codesById();
    }

    /** The location with this code as a record; a 422 naming {@code field} when there is none. */
    @Transactional
    public LocationSummary requireSummary(String field, String code) {
        return LocationSummary.from(require(field, code));
    }

    public Optional<Location> find(String code) {
        return locations.byCode(code);
    }

    public Location require(String field, String code) {
        return locations.byCode(code).orElseThrow(() -> new EntityMissingException(field, "location", code));
    }

    public Location byId(long id) {
        return locations.findById(id);
    }

    /** The kit the mechanic carries, as a record. */
    @Transactional
    public Optional<LocationSummary> kitSummaryOf(String mechanicUsername) {
        return locations.kitOf(mechanicUsername).map(LocationSummary::from);
    }

    public Optional<Location> kitOf(String mechanicUsername) {
        return locations.kitOf(mechanicUsername);
    }

    @Transactional
    public Location create(LocationRequest request) {
        if (locations.byCode(request.code()).isPresent()) {
            throw new ConflictException("code", "location '" + request.code() + "' already exists");
        }
        return save(request);
    }

    /** Creates a location or replaces a stored one's fields; the hierarchy rules hold either way. */
    private Location save(LocationRequest request) {
        Location parent = request.parentCode() == null ? null : require("parentCode", request.parentCode());
        String problem = hierarchyProblem(request.kind(), parent == null ? null : parent.kind, request.mechanicUsername());
        if (problem != null) {
            throw new BusinessRuleException("parentCode", problem);
        }
        Location location = locations.byCode(request.code()).orElseGet(Location::new);
        apply(location, request, parent);
        if (location.id == null) {
            locations.persist(location);
            locations.flush();
        }
        return location;
    }

    /** Rows may name a parent defined earlier in the same file. All or nothing; existing codes are updated. */
    @Transactional
    public int importCsv(InputStream csv) {
        Set<String> seen = new HashSet<>();
        return importer.run(csv, CsvImport.of(CSV_COLUMNS.subList(0, 4), row -> read(row, seen))
                .identifiers("code", "parent_code", "mechanic_username")
                .applyEach(this::save));
    }

    private static LocationRequest read(CsvRow row, Set<String> seen) {
        String code = row.text("code");
        if (code != null && !seen.add(code)) {
            row.reject("code", "appears twice in the file");
        }
        return new LocationRequest(code, row.text("name"), row.choice("kind", LocationKind.class),
                row.optionalText("parent_code"), row.optionalDecimal("latitude"), row.optionalDecimal("longitude"),
                row.optionalText("mechanic_username"));
    }

    public CsvExport exportCsv() {
        return CsvExport.of("locations.csv", CSV_COLUMNS, all(), l -> java.util.Arrays.asList(l.code, l.name, l.kind,
                l.parent == null ? "" : l.parent.code, plain(l.latitude), plain(l.longitude),
                l.mechanicUsername == null ? "" : l.mechanicUsername));
    }

    /** Central store has no parent; a depot hangs under the central store; a kit under a depot, held by a mechanic. */
    static String hierarchyProblem(LocationKind kind, LocationKind parentKind, String mechanic) {
        return switch (kind) {
            case CENTRAL_STORE -> parentKind == null ? null : "a central store has no parent";
            case DEPOT -> parentKind == LocationKind.CENTRAL_STORE ? null : "a depot's parent must be the central store";
            case KIT -> parentKind != LocationKind.DEPOT ? "a kit's parent must be a depot"
                    : mechanic == null ? "a kit must name the mechanic who carries it" : null;
            case IN_TRANSIT -> "the in-transit location is the system's own; it cannot be created";
        };
    }

    private void apply(Location location, LocationRequest r, Location parent) {
        audit.record(location.id == null ? "LOCATION_CREATED" : "LOCATION_UPDATED", "location", r.code(),
                location.id == null ? null : LocationResponse.from(location), r);
        if (r.kind() != LocationKind.KIT && r.mechanicUsername() != null) {
            throw new InvalidInputException("mechanicUsername", "only a kit is carried by a mechanic");
        }
        location.code = r.code();
        location.name = r.name();
        location.kind = r.kind();
        location.parent = parent;
        location.latitude = r.latitude();
        location.longitude = r.longitude();
        location.mechanicUsername = r.mechanicUsername();
    }

    private static String plain(BigDecimal value) {
        return value == null ? "" : value.toPlainString();
    }
}
