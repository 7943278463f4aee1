package org.depotcast.jobs;

/** What running work reports about itself; each call is saved at once so any instance can answer a poll. */
public interface JobProgress {
    long jobId();

    /** What the job is doing now, in words (at most 200 characters are kept). */
    void phase(String words);

    /** Units of work done out of {@code total}. */
    void progress(int done, int total);
}
