package org.depotcast.common;

import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class CsvExportTest {
    private static String written(List<?>... rows) throws Exception {
        StringBuilder out = new StringBuilder();
        new CsvExport("test.csv", List.of("a", "b"), Arrays.asList(rows)).writeTo(out);
        return out.toString();
    }

    @Test
    void cellsASpreadsheetWouldRunAsAFormulaGetALeadingQuote() throws Exception {
        assertEquals("a,b\n'=1+2,'+44 20\n'@SUM(A1),'-A1\n'\tx,\"'\ry\"\n",
                written(List.of("=1+2", "+44 20"), List.of("@SUM(A1)", "-A1"), List.of("\tx", "\ry")));
    }

    @Test
    void plainNegativeNumbersStayNumbers() throws Exception {
        assertEquals("a,b\n-12.5,-3\n-1e3,'-1-1\n", written(List.of("-12.5", -3), List.of("-1e3", "-1-1")));
    }

    @Test
    void ordinaryCellsAndNullsAreWrittenAsTheyAre() throws Exception {
        assertEquals("a,b\nOB-CS-50,\n\"a, b\",2026-11-30\n",
                written(Arrays.asList("OB-CS-50", null), List.of("a, b", java.time.LocalDate.of(2026, 11, 30))));
    }

    @Test
    void theFileNameCannotCarryHeaderSyntax() {
        assertThrows(IllegalArgumentException.class, () -> new CsvExport("x\"; y.csv", List.of("a"), List.of()));
    }
}
