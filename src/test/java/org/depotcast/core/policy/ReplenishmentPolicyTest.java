package org.depotcast.core.policy;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/** The reorder point and order-up-to rules on small cases worked by hand (tables of Poisson and NB(3, ½) below). */
class ReplenishmentPolicyTest {
    private static final double DAYS_PER_MONTH = 365.25 / 12;
    private static final ReplenishmentPolicy.Settings SETTINGS = new ReplenishmentPolicy.Settings(30, 14, 7, 60, 0.25,
            25, 5, 0.20, 180);

    @Test
    void aDepotPoissonPartCappedAtItsDaysOfCover() {
        // 0.1 a day, variance = mean: Poisson(2.1) over 14 + 7 days. CDF 0.9379 at 4, 0.9796 at 5: s = 5 at 95 %.
        // Q: EOQ √(2 × 36.525 × 5 / 2) = 13.5 → 10 or 15 in packs of 5, 15 cheaper a year (27.18 against 28.26).
        // S = 20 > ⌊0.1 × 180⌋ = 18, and s + one pack = 10 ≤ 18: capped at 18, Q = 13.
        var item = new ReplenishmentPolicy.Item(90, 10, 5, 10, null);
        var r = ReplenishmentPolicy.of(ReplenishmentPolicy.Level.DEPOT, item, 0.1 * DAYS_PER_MONTH,
                0.1 * DAYS_PER_MONTH, 0.95, 3, 0, 1, SETTINGS);
        assertEquals(21, r.protectionDays());
        assertEquals(2.1, r.demandMean(), 1e-12);
        assertEquals(2.1, r.demandVariance(), 1e-12);
        assertEquals("poisson", r.distribution());
        assertEquals(5, r.reorderPoint(), 0.0);
        assertEquals(18, r.orderUpTo(), 0.0);
        assertEquals(13, r.orderQuantity(), 0.0);
        assertEquals("capped at 180 days of cover", r.orderUpToRule());
        // Position 3 − 1 = 2; G(2) = 2.1 − 2 + 2 P(0) + P(1) = 0.1 + 0.244913 + 0.257158.
        assertEquals(2, r.position(), 0.0);
        assertEquals(0.602071, r.expectedShortUnits(), 1e-6);
        assertEquals(0.602071 * 10.5, r.pumpDaysAtRisk(), 1e-5);
    }

    @Test
    void aCentralStoreFastMoverWithLeadTimeSpreadCappedByShelfLife() {
        // 2 a day, daily variance 4, over 60 + 30 days with σ_L = 0.25 × 60 = 15: mean 180, variance 90 × 4 + 4 × 225
        // = 1260. Normal (mean ≥ 30): s = ⌈180 + 1.6449 × 35.4965⌉ = ⌈238.39⌉ = 239.
        // Q: EOQ √(2 × 730.5 × 25 / 0.4) = 302.2 → 300 (120.875 a year against 120.911 for 310), above the MOQ of 100.
        // S = 539, but 120 days of shelf life use ⌊240⌋: S = 240; Q stays 300.
        var item = new ReplenishmentPolicy.Item(60, 2, 10, 100, 120);
        var r = ReplenishmentPolicy.of(ReplenishmentPolicy.Level.CENTRAL_STORE, item, 2 * DAYS_PER_MONTH,
                4 * DAYS_PER_MONTH, 0.95, 250, 0, 0, SETTINGS);
        assertEquals(90, r.protectionDays());
        assertEquals(180, r.demandMean(), 1e-9);
        assertEquals(1260, r.demandVariance(), 1e-9);
        assertEquals("normal", r.distribution());
        assertEquals(239, r.reorderPoint(), 0.0);
        assertEquals(300, r.orderQuantity(), 0.0);
        assertEquals(240, r.orderUpTo(), 0.0);
        assertEquals("capped by the shelf life of 120 days", r.orderUpToRule());
        // G(250) = σ [φ(z) − z (1 − Φ(z))], z = 70 / 35.4965.
        assertEquals(0.324744, r.expectedShortUnits(), 1e-5);
    }

    @Test
    void aKitWhoseReorderPointAloneIsOverItsDaysOfCover() {
        // 0.05 a day, daily variance 0.1, one 60-day cycle: mean 3, variance 6, NB(3, ½); CDF 0.9673 at 8, 0.9807 at
        // 9: s = 9 at 98 %. Q = ⌈0.05 × 60⌉ = 3; S = 12 > ⌊0.05 × 180⌋ = 9, and s + 1 = 10 > 9: S = 10, Q = 1.
        var item = new ReplenishmentPolicy.Item(90, 10, 5, 10, null);
        var r = ReplenishmentPolicy.of(ReplenishmentPolicy.Level.KIT, item, 0.05 * DAYS_PER_MONTH,
                0.1 * DAYS_PER_MONTH, 0.98, 4, 0, 0, SETTINGS);
        assertEquals(60, r.protectionDays());
        assertEquals("negative-binomial", r.distribution());
        assertEquals(9, r.reorderPoint(), 0.0);
        assertEquals(10, r.orderUpTo(), 0.0);
        assertEquals(1, r.orderQuantity(), 0.0);
        assertEquals("reorder point + one unit: the reorder point alone is over 180 days of cover", r.orderUpToRule());
        // G(4) = 3 − 4 + 4 × 0.125 + 3 × 0.1875 + 2 × 0.1875 + 0.15625 = 0.59375; × 30 days.
        assertEquals(0.59375, r.expectedShortUnits(), 1e-9);
        assertEquals(17.8125, r.pumpDaysAtRisk(), 1e-7);
    }

    @Test
    void noDemandHoldsOnePackAndNothingIsShort() {
        var item = new ReplenishmentPolicy.Item(90, 10, 5, 10, 30);
        var r = ReplenishmentPolicy.of(ReplenishmentPolicy.Level.DEPOT, item, -1, 0, 0.95, 0, 0, 0, SETTINGS);
        assertEquals(0, r.dailyDemand(), 0.0);
        assertEquals(0, r.reorderPoint(), 0.0);
        assertEquals(5, r.orderQuantity(), 0.0);
        assertEquals(5, r.orderUpTo(), 0.0);
        assertEquals("reorder point + economic quantity at the transfer-trip cost", r.orderUpToRule());
        assertEquals(0, r.expectedShortUnits(), 0.0);
    }

    @Test
    void brokenInputsAreRefusedByName() {
        var e = assertThrows(IllegalArgumentException.class, () -> new ReplenishmentPolicy.Item(90, 10, 0, 10, null));
        assertEquals(true, e.getMessage().contains("packSize"));
        assertThrows(IllegalArgumentException.class, () -> new ReplenishmentPolicy.Settings(30, 14, 7, 0, 0.25, 25, 5,
                0.2, 180));
    }
}
