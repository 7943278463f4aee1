package org.depotcast.sensors;

import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.Deque;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Day-by-day stock of each depot (its own shelves and its mechanics' kits together) for the parts that repairs use,
 * resupplied from the central store after a fixed transfer lead time. Each day: what was sent {@code leadDays} ago
 * arrives; the day's reported repairs take their parts, first reported first served (a repair short of a part waits
 * for the next units to arrive); then the depot orders up to its target, counting what is on hand and on its way
 * less what waiting repairs are owed: the target is the base stock, or more when {@link ReadyTarget} asks for more
 * units to have ready that day. The central store is taken to hold every part (its own purchasing is outside this
 * replay), so a part not at the depot waits at most the transfer lead time.
 */
final class DepotStockReplay {
    /** A repair's need for one part at a depot, reported on day {@code day} of the year. */
    record Demand(int day, String depot, String part, double units) {
    }

    /** Whole units of a part a depot should hold ready on a day beyond its base stock (0 when none). */
    interface ReadyTarget {
        double unitsToHaveReady(String depot, String part, int day);
    }

    /** The day each demand had its units at hand, in the demands' order, and all units sent to the depots. */
    record Result(int[] atHandDay, double unitsSent) {
    }

    private DepotStockReplay() {
    }

    /**
     * @param demands   in day order (ties keep their order: first listed, first served)
     * @param baseStock per depot and part, the stock each depot starts the year with and orders back up to
     */
    static Result run(List<Demand> demands, Map<String, Map<String, Double>> baseStock, int leadDays, int days,
                      ReadyTarget ready) {
        Map<String, Shelf> shelves = new HashMap<>();
        baseStock.forEach((depot, parts) -> parts.forEach((part, units) ->
                shelf(shelves, depot, part, units, days + leadDays)));
        for (Demand d : demands) {
            shelf(shelves, d.depot(), d.part(), 0, days + leadDays);
        }
        int[] atHand = new int[demands.size()];
        Arrays.fill(atHand, -1);
        double[] sent = new double[1];
        int next = 0;
        for (int t = 0; t < days + leadDays; t++) {
            for (; next < demands.size() && demands.get(next).day() == t; next++) {
                Demand d = demands.get(next);
                shelves.get(d.depot() + "|" + d.part()).waiting.add(new double[]{next, d.units()});
            }
            for (Shelf shelf : shelves.values()) {
                // After the year nothing more is reported: no orders, only the arrivals of those placed in it.
                double target = t < days ? Math.max(shelf.base, ready.unitsToHaveReady(shelf.depot, shelf.part, t))
                        : Double.NEGATIVE_INFINITY;
                sent[0] += shelf.day(t, atHand, target, leadDays);
            }
        }
        return new Result(atHand, sent[0]);
    }

    private static void shelf(Map<String, Shelf> shelves, String depot, String part, double base, int horizon) {
        shelves.computeIfAbsent(depot + "|" + part, k -> new Shelf(depot, part, base, horizon));
    }

    /** One part at one depot. */
    private static final class Shelf {
        final String depot;
        final String part;
        final double base;
        final double[] arriving;
        final Deque<double[]> waiting = new ArrayDeque<>();
        double onHand;
        double onTheWay;

        Shelf(String depot, String part, double base, int horizon) {
            this.depot = depot;
            this.part = part;
            this.base = base;
            this.onHand = base;
            this.arriving = new double[horizon + 1];
        }

        /** Receives, serves the waiting repairs in order, and orders up to the target; returns the units ordered. */
        double day(int t, int[] atHand, double target, int leadDays) {
            onHand += arriving[t];
            onTheWay -= arriving[t];
            double owed = 0;
            while (!waiting.isEmpty()) {
                double[] head = waiting.peek();
                double take = Math.min(onHand, head[1]);
                head[1] -= take;
                onHand -= take;
                if (head[1] > 1e-9) {
                    break;
                }
                atHand[(int) head[0]] = t;
                waiting.poll();
            }
            for (double[] w : waiting) {
                owed += w[1];
            }
            double order = Math.ceil(target - (onHand + onTheWay - owed) - 1e-9);
            if (order <= 0 || t + leadDays >= arriving.length) {
                return 0;
            }
            arriving[t + leadDays] += order;
            onTheWay += order;
            return order;
        }
    }
}
