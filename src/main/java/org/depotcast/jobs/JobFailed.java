package org.depotcast.jobs;

/**
 * Fired synchronously inside the transaction that marks the job FAILED (observers join it with
 * {@code QuarkusTransaction.joiningExisting()}) when a job fails or its instance is found dead, so a
 * feature can mark the rows it linked to the job. {@code message} is the safe text the client sees.
 */
public record JobFailed(long jobId, JobKind kind, String message) {
}
