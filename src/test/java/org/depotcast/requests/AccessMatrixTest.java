package org.depotcast.requests;

import io.quarkus.test.junit.QuarkusTest;
import jakarta.inject.Inject;
import org.depotcast.forecasting.ForecastRunService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;

/**
 * Role × endpoint group × own/other depot. officer2 runs DEP-PELLOWDENE only; mechanic1 carries KIT-M01 at
 * DEP-TESHVALE; officer runs the central store and all three depots. Every refusal is a 403 problem.
 */
@QuarkusTest
class AccessMatrixTest {
    @Inject
    ForecastRunService runs;

    /** Planning answers 409 before the first forecast run: the cells below are about access, so one must exist. */
    @BeforeEach
    void forecastsExist() {
        if (runs.latestFinished().isEmpty()) {
            runs.runNow("test", java.time.LocalDate.of(2026, 12, 2));
        }
    }

    @ParameterizedTest(name = "{0} {1} {2} -> {3}")
    @CsvSource({
            // stock, own and other depot
            "officer2, GET, /api/stock/balances?location=DEP-PELLOWDENE, 200",
            "officer2, GET, /api/stock/balances?location=DEP-TESHVALE, 403",
            "officer2, GET, /api/stock/movements?location=DEP-TESHVALE, 403",
            "officer2, GET, /api/stock/counts/export?location=DEP-TESHVALE, 403",
            "mechanic1, GET, /api/stock/balances?location=KIT-M01, 200",
            "mechanic1, GET, /api/stock/balances?location=KIT-M02, 403",
            "mechanic1, GET, /api/stock/balances?location=DEP-TESHVALE, 403",
            "lead, GET, /api/stock/balances?location=DEP-TESHVALE, 200",
            // fleet and repairs
            "officer2, GET, /api/pumps?depot=DEP-PELLOWDENE, 200",
            "officer2, GET, /api/pumps?depot=DEP-MARROWFORD, 403",
            "mechanic1, GET, /api/pumps?depot=DEP-TESHVALE, 403",
            // catalogue: everyone reads, mechanics and leads do not edit
            "mechanic1, GET, /api/parts, 200",
            "mechanic1, POST, /api/parts, 403",
            "lead, POST, /api/parts, 403",
            // purchase orders and plans
            "mechanic1, POST, /api/purchase-orders, 403",
            "officer2, GET, /api/planning/purchase-plans/1, 403",
            "officer2, GET, /api/planning/policies, 403",
            "officer2, GET, /api/planning/policies?location=DEP-PELLOWDENE, 200",
            "officer2, GET, /api/planning/policies?location=DEP-TESHVALE, 403",
            "officer2, GET, /api/planning/alerts?location=DEP-TESHVALE, 403",
            // forecasts: programme-wide only for the lead and the central store
            "officer2, GET, /api/forecast/parts/OB-CS-50, 403",
            "mechanic1, GET, /api/forecast/locations/DEP-TESHVALE, 403",
            // background jobs: status for officers of any location; the accuracy report for the programme's view
            "mechanic1, GET, /api/jobs, 403",
            "officer2, GET, /api/jobs, 200",
            "lead, GET, /api/jobs, 200",
            "officer, POST, /api/forecast/accuracy-reports?origin=2020-01-01, 403",
            "officer2, GET, /api/forecast/accuracy-reports/1, 403",
            "officer2, GET, /api/forecast/accuracy-reports, 403",
            "mechanic1, GET, /api/forecast/accuracy-reports/1, 403",
            // requests
            "officer, POST, /api/requests, 403",
            "mechanic1, POST, /api/requests/1/approve, 403",
            "mechanic1, POST, /api/requests/1/issue, 403",
            // accounts and audit
            "officer, GET, /api/accounts, 403",
            "lead, GET, /api/accounts, 403",
            "admin, GET, /api/accounts, 200",
            "officer, GET, /api/audit, 403",
            "mechanic1, GET, /api/audit, 403",
            "lead, GET, /api/audit, 200",
            "lead, GET, /api/audit/export, 200",
    })
    void accessIsScoped(String user, String method, String path, int status) {
        var request = as(user).contentType("application/json").body("{}");
        var response = method.equals("GET") ? request.get(path) : request.post(path);
        response.then().statusCode(status);
        if (status == 403) {
            response.then().contentType("application/problem+json");
        }
    }

