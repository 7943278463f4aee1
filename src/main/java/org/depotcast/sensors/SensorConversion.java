package org.depotcast.sensors;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.math.BigDecimal;

/** How a pump model's sensor counts turn into hours of use: strokes or litres per hour (either may be unset). */
@Entity
@Table(name = "sensor_conversion")
class SensorConversion {
    @Id
    @Column(name = "pump_model_id")
    Long pumpModelId;
    @Column(name = "strokes_per_hour")
    BigDecimal strokesPerHour;
    @Column(name = "litres_per_hour")
    BigDecimal litresPerHour;
    @Version
    long version;
}
