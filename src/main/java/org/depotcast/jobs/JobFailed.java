package org.depotcast.jobs;

/**
 * Fired (synchronously, after the job row is marked FAILED) when a job fails or its instance is found dead, so a
 * feature can mark the rows it linked to the job. {@code message} is the safe text the client sees.
 */
public record JobFailed(long jobId, JobKind kind, String message) {
}
