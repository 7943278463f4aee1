package org.depotcast.common;

import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

class CsvTableTest {
    @Test
    void missingColumnsAreNamed() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CsvTable.parse("a,b\n1,2\n", List.of("a", "c")));
        assertEquals("missing column 'c'", e.errors().get(0).message());
    }

    @Test
    void everyBadCellIsListedByRowAndColumn() {
        CsvTable table = CsvTable.parse("n,d\nx,2026-01-01\n3,not-a-date\n-1,\n", List.of("n", "d"));
        for (CsvRow row : table.rows()) {
            row.integer("n", 0);
            row.date("d");
        }
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> table.problems().throwIfAny());
        List<String> fields = e.errors().stream().map(FieldError::field).toList();
        assertEquals(List.of("row 2, column n", "row 3, column d", "row 4, column n", "row 4, column d"), fields);
    }

    @Test
    void decimalBoundsAreChecked() {
        CsvTable table = CsvTable.parse("q\n0\n", List.of("q"));
        assertNull(table.rows().get(0).decimal("q", BigDecimal.ZERO, true));
        assertThrows(InvalidInputException.class, () -> table.problems().throwIfAny());
    }
}
