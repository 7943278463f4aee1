package org.depotcast.fleet;

/** Where a pump's daily usage figure came from; DEFAULT is the design load of 5 h/day (common practice). */
public enum UsageSource {
    MEASURED, SURVEYED, DEFAULT
}
