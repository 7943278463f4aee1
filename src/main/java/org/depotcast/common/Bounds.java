package org.depotcast.common;

import java.math.BigDecimal;

/**
 * The documented upper bounds of numeric input, shared by the request records (Bean Validation), query parameters
 * and the CSV imports that map rows to the same records. Each bound is far above any real rural water programme and
 * well inside what the database columns hold, so a number past it is a mistake or an attack, answered 400 naming the
 * field before any work is done. The API document shows each bound beside its field.
 */
public final class Bounds {
    /** Units of a part in one movement, order line, request line, repair line or transfer. */
    public static final String QUANTITY_MAX = "1000000";
    public static final BigDecimal QUANTITY_MAX_VALUE = new BigDecimal(QUANTITY_MAX);
    /** Whole digits of a quantity (QUANTITY_MAX has 7) and decimals kept by the ledger. */
    public static final int QUANTITY_DIGITS = 7;
    public static final int QUANTITY_DECIMALS = Quantities.SCALE;
    /** Units of a part on one bill-of-materials line or in one service kit. */
    public static final String BOM_QUANTITY_MAX = "1000";
    /** What the ledger's balance column holds (numeric(14, 3)); a balance growing past it is refused (422). */
    public static final BigDecimal BALANCE_CAPACITY = new BigDecimal("99999999999.999");
    /** Money per unit or per line, in the part's currency. */
    public static final String UNIT_COST_MAX = "100000000";
    /** A purchase-plan budget, in the catalogue currency. */
    public static final String BUDGET_MAX = "1000000000000";
    /** Units in a pack, or the least a supplier sells. */
    public static final int PACK_SIZE_MAX = 100_000;
    /** Days: supplier lead times, shelf lives. */
    public static final int LEAD_TIME_DAYS_MAX = 3_650;
    public static final int SHELF_LIFE_DAYS_MAX = 36_500;
    /** Operating hours between preventive services of a pump model. */
    public static final int SERVICE_INTERVAL_HOURS_MAX = 100_000;
    /** Lines in one order, request or repair; rows in one rate fit; values in one what-if series. */
    public static final int LINES_MAX = 500;
    public static final int RATE_FIT_ROWS_MAX = 100_000;
    public static final int SERIES_PERIODS_MAX = 1_200;
    /** Demand in one period of a what-if series, and a rate fit's counts and exposure. */
    public static final String SERIES_VALUE_MAX = "1000000";
    public static final String EXPOSURE_MAX = "1000000000000";
    /** Absolute value of a rate-fit covariate. */
    public static final String COVARIATE_ABS_MAX = "1000000";
    /** Stateless reorder-point arithmetic: mean and variance of demand over the protection period, order quantity. */
    public static final String LEAD_TIME_DEMAND_MEAN_MAX = "1000000";
    public static final String LEAD_TIME_DEMAND_VARIANCE_MAX = "1000000000000";
    public static final String ORDER_QUANTITY_MAX = "1000000";
    /** Exchange rate from the catalogue currency to a projection currency. */
    public static final String EXCHANGE_RATE_MAX = "1000000";
    /**
     * A cycle service level typed by a person (settings, spend scenarios), as a fraction: below a half the reorder
     * point falls under the mean demand, and the bounds refuse a mix-up of scales (0.2 meant as 20 %, 95 as 95 %).
     */
    public static final String SERVICE_LEVEL_MIN = "0.5";
    public static final String SERVICE_LEVEL_MAX = "0.999";
    public static final String SERVICE_LEVEL_RANGE = "must be a fraction from 0.5 to 0.999 (50 % to 99.9 %)";
    /**
     * The API document's words for such a level (the calculators' levels, any probability strictly between 0 and 1,
     * keep {@code ApiDocumentFilter}'s general words).
     */
    public static final String SERVICE_LEVEL_DESCRIPTION = "cycle service level, a fraction from 0.5 to 0.999 "
            + "(50 % to 99.9 %)";

    private Bounds() {
    }
}
