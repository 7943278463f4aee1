package org.depotcast.jobs;

/** The kinds of background job; {@link #words()} names one in messages. */
public enum JobKind {
    FORECAST_RUN("forecast run"), SPEND_RUN("spend run"), ACCURACY_REPORT("accuracy report");

    private final String words;

    JobKind(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }
}
