package org.depotcast.sensors;

/** Where a pump's operating hours come from, said in words. */
public enum UsageBasis {
    MEASURED_BY_SENSOR("measured by sensor"),
    QUARTERLY_ESTIMATE("quarterly estimate");

    private final String words;

    UsageBasis(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }
}
