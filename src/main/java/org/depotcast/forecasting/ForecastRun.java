package org.depotcast.forecasting;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.LocalDate;
import java.time.OffsetDateTime;

/** One recomputation of every forecast, with its progress while it runs. */
@Entity
@Table(name = "forecast_run")
public class ForecastRun {
    public enum Status { RUNNING, DONE, FAILED }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "trigger_kind", nullable = false)
    public String triggerKind;
    @jakarta.persistence.Enumerated(jakarta.persistence.EnumType.STRING)
    @Column(nullable = false)
    public Status status;
    @Column(name = "started_at", nullable = false)
    public OffsetDateTime startedAt;
    @Column(name = "finished_at")
    public OffsetDateTime finishedAt;
    /** First day of the forecast's first month: nothing dated on or after it was used. */
    public LocalDate origin;
    @Column(name = "history_from")
    public LocalDate historyFrom;
    @Column(name = "history_to")
    public LocalDate historyTo;
    @Column(name = "horizon_months", nullable = false)
    public int horizonMonths;
    @Column(name = "series_total", nullable = false)
    public int seriesTotal;
    @Column(name = "series_done", nullable = false)
    public int seriesDone;
    public String message;
    /** The background job that computes it (jobs/): state and progress for any instance to answer a poll. */
    @Column(name = "job_id")
    public Long jobId;
    /** Whoever started its job: an account name, or {@code system:<purpose>} for the nightly schedule. */
    @Column(name = "started_by")
    public String startedBy;
}
