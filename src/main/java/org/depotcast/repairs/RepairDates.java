package org.depotcast.repairs;

import org.depotcast.common.ConflictException;

import java.time.LocalDate;

/** The rules a repair's dates follow, shared by recording, progress and the history import. */
final class RepairDates {
    private RepairDates() {
    }

    /** A date already recorded stays; sending it again is harmless, sending another is a conflict on {@code field}. */
    static LocalDate keepOrSet(String field, LocalDate stored, LocalDate sent) {
        if (sent == null || sent.equals(stored)) {
            return stored;
        }
        if (stored != null) {
            throw new ConflictException(field, "is already recorded as " + stored);
        }
        return sent;
    }

    /** Null when the dates run in order, else the name of the first date that comes too early. */
    static String dateOrderProblem(LocalDate reported, LocalDate diagnosed, LocalDate available, LocalDate fixed) {
        LocalDate last = reported;
        String[] names = {"diagnosedOn", "partsAvailableOn", "fixedOn"};
        LocalDate[] dates = {diagnosed, available, fixed};
        for (int i = 0; i < dates.length; i++) {
            if (dates[i] != null) {
                if (dates[i].isBefore(last)) {
                    return names[i];
                }
                last = dates[i];
            }
        }
        return null;
    }
}
