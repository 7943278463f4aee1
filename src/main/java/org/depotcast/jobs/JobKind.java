package org.depotcast.jobs;

import java.util.Arrays;
import java.util.List;

/**
 * The kinds of background job; {@link #words()} names one in messages. Kinds that share a start lock run one at a
 * time between them: an accuracy report computes a forecast run of its own, so it takes turns with forecast runs.
 */
public enum JobKind {
    FORECAST_RUN("forecast run", "a forecast run", "FORECAST_RUN"),
    SPEND_RUN("spend run", "a spend run", "SPEND_RUN"),
    ACCURACY_REPORT("accuracy report", "an accuracy report", "FORECAST_RUN");

    private final String words;
    private final String oneWords;
    private final String startLock;

    JobKind(String words, String oneWords, String startLock) {
        this.words = words;
        this.oneWords = oneWords;
        this.startLock = startLock;
    }

    public String words() {
        return words;
    }

    /** The name of the row lock its start takes (common/ExclusiveLock). */
    String startLock() {
        return startLock;
    }

    /** The kinds that may not run while this one does, itself included. */
    List<JobKind> takingTurns() {
        return Arrays.stream(values()).filter(k -> k.startLock.equals(startLock)).toList();
    }

    /** Why a start of this kind waits for {@code running}. */
    String busyWords(JobKind running) {
        return running == this ? "one " + words + " at a time: another is already in progress"
                : "one forecast computation at a time: " + running.oneWords + " is in progress (an accuracy report "
                + "computes a forecast run of its own); start the " + words + " when it has finished";
    }
}
