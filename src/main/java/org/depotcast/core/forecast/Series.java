package org.depotcast.core.forecast;

/** Checks shared by the forecasting methods. */
final class Series {
    private Series() {
    }

    static void requireValid(double[] history) {
        if (history == null || history.length == 0) {
            throw new IllegalArgumentException("history must hold at least one period");
        }
        for (int t = 0; t < history.length; t++) {
            double y = history[t];
            if (!(y >= 0) || Double.isInfinite(y)) {
                throw new IllegalArgumentException("history[" + t + "] must be a finite quantity ≥ 0, was " + y);
            }
        }
    }

    static void requireSmoothing(String name, double value) {
        if (!(value > 0 && value <= 1)) {
            throw new IllegalArgumentException(name + " must be in (0, 1], was " + value);
        }
    }
}
