package org.depotcast.sensors;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.math.BigDecimal;
import java.time.LocalDate;

/** A pump whose sensor says it stopped, with no repair open: "probably down" until a repair or use returns. */
@Entity
@Table(name = "sensor_stop_flag")
class StopFlag {
    enum State {
        OPEN("probably down"),
        REPAIR_REPORTED("repair reported"),
        FALSE_ALARM("use came back without a repair");

        final String words;

        State(String words) {
            this.words = words;
        }
    }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    Long id;
    @Column(name = "pump_id", nullable = false)
    Long pumpId;
    @Column(name = "stopped_from", nullable = false)
    LocalDate stoppedFrom;
    @Column(name = "flagged_on", nullable = false)
    LocalDate flaggedOn;
    @Column(nullable = false)
    BigDecimal probability;
    @Column(name = "baseline_hours", nullable = false)
    BigDecimal baselineHours;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    State state;
    @Column(name = "closed_on")
    LocalDate closedOn;
    @Version
    long version;
}
