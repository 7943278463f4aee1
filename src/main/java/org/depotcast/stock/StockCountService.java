package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.Part;
import org.depotcast.catalogue.PartService;
import org.depotcast.common.DatedInFutureException;
import org.depotcast.common.CsvOut;
import org.depotcast.common.DateBounds;
import org.depotcast.common.CsvRow;
import org.depotcast.common.CsvTable;
import org.depotcast.common.Quantities;

import java.math.BigDecimal;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * Opening stock and stock counts from a CSV of counted quantities. Each counted line posts a count adjustment for the
 * difference from the books, so the ledger stays the single truth and re-importing the same count changes nothing.
 */
@ApplicationScoped
public class StockCountService {
    static final List<String> CSV_COLUMNS = List.of("location_code", "part_number", "quantity", "counted_on");

    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final StockQueryService queries;
    private final org.depotcast.access.AccessScope scope;

    StockCountService(PartService parts, LocationService locations, StockLedgerService ledger, StockQueryService queries,
                      org.depotcast.access.AccessScope scope) {
        this.scope = scope;
        this.parts = parts;
        this.locations = locations;
        this.ledger = ledger;
        this.queries = queries;
    }

    private record Count(String locationCode, String partNumber, BigDecimal quantity, OffsetDateTime countedAt) {
    }

    @Transactional
    public int importCsv(String csv) {
        CsvTable table = CsvTable.parse(csv, CSV_COLUMNS.subList(0, 3));
        List<Count> counts = new ArrayList<>();
        Set<String> seen = new HashSet<>();
        Integer futureRow = null;
        for (CsvRow row : table.rows()) {
            String locationCode = row.text("location_code");
            Optional<Location> location = locationCode == null ? Optional.empty() : locations.find(locationCode);
            if (locationCode != null && location.isEmpty()) {
                row.reject("location_code", "location '" + locationCode + "' does not exist");
            } else if (location.isPresent() && !scope.current().sees(location.get().id)) {
                row.reject("location_code", "location '" + locationCode + "' is outside the locations assigned to you");
            }
            String partNumber = row.text("part_number");
            Optional<Part> part = partNumber == null ? Optional.empty() : parts.find(partNumber);
            if (partNumber != null && part.isEmpty()) {
                row.reject("part_number", "part '" + partNumber + "' does not exist");
            }
            BigDecimal quantity = row.decimal("quantity", BigDecimal.ZERO, false);
            if (quantity != null && part.isPresent() && part.get().wholeUnits() && !Quantities.isWhole(quantity)) {
                row.reject("quantity", "must be a whole number for part '" + partNumber + "'");
            }
            if (locationCode != null && partNumber != null && !seen.add(locationCode + "\u0000" + partNumber)) {
                row.reject("part_number", "counted twice at '" + locationCode + "'");
            }
            var countedOn = row.optionalDate("counted_on");
            if (countedOn != null && DateBounds.tooEarly(countedOn)) {
                row.reject("counted_on", DateBounds.earliestMessage());
            } else if (countedOn != null && DateBounds.eventInFuture(countedOn) && futureRow == null) {
                futureRow = row.line();
            }
            counts.add(new Count(locationCode, partNumber, quantity,
                    countedOn == null ? null : countedOn.atStartOfDay().atOffset(ZoneOffset.UTC)));
        }
        table.problems().throwIfAny();
        if (futureRow != null) {
            // Well-formed but not yet possible: refused like a movement dated ahead, nothing written.
            throw new DatedInFutureException("row " + futureRow + ", column counted_on");
        }
        for (Count count : counts) {
            BigDecimal difference = count.quantity().subtract(queries.onHand(count.partNumber(), count.locationCode()));
            if (difference.signum() == 0) {
                continue;
            }
            boolean found = difference.signum() > 0;
            ledger.postWithin(new MovementCommand(MovementKind.COUNT_ADJUSTMENT, count.partNumber(),
                    found ? null : count.locationCode(), found ? count.locationCode() : null, difference.abs(),
                    count.countedAt(), "stock count", "count import", null, null, null));
        }
        return counts.size();
    }

    public String exportCsv(String locationCode) {
        String today = java.time.LocalDate.now(ZoneOffset.UTC).toString();
        return CsvOut.write(CSV_COLUMNS, queries.balances(locationCode), b -> List.of(b.locationCode(), b.partNumber(),
                b.onHand().stripTrailingZeros().toPlainString(), today));
    }
}
