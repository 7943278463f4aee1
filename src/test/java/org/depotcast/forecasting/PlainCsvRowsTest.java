package org.depotcast.forecasting;

import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The byte-level reader of plain batch records, and where it hands the body over to FastCSV. */
class PlainCsvRowsTest {
    private static final int[] COLUMNS = {0, 1, 2};

    @Test
    void readsPlainRowsWithTheirLineNumbersSkippingEmptyLines() {
        PlainCsvRows rows = rows("series_id,period,quantity\nA,1,3\n\nA,2,0\n B ,07, 12 \nB,x,\nB\n,5,1");
        assertEquals(List.of("series_id", "period", "quantity"), rows.header());
        List<String> read = readAll(rows);
        // line: id | period or its text | quantity or its text (the text is null where the cell was plain digits)
        assertEquals(List.of("2:A|1|3", "4:A|2|0", "5:B|7|12", "6:B|x|", "7:B||", "8:|5|1"), read);
        assertFalse(rows.stopped());
    }

    @Test
    void theCommonRecordAndTheCellByCellReadingGiveTheSameRows() {
        // The first row of a series is read cell by cell, the others at once; a space, a sign, a tenth digit or an
        // extra cell sends a row back to the cell-by-cell reading.
        PlainCsvRows rows = rows("series_id,period,quantity\nA,1,3\nA,2,0\nA,3 ,1\nA,4,+1\nA,5,1234567890\nA,6,1,x\nA,7,2\n");
        rows.header();
        assertEquals(List.of("2:A|1|3", "3:A|2|0", "4:A|3|1", "5:A|4|+1", "6:A|5|1234567890", "7:A|6|1", "8:A|7|2"),
                readAll(rows));
    }

    @Test
    void stopsAtTheFirstRecordThatIsNotPlainAndHandsTheRestOver() throws IOException {
        for (String special : new String[]{"\"B\",1,2", "B,1,2\r", "Bé,1,2", "B\"x,1,2"}) {
            PlainCsvRows rows = rows("series_id,period,quantity\nA,1,3\n\nA,2,0\n" + special + "\nC,1,1\n");
            rows.header();
            assertEquals(List.of("2:A|1|3", "4:A|2|0"), readAll(rows), special);
            assertTrue(rows.stopped(), special);
            assertEquals(4, rows.linesBefore(), special);
            assertFalse(rows.restIsWholeBody(), special);
            assertEquals(special + "\nC,1,1\n", new String(rows.rest().readAllBytes(), StandardCharsets.UTF_8), special);
        }
    }

    @Test
    void aHeaderThatIsNotPlainHandsOverTheWholeBody() throws IOException {
        String body = "\uFEFFseries_id,period,quantity\nA,1,3\n";
        PlainCsvRows rows = rows(body);
        assertNull(rows.header());
        assertTrue(rows.stopped());
        assertTrue(rows.restIsWholeBody());
        assertEquals(body, new String(rows.rest().readAllBytes(), StandardCharsets.UTF_8));
    }

    @Test
    void aRecordLongerThanTheBufferIsHandedOver() throws IOException {
        String longId = "L".repeat(300_000);
        PlainCsvRows rows = rows("series_id,period,quantity\nA,1,3\n" + longId + ",1,1\nB,1,1\n");
        rows.header();
        assertEquals(List.of("2:A|1|3"), readAll(rows));
        assertTrue(rows.stopped());
        assertEquals(2, rows.linesBefore());
        assertEquals(longId + ",1,1\nB,1,1\n", new String(rows.rest().readAllBytes(), StandardCharsets.UTF_8));
    }

    @Test
    void rowsAcrossManyBufferFillsAreAllRead() {
        StringBuilder body = new StringBuilder("series_id,period,quantity\n");
        int count = 200_000;
        for (int i = 0; i < count; i++) {
            body.append("S").append(i / 100).append(',').append(i % 100 + 1).append(',').append(i % 7).append('\n');
        }
        PlainCsvRows rows = rows(body.toString());
        rows.header();
        BatchRowReader.Row row = new BatchRowReader.Row();
        long sum = 0;
        int n = 0;
        while (rows.next(row, COLUMNS)) {
            assertEquals("S" + n / 100, row.id);
            assertEquals(n + 2, row.line);
            sum += row.quantity;
            n++;
        }
        assertEquals(count, n);
        assertEquals(599_994, sum); // 0+1+…+6 = 21 per 7 rows: 28,571 whole cycles and 0,1,2 over the last 3 rows
        assertFalse(rows.stopped());
    }

    private static PlainCsvRows rows(String body) {
        return new PlainCsvRows(new ByteArrayInputStream(body.getBytes(StandardCharsets.UTF_8)));
    }

    private static List<String> readAll(PlainCsvRows rows) {
        List<String> read = new ArrayList<>();
        BatchRowReader.Row row = new BatchRowReader.Row();
        while (rows.next(row, COLUMNS)) {
            read.add(row.line + ":" + row.id + "|" + (row.periodText == null ? row.period : row.periodText) + "|"
                    + (row.quantityText == null ? row.quantity : row.quantityText));
        }
        return read;
    }
}
