package org.depotcast.requests;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.AccessScope;
import org.depotcast.core.stats.SampleQuantile;
import org.depotcast.repairs.PartsWaitService;
import org.depotcast.stock.LocationSummary;
import org.depotcast.stock.LocationKind;
import org.depotcast.stock.LocationService;

import java.time.Clock;
import java.time.Duration;
import java.time.LocalDate;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/** Per depot over the last 365 days: hours from request to issue, and pump-days spent waiting for parts. */
@ApplicationScoped
public class RequestReportService {
    private final RequestService requests;
    private final PartsWaitService partsWaits;
    private final LocationService locations;
    private final AccessScope scope;
    private final Clock clock;

    RequestReportService(RequestService requests, PartsWaitService partsWaits, LocationService locations, AccessScope scope,
                         Clock clock) {
        this.requests = requests;
        this.partsWaits = partsWaits;
        this.locations = locations;
        this.scope = scope;
        this.clock = clock;
    }

    @Transactional
    public List<RequestDtos.DepotReport> perDepot() {
        OffsetDateTime since = OffsetDateTime.now(clock).minusDays(365);
        LocalDate today = LocalDate.now(clock);
        Map<String, long[]> waits = partsWaits.waitingForPartsSince(today.minusDays(365));
        // Today's waits: a pump counts once however many parts it waits for, at its longest wait.
        Map<String, Map<String, Long>> waitingNow = new java.util.HashMap<>();
        for (PartsWaitService.PumpWait w : partsWaits.waitingNow(today)) {
            waitingNow.computeIfAbsent(w.depotCode(), k -> new java.util.HashMap<>()).merge(w.assetId(), w.daysWaiting(), Math::max);
        }
        List<PartsRequest> issued = requests.issuedSince(since);
        AccessScope.Scope visible = scope.current();
        List<RequestDtos.DepotReport> out = new ArrayList<>();
        for (LocationSummary depot : locations.summariesOfKind(LocationKind.DEPOT)) {
            if (!visible.sees(depot.id())) {
                continue;
            }
            double[] hours = issued.stream().filter(r -> r.depotId == depot.id())
                    .mapToDouble(r -> Duration.between(r.raisedAt, r.issuedAt).toMinutes() / 60.0).sorted().toArray();
            long[] wait = waits.getOrDefault(depot.code(), new long[2]);
            Map<String, Long> now = waitingNow.getOrDefault(depot.code(), Map.of());
            out.add(new RequestDtos.DepotReport(depot.code(), hours.length,
                    hours.length == 0 ? null : java.util.Arrays.stream(hours).average().orElse(0),
                    hours.length == 0 ? null : SampleQuantile.median(hours), wait[0], wait[1], now.size(),
                    now.values().stream().mapToLong(Long::longValue).sum()));
        }
        return out;
    }
}
