package org.depotcast.sensors;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.fleet.PumpQueryService;
import org.depotcast.fleet.PumpSummary;

import java.util.List;

/** A pump's sensor view for those who may see the pump. */
@ApplicationScoped
public class SensorPumpService {
    private final PumpQueryService pumps;
    private final SensorUsageQuery usage;

    SensorPumpService(PumpQueryService pumps, SensorUsageQuery usage) {
        this.pumps = pumps;
        this.usage = usage;
    }

    @Transactional
    public PumpSensorUsage usageOf(String assetId) {
        PumpSummary pump = pumps.requireVisible("assetId", assetId);
        List<MonthlyOperatingHours> months = usage.monthsOf(pump.id());
        MeasuredUsage measured = usage.measuredUsageOf(pump.id(), org.depotcast.common.DateBounds.today());
        UsageBasis basis = measured == null ? UsageBasis.QUARTERLY_ESTIMATE : UsageBasis.MEASURED_BY_SENSOR;
        return new PumpSensorUsage(pump.assetId(), basis, basis.words(),
                measured == null ? null : measured.hoursPerDay(), months);
    }
}
