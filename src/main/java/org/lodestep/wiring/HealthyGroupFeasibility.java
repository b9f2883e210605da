package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

import org.apache.commons.math3.optim.MaxIter;
import org.apache.commons.math3.optim.linear.LinearConstraint;
import org.apache.commons.math3.optim.linear.LinearConstraintSet;
import org.apache.commons.math3.optim.linear.LinearObjectiveFunction;
import org.apache.commons.math3.optim.linear.NoFeasibleSolutionException;
import org.apache.commons.math3.optim.linear.NonNegativeConstraint;
import org.apache.commons.math3.optim.linear.Relationship;
import org.apache.commons.math3.optim.linear.SimplexSolver;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;

/**
 * Whether a candidate hub explains a group's readings with healthy coils: a linear feasibility problem solved with
 * Commons Math's simplex method.
 *
 * <p>Unknowns: coil resistances h_i of the non-hub leads and a nominal coil value H. Each reading r of a pair
 * constrains the sum of the coils between its leads (one coil for hub-to-end, two for end-to-end) to lie within
 * [r·(1 − meter) − contact allowance, r·(1 + meter)], because probe contact only adds resistance. Healthy coils lie
 * within ±{@link #COIL_SPREAD}/2 of H. Both limits are common practice, not a published source.
 */
final class HealthyGroupFeasibility {
    /** Largest spread (max − min)/nominal of the coils of a healthy motor, as a fraction. */
    static final double COIL_SPREAD = 0.2;
    /** Meter error as a fraction of the reading (handheld meters on the 200 Ω range: about 1 %, doubled). */
    static final double METER_FRACTION = 0.02;
    /** Smallest nominal coil resistance considered, ohms; keeps the trivial all-zero solution out. */
    static final double MIN_COIL_OHM = 1e-3;

    private HealthyGroupFeasibility() {
    }

    static boolean feasible(String hub, List<String> group, ResistanceMatrix m, double contactAllowanceOhm) {
        List<String> ends = group.stream().filter(l -> !l.equals(hub)).toList();
        int k = ends.size();
        List<LinearConstraint> cons = new ArrayList<>();
        for (int i = 0; i < group.size(); i++) {
            for (int j = i + 1; j < group.size(); j++) {
                OptionalDouble v = m.ohms(LeadPair.of(group.get(i), group.get(j)));
                if (v.isEmpty()) {
                    continue;
                }
                double[] row = new double[k + 1];
                for (String l : List.of(group.get(i), group.get(j))) {
                    int e = ends.indexOf(l);
                    if (e >= 0) {
                        row[e] = 1;
                    }
                }
                double r = v.getAsDouble();
                cons.add(new LinearConstraint(row, Relationship.GEQ, r * (1 - METER_FRACTION) - contactAllowanceOhm));
                cons.add(new LinearConstraint(row, Relationship.LEQ, r * (1 + METER_FRACTION)));
            }
        }
        for (int e = 0; e < k; e++) {
            double[] lo = new double[k + 1];
            lo[e] = 1;
            lo[k] = -(1 - COIL_SPREAD / 2);
            cons.add(new LinearConstraint(lo, Relationship.GEQ, 0));
            double[] hi = new double[k + 1];
            hi[e] = 1;
            hi[k] = -(1 + COIL_SPREAD / 2);
            cons.add(new LinearConstraint(hi, Relationship.LEQ, 0));
        }
        double[] nominal = new double[k + 1];
        nominal[k] = 1;
        cons.add(new LinearConstraint(nominal, Relationship.GEQ, MIN_COIL_OHM));
        try {
            new SimplexSolver().optimize(new MaxIter(1000), new LinearObjectiveFunction(nominal, 0),
                    new LinearConstraintSet(cons), GoalType.MINIMIZE, new NonNegativeConstraint(true));
            return true;
        } catch (NoFeasibleSolutionException e) {
            return false;
        }
    }
}
