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

    /** A buffer for one draw's sums at a time, for one thread. */
    Column column() {
        return new Column();
    }

    /**
     * One draw's aggregates, added up line by line in the order given (so every sum is the same to the last bit as
     * when added straight into the draw columns), then written to a draw's column and cleared.
     */
    final class Column {
        private final double[] total = new double[years()];
        private final double[][] byGroup = new double[years()][groups];
        private final double[][] byPart = new double[years()][parts];
        private final double[][] byDepot = new double[years()][depots];

        void add(SpendLine line, double spend) {
            int y = line.year();
            total[y] += spend;
            byGroup[y][line.group()] += spend;
            byPart[y][line.part()] += spend;
            byDepot[y][line.depot()] += spend;
        }

        void writeTo(int draw) {
            for (int y = 0; y < total.length; y++) {
                SpendDraws.this.total[y][draw] = total[y];
                total[y] = 0;
                copyAndClear(byGroup[y], SpendDraws.this.byGroup[y], draw);
                copyAndClear(byPart[y], SpendDraws.this.byPart[y], draw);
                copyAndClear(byDepot[y], SpendDraws.this.byDepot[y], draw);
            }
        }

        private static void copyAndClear(double[] sums, double[][] columns, int draw) {
            for (int i = 0; i < sums.length; i++) {
                columns[i][draw] = sums[i];
                sums[i] = 0;
            }
        }
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
