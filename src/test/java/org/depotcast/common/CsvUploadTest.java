package org.depotcast.common;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.io.StringReader;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class CsvUploadTest {
    private static List<FieldError> problemsOf(String csv, Set<String> identifiers) {
        try (CsvUpload upload = CsvUpload.open(new StringReader(csv), List.of("code", "qty"), identifiers)) {
            for (CsvRow row : upload) {
                row.text("code");
                row.decimal("qty");
            }
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> upload.problems().throwIfAny());
            return e.errors();
        }
    }

    private static List<String> codesOf(String csv) {
        List<String> codes = new ArrayList<>();
        try (CsvUpload upload = CsvUpload.open(new StringReader(csv), List.of("code", "qty"), Set.of("code"))) {
            for (CsvRow row : upload) {
                codes.add(row.text("code") + "=" + row.decimal("qty").toPlainString());
            }
            upload.problems().throwIfAny();
        }
        return codes;
    }

    @Test
    void aByteOrderMarkBeforeTheHeaderIsSkipped() {
        assertEquals(List.of("A1=2"), codesOf("\uFEFFcode,qty\nA1,2\n"));
    }

    @Test
    void semicolonSeparatedFilesAreReadByTheirHeader() {
        // As a spreadsheet with a decimal comma writes it; a comma inside a quoted cell is not a separator.
        assertEquals(List.of("A1=2", "B,2=3.5"), codesOf("\uFEFFcode;qty\r\nA1;2\r\n\"B,2\";3.5\r\n"));
        assertEquals(List.of("A;1=2"), codesOf("code,qty\n\"A;1\",2\n"));
    }

    @Test
    void anUnbalancedQuoteIsRefusedNamingItsRow() {
        List<FieldError> errors = problemsOf("code,qty\nA1,2\nA2,3\n\"A3,4\nA4,5\n", Set.of());
        assertEquals("row 4", errors.get(errors.size() - 1).field());
        assertTrue(errors.get(errors.size() - 1).message().contains("quoted value is not closed"));
        errors = problemsOf("code,qty\n\"A1\"x,2\n", Set.of());
        assertEquals("row 2", errors.get(0).field());
    }

    @ParameterizedTest
    @ValueSource(strings = {"=HYPERLINK(\"http://x\")", "+1", "-2+3", "@SUM(A1)", "\tA1", "\rA1", " =A1"})
    void identifiersAFormulaCouldHideInAreRefused(String hostile) {
        String cell = "\"" + hostile.replace("\"", "\"\"") + "\"";
        List<FieldError> errors = problemsOf("code,qty\nOK-1,1\n" + cell + ",2\n", Set.of("code"));
        assertEquals("row 3, column code", errors.get(0).field());
        assertTrue(errors.get(0).message().contains("OWASP CSV Injection"), errors.get(0).message());
    }

    @Test
    void missingColumnsAndAnEmptyBodyAreNamed() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> CsvUpload.open(new StringReader("code,amount\nA,1\n"), List.of("code", "qty"), Set.of()));
        assertEquals(new FieldError("header", "missing column 'qty'"), e.errors().get(0));
        e = assertThrows(InvalidInputException.class,
                () -> CsvUpload.open(new StringReader(""), List.of("code"), Set.of()));
        assertEquals("body", e.errors().get(0).field());
    }

    @Test
    void everyBadCellIsListedByRowAndColumn() {
        List<FieldError> errors = problemsOf("code,qty\nA,x\n,2\nC,1e999\n", Set.of());
        assertEquals(List.of("row 2, column qty", "row 3, column code", "row 4, column qty"),
                errors.stream().map(FieldError::field).toList());
    }

    @Test
    void cellsAreStrippedAndDecimalsKeepTheirValue() {
        try (CsvUpload upload = CsvUpload.open(new StringReader("code , qty\n  A1 , 2.50 \n"), List.of("code", "qty"),
                Set.of("code"))) {
            CsvRow row = upload.iterator().next();
            assertEquals("A1", row.text("code"));
            assertEquals(0, new BigDecimal("2.5").compareTo(row.decimal("qty")));
        }
    }
}
