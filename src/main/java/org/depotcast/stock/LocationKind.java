package org.depotcast.stock;

/** Levels of the stock hierarchy: the central store supplies depots, a depot supplies its mechanics' kits. */
public enum LocationKind {
    CENTRAL_STORE, DEPOT, KIT,
    /** The single system location holding stock dispatched between stores and not yet received. */
    IN_TRANSIT
}
