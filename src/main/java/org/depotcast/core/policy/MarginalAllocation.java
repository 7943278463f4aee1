package org.depotcast.core.policy;

import java.util.ArrayList;
import java.util.List;
import java.util.PriorityQueue;

/**
 * Spends a budget where it removes the most expected backorders per unit of money: marginal analysis after Sherbrooke
 * (1968, "METRIC: a multi-echelon technique for recoverable item control", Oper. Res. 16(1):122–141; and Optimal
 * Inventory Modeling of Systems, 2nd ed., 2004). Raising item i's stock from s to s + q removes
 * EBO(s) − EBO(s + q) = Σ_{k=s}^{s+q−1} P(X_i &gt; k) expected backorders; items are bought in whole packs, each step
 * the pack with the largest reduction × weight ÷ pack cost. EBO is convex in s, so the greedy path stays on the
 * efficient curve (at pack granularity).
 */
public final class MarginalAllocation {
    private MarginalAllocation() {
    }

    /**
     * @param demand      pipeline (lead-time) demand of the item
     * @param stock       stock position already held
     * @param packSize    units per purchase step
     * @param packCost    cost of one step
     * @param weight      consequence per backorder (e.g. pump-days lost per unit short)
     * @param maxUnits    most units worth buying (e.g. up to the order-up-to level)
     */
    public record Item(DemandDistribution demand, double stock, int packSize, double packCost, double weight,
                       long maxUnits) {
        public Item {
            if (packSize < 1 || !(packCost > 0) || weight < 0 || maxUnits < 0) {
                throw new IllegalArgumentException("pack size ≥ 1, pack cost > 0, weight ≥ 0 and max units ≥ 0 are required");
            }
        }

        double backorders(double s) {
            return demand.expectedShortfall(s);
        }
    }

    /** One purchase step in the order taken. */
    public record Step(int item, int units, double cost, double backordersRemoved) {
    }

    public record Plan(List<Step> steps, long[] unitsPerItem, double spent, double backordersBefore, double backordersAfter) {
    }

    public static Plan allocate(List<Item> items, double budget) {
        if (!(budget > 0)) {
            throw new IllegalArgumentException("budget must be > 0, was " + budget);
        }
        long[] units = new long[items.size()];
        double before = 0;
        PriorityQueue<double[]> queue = new PriorityQueue<>((a, b) -> Double.compare(b[1], a[1]) != 0
                ? Double.compare(b[1], a[1]) : Double.compare(a[0], b[0]));
        for (int i = 0; i < items.size(); i++) {
            before += items.get(i).backorders(items.get(i).stock()) * items.get(i).weight();
            queue.add(new double[]{i, ratio(items.get(i), 0)});
        }
        List<Step> steps = new ArrayList<>();
        double spent = 0, after = before;
        while (!queue.isEmpty()) {
            double[] top = queue.poll();
            int i = (int) top[0];
            Item item = items.get(i);
            if (top[1] <= 0) {
                break;
            }
            if (spent + item.packCost() > budget + 1e-9 || units[i] + item.packSize() > item.maxUnits()) {
                continue;
            }
            double s = item.stock() + units[i];
            double removed = item.backorders(s) - item.backorders(s + item.packSize());
            units[i] += item.packSize();
            spent += item.packCost();
            after -= removed * item.weight();
            steps.add(new Step(i, item.packSize(), item.packCost(), removed));
            queue.add(new double[]{i, ratio(item, units[i])});
        }
        return new Plan(steps, units, spent, before, Math.max(0, after));
    }

    private static double ratio(Item item, long bought) {
        double s = item.stock() + bought;
        return (item.backorders(s) - item.backorders(s + item.packSize())) * item.weight() / item.packCost();
    }
}
