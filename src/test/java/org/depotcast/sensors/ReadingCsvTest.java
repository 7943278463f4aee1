package org.depotcast.sensors;

import org.depotcast.common.CsvRow;
import org.depotcast.common.CsvUpload;
import org.depotcast.common.InvalidInputException;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Set;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The readings reader against the shared upload reader (Apache Commons CSV, RFC 4180) on the same files: the same
 * rows, numbers and cells, whatever the separator, quotes, line ends, byte-order mark or empty lines.
 */
class ReadingCsvTest {
    private static List<String> ours(String file) {
        List<String> rows = new ArrayList<>();
        ReadingCsv.read(new ByteArrayInputStream(file.getBytes(StandardCharsets.UTF_8)), r -> rows.add(
                r.unreadable() != null ? r.row() + " unreadable" : r.row() + "|" + r.assetId() + "|" + r.day() + "|"
                        + r.hours() + "|" + r.strokes() + "|" + r.litres()));
        return rows;
    }

    /** What the general reader gives for the same file, in the same shape. */
    private static List<String> commonsCsv(String file) {
        List<String> rows = new ArrayList<>();
        try (CsvUpload upload = CsvUpload.open(new StringReader(file.replace("\uFEFF", "")),
                List.of("asset_id", "day"), Set.of())) {
            Iterator<CsvRow> it = upload.iterator();
            while (it.hasNext()) {
                CsvRow row = it.next();
                rows.add(row.line() + "|" + row.optionalText("asset_id") + "|" + row.optionalText("day") + "|"
                        + cell(row, "hours") + "|" + cell(row, "strokes") + "|" + cell(row, "litres"));
            }
            if (!upload.problems().isEmpty()) {
                rows.add((rows.isEmpty() ? 2 : Integer.parseInt(rows.get(rows.size() - 1).split("\\|")[0]) + 1)
                        + " unreadable");
            }
        }
        return rows;
    }

    private static String cell(CsvRow row, String column) {
        return row.has(column) ? row.optionalText(column) : null;
    }

    @Test
    void readsAsTheGeneralReaderDoes() {
        List<String> files = List.of(
                "asset_id,day,hours\nP1,2026-10-01,5.5\nP2,2026-10-02,0\n",
                "\uFEFFhours,asset_id,day\r\n4,P1,2026-10-01\r\n\r\n,P2,2026-10-02\r\n",
                "asset_id;day;strokes\nP1;2026-10-01;1,5\n\"P;2\";\"2026-10-02\";\"3\"\n",
                "asset_id,day,hours,note\n\"P \"\"one\"\"\",2026-10-01,5,\"two\nlines\"\nP2,2026-10-03\n",
                "asset_id,day,litres\n  P1 , 2026-10-01 ,  7 \nP1,2026-10-02,8",
                "asset_id,day,hours\nP1,2026-10-01,5\nP2,\"2026-10-02,6\nP3,2026-10-03,7\n",
                "asset_id,day,hours\nP1,2026-10-01,5\n\"P2\"x,2026-10-02,6\nP3,2026-10-03,7\n",
                "asset_id,day,hours,asset_id\nP1,2026-10-01,5,P9\n");
        for (String file : files) {
            assertEquals(commonsCsv(file), ours(file), file);
        }
        assertEquals(List.of("2|P1|2026-10-01|5.5|null|null", "3|P2|2026-10-02|0|null|null"), ours(files.get(0)));
        assertEquals(List.of("2|P1|2026-10-01|5|null|null", "3 unreadable"), ours(files.get(5)));
    }

    @Test
    void aHeaderWithoutItsColumnsIsRefused() {
        InvalidInputException missing = assertThrows(InvalidInputException.class, () -> ours("pump,day,hours\nP1,2026-10-01,5\n"));
        assertEquals("missing column 'asset_id'", missing.errors().get(0).message());
        InvalidInputException noValue = assertThrows(InvalidInputException.class, () -> ours("asset_id,day\nP1,2026-10-01\n"));
        assertEquals("header", noValue.errors().get(0).field());
        assertThrows(InvalidInputException.class, () -> ours("\n\n"));
    }
}
