package org.depotcast.jobs;

/** Where a background job stands; {@link #words()} is what people read. */
public enum JobState {
    RUNNING("running"), DONE("done"), FAILED("failed");

    private final String words;

    JobState(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }
}
