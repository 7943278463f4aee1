package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.PartService;
import org.junit.jupiter.api.Test;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** One bad row anywhere refuses the whole file, lists every problem by row and column, and writes nothing. */
@QuarkusTest
class ImportAllOrNothingTest {
    @Inject
    PartService parts;

    private static String partsCsv(String prefix, int rows, int badRow) {
        StringBuilder csv = new StringBuilder("part_number,description,family,unit_of_issue,pack_size,min_order_qty,"
                + "unit_cost,currency,supplier,lead_time_days,shelf_life_days,critical\n");
        for (int i = 1; i <= rows; i++) {
            String pack = i == badRow ? "ten" : "10";
            String family = i == badRow ? "SPROCKET" : "O_RING";
            csv.append(prefix).append(i).append(",Test ring ").append(i).append(',').append(family)
                    .append(",EACH,").append(pack).append(",10,0.50,USD,Test Supplier,30,,false\n");
        }
        return csv.toString();
    }

    @Test
    void badRow500Of1000WritesNothing() {
        String prefix = TestData.unique("IMP").toUpperCase() + "-";
        as("officer").contentType("text/csv").body(partsCsv(prefix, 1000, 500)).post("/api/parts/import")
                .then().statusCode(400).contentType("application/problem+json")
                .body("errors.field", hasItems("row 501, column family", "row 501, column pack_size"));
        for (int i = 1; i <= 1000; i += 37) {
            assertTrue(parts.find(prefix + i).isEmpty(), "part " + prefix + i + " must not exist");
        }
        assertTrue(parts.find(prefix + 1000).isEmpty());
        as("officer").contentType("text/csv").body(partsCsv(prefix, 1000, -1)).post("/api/parts/import")
                .then().statusCode(200).body("rowsImported", equalTo(1000));
        assertTrue(parts.find(prefix + 1000).isPresent());
    }

    @Test
    void usageImportChecksPumpsAndDates() {
        String csv = "asset_id,read_on,hours_per_day,source\nOB-00001,2026-11-30,4.5,MEASURED\n"
                + "NO-SUCH-PUMP,2026-11-30,4,MEASURED\nOB-00002,30/11/2026,30,GUESSED\n";
        as("officer").contentType("text/csv").body(csv).post("/api/pumps/usage/import")
                .then().statusCode(400).contentType("application/problem+json")
                .body("errors.field", hasItems("row 3, column asset_id", "row 4, column read_on",
                        "row 4, column hours_per_day", "row 4, column source"));
    }

    @Test
    void missingColumnsAndEmptyFilesAreRefused() {
        as("officer").contentType("text/csv").body("asset_id,read_on\nOB-00001,2026-11-30\n")
                .post("/api/pumps/usage/import").then().statusCode(400).body("errors[0].field", equalTo("header"));
        as("officer").contentType("text/csv").body("").post("/api/repairs/import").then().statusCode(400);
    }
}
