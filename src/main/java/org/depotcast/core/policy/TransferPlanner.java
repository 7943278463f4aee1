package org.depotcast.core.policy;

import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.PointValuePair;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;

import java.util.ArrayList;
import java.util.List;

/**
 * Transfers between depots as a transportation linear program (Hitchcock 1941, J. Math. Phys. 20:224–230), solved
 * with Commons Math's simplex: minimise Σ (c_ij − penalty) x_ij subject to Σ_j x_ij ≤ surplus_i (a donor never goes
 * below its own reorder point), Σ_i x_ij ≤ deficit_j, x ≥ 0. The penalty is the value of a unit of shortage removed;
 * a lane is used only where it is worth more than it costs. The constraint matrix is totally unimodular, so whole-
 * unit surpluses and deficits give whole-unit optima; solutions are rounded only to remove floating-point noise.
 * Bland's rule makes the result the same on every run.
 */
public final class TransferPlanner {
    private TransferPlanner() {
    }

    public record Move(int from, int to, long units, double unitCost) {
    }

    public static List<Move> plan(long[] surplus, long[] deficit, double[][] unitCost, double shortagePenalty) {
        int m = surplus.length, n = deficit.length;
        if (unitCost.length != m) {
            throw new IllegalArgumentException("unitCost must have one row per donor");
        }
        if (m == 0 || n == 0) {
            return new ArrayList<>();
        }
        double[] objective = objective(surplus, n, unitCost, shortagePenalty);
        List<LinearConstraint> constraints = supplyAndDemandConstraints(surplus, deficit);
        PointValuePair solution = new SimplexSolver().optimize(new MaxIter(10_000),
                new LinearObjectiveFunction(objective, 0), new LinearConstraintSet(constraints), GoalType.MINIMIZE,
                new NonNegativeConstraint(true));
        return moves(solution.getPoint(), m, n, unitCost);
    }

    /** c_ij − penalty per lane, lane (i, j) at index i·n + j; checks surpluses and costs. */
    private static double[] objective(long[] surplus, int n, double[][] unitCost, double shortagePenalty) {
        int m = surplus.length;
        double[] objective = new double[m * n];
        for (int i = 0; i < m; i++) {
            if (surplus[i] < 0) {
                throw new IllegalArgumentException("surplus[" + i + "] must be ≥ 0");
            }
            for (int j = 0; j < n; j++) {
                if (!(unitCost[i][j] >= 0)) {
                    throw new IllegalArgumentException("unitCost[" + i + "][" + j + "] must be ≥ 0");
                }
                objective[i * n + j] = unitCost[i][j] - shortagePenalty;
            }
        }
        return objective;
    }

    /** Σ_j x_ij ≤ surplus_i per donor and Σ_i x_ij ≤ deficit_j per receiver; checks deficits. */
    private static List<LinearConstraint> supplyAndDemandConstraints(long[] surplus, long[] deficit) {
        int m = surplus.length, n = deficit.length;
        List<LinearConstraint> constraints = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            double[] row = new double[m * n];
            for (int j = 0; j < n; j++) {
                row[i * n + j] = 1;
            }
            constraints.add(new LinearConstraint(row, Relationship.LEQ, surplus[i]));
        }
        for (int j = 0; j < n; j++) {
            if (deficit[j] < 0) {
                throw new IllegalArgumentException("deficit[" + j + "] must be ≥ 0");
            }
            double[] column = new double[m * n];
            for (int i = 0; i < m; i++) {
                column[i * n + j] = 1;
            }
            constraints.add(new LinearConstraint(column, Relationship.LEQ, deficit[j]));
        }
        return constraints;
    }

    /** The lanes carrying at least one whole unit in the solution, rounded to remove floating-point noise. */
    private static List<Move> moves(double[] x, int m, int n, double[][] unitCost) {
        List<Move> moves = new ArrayList<>();
        for (int i = 0; i < m; i++) {
            for (int j = 0; j < n; j++) {
                long units = Math.round(x[i * n + j]);
                if (units > 0) {
                    moves.add(new Move(i, j, units, unitCost[i][j]));
                }
            }
        }
        return moves;
    }

    /** Great-circle distance in km between two points (haversine, mean Earth radius 6,371 km). */
    public static double distanceKm(double lat1, double lon1, double lat2, double lon2) {
        double p1 = Math.toRadians(lat1), p2 = Math.toRadians(lat2);
        double dp = p2 - p1, dl = Math.toRadians(lon2 - lon1);
        double a = Math.sin(dp / 2) * Math.sin(dp / 2) + Math.cos(p1) * Math.cos(p2) * Math.sin(dl / 2) * Math.sin(dl / 2);
        return 2 * 6371.0 * Math.asin(Math.min(1, Math.sqrt(a)));
    }
}
