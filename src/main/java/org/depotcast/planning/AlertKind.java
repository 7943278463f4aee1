package org.depotcast.planning;

/** Why a part at a location needs the stores officer's attention. */
public enum AlertKind {
    /** Inventory position at or below the reorder point: order or transfer now. */
    BELOW_REORDER_POINT,
    /** Stock on hand will run out before a replenishment ordered today could arrive. */
    STOCKOUT_PROJECTED,
    /** Nothing on hand while broken pumps at this depot wait for the part. */
    OUT_WITH_PUMPS_WAITING,
    /** More than a full order beyond the order-up-to level: candidate to send to a depot that is short. */
    EXCESS,
    /** At the current rate of use, some of the stock will pass its shelf life before it is used. */
    SHELF_LIFE_RISK
}
