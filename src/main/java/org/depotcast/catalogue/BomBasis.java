package org.depotcast.catalogue;

/** Whether a bill-of-materials quantity is per pump (one plunger) or per metre of borehole depth (rods, pipes). */
public enum BomBasis {
    PER_PUMP, PER_METRE;

    /** Units of a line's quantity in one pump at this depth: per-metre lines round up to whole lengths. */
    double unitsAt(java.math.BigDecimal quantity, double depthM) {
        double q = quantity.doubleValue();
        return this == PER_PUMP ? q : Math.ceil(q * depthM - 1e-9);
    }
}
