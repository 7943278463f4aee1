package org.depotcast.sensors;

import io.quarkus.test.junit.QuarkusTest;
import org.depotcast.TestData;
import org.junit.jupiter.api.Test;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import static org.depotcast.TestData.as;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * The hours since a service for a pump with a sensor count the days read and the days not read over one span, the
 * days from the service up to today (today not included), as the recorded estimate does.
 */
@QuarkusTest
class ServiceDueSpanTest {
    @Test
    void daysReadAndDaysUnreadShareTheEstimatesSpan() {
        LocalDate today = LocalDate.now(ZoneOffset.UTC);
        LocalDate serviced = today.minusDays(10);
        String asset = SensorIntakeTest.pump("DEP-TESHVALE", "RB-2");
        as("officer").contentType("application/json").body(Map.of("readOn", today.minusDays(40).toString(),
                "hoursPerDay", 3, "source", "SURVEYED")).post("/api/pumps/" + asset + "/usage").then().statusCode(201);
        as("officer").contentType("application/json").body(Map.of("repairRef", TestData.unique("svc"), "assetId", asset,
                "kind", "PREVENTIVE", "reportedOn", serviced.toString(), "fixedOn", serviced.toString(), "lines", List.of()))
                .post("/api/repairs").then().statusCode(201);
        // Read at 2 h a day on the service's 6th to 10th day and today (at most 6 days a month: the typed 3 h a day
        // stays the estimate).
        StringBuilder file = new StringBuilder("asset_id,day,hours\n");
        for (LocalDate day = serviced.plusDays(5); !day.isAfter(today); day = day.plusDays(1)) {
            file.append(asset).append(',').append(day).append(",2\n");
        }
        SensorIntakeTest.csv("officer", file.toString()).then().statusCode(200);

        Map<String, Object> due = as("officer").queryParam("depot", "DEP-TESHVALE").get("/api/pumps/service-due")
                .then().statusCode(200).extract().jsonPath().<Map<String, Object>>getList("$").stream()
                .filter(d -> asset.equals(d.get("assetId"))).findFirst().orElseThrow();
        assertEquals(serviced.toString(), due.get("countedFrom"));
        // By hand: the span is the 10 days from the service to today. 5 of them read at 2 h = 10 h; the other 5
        // unread, half the estimate of 10 days × 3 h = 15 h. 25 h (today's reading is outside the span, as in the
        // estimate; counting it gave 12 h read + 0.4 × 30 h = 24 h).
        assertEquals(25.0, ((Number) due.get("hoursSinceService")).doubleValue(), 1e-9);
    }
}
