package org.depotcast.sensors;

import java.util.List;

/**
 * One pump's measured months and where its daily load comes from ("measured by sensor" when its recent months hold
 * enough days, else "quarterly estimate").
 */
public record PumpSensorUsage(String assetId, UsageBasis usageBasis, String usageBasisInWords,
                              Double measuredHoursPerDay, List<MonthlyOperatingHours> months) {
}
