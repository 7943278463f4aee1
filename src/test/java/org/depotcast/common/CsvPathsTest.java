package org.depotcast.common;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.ValidatableResponse;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.fleet.PumpService;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.hamcrest.Matchers.hasItems;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The one CSV path: imports as spreadsheets write them, refused by row and column, and exports a spreadsheet cannot run. */
@QuarkusTest
class CsvPathsTest {
    private static final String PROBLEM = "application/problem+json";
    private static final String PART_HEADER = "part_number,description,family,unit_of_issue,pack_size,min_order_qty,"
            + "unit_cost,currency,supplier,lead_time_days,shelf_life_days,critical";

    @Inject
    TestData data;
    @Inject
    PartService parts;
    @Inject
    PumpService pumps;

    private static ValidatableResponse upload(String user, String path, String csv) {
        return as(user).contentType("text/csv; charset=UTF-8").body(csv.getBytes(StandardCharsets.UTF_8)).post(path).then();
    }

    private static String partRow(String number, String description, String unitCost) {
        return number + "," + description + ",O_RING,EACH,10,10," + unitCost + ",USD,Test Supplier,30,,false";
    }

    @Test
    void aSpreadsheetsByteOrderMarkAndSemicolonsAreRead() {
        String first = TestData.unique("BOM").toUpperCase();
        String second = TestData.unique("BOM").toUpperCase();
        String csv = "\uFEFF" + PART_HEADER.replace(',', ';') + "\r\n"
                + (partRow(first, "\"Ring; large\"", "2.50") + "\r\n").replace(',', ';')
                + (partRow(second, "Ring small", "0.75") + "\r\n").replace(',', ';');
        upload("officer", "/api/parts/import", csv).statusCode(200).body("rowsImported", equalTo(2));
        as("officer").get("/api/parts/" + first).then().statusCode(200).body("description", equalTo("Ring; large"))
                .body("unitCost", equalTo(2.5f));
        as("officer").get("/api/parts/" + second).then().statusCode(200);
    }

    @Test
    void anIdentifierThatWouldRunAsAFormulaIsRefusedAndNothingWritten() {
        String good = TestData.unique("INJ").toUpperCase();
        String csv = PART_HEADER + "\n" + partRow(good, "Ring", "1.00") + "\n"
                + partRow("\"=HYPERLINK(\"\"http://example.invalid\"\",\"\"x\"\")\"", "Ring", "1.00") + "\n"
                + partRow("@SUM(A1)", "Ring", "1.00") + "\n";
        upload("officer", "/api/parts/import", csv).statusCode(400).contentType(PROBLEM)
                .body("type", equalTo("/problems/invalid-input"))
                .body("errors.field", hasItems("row 3, column part_number", "row 4, column part_number"))
                .body("errors[0].message", containsString("OWASP CSV Injection"));
        assertTrue(parts.find(good).isEmpty(), "the good row before the refused one must not be written");
    }

