package org.depotcast.jobs;

/** The body of a background job. It runs as the system (the starter's rights were checked before it was queued). */
@FunctionalInterface
public interface JobWork {
    /** @return a short summary in words, kept as the job's message (read by clients: no exception text) */
    String run(JobProgress progress);
}
