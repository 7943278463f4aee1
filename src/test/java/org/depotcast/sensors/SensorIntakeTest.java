package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;

/** Intake rules: one reading per pump and day, replacements audited, refused rows with reasons, missing is not zero. */
@QuarkusTest
class SensorIntakeTest {
    static final String PROBLEM = "application/problem+json";

    @Inject
    SensorUsageQuery usage;
    @Inject
    org.depotcast.fleet.PumpService pumps;

    long pumpId(String asset) {
        return io.quarkus.narayana.jta.QuarkusTransaction.requiringNew().call(() -> pumps.find(asset).orElseThrow().id);
    }

    static String pump(String depot, String model) {
        String asset = TestData.unique("SENS");
        Map<String, Object> body = new HashMap<>();
        body.put("assetId", asset);
        body.put("modelCode", model);
        body.put("depthM", 30);
        body.put("installedOn", "2024-05-01");
        body.put("depotCode", depot);
        as("admin").contentType("application/json").body(body).post("/api/pumps").then().statusCode(201);
        return asset;
    }

    static Response csv(String user, String body) {
        return as(user).contentType("text/csv").body(body).post("/api/sensors/readings");
    }

    @Test
    void rowsThatCannotBeRightAreRefusedByRowAndTheRestTaken() {
        String p = pump("DEP-TESHVALE", "RB-2");
        String future = LocalDate.now(ZoneOffset.UTC).plusDays(5).toString();
        String file = "asset_id,day,hours\n"
                + p + ",2026-10-01,5.5\n"
                + p + ",2026-10-02,0\n"
                + p + ",2026-10-04,6.25\n"
                + p + ",2026-10-05,25\n"
                + p + ",2026-10-06,-1\n"
                + p + ",2024-04-30,3\n"
                + p + "," + future + ",3\n"
                + "NO-SUCH-PUMP,2026-10-07,3\n"
                + p + ",2026-10-08,abc\n"
                + p + ",10/09/2026,2\n";
        csv("officer", file).then().statusCode(200)
                .body("rowsRead", equalTo(10)).body("taken", equalTo(3)).body("added", equalTo(3))
                .body("refused", equalTo(7)).body("refusedListComplete", equalTo(true))
                .body("refusedRows.row", equalTo(List.of(5, 6, 7, 8, 9, 10, 11)))
                .body("refusedRows.field", equalTo(List.of("hours", "hours", "day", "day", "assetId", "hours", "day")))
                .body("refusedRows[0].reason", equalTo("more than 24 hours of use in one day"))
                .body("refusedRows[1].reason", equalTo("negative"))
                .body("refusedRows[2].reason", equalTo("before the pump was installed on 2024-05-01"))
                .body("refusedRows[3].reason", equalTo("after today"));
        // 3 October is missing, not zero: the month covers 3 days, and 2 October's zero is one of them.
        monthIs(p, "2026-10-01", 11.75f, 3);

        csv("officer", file).then().statusCode(200).body("added", equalTo(0)).body("unchanged", equalTo(3))
                .body("replaced", equalTo(0)).body("refused", equalTo(7));
        monthIs(p, "2026-10-01", 11.75f, 3);

        // The corrected rows sent again are taken; a different value for a day held replaces it, audited.
        csv("officer", "asset_id,day,hours\n" + p + ",2026-10-05,4\n" + p + ",2026-10-06,1\n" + p + ",2026-10-01,4.5\n")
                .then().statusCode(200).body("added", equalTo(2)).body("replaced", equalTo(1)).body("refused", equalTo(0));
        monthIs(p, "2026-10-01", 15.75f, 5);
        as("admin").queryParam("entityType", "sensor_reading").get("/api/audit").then().statusCode(200)
                .body("findAll { it.entityKey == '" + p + "@2026-10-01' }.action", hasItem("SENSOR_READING_REPLACED"))
                .body("find { it.entityKey == '" + p + "@2026-10-01' }.beforeJson", equalTo("{\"hours\":5.5}"));
    }

    @Test
    void countsTurnIntoHoursByTheModelsFactorAndNdjsonIsReadLineByLine() {
        String p = pump("DEP-TESHVALE", "RB-2");
        as("admin").contentType("application/json").body(Map.of("strokesPerHour", 1200))
                .put("/api/sensors/conversions/RB-2").then().statusCode(200).body("strokesPerHour", equalTo(1200));
        String longLine = "{\"assetId\":\"" + "x".repeat(5_000_000) + "\"}";
        String body = "{\"assetId\":\"" + p + "\",\"day\":\"2026-09-01\",\"strokes\":3000}\n"
                + "{\"assetId\":\"" + p + "\",\"day\":\"2026-09-02\",\"litres\":900}\n"
                + "not json\n"
                + longLine + "\n"
                + "{\"assetId\":\"" + p + "\",\"day\":\"2026-09-03\",\"hours\":3,\"strokes\":10}\n"
                + "{\"assetId\":\"" + p + "\",\"day\":\"2026-09-04\",\"hours\":7.125}\n";
        as("officer").contentType(SensorResource.NDJSON).body(body.getBytes(java.nio.charset.StandardCharsets.UTF_8)).post("/api/sensors/readings").then()
                .statusCode(200).body("added", equalTo(2)).body("refused", equalTo(4))
                .body("refusedRows.row", equalTo(List.of(2, 3, 4, 5)))
                .body("refusedRows[0].reason", equalTo("no litres-per-hour factor is set for this pump's model"))
                .body("refusedRows[2].reason", equalTo("line longer than 1000 characters"))
                .body("refusedRows[3].reason", equalTo("give only one of hours, strokes or litres"));
        // 3000 strokes / 1200 per hour = 2.5 h; 7.125 h kept to the hundredth, half up = 7.13 h.
        monthIs(p, "2026-09-01", 9.63f, 2);
    }

