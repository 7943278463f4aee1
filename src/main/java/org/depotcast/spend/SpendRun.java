package org.depotcast.spend;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.LocalDate;
import java.time.OffsetDateTime;

/** One run of a scenario; results (JSON) are written once, when it is done. */
@Entity
@Table(name = "spend_run")
public class SpendRun {
    public enum Status { RUNNING, DONE, FAILED }

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(name = "scenario_id", nullable = false)
    public Long scenarioId;
    /** First day of the projection: nothing dated on or after it is used (null for runs made before origins). */
    public LocalDate origin;
    @jakarta.persistence.Enumerated(jakarta.persistence.EnumType.STRING)
    @Column(nullable = false)
    public Status status;
    public String phase;
    @Column(name = "started_at", nullable = false)
    public OffsetDateTime startedAt;
    @Column(name = "finished_at")
    public OffsetDateTime finishedAt;
    @Column(nullable = false)
    public int draws;
    @Column(nullable = false)
    public long seed;
    public String results;
    public String message;
    /** The background job that computes it (jobs/). */
    @Column(name = "job_id")
    public Long jobId;
}
