package org.depotcast.repairs;

import io.quarkus.test.junit.QuarkusTest;
import io.restassured.path.json.JsonPath;
import io.restassured.specification.RequestSpecification;
import jakarta.inject.Inject;
import org.depotcast.TestData;
import org.depotcast.access.AccountService;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.StockQueryService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import static io.restassured.RestAssured.given;
import static org.depotcast.TestData.as;
import static org.hamcrest.Matchers.equalTo;
import static org.hamcrest.Matchers.not;
import static org.hamcrest.Matchers.hasItem;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A repair refused because the kit's books hold fewer parts than it used leaves the depot's stores officer a notice
 * (one per report however often the phone resends it), written apart from the refused repair, which writes nothing;
 * the notice closes when the resend is recorded or when the officer dismisses it, and only the depot's officers see it.
 */
@QuarkusTest
class RefusedRepairResourceTest {
    private static final String PROBLEM = "application/problem+json";
    private static final String PASSWORD = "kit-and-pumps-1";

    @Inject
    TestData data;
    @Inject
    AccountService accounts;
    @Inject
    LocationService locations;
    @Inject
    StockQueryService stock;

    String depot;
    String mechanic;
    String kit;
    String pump;
    String seal;
    String rod;

    @BeforeEach
    void mechanicWithKitAndPump() {
        depot = data.depot();
        mechanic = TestData.unique("mech").toLowerCase();
        kit = data.kit(depot, mechanic);
        data.asSystem(() -> accounts.create(mechanic, PASSWORD, Set.of("mechanic"), locations.require(null, kit).id));
        seal = data.part(UnitOfIssue.EACH);
        rod = data.part(UnitOfIssue.EACH);
        data.stock(seal, kit, 1);
        data.stock(rod, kit, 5);
        pump = TestData.unique("RR").toUpperCase();
        as("officer").contentType("application/json").body(Map.of("assetId", pump, "modelCode", "RB-2", "depthM", 35,
                "installedOn", "2022-05-01", "depotCode", depot, "assignedMechanic", mechanic)).post("/api/pumps")
                .then().statusCode(201);
    }

    private RequestSpecification asMechanic() {
        return given().auth().preemptive().basic(mechanic, PASSWORD);
    }

    private Map<String, Object> repair(String ref, int seals) {
        Map<String, Object> body = new HashMap<>();
        body.put("repairRef", ref);
        body.put("assetId", pump);
        body.put("kind", "BREAKDOWN");
        body.put("reportedOn", "2026-11-20");
        body.put("fixedOn", "2026-11-21");
        body.put("lines", List.of(Map.of("partNumber", seal, "quantity", seals), Map.of("partNumber", rod, "quantity", 1)));
        return body;
    }

    private void sendRefused(String ref, int seals) {
        asMechanic().contentType("application/json").body(repair(ref, seals)).post("/api/repairs").then().statusCode(422)
                .contentType(PROBLEM).body("type", equalTo("/problems/not-enough-stock"));
    }

    private List<Map<String, Object>> notices(String account, String depotCode) {
        return as(account).queryParam("depot", depotCode).get("/api/refused-repairs").then().statusCode(200)
                .extract().jsonPath().getList("$");
    }

    @Test
    void aRefusedRepairIsOneNoticeForTheDepotUntilItsResendIsRecorded() {
        String ref = TestData.unique("phone-rep");
        sendRefused(ref, 2);
        sendRefused(ref, 2);

        List<Map<String, Object>> open = notices("officer", depot);
        assertEquals(1, open.size(), "two sends of one report are one notice: " + open);
        JsonPath notice = new JsonPath(as("officer").queryParam("depot", depot).get("/api/refused-repairs").asString());
        assertEquals(ref, notice.getString("[0].repairRef"));
        assertEquals(mechanic, notice.getString("[0].mechanic"));
        assertEquals(kit, notice.getString("[0].kitCode"));
        assertEquals(depot, notice.getString("[0].depotCode"));
        assertEquals(pump, notice.getString("[0].assetId"));
        assertEquals("2026-11-21", notice.getString("[0].fixedOn"));
        assertEquals(2, notice.getInt("[0].attempts"));
        assertEquals("OPEN", notice.getString("[0].state"));
        // Only the part the books were short of: the rods were there.
        assertEquals(List.of(seal), notice.getList("[0].lines.partNumber"));
        assertEquals(2, notice.getInt("[0].lines[0].unitsUsed"));
        assertEquals(1, notice.getInt("[0].lines[0].unitsHeld"));
        // The refused repair itself wrote nothing.
        as("officer").get("/api/repairs/" + ref).then().statusCode(404);
        assertEquals(0, BigDecimal.valueOf(5).compareTo(stock.onHand(rod, kit)));

        // Another depot's officer neither sees it nor may ask for this depot.
        as("officer2").queryParam("depot", depot).get("/api/refused-repairs").then().statusCode(403).contentType(PROBLEM);
        as("officer2").get("/api/refused-repairs").then().statusCode(200).body("repairRef", not(hasItem(ref)));
        as("lead").get("/api/refused-repairs").then().statusCode(200).body("repairRef", hasItem(ref));
        asMechanic().get("/api/refused-repairs").then().statusCode(403).contentType(PROBLEM);

        // The officer books the missing seal to the kit; the phone sends the same report again and it is recorded.
        as("officer").contentType("application/json").body(Map.of("kind", "COUNT_ADJUSTMENT", "partNumber", seal, "to", kit,
                "quantity", 1, "reference", "kit count", "idempotencyKey", TestData.unique("count"))).post("/api/stock/movements")
                .then().statusCode(201);
        asMechanic().contentType("application/json").body(repair(ref, 2)).post("/api/repairs").then().statusCode(201);
        assertTrue(notices("officer", depot).isEmpty(), "recorded, so no longer a notice");
        String audit = as("admin").queryParam("entityType", "refused-repair").get("/api/audit").asString();
        assertTrue(audit.contains("REFUSED_REPAIR_RECORDED") && audit.contains(ref), audit);
    }

