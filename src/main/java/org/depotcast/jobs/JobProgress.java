package org.depotcast.jobs;

/** What running work reports about itself; each call is saved at once so any instance can answer a poll. */
public interface JobProgress {
    long jobId();

    /** What the job is doing now, in words (at most 200 characters are kept). */
    void phase(String words);

    /** Units of work done out of {@code total}. */
    void progress(int done, int total);

    /**
     * Runs {@code lastWrite} (the feature marking its rows finished) in the transaction that marks the job done, after
     * the work has returned; never if the job fails. A poll then sees the rows finished exactly when the job has ended,
     * so a start made right after it is not refused for a job still ending (JobKind's start lock).
     */
    void finishWith(Runnable lastWrite);
}