    @Test
    void anEmptyNdjsonFileIsRefusedAsAnEmptyCsvIs() {
        for (String body : List.of("", "\n\n  \n")) {
            as("officer").contentType(SensorResource.NDJSON).body(body.getBytes(java.nio.charset.StandardCharsets.UTF_8))
                    .post("/api/sensors/readings").then()
                    .statusCode(400).contentType(PROBLEM).body("errors[0].field", equalTo("body"))
                    .body("errors[0].message", equalTo("the body is empty"));
        }
    }

    @Test
    void whoMaySendAndForWhichPumps() {
        String elsewhere = pump("DEP-PELLOWDENE", "RB-2");
        csv("mechanic1", "asset_id,day,hours\n" + elsewhere + ",2026-10-01,3\n").then().statusCode(403)
                .contentType(PROBLEM);
        // officer2 runs Pellowdene only: a Teshvale pump reads as unknown to them.
        String teshvale = pump("DEP-TESHVALE", "RB-2");
        csv("officer2", "asset_id,day,hours\n" + teshvale + ",2026-10-01,3\n" + elsewhere + ",2026-10-01,3\n")
                .then().statusCode(200).body("added", equalTo(1)).body("refusedRows[0].field", equalTo("assetId"));
        csv("officer", "asset_id,hours\nX,3\n").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("header"));
        csv("officer", "asset_id,day\nX,2026-10-01\n").then().statusCode(400).contentType(PROBLEM)
                .body("errors[0].field", equalTo("header"));
    }

    @Test
    void theRollUpIsTheSumOfItsDaysAfterAdditionsAndReplacements() {
        String p = pump("DEP-TESHVALE", "RB-2");
        java.util.SplittableRandom random = new java.util.SplittableRandom(14);
        for (int file = 0; file < 4; file++) {
            StringBuilder body = new StringBuilder("asset_id,day,hours\n");
            for (int i = 0; i < 150; i++) {
                LocalDate day = LocalDate.of(2026, 1, 1).plusDays(random.nextInt(300));
                body.append(p).append(',').append(day).append(',').append(random.nextInt(0, 1200) / 100.0).append('\n');
            }
            csv("officer", body.toString()).then().statusCode(200).body("refused", equalTo(0));
        }
        long pumpId = pumpId(p);
        Map<LocalDate, Double> days = usage.daysOf(pumpId, LocalDate.of(2026, 1, 1), LocalDate.of(2026, 12, 31));
        for (MonthlyOperatingHours month : usage.monthsOf(pumpId)) {
            double sum = days.entrySet().stream().filter(e -> e.getKey().withDayOfMonth(1).equals(month.monthStart()))
                    .mapToDouble(Map.Entry::getValue).sum();
            long count = days.keySet().stream().filter(d -> d.withDayOfMonth(1).equals(month.monthStart())).count();
            assertEquals(sum, month.hours().doubleValue(), 1e-6, month.monthStart().toString());
            assertEquals(count, month.daysCovered(), month.monthStart().toString());
        }
        assertEquals(10, usage.monthsOf(pumpId).size());
    }

    @Test
    void aFileOverTheGeneralBodyLimitIsTakenAsABulkStream() {
        // A year's export of a thousand pumps is about 9 MB; the readings path takes bulk bodies (over 10 MB).
        String p = pump("DEP-TESHVALE", "RB-2");
        StringBuilder body = new StringBuilder(12 * 1024 * 1024).append("asset_id,day,hours\n");
        long rows = 0;
        while (body.length() <= 11 * 1024 * 1024) {
            for (int d = 0; d < 304; d++, rows++) {
                LocalDate day = LocalDate.of(2026, 1, 1).plusDays(d);
                body.append(p).append(',').append(day).append(',').append(day.getDayOfMonth() % 12).append(".25\n");
            }
        }
        byte[] bytes = body.toString().getBytes(java.nio.charset.StandardCharsets.UTF_8);
        // Sent chunked (a stream of unknown length), as a gateway streams a file.
        as("officer").contentType("text/csv").body(new java.io.ByteArrayInputStream(bytes))
                .post("/api/sensors/readings").then().statusCode(200).body("rowsRead", equalTo((int) rows))
                .body("added", equalTo(304)).body("unchanged", equalTo((int) rows - 304)).body("refused", equalTo(0));
        // March: days 1..31, each day-of-month mod 12 plus a quarter hour.
        double march = java.util.stream.IntStream.rangeClosed(1, 31).mapToDouble(d -> d % 12 + 0.25).sum();
        monthIs(p, "2026-03-01", (float) march, 31);
    }

    private static void monthIs(String asset, String monthStart, float hours, int days) {
        as("officer").get("/api/sensors/pumps/" + asset + "/months").then().statusCode(200)
                .body("months.find { it.monthStart == '" + monthStart + "' }.hours", equalTo(hours))
                .body("months.find { it.monthStart == '" + monthStart + "' }.daysCovered", equalTo(days));
    }
}
