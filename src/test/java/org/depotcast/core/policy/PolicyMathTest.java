package org.depotcast.core.policy;

import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class PolicyMathTest {

    @Test
    void poissonReorderPointsForCycleServiceAndFillRate() {
        // Lead-time demand Poisson(4); cumulative values as in standard Poisson tables (see DemandDistributionTest).
        PoissonDemand d = new PoissonDemand(4);
        ReorderPoint.Result at95 = ReorderPoint.of(d, 0.95, ReorderPoint.Target.CYCLE_SERVICE_LEVEL, 5);
        assertEquals(8, at95.reorderPoint());
        assertEquals(0.978637, at95.cycleServiceLevel(), 1e-6);
        assertEquals(0.033627, at95.expectedBackorders(), 1e-6);
        // (s, Q) = (8, 5): P2 = 1 − [G(8) − G(13)]/5 = 0.993295 (hand-worked from the loss function).
        assertEquals(0.993295, at95.fillRate(), 1e-6);
        assertEquals(7, ReorderPoint.of(d, 0.90, ReorderPoint.Target.CYCLE_SERVICE_LEVEL, 1).reorderPoint());
        ReorderPoint.Result fill = ReorderPoint.of(d, 0.99, ReorderPoint.Target.FILL_RATE, 5);
        assertTrue(fill.fillRate() >= 0.99);
        assertTrue(ReorderPoint.fillRate(d, fill.reorderPoint() - 1, 5) < 0.99);
    }

    @Test
    void normalReorderPointIsMeanPlusSafetyFactor() {
        // s = x̂_L + k σ_L with Φ(k) = 0.95, k = 1.645 (Silver, Pyke & Thomas 2017, ch. 6).
        NormalDemand d = new NormalDemand(200, 900);
        assertEquals(200 + 1.6448536 * 30, ReorderPoint.of(d, 0.95, ReorderPoint.Target.CYCLE_SERVICE_LEVEL, 100).reorderPoint(), 1e-4);
    }

    @Test
    void leadTimeVariabilityAddsVariance() {
        // d = 2/day, σ_d² = 2, L = 10 ± 3 days → mean 20, variance 10·2 + 4·9 = 56.
        double[] m = ReorderPoint.leadTimeMoments(2, 2, 10, 3);
        assertEquals(20, m[0], 1e-12);
        assertEquals(56, m[1], 1e-12);
    }

    @Test
    void economicOrderQuantityAndPackRounding() {
        // Harris/Wilson: D = 1200/yr, K = 50, h = 3 → Q* = 200, TC* = 600 (hand-worked; the textbook form of the
        // formula, e.g. Silver, Pyke & Thomas 2017, ch. 4).
        assertEquals(200, OrderQuantity.economic(1200, 50, 3), 1e-9);
        assertEquals(600, OrderQuantity.annualCost(200, 1200, 50, 3), 1e-9);
        // Packs of 24: 192 costs 600.50, 216 costs 601.78 → 192.
        assertEquals(600.5, OrderQuantity.annualCost(192, 1200, 50, 3), 1e-9);
        assertEquals(601.777778, OrderQuantity.annualCost(216, 1200, 50, 3), 1e-6);
        assertEquals(192, OrderQuantity.economicInPacks(1200, 50, 3, 24, 1));
        assertEquals(240, OrderQuantity.economicInPacks(1200, 50, 3, 24, 230));
        assertEquals(30, OrderQuantity.roundUpToPacks(21, 10));
    }

    @Test
    void marginalAllocationByHand() {
        // Pipelines Poisson 3.0 (cost 2), 0.8 (cost 10), 1.5 (cost 5), one unit per step, budget 30.
        // Ratios P(X > s)/c worked by hand give the order A, A, A, A, C, A, C, B;
        // EBO falls from 3.0 + 0.8 + 1.5 = 5.3 to 0.664905.
        List<MarginalAllocation.Item> items = List.of(
                new MarginalAllocation.Item(new PoissonDemand(3.0), 0, 1, 2, 1, Long.MAX_VALUE),
                new MarginalAllocation.Item(new PoissonDemand(0.8), 0, 1, 10, 1, Long.MAX_VALUE),
                new MarginalAllocation.Item(new PoissonDemand(1.5), 0, 1, 5, 1, Long.MAX_VALUE));
        MarginalAllocation.Plan plan = MarginalAllocation.allocate(items, 30);
        assertEquals(List.of(0, 0, 0, 0, 2, 0, 2, 1), plan.steps().stream().map(MarginalAllocation.Step::item).toList());
        assertEquals(30, plan.spent(), 1e-9);
        assertEquals(5.3, plan.backordersBefore(), 1e-9);
        assertEquals(0.664905, plan.backordersAfter(), 1e-6);
        assertThrows(IllegalArgumentException.class, () -> MarginalAllocation.allocate(items, 0));
        // A cap stops an item at its order-up-to level and leaves the money for the others.
        MarginalAllocation.Plan capped = MarginalAllocation.allocate(List.of(
                new MarginalAllocation.Item(new PoissonDemand(3.0), 0, 1, 2, 1, 2), items.get(1), items.get(2)), 30);
        assertEquals(2, capped.unitsPerItem()[0]);
    }

    @Test
    void unitsOwedToPumpsAreBoughtFirst() {
        // B: two units committed beyond stock (position −2), pipeline Poisson 0.8, cost 10; A: position 0, Poisson 3.0,
        // cost 2. B's owed units each remove a whole backorder (G(−2) − G(−1) = 1), 0.1 per unit of money, which comes
        // before A's fifth unit (P(X > 4)/2 = 0.092). Budget 28: A four times (0.475, 0.400, 0.288, 0.176), then B, B.
        List<MarginalAllocation.Item> items = List.of(
                new MarginalAllocation.Item(new PoissonDemand(3.0), 0, 1, 2, 1, Long.MAX_VALUE),
                new MarginalAllocation.Item(new PoissonDemand(0.8), -2, 1, 10, 1, 4));
        MarginalAllocation.Plan plan = MarginalAllocation.allocate(items, 28);
        assertEquals(4, plan.unitsPerItem()[0]);
        assertEquals(2, plan.unitsPerItem()[1]);
        assertEquals(3.0 + 2.8, plan.backordersBefore(), 1e-9);
    }

    @Test
    void transportationProblemWithAKnownOptimum() {
        // Surplus A 5, B 3; deficit C 4, D 3; costs A→C 2, A→D 5, B→C 4, B→D 1 → A→C 4, B→D 3, cost 11 (hand-solved).
        List<TransferPlanner.Move> moves = TransferPlanner.plan(new long[]{5, 3}, new long[]{4, 3},
                new double[][]{{2, 5}, {4, 1}}, 100);
        assertEquals(2, moves.size());
        double cost = 0;
        for (TransferPlanner.Move m : moves) {
            cost += m.units() * m.unitCost();
        }
        assertEquals(11, cost, 1e-9);
        assertTrue(moves.contains(new TransferPlanner.Move(0, 0, 4, 2)));
        assertTrue(moves.contains(new TransferPlanner.Move(1, 1, 3, 1)));
        // Re-running gives the same answer; a lane dearer than the shortage it removes is not used.
        assertEquals(moves, TransferPlanner.plan(new long[]{5, 3}, new long[]{4, 3}, new double[][]{{2, 5}, {4, 1}}, 100));
        assertTrue(TransferPlanner.plan(new long[]{5}, new long[]{4}, new double[][]{{50}}, 10).isEmpty());
    }

    @Test
    void haversineDistance() {
        // One degree of latitude ≈ 111.19 km on a 6,371 km sphere.
        assertEquals(111.195, TransferPlanner.distanceKm(0, 0, 1, 0), 1e-3);
    }
}
