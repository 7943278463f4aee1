package org.depotcast.core.forecast;

/**
 * Demand pattern classes of Syntetos, Boylan &amp; Croston (2005), "On the categorization of demand patterns",
 * JORS 56(5):495–503, with the published cut-offs ADI 1.32 and CV² 0.49.
 */
public enum DemandClass {
    SMOOTH, ERRATIC, INTERMITTENT, LUMPY,
    /** Fewer than two periods with demand: no interval or size variation can be estimated. */
    TOO_LITTLE_HISTORY;

    public static final double ADI_CUT_OFF = 1.32;
    public static final double CV2_CUT_OFF = 0.49;

    static DemandClass of(double adi, double cv2) {
        boolean frequent = adi <= ADI_CUT_OFF;
        boolean steady = cv2 <= CV2_CUT_OFF;
        if (frequent) {
            return steady ? SMOOTH : ERRATIC;
        }
        return steady ? INTERMITTENT : LUMPY;
    }
}
