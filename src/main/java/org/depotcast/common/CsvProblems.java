package org.depotcast.common;

import java.util.ArrayList;
import java.util.List;

/** Every problem found in an upload, by row and column; {@link #throwIfAny()} refuses the whole file. */
public final class CsvProblems {
    private static final int MOST_LISTED = 1000;
    private final List<FieldError> errors = new ArrayList<>();
    private int count;

    /** A problem of one cell, or of the whole row when {@code column} is null. */
    public void add(int line, String column, String message) {
        count++;
        if (errors.size() < MOST_LISTED) {
            errors.add(new FieldError(column == null ? "row " + line : "row " + line + ", column " + column, message));
        }
    }

    public boolean isEmpty() {
        return count == 0;
    }

    public void throwIfAny() {
        if (count == 0) {
            return;
        }
        List<FieldError> listed = new ArrayList<>(errors);
        if (count > errors.size()) {
            listed.add(new FieldError("file", (count - errors.size()) + " further problems not listed"));
        }
        throw new InvalidInputException(listed);
    }
}
