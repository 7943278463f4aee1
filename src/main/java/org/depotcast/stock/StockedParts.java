package org.depotcast.stock;

import java.util.Set;

/**
 * Parts a location is meant to stock by its policy, held or not, so a count sheet lists them with a zero balance.
 * Planning implements it (stock does not depend on planning).
 */
public interface StockedParts {
    Set<String> stockedAt(LocationSummary location);
}
