package org.depotcast.catalogue;

/** How a part is counted out of stores. Counted units must move in whole numbers; measured ones may not. */
public enum UnitOfIssue {
    EACH(true), PAIR(true), SET(true), LENGTH(true), METRE(false), KILOGRAM(false), LITRE(false);

    private final boolean wholeUnits;

    UnitOfIssue(boolean wholeUnits) {
        this.wholeUnits = wholeUnits;
    }

    public boolean wholeUnits() {
        return wholeUnits;
    }
}
