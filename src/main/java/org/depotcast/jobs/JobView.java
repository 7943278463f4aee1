package org.depotcast.jobs;

import java.time.OffsetDateTime;

/**
 * A background job as other features and clients see it.
 *
 * @param kindWords     the kind in words
 * @param state         RUNNING, DONE or FAILED
 * @param stateWords    the state in words
 * @param phase         what the job is doing now, in words
 * @param progressDone  units of work done (series, lines: see {@code phase})
 * @param progressTotal units of work in all; 0 while not yet known
 * @param ownerInstance the service instance running it
 * @param message       a safe summary on completion or failure, never an exception's text
 */
public record JobView(long id, JobKind kind, String kindWords, JobState state, String stateWords, String phase, int progressDone,
                      int progressTotal, String startedBy, OffsetDateTime startedAt, OffsetDateTime finishedAt,
                      String ownerInstance, OffsetDateTime heartbeatAt, String message) {
}
