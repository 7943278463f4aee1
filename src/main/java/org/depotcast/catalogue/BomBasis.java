package org.depotcast.catalogue;

/** Whether a bill-of-materials quantity is per pump (one plunger) or per metre of borehole depth (rods, pipes). */
public enum BomBasis {
    PER_PUMP, PER_METRE
}
