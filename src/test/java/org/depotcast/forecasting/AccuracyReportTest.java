package org.depotcast.forecasting;

import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.response.Response;
import jakarta.inject.Inject;
import jakarta.persistence.EntityManager;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The accuracy report end to end on the demo programme, and its refusals. */
@QuarkusTest
class AccuracyReportTest {
    private static final String PROBLEM = "application/problem+json";
    private static final String REPORTS = "/api/forecast/accuracy-reports";

    @Inject
    EntityManager em;

    @Test
    void originsThatCannotBeCheckedAreRefused() {
        LocalDate tooRecent = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1).minusMonths(11);
        TestData.as("lead").post(REPORTS + "?origin=" + tooRecent).then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("origin")).body("errors[0].message", containsString("12 months"));
        TestData.as("lead").post(REPORTS).then().statusCode(400).contentType(PROBLEM).body("errors.field", hasItem("origin"));
        // Sent in a JSON body, it is still missing where it is read, and the answer says where that is.
        TestData.as("lead").contentType("application/json").body(java.util.Map.of("origin", "2025-12-01")).post(REPORTS)
                .then().statusCode(400).contentType(PROBLEM).body("errors[0].field", org.hamcrest.Matchers.equalTo("origin"))
                .body("errors[0].message", org.hamcrest.Matchers.startsWith("is required, as a query parameter (?origin="));
        TestData.as("lead").post(REPORTS + "?origin=last-year").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("origin"));
        // Before the register's first pump there is nothing to forecast from: refused, not an empty report.
        TestData.as("lead").post(REPORTS + "?origin=1900-01-01").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("origin")).body("errors[0].message", containsString("first pump"));
        TestData.as("officer").post(REPORTS + "?origin=2024-01-01").then().statusCode(403);
        TestData.as("mechanic1").get(REPORTS + "/1").then().statusCode(403);
        TestData.as("lead").get(REPORTS + "/987654").then().statusCode(404).contentType(PROBLEM);
    }

    @Test
    void aPastYearIsScoredAgainstTheRepairRecords() throws InterruptedException {
        LocalDate origin = LocalDate.now(ZoneOffset.UTC).withDayOfMonth(1).minusMonths(12);
        Integer planningRunBefore = planningRunId();
        Response accepted = TestData.as("lead").post(REPORTS + "?origin=" + origin);
        accepted.then().statusCode(202).body("job.kind", equalTo("ACCURACY_REPORT"));
        String location = accepted.header("Location");
        assertTrue(location.endsWith(REPORTS + "/" + accepted.path("id")), location);
        JsonPath report = pollToEnd(location.substring(location.indexOf("/api/")));
        assertEquals("DONE", report.getString("job.state"), report.prettify());

        List<Map<String, Object>> rows = report.getList("results.rows");
        assertFalse(rows.isEmpty());
        // Every consumption counts once at the programme and once at its depot.
        Map<String, Double> programme = new HashMap<>(), depots = new HashMap<>();
        for (Map<String, Object> row : rows) {
            double actual = ((Number) row.get("actual")).doubleValue();
            Map<String, Double> into = "PROGRAMME".equals(row.get("level")) ? programme : "DEPOT".equals(row.get("level")) ? depots : null;
            if (into != null) {
                into.merge((String) row.get("partNumber"), actual, Double::sum);
            }
        }
        programme.forEach((part, total) -> assertEquals(total, depots.getOrDefault(part, 0.0), 1e-9, part));
        // The programme's actual total is what the repair table holds for the repairs reported in the 12 months (one
        // open on the origin was history to the forecast), for the parts forecast at the origin (parts made after it,
        // e.g. by other tests, have no series; the report's notes count them).
        double recorded = unitsReplaced(origin, origin.plusMonths(12), programme.keySet());
        assertTrue(recorded > 0);
        assertEquals(recorded, programme.values().stream().mapToDouble(Double::doubleValue).sum(), 1e-6);
        checkSummary(report, rows, "PROGRAMME", "service");
        checkSummary(report, rows, "DEPOT", "mean12");
        // The as-of run stays out of planning's way.
        assertEquals(planningRunBefore, planningRunId());
        TestData.as("lead").get("/api/forecast/runs/" + report.getLong("forecastRunId")).then().statusCode(200)
                .body("trigger", equalTo("as-of")).body("origin", equalTo(origin.toString()))
                .body("startedBy", equalTo("lead"));
        TestData.as("officer").get(location.substring(location.indexOf("/api/"))).then().statusCode(200);
        // Listed among the earlier reports, newest first, with its origin and its job's state.
        TestData.as("officer").get(REPORTS + "?limit=100").then().statusCode(200)
                .body("find { it.id == " + accepted.path("id") + " }.origin", equalTo(origin.toString()))
                .body("find { it.id == " + accepted.path("id") + " }.job.state", equalTo("DONE"));
        List<Integer> listed = TestData.as("lead").get(REPORTS).then().statusCode(200).extract().path("id");
        assertTrue(listed.size() <= 20 && !listed.isEmpty(), listed.toString());
        for (int i = 1; i < listed.size(); i++) {
            assertTrue(listed.get(i - 1) > listed.get(i), "newest first: " + listed);
        }
        TestData.as("lead").get(REPORTS + "?limit=0").then().statusCode(400).contentType(PROBLEM)
                .body("errors.field", hasItem("limit"));
        // The report covers every depot: an officer of one depot does not read it.
        TestData.as("officer2").get(location.substring(location.indexOf("/api/"))).then().statusCode(403);
        String csv = TestData.as("officer").get(REPORTS + "/" + accepted.path("id") + "/rows.csv").then().statusCode(200)
                .extract().asString();
        assertTrue(csv.startsWith("part_number,location,level,origin,actual,service_forecast"), csv.substring(0, 80));
        assertEquals(rows.size() + 1, csv.strip().split("\r?\n").length);
    }

    /** MAE and total bias of a level and method, recomputed here from the rows the report lists. */
    private static void checkSummary(JsonPath report, List<Map<String, Object>> rows, String level, String method) {
        double absolute = 0, forecast = 0, actual = 0;
        int n = 0, in80 = 0;
        for (Map<String, Object> row : rows) {
            if (level.equals(row.get("level"))) {
                @SuppressWarnings("unchecked")
                Map<String, Object> score = (Map<String, Object>) row.get(method);
                absolute += Math.abs(((Number) score.get("error")).doubleValue());
                forecast += ((Number) score.get("forecast")).doubleValue();
                actual += ((Number) row.get("actual")).doubleValue();
                in80 += Boolean.TRUE.equals(score.get("inside80")) ? 1 : 0;
                n++;
            }
        }
        Map<String, Object> summary = report.getMap("results.summaries.find { it.level == '" + level
                + "' && it.method == '" + method + "' }");
        assertEquals(n, ((Number) summary.get("series")).intValue());
        assertEquals(absolute / n, ((Number) summary.get("mae")).doubleValue(), 1e-4);
        assertEquals(100 * (forecast - actual) / actual, ((Number) summary.get("totalBiasPercent")).doubleValue(), 1e-4);
        assertEquals(100.0 * in80 / n, ((Number) summary.get("coverage80")).doubleValue(), 1e-4);
    }

    private double unitsReplaced(LocalDate from, LocalDate to, java.util.Set<String> partNumbers) {
        return QuarkusTransaction.requiringNew().call(() -> ((Number) em.createNativeQuery("""
                        select coalesce(sum(l.quantity), 0) from repair_line l join repair r on r.id = l.repair_id
                        join part p on p.id = l.part_id
                        where r.reported_on >= ?1 and r.reported_on < ?2 and p.part_number in (?3)""")
                .setParameter(1, from).setParameter(2, to).setParameter(3, partNumbers).getSingleResult()).doubleValue());
    }

    private static Integer planningRunId() {
        List<Integer> ids = TestData.as("lead").get("/api/forecast/runs?status=DONE&limit=100").then().statusCode(200)
                .extract().path("findAll { it.trigger != 'as-of' }.id");
        return ids.isEmpty() ? null : ids.get(0);
    }

    private static JsonPath pollToEnd(String path) throws InterruptedException {
        long deadline = System.nanoTime() + 120_000_000_000L;
        while (System.nanoTime() < deadline) {
            JsonPath body = TestData.as("officer").get(path).then().statusCode(200).extract().jsonPath();
            if (!"RUNNING".equals(body.getString("job.state"))) {
                return body;
            }
            Thread.sleep(200);
        }
        throw new AssertionError("the report did not finish within 2 minutes");
    }
}
