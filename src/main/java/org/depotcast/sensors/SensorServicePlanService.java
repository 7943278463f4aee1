package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.catalogue.PumpModelService;
import org.depotcast.catalogue.PumpModelSummary;
import org.depotcast.fleet.PumpSummary;
import org.depotcast.repairs.ServiceDue;
import org.depotcast.repairs.ServiceDueService;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

/**
 * Service by operating hours for a depot's pumps, week by week with the service-kit parts. Each pump's hours, load
 * and due day are the repairs feature's service schedule ({@link ServiceDueService}), which counts them once by
 * {@link org.depotcast.core.sensors.ServiceByHours}: where a pump's sensor read, its days read replace the recorded
 * estimate for those days (the estimate is taken as even over the span, so an unread day keeps its share of it).
 */
@ApplicationScoped
public class SensorServicePlanService {
    static final int HORIZON_DAYS = 90;

    private final ServiceDueService schedule;
    private final SensorAreas areas;
    private final PumpModelService models;

    SensorServicePlanService(ServiceDueService schedule, SensorAreas areas, PumpModelService models) {
        this.schedule = schedule;
        this.areas = areas;
        this.models = models;
    }

    /** For a depot the caller may see, or for a mechanic naming none, their own pumps and kit ({@link SensorAreas}). */
    @Transactional
    public ServicePlanReport planAt(String depotCode, LocalDate today) {
        SensorArea area = areas.resolve(depotCode);
        Map<String, PumpSummary> byAsset = new HashMap<>();
        area.pumps().forEach(p -> byAsset.put(p.assetId(), p));
        List<ServicePlanReport.PumpDue> rows = new ArrayList<>();
        for (ServiceDueService.Counted c : schedule.countedAt(today, area.mechanic() == null ? area.depotCode() : null)) {
            ServiceDue d = c.due();
            UsageBasis basis = c.measured() == null ? UsageBasis.QUARTERLY_ESTIMATE : UsageBasis.MEASURED_BY_SENSOR;
            rows.add(new ServicePlanReport.PumpDue(d.assetId(), byAsset.get(d.assetId()).assignedMechanic(),
                    basis.words(), d.serviceIntervalHours(), d.hoursSinceService(),
                    c.measured() == null ? 0 : c.measured().hoursRead(), d.hoursPerDay(), d.hoursLeft(), d.dueOn()));
        }
        rows.sort(Comparator.comparing(ServicePlanReport.PumpDue::dueOn, Comparator.nullsLast(Comparator.naturalOrder()))
                .thenComparing(ServicePlanReport.PumpDue::assetId));
        return new ServicePlanReport(area.depotCode(), area.mechanic(), today, rows,
                weeks(area.held(), today, rows, byAsset, models.summariesById()), area.stockWords());
    }

    /** Week k covers today + 7k … today + 7k + 6; a pump already overdue counts in the first week. */
    private static List<ServicePlanReport.Week> weeks(Map<String, BigDecimal> inStock, LocalDate today,
                                                      List<ServicePlanReport.PumpDue> rows,
                                                      Map<String, PumpSummary> byAsset,
                                                      Map<Long, PumpModelSummary> boms) {
        int weekCount = (HORIZON_DAYS + 6) / 7;
        List<List<String>> pumpsDue = new ArrayList<>();
        List<Map<String, Double>> units = new ArrayList<>();
        for (int w = 0; w < weekCount; w++) {
            pumpsDue.add(new ArrayList<>());
            units.add(new TreeMap<>());
        }
        for (ServicePlanReport.PumpDue row : rows) {
            if (row.dueOn() == null || row.dueOn().isAfter(today.plusDays(HORIZON_DAYS - 1L))) {
                continue;
            }
            int week = (int) Math.max(0, ChronoUnit.DAYS.between(today, row.dueOn()) / 7);
            pumpsDue.get(week).add(row.assetId());
            PumpSummary pump = byAsset.get(row.assetId());
            for (PumpModelSummary.Line line : boms.get(pump.modelId()).bom()) {
                double kit = line.serviceKitQuantity(pump.depthM().doubleValue());
                if (kit > 0) {
                    units.get(week).merge(line.partNumber(), kit, Double::sum);
                }
            }
        }
        Map<String, Double> toDate = new TreeMap<>();
        List<ServicePlanReport.Week> weeks = new ArrayList<>();
        for (int w = 0; w < weekCount; w++) {
            List<ServicePlanReport.KitPart> parts = new ArrayList<>();
            units.get(w).forEach((part, u) -> {
                double cumulative = toDate.merge(part, u, Double::sum);
                BigDecimal held = inStock.getOrDefault(part, BigDecimal.ZERO);
                parts.add(new ServicePlanReport.KitPart(part, u, cumulative, held,
                        held.doubleValue() >= Math.ceil(cumulative - 1e-9)));
            });
            weeks.add(new ServicePlanReport.Week(today.plusDays(7L * w), pumpsDue.get(w), parts));
        }
        return weeks;
    }
}
