package org.depotcast;

import io.restassured.specification.RequestSpecification;
import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.catalogue.PartRequest;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.UnitOfIssue;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationRequest;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.MovementCommand;
import org.depotcast.stock.MovementKind;
import org.depotcast.stock.StockLedgerService;

import java.math.BigDecimal;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Supplier;

import static io.restassured.RestAssured.given;

/**
 * Builders for test data that never clash with the demo programme or with other tests. They run as the system (a test
 * thread has no one signed in, and the access scope grants such a caller nothing).
 */
@ApplicationScoped
public class TestData {
    private static final AtomicInteger SEQUENCE = new AtomicInteger();

    private final PartService parts;
    private final LocationService locations;
    private final StockLedgerService ledger;
    private final org.depotcast.access.AccountService accounts;
    private final SystemWork system;

    TestData(PartService parts, LocationService locations, StockLedgerService ledger,
             org.depotcast.access.AccountService accounts, SystemWork system) {
        this.accounts = accounts;
        this.system = system;
        this.parts = parts;
        this.locations = locations;
        this.ledger = ledger;
    }

    public static String unique(String prefix) {
        return prefix + "-" + SEQUENCE.incrementAndGet() + "-" + Long.toString(System.nanoTime() % 100000, 36);
    }

    public static RequestSpecification as(String user) {
        return given().auth().preemptive().basic(user, user + "-demo");
    }

    /** Runs a direct service call as the system, as background work does. */
    public <T> T asSystem(Supplier<T> work) {
        return system.call("test", work);
    }

    public void asSystem(Runnable work) {
        system.run("test", work);
    }

    public String part(UnitOfIssue unit) {
        String number = unique("TP").toUpperCase();
        asSystem(() -> parts.create(new PartRequest(number, "test part", ComponentFamily.CUP_SEAL, unit, 10, 10,
                new BigDecimal("2.50"), "USD", "Test Supplier", 30, null, false, null)));
        return number;
    }

    public String depot() {
        String code = unique("TDEP").toUpperCase();
        asSystem(() -> {
            var depot = locations.create(new LocationRequest(code, "test depot", LocationKind.DEPOT, "CENTRAL", null, null, null));
            accounts.addLocation("officer", depot.id);
        });
        return code;
    }

    public String kit(String depot, String mechanic) {
        String code = unique("TKIT").toUpperCase();
        asSystem(() -> locations.create(new LocationRequest(code, "test kit", LocationKind.KIT, depot, null, null, mechanic)));
        return code;
    }

    /** Puts stock at a location through the ledger, as a count that found it there. */
    public void stock(String part, String location, int quantity) {
        asSystem(() -> ledger.post(MovementCommand.of(MovementKind.COUNT_ADJUSTMENT, part, null, location,
                BigDecimal.valueOf(quantity), "test stock")));
    }
}
