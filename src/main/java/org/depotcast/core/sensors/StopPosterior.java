package org.depotcast.core.sensors;

/**
 * The probability that a pump whose last days read were near nothing is down rather than idle: Shiryaev's Bayesian
 * quickest-detection posterior, the chance that the change has happened by day t given the days seen,
 * p_t = P(θ ≤ t | x₁..x_t), with a geometric prior on the change day θ (A. N. Shiryaev, "On optimum methods in quickest
 * detection problems", Theory of Probability and Its Applications 8(1):22–46, 1963). The change is a breakdown, with
 * the pump's own daily hazard π; the other explanation of near-nothing days is an idle spell whose length has the
 * programme's distribution ({@link IdleDayPrior}), so the days of a spell are not independent and the chain is
 * semi-Markov: its hidden state is carried with the spell's age, as in the run-length recursion of R. P. Adams and
 * D. J. C. MacKay, "Bayesian online changepoint detection", arXiv:0710.3742, 2007.
 *
 * <p>States: in use (W), in the j-th day of an idle spell (I_j), down (D, lasting past the days judged). The recursion
 * starts on the last day read in use, where the pump was working (W = 1), and steps one day at a time:
 * D ← D + π (W + Σ I_j); I₁ ← (1 − π) s W; I_{j+1} ← (1 − π) c_j I_j; W ← (1 − π)((1 − s) W + Σ (1 − c_j) I_j), with s
 * the pump's chance of starting a spell and c_j the chance a spell of j days lasts another. Then the day's reading
 * weighs the states: a near-nothing day is impossible in use (W ← 0), and its class of hours b ({@link IdleDays#bin})
 * weighs an idle day by f_idle(b) and a broken one by f_broken(b), the programme's shares ({@link IdleDayPrior}; 1
 * when judged alone); a day with no reading weighs every state alike, so a transmission gap is no evidence and only
 * lets time pass. After the last day, p = D / (W + Σ I_j + D). One near-nothing day gives
 * π f_broken / (π f_broken + (1 − π) s f_idle); a run of n whose hours weigh nothing, about π / (π + s L(n)).
 */
public final class StopPosterior {
    private StopPosterior() {
    }

    /**
     * The chance that a breakdown starts on a given day, from a rate per operating hour and the pump's hours a day:
     * 1 − exp(−λ h), the Poisson chance of at least one.
     */
    public static double dailyChance(double breakdownsPerHour, double hoursPerDay) {
        if (!(breakdownsPerHour >= 0) || !(hoursPerDay >= 0)) {
            throw new IllegalArgumentException("breakdownsPerHour and hoursPerDay must be ≥ 0: " + breakdownsPerHour
                    + ", " + hoursPerDay);
        }
        return -Math.expm1(-breakdownsPerHour * hoursPerDay);
    }

    /**
     * @param hours       the pump's days, NaN for a day with no reading
     * @param lastInUse   the last day read above near nothing: the days after it are near nothing or not read
     * @param nearNothing the pump's near-nothing hours, for the class of each day's hours
     * @param dailyChance π, the chance that a breakdown starts on a given day
     * @param prior       the programme's idle spells
     * @param own         the pump's idle history
     */
    public static double probabilityDown(double[] hours, int lastInUse, double nearNothing, double dailyChance,
                                         IdleDayPrior prior, IdleDays own) {
        if (!(dailyChance >= 0 && dailyChance < 1)) {
            throw new IllegalArgumentException("dailyChance must be in [0, 1): " + dailyChance);
        }
        int days = hours.length - 1 - lastInUse;
        if (lastInUse < 0 || days < 1) {
            throw new IllegalArgumentException("lastInUse must leave days after it: " + lastInUse);
        }
        double start = prior.spellStartChance(own);
        double[] continuing = new double[days + 1];
        for (int j = 1; j <= days; j++) {
            continuing[j] = prior.continuing(own, j);
        }
        double inUse = 1, down = 0;
        double[] idle = new double[days + 1];
        double stay = 1 - dailyChance;
        for (int t = lastInUse + 1; t < hours.length; t++) {
            double working = inUse, ended = 0;
            for (int j = 1; j <= days; j++) {
                working += idle[j];
                ended += (1 - continuing[j]) * idle[j];
            }
            for (int j = days - 1; j >= 1; j--) {
                idle[j + 1] = stay * continuing[j] * idle[j];
            }
            idle[1] = stay * start * inUse;
            down += dailyChance * working;
            // A near-nothing day is impossible in use; a day with no reading weighs every state alike.
            inUse = Double.isNaN(hours[t]) ? stay * ((1 - start) * inUse + ended) : 0;
            if (!Double.isNaN(hours[t])) {
                int bin = IdleDays.bin(hours[t], nearNothing);
                down *= prior.brokenHoursChance(bin);
                double idleWeight = prior.idleHoursChance(bin);
                for (int j = 1; j <= days; j++) {
                    idle[j] *= idleWeight;
                }
            }
            double total = inUse + down;
            for (int j = 1; j <= days; j++) {
                total += idle[j];
            }
            inUse /= total;
            down /= total;
            for (int j = 1; j <= days; j++) {
                idle[j] /= total;
            }
        }
        return down;
    }
}
