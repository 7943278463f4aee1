package org.depotcast.core.sensors;

import org.depotcast.core.policy.PoissonDemand;

/**
 * How many units of a part to have ready at a store for the pumps flagged there as probably down: the smallest whole
 * k with P(N ≤ k) ≥ the cover level, N the units those pumps will need.
 *
 * <p>N is taken as Poisson with mean m = Σ p · (r_f / Σ r) · u_f · share of the part ({@link StoppedPumpParts},
 * summed over the flagged pumps): a sum of small, independent chances of needing a unit, which the Poisson law
 * approximates (Le Cam 1960: the total variation distance is under twice the sum of the squared chances). Where the
 * chances are not small it errs both ways: one pump down for near certain with one family dominating has less spread
 * than the Poisson (more cover than stated), and a family used in pairs (two cup seals a repair) more (less cover than
 * stated). The cover level is the programme's cycle service level for the part's class, as its reorder points use.
 */
public final class PartsToHaveReady {
    private PartsToHaveReady() {
    }

    /**
     * @param expectedUnits the flagged pumps' expected units of the part, summed (≥ 0)
     * @param coverLevel    the chance of having enough, in (0, 1)
     * @return the smallest whole k with P(N ≤ k) ≥ {@code coverLevel}, N ~ Poisson({@code expectedUnits}); 0 when
     *         nothing is expected or the chance of needing none already reaches the level
     */
    public static int units(double expectedUnits, double coverLevel) {
        if (!(expectedUnits >= 0) || Double.isInfinite(expectedUnits)) {
            throw new IllegalArgumentException("expectedUnits must be finite and ≥ 0, was " + expectedUnits);
        }
        if (!(coverLevel > 0 && coverLevel < 1)) {
            throw new IllegalArgumentException("coverLevel must be in (0, 1), was " + coverLevel);
        }
        return (int) new PoissonDemand(expectedUnits).quantile(coverLevel);
    }
}
