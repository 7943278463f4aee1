package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import org.junit.jupiter.api.Test;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The pump list's service due ({@code /api/pumps/service-due}) and the sensor service plan ({@code
 * /api/sensors/service-plan}) give the same hours, load and due day for the demo's pumps, measured by sensor or not.
 */
@QuarkusTest
class ServiceDueAgreementTest {
    @Test
    void theTwoEndpointsAgreeOnTheDemosPumpsWithAndWithoutSensors() {
        List<Map<String, Object>> listed = as("officer").queryParam("depot", "DEP-TESHVALE")
                .get("/api/pumps/service-due").then().statusCode(200).extract().jsonPath().getList("$");
        Map<String, Map<String, Object>> byAsset = new HashMap<>();
        listed.forEach(d -> byAsset.put((String) d.get("assetId"), d));
        List<Map<String, Object>> planned = as("officer").queryParam("depot", "DEP-TESHVALE")
                .get("/api/sensors/service-plan").then().statusCode(200).extract().jsonPath().getList("pumps");
        Map<String, Integer> compared = new HashMap<>();
        for (Map<String, Object> row : planned) {
            String asset = (String) row.get("assetId");
            if (!asset.startsWith("OB-")) {
                continue;
            }
            Map<String, Object> due = byAsset.get(asset);
            assertTrue(due != null, asset + " is on both lists");
            assertEquals(number(row, "hoursSinceService"), number(due, "hoursSinceService"), 1e-9, asset);
            assertEquals(number(row, "recentHoursPerDay"), number(due, "hoursPerDay"), 1e-9, asset);
            assertEquals(number(row, "hoursLeft"), number(due, "hoursLeft"), 1e-9, asset);
            assertEquals(row.get("dueOn"), due.get("dueOn"), asset);
            compared.merge((String) row.get("usageBasis"), 1, Integer::sum);
        }
        assertTrue(compared.getOrDefault(UsageBasis.MEASURED_BY_SENSOR.words(), 0) > 0, compared.toString());
        assertTrue(compared.getOrDefault(UsageBasis.QUARTERLY_ESTIMATE.words(), 0) > 0, compared.toString());
        assertEquals(planned.stream().filter(r -> ((String) r.get("assetId")).startsWith("OB-")).count(),
                listed.stream().filter(d -> ((String) d.get("assetId")).startsWith("OB-")).count(),
                "the same demo pumps on both");
    }

    private static double number(Map<String, Object> row, String field) {
        return ((Number) row.get(field)).doubleValue();
    }
}
