package org.depotcast.demo;

import io.quarkus.logging.Log;
import io.quarkus.narayana.jta.QuarkusTransaction;
import io.quarkus.runtime.StartupEvent;
import jakarta.annotation.Priority;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Observes;
import org.depotcast.access.AccountService;
import org.depotcast.access.Roles;
import org.depotcast.access.SystemWork;
import org.depotcast.catalogue.PartService;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.fleet.PumpCsv;
import org.depotcast.fleet.UsageService;
import org.depotcast.repairs.RepairHistoryCsv;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;
import org.depotcast.stock.PurchaseOrderService;
import org.depotcast.stock.StockCountService;
import org.eclipse.microprofile.config.inject.ConfigProperty;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.function.ToIntFunction;

/**
 * On the first start in demo mode (empty catalogue), loads the invented demo programme from seed-data/ through the
 * same CSV imports a user has, and creates the demo accounts ({@code <name>}/{@code <name>-demo}).
 */
@ApplicationScoped
class DemoProgrammeLoader {
    private final PartService parts;
    private final PumpModelService models;
    private final LocationService locations;
    private final PumpCsv pumps;
    private final UsageService usage;
    private final RepairHistoryCsv repairs;
    private final StockCountService counts;
    private final PurchaseOrderService orders;
    private final AccountService accounts;
    private final SystemWork system;
    private final String mode;
    private final Path seedDirectory;

    DemoProgrammeLoader(PartService parts, PumpModelService models, LocationService locations, PumpCsv pumps,
                        UsageService usage, RepairHistoryCsv repairs, StockCountService counts,
                        PurchaseOrderService orders, AccountService accounts, SystemWork system,
                        @ConfigProperty(name = "depotcast.mode") String mode,
                        @ConfigProperty(name = "depotcast.seed.directory") String seedDirectory) {
        this.parts = parts;
        this.models = models;
        this.locations = locations;
        this.pumps = pumps;
        this.usage = usage;
        this.repairs = repairs;
        this.counts = counts;
        this.orders = orders;
        this.accounts = accounts;
        this.system = system;
        this.mode = mode;
        this.seedDirectory = Path.of(seedDirectory);
    }

    void load(@Observes @Priority(20) StartupEvent event) {
        system.run("demo-load", this::loadIfEmpty);
    }

    private void loadIfEmpty() {
        if (!"demo".equals(mode) || !parts.all().isEmpty()) {
            return;
        }
        if (!Files.isDirectory(seedDirectory)) {
            Log.warnf("demo mode, but no seed data at %s: starting empty", seedDirectory.toAbsolutePath());
            return;
        }
        long started = System.nanoTime();
        // One transaction: an interrupted first start leaves an empty database, never a half-loaded one.
        QuarkusTransaction.requiringNew().timeout(900).run(this::loadAll);
        Log.infof("demo programme loaded from %s in %d ms", seedDirectory, (System.nanoTime() - started) / 1_000_000);
    }

    private void loadAll() {
        load("locations.csv", locations::importCsv);
        load("parts.csv", parts::importCsv);
        load("pump-models.csv", models::importCsv);
        load("pumps.csv", pumps::importCsv);
        load("usage-readings.csv", usage::importCsv);
        load("repairs.csv", repairs::importCsv);
        load("opening-stock.csv", counts::importCsv);
        load("purchase-orders.csv", orders::importCsv);
        createDemoAccounts();
    }

    private void load(String file, ToIntFunction<InputStream> importer) {
        try (InputStream in = Files.newInputStream(seedDirectory.resolve(file))) {
            int rows = importer.applyAsInt(in);
            Log.infof("loaded %d rows from %s", rows, file);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read demo file " + file, e);
        }
    }

    private void createDemoAccounts() {
        if (accounts.count() > 0) {
            return;
        }
        accounts.create("officer", "officer-demo", Set.of(Roles.STORES_OFFICER), null);
        accounts.assignLocations("officer", java.util.stream.Stream.concat(
                locations.summariesOfKind(LocationKind.CENTRAL_STORE).stream(),
                locations.summariesOfKind(LocationKind.DEPOT).stream()).map(LocationSummary::id).toList());
        // A second officer who runs one depot only: shows how stores officers are scoped.
        accounts.create("officer2", "officer2-demo", Set.of(Roles.STORES_OFFICER), null);
        accounts.assignLocations("officer2", List.of(locations.requireSummary("location", "DEP-PELLOWDENE").id()));
        accounts.create("lead", "lead-demo", Set.of(Roles.PROGRAMME_LEAD), null);
        accounts.create("admin", "admin-demo", Set.of(Roles.ADMIN), null);
        for (LocationSummary kit : locations.summariesOfKind(LocationKind.KIT)) {
            String name = kit.mechanicUsername();
            accounts.create(name, name + "-demo", Set.of(Roles.MECHANIC), kit.id());
        }
    }
}
