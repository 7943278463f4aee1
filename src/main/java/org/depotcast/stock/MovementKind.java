package org.depotcast.stock;

/**
 * Every way stock can change, with which ends a movement of that kind must have. The rules here are the ledger's
 * shape; quantities and balances are checked by {@link StockLedgerService}.
 */
public enum MovementKind {
    /** From a supplier into any store, against a purchase-order line. */
    RECEIPT,
    /** Between the central store and depots, or depot to depot, directly or through the in-transit location. */
    TRANSFER,
    /** From a depot into one of its mechanics' kits. */
    ISSUE_TO_KIT,
    /** Used up at a repair, from the mechanic's kit. */
    CONSUMPTION,
    /** Unused parts back from a kit to its depot. */
    RETURN,
    /** A stock count that found more (to) or less (from) than the books; exactly one end. */
    COUNT_ADJUSTMENT,
    /** Damaged, expired or lost stock taken off the books. */
    WRITE_OFF;

    /** Null when the ends fit this kind, else what is wrong. {@code from}/{@code to} are null for "outside". */
    public String endsProblem(LocationKind from, LocationKind to, boolean sameLocation) {
        if (from != null && to != null && sameLocation) {
            return "from and to must be different locations";
        }
        if ((from == LocationKind.IN_TRANSIT || to == LocationKind.IN_TRANSIT) && this != TRANSFER) {
            return "only transfers pass through the in-transit location";
        }
        return switch (this) {
            case RECEIPT -> from == null && to != null ? null : "a receipt has a 'to' location and no 'from'";
            case TRANSFER -> from != null && to != null && from != LocationKind.KIT && to != LocationKind.KIT ? null
                    : "a transfer moves stock between the central store and depots (kits use issue and return)";
            case ISSUE_TO_KIT -> from == LocationKind.DEPOT && to == LocationKind.KIT ? null
                    : "an issue to a kit goes from a depot to a kit";
            case CONSUMPTION -> from == LocationKind.KIT && to == null ? null
                    : "a consumption comes from a mechanic's kit and has no 'to'";
            case RETURN -> from == LocationKind.KIT && to == LocationKind.DEPOT ? null
                    : "a return goes from a kit back to a depot";
            case COUNT_ADJUSTMENT -> (from == null) != (to == null) ? null
                    : "a count adjustment has exactly one of 'from' (stock found short) or 'to' (stock found over)";
            case WRITE_OFF -> from != null && to == null ? null : "a write-off has a 'from' location and no 'to'";
        };
    }
}
