package org.depotcast.sensors;

import java.math.BigDecimal;

public record SensorConversionResponse(String pumpModel, BigDecimal strokesPerHour, BigDecimal litresPerHour) {
}
