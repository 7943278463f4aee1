package org.depotcast.planning;

/** Why a part at a location needs the stores officer's attention, most pressing first. */
public enum AlertKind {
    /** Nothing on hand while broken pumps at this depot wait for the part. */
    OUT_WITH_PUMPS_WAITING,
    /** Inventory position at or below the reorder point: order or transfer now. */
    BELOW_REORDER_POINT,
    /** Stock on hand will run out before a replenishment ordered today could arrive. */
    STOCKOUT_PROJECTED,
    /** A kit below its min only for planned preventive services: planned work, not a shortage. */
    PLANNED_WORK_SHORT,
    /** At the current rate of use, some of the stock will pass its shelf life before it is used. */
    SHELF_LIFE_RISK,
    /** More than a full order beyond the order-up-to level: candidate to send to a depot that is short. */
    EXCESS,
    /** Stock is held but the latest forecast run has no forecast of the part here: its demand is unknown. */
    NO_FORECAST
}
