package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.CsvExport;
import org.depotcast.common.CsvImport;
import org.depotcast.common.CsvImporter;
import org.depotcast.common.CsvRow;
import org.depotcast.common.InvalidInputException;
import org.depotcast.common.Quantities;

import java.io.InputStream;
import java.math.BigDecimal;
import java.time.Clock;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

/**
 * Opening stock and stock counts from a CSV of counted quantities. Each counted line posts a count adjustment for the
 * difference from the books, so the ledger stays the single truth and re-importing the same count changes nothing.
 */
@ApplicationScoped
public class StockCountService {
    static final List<String> CSV_COLUMNS = List.of("location_code", "part_number", "quantity", "counted_on");
    private static final List<String> SHEET_COLUMNS = List.of("location_code", "part_number", "quantity", "counted_on",
            "description");

    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final StockQueryService queries;
    private final AccessScope scope;
    private final StockedParts stocked;
    private final CsvImporter importer;
    private final Clock clock;

    StockCountService(PartService parts, LocationService locations, StockLedgerService ledger, StockQueryService queries,
                      AccessScope scope, StockedParts stocked, CsvImporter importer, Clock clock) {
        this.scope = scope;
        this.parts = parts;
        this.locations = locations;
        this.ledger = ledger;
        this.queries = queries;
        this.stocked = stocked;
        this.importer = importer;
        this.clock = clock;
    }

    /** Books one counted line: a count adjustment for the difference from the books, none when they agree. */
    @Transactional
    public void count(StockCountLine line) {
        Location location = locations.require("locationCode", line.locationCode());
        scope.require(location.id, location.code);
        PartSummary part = parts.requireSummary("partNumber", line.partNumber());
        if (part.unitOfIssue().wholeUnits() && !Quantities.isWhole(line.quantity())) {
            throw new InvalidInputException("quantity", "must be a whole number for part '" + part.partNumber() + "'");
        }
        BigDecimal difference = line.quantity().subtract(queries.onHand(part.partNumber(), location.code));
        if (difference.signum() == 0) {
            return;
        }
        boolean found = difference.signum() > 0;
        ledger.postWithin(new MovementCommand(MovementKind.COUNT_ADJUSTMENT, part.partNumber(),
                found ? null : location.code, found ? location.code : null, difference.abs(),
                line.countedOn() == null ? null : line.countedOn().atStartOfDay().atOffset(ZoneOffset.UTC),
                "stock count", "count import", null, null, null));
    }

    @Transactional
    public int importCsv(InputStream csv) {
        Set<String> seen = new HashSet<>();
        return importer.run(csv, CsvImport.of(CSV_COLUMNS.subList(0, 3), row -> read(row, seen))
                .identifiers("location_code", "part_number")
                .applyEach(this::count));
    }

    private static StockCountLine read(CsvRow row, Set<String> seen) {
        String locationCode = row.text("location_code");
        String partNumber = row.text("part_number");
        if (locationCode != null && partNumber != null && !seen.add(locationCode + "\u0000" + partNumber)) {
            row.reject("part_number", "counted twice at '" + locationCode + "'");
        }
        return new StockCountLine(locationCode, partNumber, row.decimal("quantity"), row.optionalDate("counted_on"));
    }

    /**
     * A count sheet: every part held at the location (or every location in scope), zero balances included, and every
     * part it stocks by policy though none is held, with the books' quantity to be corrected by the counter.
     */
    @Transactional
    public CsvExport exportCsv(String locationCode) {
        String today = LocalDate.now(clock).toString();
        Map<String, List<?>> rows = new TreeMap<>();
        Map<String, String> descriptions = new java.util.HashMap<>();
        parts.summaries().forEach(p -> descriptions.put(p.partNumber(), p.description()));
        for (BalanceView b : queries.balances(locationCode)) {
            rows.put(b.locationCode() + "\u0000" + b.partNumber(), List.of(b.locationCode(), b.partNumber(),
                    b.onHand().stripTrailingZeros().toPlainString(), today, b.description()));
        }
        List<Location> sheetLocations = new ArrayList<>();
        if (locationCode != null) {
            sheetLocations.add(locations.require("location", locationCode));
        } else {
            AccessScope.Scope visible = scope.current();
            locations.all().stream().filter(l -> visible.sees(l.id)).forEach(sheetLocations::add);
        }
        for (Location location : sheetLocations) {
            for (String partNumber : stocked.stockedAt(LocationSummary.from(location))) {
                rows.putIfAbsent(location.code + "\u0000" + partNumber, List.of(location.code, partNumber, "0", today,
                        descriptions.getOrDefault(partNumber, "")));
            }
        }
        String name = locationCode == null ? "stock-count.csv" : "stock-count-" + locationCode + ".csv";
        return new CsvExport(name, SHEET_COLUMNS, new ArrayList<>(rows.values()));
    }
}
