package org.lodestep.rig;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;

/**
 * The electrical network of a two-phase motor as the rig's relays see it: half-windings, leakage between phases and
 * insulation to the frame as resistors between nodes, with lead terminals on some nodes.
 *
 * <p>Resistance between two nodes comes from nodal analysis (Kirchhoff's current law on the conductance matrix with
 * one node grounded; any circuit-theory text, e.g. Alexander and Sadiku, Fundamentals of Electric Circuits, chapter
 * "Methods of analysis"). Inductance along a winding path uses L = L1 + L2 + 2M for aiding series halves, M =
 * k·sqrt(L1·L2) (coupled-coil relation; ibid., chapter "Magnetically coupled circuits").
 */
final class WindingNetwork {
    /** An open winding is air and varnish, not nothing: keeps the matrix regular. */
    static final double OPEN_OHM = 1e13;

    /** One half-winding: phase 0 (A) or 1 (B), half 0 or 1, from node {@code start} to node {@code end}. */
    record Half(int phase, int half, int start, int end, double ohm, double henry, double emfScale, boolean open) {
    }

    private record Resistor(int a, int b, double ohm) {
    }

    private final int nodeCount;
    private final int frameNode;
    private final List<Half> halves;
    private final List<Resistor> resistors = new ArrayList<>();
    private final double coupling;

    WindingNetwork(int nodeCount, int frameNode, List<Half> halves, double coupling) {
        this.nodeCount = nodeCount;
        this.frameNode = frameNode;
        this.halves = List.copyOf(halves);
        this.coupling = coupling;
        for (Half h : halves) {
            resistors.add(new Resistor(h.start, h.end, h.open ? OPEN_OHM : h.ohm));
        }
    }

    void addResistor(int a, int b, double ohm) {
        resistors.add(new Resistor(a, b, ohm));
    }

    int frameNode() {
        return frameNode;
    }

    List<Half> halves() {
        return halves;
    }

    /** Resistance between two distinct nodes, ohm. */
    double resistanceOhm(int a, int b) {
        if (a == b) {
            return 0;
        }
        // ground b; unknowns are the other nodes' voltages
        int[] index = new int[nodeCount];
        int n = 0;
        for (int i = 0; i < nodeCount; i++) {
            index[i] = i == b ? -1 : n++;
        }
        double[][] g = new double[n][n];
        for (Resistor r : resistors) {
            double c = 1.0 / r.ohm;
            int i = index[r.a];
            int j = index[r.b];
            if (i >= 0) {
                g[i][i] += c;
            }
            if (j >= 0) {
                g[j][j] += c;
            }
            if (i >= 0 && j >= 0) {
                g[i][j] -= c;
                g[j][i] -= c;
            }
        }
        // nodes with no resistor at all float: tie them to the frame through air
        for (int i = 0; i < n; i++) {
            if (g[i][i] == 0) {
                g[i][i] = 1.0 / OPEN_OHM;
            }
        }
        RealVector inj = new ArrayRealVector(n);
        inj.setEntry(index[a], 1.0);
        RealVector v = new LUDecomposition(new Array2DRowRealMatrix(g, false), 1e-300).getSolver().solve(inj);
        return v.getEntry(index[a]);
    }

    /**
     * The half-windings on the path from node {@code from} to node {@code to} through windings only, each with its
     * traversal sign (+1 start to end), or an empty list when no closed winding joins them.
     */
    List<Step> windingPath(int from, int to) {
        List<Step> path = new ArrayList<>();
        return dfs(from, to, new boolean[nodeCount], path) ? path : List.of();
    }

    record Step(Half half, int sign) {
    }

    private boolean dfs(int at, int to, boolean[] seen, List<Step> path) {
        if (at == to) {
            return true;
        }
        seen[at] = true;
        for (Half h : halves) {
            if (h.open) {
                continue;
            }
            int next = h.start == at ? h.end : h.end == at ? h.start : -1;
            if (next < 0 || seen[next]) {
                continue;
            }
            path.add(new Step(h, h.start == at ? +1 : -1));
            if (dfs(next, to, seen, path)) {
                return true;
            }
            path.remove(path.size() - 1);
        }
        return false;
    }

    /** Inductance of a winding path, henry: self-inductances plus 2·σi·σj·M for halves of the same phase. */
    double inductanceH(List<Step> path) {
        double l = 0;
        for (int i = 0; i < path.size(); i++) {
            Half hi = path.get(i).half;
            l += hi.henry;
            for (int j = i + 1; j < path.size(); j++) {
                Half hj = path.get(j).half;
                if (hi.phase == hj.phase) {
                    l += 2 * path.get(i).sign * path.get(j).sign * coupling * Math.sqrt(hi.henry * hj.henry);
                }
            }
        }
        return l;
    }
}
