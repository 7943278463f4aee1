package org.depotcast.core.forecast;

/**
 * Croston's two estimates as they update period by period, shared by {@link Smoothing#croston} and its one-step
 * error so the two cannot drift apart: ẑ starts at the first demand and p̂ at its 1-based position, both then move
 * by α at each later demand.
 */
final class CrostonLevels {
    private final double alpha;
    private double z, p;
    private boolean started;
    private int sinceLast;

    CrostonLevels(double alpha) {
        this.alpha = alpha;
    }

    /** factor × ẑ / p̂ from the periods seen so far; NaN before the first demand. */
    double forecast(double factor) {
        return started ? factor * z / p : Double.NaN;
    }

    void observe(double demand) {
        sinceLast++;
        if (demand > 0) {
            if (!started) {
                z = demand;
                p = sinceLast;
                started = true;
            } else {
                z += alpha * (demand - z);
                p += alpha * (sinceLast - p);
            }
            sinceLast = 0;
        }
    }
}