    private static final String PART = "{\"partNumber\":\"{unique}\",\"description\":\"matrix part\","
            + "\"family\":\"CUP_SEAL\",\"unitOfIssue\":\"EACH\",\"packSize\":1,\"minOrderQty\":1,\"unitCost\":1.5,"
            + "\"currency\":\"USD\",\"supplier\":\"Matrix Supplies\",\"leadTimeDays\":30,\"critical\":false}";
    private static final String MODEL = "{\"code\":\"{unique}\",\"name\":\"matrix model\",\"serviceIntervalHours\":9125,"
            + "\"bom\":[{\"partNumber\":\"OB-CS-50\",\"basis\":\"PER_PUMP\",\"quantity\":1}]}";

    /**
     * Programme-wide things. The catalogue (parts, substitutes, pump models) is kept by the central store's officers
     * and admins; depot officers and mechanics read it. Programme forecast runs, fleet-model fits, purchase plans and
     * spend are for the lead, admins and central-store officers. Mechanics read no programme-wide fits or run counts.
     * Bodies are valid, so a refusal is the access rule and not the validation.
     */
    @ParameterizedTest(name = "{0} {1} {2} -> {4}")
    @CsvSource(delimiter = '|', value = {
            // catalogue: read by all, changed by the central store and admins
            "officer2 | GET | /api/parts | | 200",
            "officer2 | GET | /api/pump-models | | 200",
            "mechanic1 | GET | /api/pump-models | | 200",
            "officer2 | POST | /api/parts | PART | 403",
            "officer2 | PUT | /api/parts/OB-CS-50 | PART | 403",
            "officer2 | POST | /api/parts/import | CSV | 403",
            "officer2 | POST | /api/parts/OB-CS-50/substitutes | {\"partNumber\":\"OB-CS-63\"} | 403",
            "officer2 | POST | /api/pump-models | MODEL | 403",
            "officer | POST | /api/parts | PART | 201",
            "admin | POST | /api/parts | PART | 201",
            "officer | POST | /api/pump-models | MODEL | 201",
            "lead | POST | /api/pump-models | MODEL | 403",
            "mechanic1 | POST | /api/pump-models | MODEL | 403",
            // programme forecasts and fits
            "officer2 | POST | /api/forecast/runs | | 403",
            "mechanic1 | POST | /api/forecast/runs | | 403",
            "officer2 | GET | /api/forecast/fleet-models/pump_rod | | 403",
            "mechanic1 | GET | /api/forecast/fleet-models/pump_rod | | 403",
            "mechanic1 | GET | /api/forecast/runs/1 | | 403",
            // purchase plans and spend
            "officer2 | POST | /api/planning/purchase-plans | {\"budget\":100} | 403",
            "officer2 | POST | /api/spend/scenarios | {\"name\":\"{unique}\",\"horizonYears\":1} | 403",
            "officer2 | GET | /api/spend/scenarios | | 403",
            "officer2 | GET | /api/spend/runs/1 | | 403",
            "mechanic1 | GET | /api/spend/scenarios | | 403",
            "officer | GET | /api/spend/scenarios | | 200",
            "lead | GET | /api/spend/scenarios | | 200",
    })
    void programmeWideThings(String user, String method, String path, String body, int status) {
        String unique = org.depotcast.TestData.unique("MX").toUpperCase();
        String content = body == null ? "" : switch (body) {
            case "PART" -> PART.replace("{unique}", unique);
            case "MODEL" -> MODEL.replace("{unique}", unique);
            case "CSV" -> "part_number,description,family,unit_of_issue,pack_size,min_order_qty,unit_cost,currency,"
                    + "supplier,lead_time_days,shelf_life_days\n" + unique + ",csv part,CUP_SEAL,EACH,1,1,1.5,USD,S,30,\n";
            default -> body.replace("{unique}", unique);
        };
        if (path.equals("/api/parts/OB-CS-50")) {
            content = PART.replace("{unique}", "OB-CS-50");
        }
        var request = as(user).contentType(body != null && body.equals("CSV") ? "text/csv" : "application/json")
                .body(content);
        var response = switch (method) {
            case "GET" -> request.get(path);
            case "PUT" -> request.put(path);
            default -> request.post(path);
        };
        response.then().statusCode(status);
        if (status == 403) {
            response.then().contentType("application/problem+json");
        }
    }

    @ParameterizedTest(name = "anonymous {0} -> 401")
    @CsvSource({"/api/parts", "/api/stock/balances", "/api/requests", "/api/audit", "/api/accounts"})
    void everyApiNeedsSignIn(String path) {
        given().get(path).then().statusCode(401);
    }
}
