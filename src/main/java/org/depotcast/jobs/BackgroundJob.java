package org.depotcast.jobs;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;

import java.time.OffsetDateTime;

/**
 * One background job. The instance running it refreshes {@link #heartbeatAt}; a running job whose heartbeat is older
 * than the configured limit belongs to an instance that died and is marked failed by any other instance.
 */
@Entity
@Table(name = "background_job")
class BackgroundJob {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    Long id;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    JobKind kind;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    JobState state;
    String phase;
    @Column(name = "progress_done", nullable = false)
    int progressDone;
    @Column(name = "progress_total", nullable = false)
    int progressTotal;
    @Column(name = "started_by", nullable = false)
    String startedBy;
    @Column(name = "started_at", nullable = false)
    OffsetDateTime startedAt;
    @Column(name = "finished_at")
    OffsetDateTime finishedAt;
    @Column(name = "owner_instance", nullable = false)
    String ownerInstance;
    @Column(name = "heartbeat_at", nullable = false)
    OffsetDateTime heartbeatAt;
    /** Safe for any client to read: never an exception's class or message. */
    String message;

    JobView view() {
        return new JobView(id, kind, kind.words(), state, state.words(), phase, progressDone, progressTotal, startedBy, startedAt,
                finishedAt, ownerInstance, heartbeatAt, message);
    }
}