    /**
     * The refusal's answer says whether the officer's notice was written (and which it is), so the phone says "the
     * officer has been told" only when it is true; a write that fails (provoked here) still answers the refusal, saying
     * no notice was recorded.
     */
    @Test
    void theRefusalSaysWhetherTheOfficersNoticeWasRecorded() {
        String ref = TestData.unique("phone-rep");
        Number told = asMechanic().contentType("application/json").body(repair(ref, 2)).post("/api/repairs").then()
                .statusCode(422).contentType(PROBLEM).body("type", equalTo("/problems/not-enough-stock"))
                .body("officerNoticeRecorded", equalTo(true)).extract().path("officerNotice");
        assertEquals(((Number) notices("officer", depot).get(0).get("id")).longValue(), told.longValue());

        NoticeWritesFail.install().fail(true);
        String untold = TestData.unique("phone-rep");
        asMechanic().contentType("application/json").body(repair(untold, 2)).post("/api/repairs").then()
                .statusCode(422).contentType(PROBLEM).body("type", equalTo("/problems/not-enough-stock"))
                .body("detail", equalTo("only 1 of part '" + seal + "' on hand at '" + kit + "', cannot take 2"))
                .body("officerNoticeRecorded", equalTo(false)).body("$", not(org.hamcrest.Matchers.hasKey("officerNotice")));
        as("officer").get("/api/repairs/" + untold).then().statusCode(404);
    }

    @Test
    void theOfficerDismissesANoticeAndTheDismissalIsAudited() {
        String ref = TestData.unique("phone-rep");
        // A part the kit never held is a draw of more than the books show (0) like any other.
        String valve = data.part(UnitOfIssue.EACH);
        Map<String, Object> body = repair(ref, 1);
        body.put("lines", List.of(Map.of("partNumber", valve, "quantity", 1)));
        asMechanic().contentType("application/json").body(body).post("/api/repairs").then().statusCode(422)
                .contentType(PROBLEM).body("type", equalTo("/problems/not-enough-stock"))
                .body("detail", equalTo("only 0 of part '" + valve + "' on hand at '" + kit + "', cannot take 1"));
        assertEquals(0, ((Number) new JsonPath(as("officer").queryParam("depot", depot).get("/api/refused-repairs").asString())
                .getInt("[0].lines[0].unitsHeld")).intValue());
        long id = ((Number) notices("officer", depot).get(0).get("id")).longValue();
        as("officer2").post("/api/refused-repairs/" + id + "/dismiss").then().statusCode(403).contentType(PROBLEM);
        asMechanic().post("/api/refused-repairs/" + id + "/dismiss").then().statusCode(403).contentType(PROBLEM);
        as("officer").post("/api/refused-repairs/" + Long.MAX_VALUE + "/dismiss").then().statusCode(404).contentType(PROBLEM)
                .body("type", equalTo("/problems/not-found"));
        as("officer").post("/api/refused-repairs/" + id + "/dismiss").then().statusCode(200)
                .body("state", equalTo("DISMISSED")).body("closedBy", equalTo("officer"))
                .body("closedReason", equalTo("dismissed by the stores officer"));
        as("officer").post("/api/refused-repairs/" + id + "/dismiss").then().statusCode(200).body("state", equalTo("DISMISSED"));
        assertTrue(notices("officer", depot).isEmpty());
        String audit = as("admin").queryParam("entityType", "refused-repair").get("/api/audit").asString();
        assertTrue(audit.contains("REFUSED_REPAIR_DISMISSED"), audit);
    }

