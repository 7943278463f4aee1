package org.depotcast.common;

/** Answer to an accepted CSV import: how many rows were written. */
public record ImportResult(int rowsImported) {
}