    @Test
    void anUnbalancedQuoteIsA400NamingTheRow() {
        String good = TestData.unique("QUO").toUpperCase();
        String csv = PART_HEADER + "\n" + partRow(good, "Ring", "1.00") + "\n" + partRow("X1", "\"Ring", "1.00") + "\n";
        upload("officer", "/api/parts/import", csv).statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("row 3"));
        assertTrue(parts.find(good).isEmpty());
    }

    @Test
    void hostileRowsAreRefusedByRowAndColumnWithNothingWritten() {
        String good = TestData.unique("HOS").toUpperCase();
        String csv = PART_HEADER + "\n" + partRow(good, "Ring", "1.00") + "\n"
                + partRow(TestData.unique("HOS").toUpperCase(), "d".repeat(400), "1.00") + "\n"
                + partRow(TestData.unique("HOS").toUpperCase(), "Ring", "1e20") + "\n";
        upload("officer", "/api/parts/import", csv).statusCode(400).contentType(PROBLEM)
                .body("type", equalTo("/problems/invalid-input"))
                .body("errors.field", hasItems("row 3, column description", "row 4, column unit_cost"));
        assertTrue(parts.find(good).isEmpty());

        String model = as("officer").get("/api/pump-models").then().extract().jsonPath().getString("[0].code");
        String goodPump = TestData.unique("HP").toUpperCase();
        String pumpsCsv = "asset_id,model_code,depth_m,installed_on,depot_code\n"
                + goodPump + "," + model + ",40,2020-01-01,DEP-PELLOWDENE\n"
                + "A".repeat(100) + "," + model + ",40,2020-01-01,DEP-PELLOWDENE\n"
                + TestData.unique("HP").toUpperCase() + "," + model + ",1e9,2020-01-01,DEP-PELLOWDENE\n";
        upload("officer", "/api/pumps/import", pumpsCsv).statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItems("row 3, column asset_id", "row 4, column depth_m"));
        assertTrue(pumps.find(goodPump).isEmpty());

        String part = data.part(UnitOfIssue.EACH);
        String order = TestData.unique("HPO").toUpperCase();
        upload("officer", "/api/purchase-orders/import", "order_number,supplier,destination_code,ordered_on,expected_on,"
                + "part_number,quantity\n" + order + ",Test Supplier,CENTRAL,2026-11-01,," + part + ",1e15\n")
                .statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("row 2, column quantity"));
        as("officer").get("/api/purchase-orders/" + order).then().statusCode(404);
        upload("officer", "/api/stock/counts/import", "location_code,part_number,quantity\nCENTRAL," + part + ",3\n"
                + "CENTRAL," + data.part(UnitOfIssue.EACH) + ",1e15\n")
                .statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("row 3, column quantity"));
        as("officer").get("/api/stock/balances?location=CENTRAL").then().statusCode(200)
                .body("findAll { it.partNumber == '" + part + "' }.size()", equalTo(0));
    }

    @Test
    void anOfficerCannotMoveAnotherDepotsPumpThroughTheImport() {
        String csv = as("lead").get("/api/pumps/export").asString();
        List<String> lines = csv.lines().toList();
        String theirs = lines.stream().filter(l -> l.contains(",DEP-TESHVALE,")).findFirst().orElseThrow();
        String assetId = theirs.substring(0, theirs.indexOf(','));
        upload("officer2", "/api/pumps/import", lines.get(0) + "\n" + theirs.replace(",DEP-TESHVALE,", ",DEP-PELLOWDENE,"))
                .statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("row 2, column depot_code"))
                .body("errors[0].message", containsString("outside the locations assigned to you"));
        as("lead").get("/api/pumps/" + assetId).then().body("depotCode", equalTo("DEP-TESHVALE"));
    }

    @Test
    void exportsAreAttachmentsAndNeutraliseFormulasButKeepNegativeNumbers() {
        String number = TestData.unique("FX").toUpperCase();
        as("officer").contentType("application/json").body(Map.ofEntries(Map.entry("partNumber", number),
                Map.entry("description", "=2+3 ring"), Map.entry("family", "O_RING"), Map.entry("unitOfIssue", "EACH"),
                Map.entry("packSize", 1), Map.entry("minOrderQty", 1), Map.entry("unitCost", 1),
                Map.entry("currency", "USD"), Map.entry("supplier", "@Supplier"), Map.entry("leadTimeDays", 5),
                Map.entry("critical", false))).post("/api/parts").then().statusCode(201);
        String partsCsv = as("officer").get("/api/parts/export").then().statusCode(200)
                .header("Content-Disposition", equalTo("attachment; filename=\"parts.csv\""))
                .contentType(containsString("text/csv")).extract().asString();
        String row = partsCsv.lines().filter(l -> l.startsWith(number + ",")).findFirst().orElseThrow();
        assertTrue(row.contains(",'=2+3 ring,") && row.contains(",'@Supplier,"), row);

        String code = TestData.unique("NEG").toUpperCase();
        as("admin").contentType("application/json").body(Map.of("code", code, "name", "-south depot", "kind", "DEPOT",
                "parentCode", "CENTRAL", "latitude", -13.25, "longitude", 33.5)).post("/api/locations").then().statusCode(201);
        String locations = as("admin").get("/api/locations/export").then().statusCode(200)
                .header("Content-Disposition", equalTo("attachment; filename=\"locations.csv\"")).extract().asString();
        String location = locations.lines().filter(l -> l.startsWith(code + ",")).findFirst().orElseThrow();
        assertEquals(code + ",'-south depot,DEPOT,CENTRAL,-13.250000,33.500000,", location);
    }

    @Test
    void everyExportIsAnAttachmentWithAFileName() {
        Map<String, String> files = Map.of("/api/parts/export", "parts.csv", "/api/pump-models/export", "pump-models.csv",
                "/api/pumps/export", "pumps.csv", "/api/pumps/usage/export", "usage-readings.csv",
                "/api/repairs/export", "repairs.csv", "/api/stock/counts/export?location=DEP-PELLOWDENE",
                "stock-count-DEP-PELLOWDENE.csv", "/api/locations/export", "locations.csv",
                "/api/purchase-orders/export", "purchase-orders.csv", "/api/audit/export", "audit-log.csv");
        files.forEach((path, name) -> {
            String body = as("admin").get(path).then().statusCode(200).contentType(containsString("text/csv"))
                    .header("Content-Disposition", equalTo("attachment; filename=\"" + name + "\"")).extract().asString();
            assertFalse(body.isBlank(), path);
        });
        as("officer").contentType("text/csv").body("series_id,period,quantity\nA,1,2\nA,2,0\nA,3,1\n")
                .post("/api/forecast/batch?method=croston&alpha=0.1&horizon=2").then().statusCode(200)
                .header("Content-Disposition", equalTo("attachment; filename=\"forecasts.csv\""));
    }

    @Test
    void theCountSheetListsZeroBalances() {
        String depot = data.depot();
        String held = data.part(UnitOfIssue.EACH);
        String emptied = data.part(UnitOfIssue.EACH);
        data.stock(held, depot, 4);
        data.stock(emptied, depot, 3);
        upload("officer", "/api/stock/counts/import", "location_code,part_number,quantity\n" + depot + "," + emptied + ",0\n")
                .statusCode(200);
        String sheet = as("officer").get("/api/stock/counts/export?location=" + depot).then().statusCode(200)
                .header("Content-Disposition", equalTo("attachment; filename=\"stock-count-" + depot + ".csv\""))
                .extract().asString();
        List<String> lines = sheet.lines().toList();
        assertEquals("location_code,part_number,quantity,counted_on,description", lines.get(0));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith(depot + "," + held + ",4,")), sheet);
        assertTrue(lines.stream().anyMatch(l -> l.startsWith(depot + "," + emptied + ",0,")), sheet);
        // The sheet, filled in as found, reads back and changes nothing.
        upload("officer", "/api/stock/counts/import", sheet).statusCode(200).body("rowsImported", equalTo(2));
    }

    @Test
    void thePurchaseOrderExportLabelsOrderedReceivedAndOutstanding() {
        String depot = data.depot();
        String part = data.part(UnitOfIssue.EACH);
        String order = TestData.unique("PO").toUpperCase();
        as("officer").contentType("application/json").body(Map.of("orderNumber", order, "supplier", "Test Supplier",
                "destination", depot, "orderedOn", "2026-11-01", "lines", List.of(Map.of("partNumber", part, "quantity", 10))))
                .post("/api/purchase-orders").then().statusCode(201);
        as("officer").contentType("application/json").body(Map.of("partNumber", part, "quantity", 4))
                .post("/api/purchase-orders/" + order + "/receipts").then().statusCode(201);
        String csv = as("officer").get("/api/purchase-orders/export").then().statusCode(200).extract().asString();
        List<String> lines = csv.lines().toList();
        assertEquals("order_number,supplier,destination_code,ordered_on,expected_on,part_number,quantity_ordered,"
                + "quantity_received,quantity_outstanding", lines.get(0));
        assertTrue(lines.contains(order + ",Test Supplier," + depot + ",2026-11-01,," + part + ",10,4,6"), csv);
    }
}
