package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.common.BusinessRuleException;
import org.depotcast.common.ConflictException;
import org.depotcast.common.CsvOut;
import org.depotcast.common.CsvRow;
import org.depotcast.common.CsvTable;
import org.depotcast.common.EntityMissingException;
import org.depotcast.common.InvalidInputException;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Stock locations: the central store, district depots and mechanics' kits. */
@ApplicationScoped
public class LocationService {
    static final List<String> CSV_COLUMNS = List.of("code", "name", "kind", "parent_code", "latitude", "longitude",
            "mechanic_username");

    private final LocationRepository locations;
    private final org.depotcast.access.AuditService audit;

    LocationService(LocationRepository locations, org.depotcast.access.AuditService audit) {
        this.locations = locations;
        this.audit = audit;
    }

    public List<Location> all() {
        return locations.allByCode();
    }

    public List<Location> ofKind(LocationKind kind) {
        return locations.ofKind(kind);
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

    public Optional<Location> kitOf(String mechanicUsername) {
        return locations.kitOf(mechanicUsername);
    }

    @Transactional
    public Location create(LocationRequest request) {
        if (locations.byCode(request.code()).isPresent()) {
            throw new ConflictException("code", "location '" + request.code() + "' already exists");
        }
        Location parent = request.parentCode() == null ? null : require("parentCode", request.parentCode());
        String problem = hierarchyProblem(request.kind(), parent == null ? null : parent.kind, request.mechanicUsername());
        if (problem != null) {
            throw new BusinessRuleException("parentCode", problem);
        }
        Location location = new Location();
        apply(location, request, parent);
        locations.persist(location);
        return location;
    }

    /** Rows may name a parent defined earlier in the same file. All or nothing; existing codes are updated. */
    @Transactional
    public int importCsv(String csv) {
        CsvTable table = CsvTable.parse(csv, CSV_COLUMNS.subList(0, 4));
        Map<String, LocationKind> kindsInFile = new HashMap<>();
        List<LocationRequest> requests = new ArrayList<>();
        for (CsvRow row : table.rows()) {
            String code = row.text("code");
            LocationKind kind = row.choice("kind", LocationKind.class);
            String parentCode = row.optionalText("parent_code");
            LocationKind parentKind = parentCode == null ? null : kindsInFile.getOrDefault(parentCode,
                    locations.byCode(parentCode).map(l -> l.kind).orElse(null));
            if (parentCode != null && parentKind == null) {
                row.reject("parent_code", "location '" + parentCode + "' is neither in the file above this row nor stored");
            }
            String mechanic = row.optionalText("mechanic_username");
            if (kind != null && (parentCode == null || parentKind != null)) {
                String problem = hierarchyProblem(kind, parentKind, mechanic);
                if (problem != null) {
                    row.reject("kind", problem);
                }
            }
            if (code != null && kindsInFile.put(code, kind) != null) {
                row.reject("code", "appears twice in the file");
            }
            requests.add(new LocationRequest(code, row.text("name"), kind, parentCode,
                    row.optionalDecimal("latitude", BigDecimal.valueOf(-90), false),
                    row.optionalDecimal("longitude", BigDecimal.valueOf(-180), false), mechanic));
        }
        table.problems().throwIfAny();
        for (LocationRequest request : requests) {
            Location location = locations.byCode(request.code()).orElseGet(Location::new);
            Location parent = request.parentCode() == null ? null : locations.byCode(request.parentCode()).orElseThrow();
            apply(location, request, parent);
            if (location.id == null) {
                locations.persist(location);
                locations.flush();
            }
        }
        return requests.size();
    }

    public String exportCsv() {
        return CsvOut.write(CSV_COLUMNS, all(), l -> java.util.Arrays.asList(l.code, l.name, l.kind,
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
