package org.depotcast.sensors;

import java.math.BigDecimal;
import java.time.LocalDate;
import java.util.List;

/**
 * Service by operating hours at one depot (or, for a mechanic naming none, at their own pumps against their kit):
 * each pump's hours since its last service (measured where its sensor read, the recorded estimate elsewhere), its
 * recent daily load and the day it reaches its interval, soonest first (a mechanic's visit order); and per week of the next {@value SensorServicePlanService#HORIZON_DAYS} days the pumps
 * falling due and the service-kit parts they need, cumulative, against the stock named by {@code stockCounted}.
 */
public record ServicePlanReport(String depotCode, String mechanic, LocalDate today, List<PumpDue> pumps,
                                List<Week> weeks, String stockCounted) {
    public record PumpDue(String assetId, String assignedMechanic, String usageBasis, int serviceIntervalHours,
                          double hoursSinceService, double measuredHours, double recentHoursPerDay, double hoursLeft,
                          LocalDate dueOn) {
    }

    public record Week(LocalDate weekStart, List<String> pumpsDue, List<KitPart> parts) {
    }

    /** Units of a service-kit part needed in the week and up to its end, against stock at the depot and its kits. */
    public record KitPart(String partNumber, double unitsThisWeek, double unitsToDate, BigDecimal inStock,
                          boolean enoughInStock) {
    }
}
