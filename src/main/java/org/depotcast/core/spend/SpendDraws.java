package org.depotcast.core.spend;

/**
 * Draws of every aggregate: total, per group, per part and per depot, for each year. Each draw writes only its own
 * column, so blocks of draws may run in parallel without locks.
 */
public final class SpendDraws {
    private final int groups;
    private final int parts;
    private final int depots;
    private final double[][] total;
    private final double[][][] byGroup;
    private final double[][][] byPart;
    private final double[][][] byDepot;

    SpendDraws(int years, int groups, int parts, int depots, int draws) {
        this.groups = groups;
        this.parts = parts;
        this.depots = depots;
        total = new double[years][draws];
        byGroup = new double[years][groups][draws];
        byPart = new double[years][parts][draws];
        byDepot = new double[years][depots][draws];
    }

    void add(int draw, SpendLine line, double spend) {
        int y = line.year();
        total[y][draw] += spend;
        byGroup[y][line.group()][draw] += spend;
        byPart[y][line.part()][draw] += spend;
        byDepot[y][line.depot()][draw] += spend;
    }

    public int years() {
        return total.length;
    }

    public int groups() {
        return groups;
    }

    public int parts() {
        return parts;
    }

    public int depots() {
        return depots;
    }

    public double[] total(int year) {
        return total[year];
    }

    public double[] group(int year, int group) {
        return byGroup[year][group];
    }

    public double[] part(int year, int part) {
        return byPart[year][part];
    }

    public double[] depot(int year, int depot) {
        return byDepot[year][depot];
    }
}
