package org.depotcast.forecasting;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.LocalDate;
import java.time.OffsetDateTime;

/** One accuracy report: an as-of forecast run scored against the 12 months after its origin. */
@Entity
@Table(name = "accuracy_report")
class AccuracyReport {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    Long id;
    @Column(name = "job_id", nullable = false)
    Long jobId;
    @Column(nullable = false)
    LocalDate origin;
    @Column(name = "forecast_run_id")
    Long forecastRunId;
    @Column(name = "created_by", nullable = false)
    String createdBy;
    @Column(name = "created_at", nullable = false)
    OffsetDateTime createdAt;
    /** {@link AccuracyResults} as JSON, written once when the report is done. */
    String results;
}