    /**
     * The mechanic discards the refused repair on the phone: the phone withdraws its notice, which leaves the
     * officer's board with the reason in words. Only that mechanic may; a resend of the withdrawal is answered as it is.
     */
    @Test
    void theMechanicWithdrawsTheNoticeOfTheirOwnRefusedRepair() {
        String ref = TestData.unique("phone-rep");
        sendRefused(ref, 2);
        String withdraw = "/api/refused-repairs/by-repair/" + ref + "/withdraw";
        String other = TestData.unique("mech").toLowerCase();
        String otherKit = data.kit(depot, other);
        data.asSystem(() -> accounts.create(other, PASSWORD, Set.of("mechanic"), locations.require(null, otherKit).id));
        given().auth().preemptive().basic(other, PASSWORD).post(withdraw).then().statusCode(403).contentType(PROBLEM)
                .body("type", equalTo("/problems/forbidden"));
        as("officer").post(withdraw).then().statusCode(403).contentType(PROBLEM);
        asMechanic().post("/api/refused-repairs/by-repair/" + TestData.unique("never-sent") + "/withdraw").then()
                .statusCode(404).contentType(PROBLEM).body("type", equalTo("/problems/not-found"));
        assertEquals(1, notices("officer", depot).size(), "refused withdrawals leave it open");

        asMechanic().post(withdraw).then().statusCode(200).body("repairRef", equalTo(ref))
                .body("state", equalTo("WITHDRAWN")).body("closedBy", equalTo(mechanic))
                .body("closedReason", equalTo("withdrawn by the mechanic"));
        asMechanic().post(withdraw).then().statusCode(200).body("state", equalTo("WITHDRAWN"));
        assertTrue(notices("officer", depot).isEmpty(), "withdrawn, so off the officer's board");
        String audit = as("admin").queryParam("entityType", "refused-repair").get("/api/audit").asString();
        assertTrue(audit.contains("REFUSED_REPAIR_WITHDRAWN") && audit.contains(ref), audit);
    }

    @Test
    void closingAnOpenRepairWithPartsNotOnTheBooksLeavesANoticeToo() {
        String ref = TestData.unique("phone-rep");
        Map<String, Object> open = repair(ref, 1);
        open.remove("fixedOn");
        open.put("lines", List.of());
        asMechanic().contentType("application/json").body(open).post("/api/repairs").then().statusCode(201);
        Map<String, Object> close = Map.of("fixedOn", LocalDate.of(2026, 11, 22).toString(),
                "lines", List.of(Map.of("partNumber", seal, "quantity", 4)));
        asMechanic().contentType("application/json").body(close).patch("/api/repairs/" + ref).then().statusCode(422)
                .contentType(PROBLEM).body("type", equalTo("/problems/not-enough-stock"));
        JsonPath notice = new JsonPath(as("officer").queryParam("depot", depot).get("/api/refused-repairs").asString());
        assertEquals(List.of(ref), notice.getList("repairRef"));
        assertEquals("2026-11-22", notice.getString("[0].fixedOn"));
        assertEquals(4, notice.getInt("[0].lines[0].unitsUsed"));
        asMechanic().get("/api/repairs/" + ref).then().statusCode(200).body("fixedOn", equalTo(null));
    }

    private void report(String status, LocalDate since) {
        asMechanic().contentType("application/json").body(Map.of("status", status, "since", since.toString()))
                .post("/api/pumps/" + pump + "/status").then().statusCode(200);
    }

    /**
     * While the refused repair waits on the phone the pump gets newer statuses (working again, then broken again
     * after the repair's dates): the resend after the officer books the parts is still recorded, once, its parts out
     * of the kit once, and the newer status stands. No rule refuses a report for being older than the pump's status
     * on record except the status report itself; a repair's dates are its own.
     */
    @Test
    void aResendAfterANewerStatusOfThePumpIsRecordedOnce() {
        LocalDate today = LocalDate.now(java.time.ZoneOffset.UTC);
        String ref = TestData.unique("phone-rep");
        report("BROKEN", today.minusDays(6));
        Map<String, Object> body = repair(ref, 3);
        body.put("reportedOn", today.minusDays(6).toString());
        body.put("fixedOn", today.minusDays(5).toString());
        asMechanic().contentType("application/json").body(body).post("/api/repairs").then().statusCode(422)
                .body("type", equalTo("/problems/not-enough-stock"));
        report("WORKING", today.minusDays(4));
        report("BROKEN", today.minusDays(2));

        as("officer").contentType("application/json").body(Map.of("kind", "COUNT_ADJUSTMENT", "partNumber", seal, "to", kit,
                "quantity", 2, "reference", "kit count", "idempotencyKey", TestData.unique("count"))).post("/api/stock/movements")
                .then().statusCode(201);
        asMechanic().contentType("application/json").body(body).post("/api/repairs").then().statusCode(201);
        asMechanic().contentType("application/json").body(body).post("/api/repairs").then().statusCode(200);
        assertEquals(List.of(ref), asMechanic().queryParam("asset", pump).get("/api/repairs").then().statusCode(200)
                .extract().jsonPath().getList("repairRef"));
        assertEquals(0, BigDecimal.ZERO.compareTo(stock.onHand(seal, kit)), "1 + 2 booked, 3 used once");
        assertEquals(0, BigDecimal.valueOf(4).compareTo(stock.onHand(rod, kit)));
        as("officer").get("/api/pumps/" + pump).then().statusCode(200).body("status", equalTo("BROKEN"))
                .body("statusSince", equalTo(today.minusDays(2).toString()));
        assertTrue(notices("officer", depot).isEmpty());
    }
}
