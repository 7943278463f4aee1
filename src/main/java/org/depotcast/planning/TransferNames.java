package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PartSummary;
import org.depotcast.stock.LocationService;

import java.util.Map;

/**
 * What a transfer's answer and its ledger lines name by the ids the transfer holds: its part (a catalogue record)
 * and its two locations' codes, read once for one transfer or a whole list.
 */
record TransferNames(Map<Long, PartSummary> parts, Map<Long, String> locationCodes) {
    PartSummary part(TransferOrder order) {
        return parts.get(order.partId);
    }

    String partNumber(TransferOrder order) {
        return part(order).partNumber();
    }

    String fromCode(TransferOrder order) {
        return locationCodes.get(order.fromId);
    }

    String toCode(TransferOrder order) {
        return locationCodes.get(order.toId);
    }

    /** Reads the names from the catalogue and stock (two queries). */
    @ApplicationScoped
    static class Reader {
        private final PartService parts;
        private final LocationService locations;

        Reader(PartService parts, LocationService locations) {
            this.parts = parts;
            this.locations = locations;
        }

        TransferNames read() {
            return new TransferNames(parts.summariesById(), locations.codesById());
        }
    }
}
