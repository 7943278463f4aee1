package org.depotcast.forecasting;

import org.depotcast.catalogue.ComponentFamily;
import org.depotcast.core.forecast.RateCovariate;

import java.time.LocalDate;
import java.util.Arrays;
import java.util.Map;

/**
 * One family's pump-year rows: each pump in each 12-month block counted back from the origin ({@code blocks},
 * 0 the last), in pump order and, within a pump, from the last block back.
 */
record PumpYearRows(double[][] covariates, double[] y, double[] e, long[] depots, int[] blocks) {
    private static final double DAYS_PER_YEAR = 365.25;

    /** Every pump using the family, every block it ran in, rows where it ran under one hour left out. */
    static PumpYearRows of(ForecastModelDefinition definition, FleetSnapshot snapshot,
                           FleetModelFitter.Breakdowns breakdowns) {
        ComponentFamily family = definition.family();
        Map<Long, long[]> eventDays = breakdowns == null ? Map.of() : breakdowns.daysByPump();
        int blockCount = snapshot.months() / 12;
        int capacity = snapshot.pumps().size() * blockCount;
        PumpYearRows all = new PumpYearRows(new double[capacity][], new double[capacity], new double[capacity],
                new long[capacity], new int[capacity]);
        int rows = 0;
        for (FleetSnapshot.PumpRecord pump : snapshot.pumps()) {
            if (pump.bom().stream().noneMatch(b -> b.family() == family)) {
                continue;
            }
            long[] events = eventDays.getOrDefault(pump.id(), new long[0]);
            for (int b = 0; b < blockCount; b++) {
                rows = all.add(rows, definition, snapshot, pump, events, b);
            }
        }
        return all.first(rows);
    }

    /** Adds the pump's row of block {@code b} at {@code row} when it ran then; answers the next free row. */
    private int add(int row, ForecastModelDefinition definition, FleetSnapshot snapshot,
                    FleetSnapshot.PumpRecord pump, long[] events, int b) {
        LocalDate blockEnd = snapshot.historyEnd().minusMonths(12L * b);
        // Hours before the first repair on record would count as event-free: leave them out.
        long from = Math.max(Math.max(blockEnd.minusMonths(12).toEpochDay(), pump.installedDay()),
                snapshot.recordsStartDay());
        long to = Math.min(blockEnd.toEpochDay(), pump.endDay());
        double hours = pump.usage().hoursBetween(from, to);
        if (to - from < 1 || hours < 1) {
            return row;
        }
        int count = 0;
        for (long day : events) {
            if (day >= from && day < to) {
                count++;
            }
        }
        double age = ((from + to) / 2.0 - pump.installedDay()) / DAYS_PER_YEAR;
        covariates[row] = RateCovariate.values(definition.covariates(), pump.depthM(), age, hours / (to - from));
        y[row] = count;
        e[row] = hours;
        depots[row] = pump.depotId();
        blocks[row] = b;
        return row + 1;
    }

    private PumpYearRows first(int n) {
        return new PumpYearRows(Arrays.copyOf(covariates, n), Arrays.copyOf(y, n), Arrays.copyOf(e, n),
                Arrays.copyOf(depots, n), Arrays.copyOf(blocks, n));
    }

    /** The rows of blocks {@code skip} and older, in the same order. */
    PumpYearRows from(int skip) {
        if (skip == 0) {
            return this;
        }
        PumpYearRows kept = new PumpYearRows(new double[y.length][], new double[y.length], new double[y.length],
                new long[y.length], new int[y.length]);
        int n = 0;
        for (int i = 0; i < y.length; i++) {
            if (blocks[i] >= skip) {
                kept.covariates[n] = covariates[i];
                kept.y[n] = y[i];
                kept.e[n] = e[i];
                kept.depots[n] = depots[i];
                kept.blocks[n++] = blocks[i];
            }
        }
        return kept.first(n);
    }
}
