package org.depotcast.planning;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.LocalDate;
import java.time.OffsetDateTime;

/** An officer's acknowledgement or snooze of an alert; kept as a record of who saw what, never edited. */
@Entity
@Table(name = "alert_action")
public class AlertAction {
    public enum Action { ACKNOWLEDGE, SNOOZE }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "part_id", nullable = false)
    public Long partId;
    @Column(name = "location_code", nullable = false)
    public String locationCode;
    @Enumerated(EnumType.STRING)
    @Column(name = "alert_kind", nullable = false)
    public AlertKind alertKind;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public Action action;
    /** Every reason the alert had when the action was taken, comma-separated; {@code alertKind} is the first. */
    public String reasons;
    @Column(name = "snoozed_until")
    public LocalDate snoozedUntil;
    public String note;
    @Column(nullable = false)
    public String actor;
    @Column(name = "acted_at", nullable = false)
    public OffsetDateTime actedAt;
}
