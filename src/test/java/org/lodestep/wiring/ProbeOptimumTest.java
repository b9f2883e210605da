package org.lodestep.wiring;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

/**
 * The least mean number of readings any question order can reach, by exhaustive search over every order (dynamic
 * programming over the layouts left and the pairs read), for the stopping rule of {@link ProbeSession}: one healthy
 * layout left, every winding read from its own coils ({@link MotorHypotheses#windingReadings}). A reading shows
 * open or continuity, and coil counts only relative to the other continuity readings (series circuits, references
 * §4; the meter does not know the coil's resistance in advance). The planner's mean over all labelings must equal it.
 */
class ProbeOptimumTest {

    private static final class Search {
        final int n;
        final List<int[][]> layouts;
        final List<List<long[]>> windings;
        final Map<String, Double> memo = new HashMap<>();

        Search(int n) {
            this.n = n;
            this.layouts = MotorHypotheses.forLeads(n);
            this.windings = layouts.stream().map(MotorHypotheses::windingReadings).toList();
        }

        int unread(int k, long read) {
            int u = 0;
            for (long[] ways : windings.get(k)) {
                int fewest = Integer.MAX_VALUE;
                for (long w : ways) {
                    fewest = Math.min(fewest, Long.bitCount(w & ~read));
                }
                u += fewest;
            }
            return u;
        }

        /** What layout k shows on the pairs read: open or coil count, counts all equal seen as one level. */
        String seen(int k, List<int[]> pairs) {
            int[][] m = layouts.get(k);
            int level = 0;
            boolean one = true;
            for (int[] p : pairs) {
                int c = m[p[0]][p[1]];
                if (c > 0) {
                    one &= level == 0 || level == c;
                    level = c;
                }
            }
            StringBuilder b = new StringBuilder();
            for (int[] p : pairs) {
                int c = m[p[0]][p[1]];
                b.append(one && c > 0 ? 1 : c);
            }
            return b.toString();
        }

        /** Least expected readings from here, with at most {@code budget} more (infinite when impossible). */
        double best(BitSet alive, long read, List<int[]> pairs, int budget) {
            if (alive.cardinality() == 1 && unread(alive.nextSetBit(0), read) == 0) {
                return 0;
            }
            if (budget == 0) {
                return Double.POSITIVE_INFINITY;
            }
            String key = alive + "/" + read + "/" + budget;
            Double known = memo.get(key);
            if (known != null) {
                return known;
            }
            double best = Double.POSITIVE_INFINITY;
            for (int i = 0; i < n; i++) {
                for (int j = i + 1; j < n; j++) {
                    long bit = MotorHypotheses.bit(i, j);
                    if ((read & bit) != 0) {
                        continue;
                    }
                    List<int[]> after = new ArrayList<>(pairs);
                    after.add(new int[] {i, j});
                    Map<String, BitSet> outcomes = new LinkedHashMap<>();
                    for (int k = alive.nextSetBit(0); k >= 0; k = alive.nextSetBit(k + 1)) {
                        outcomes.computeIfAbsent(seen(k, after), x -> new BitSet()).set(k);
                    }
                    boolean useful = outcomes.size() > 1;
                    for (int k = alive.nextSetBit(0); k >= 0 && !useful; k = alive.nextSetBit(k + 1)) {
                        useful = unread(k, read | bit) < unread(k, read);
                    }
                    if (!useful) {
                        continue;
                    }
                    double cost = 1;
                    for (BitSet g : outcomes.values()) {
                        cost += (double) g.cardinality() / alive.cardinality() * best(g, read | bit, after,
                                budget - 1);
                    }
                    best = Math.min(best, cost);
                }
            }
            memo.put(key, best);
            return best;
        }

        double optimum(int budget) {
            BitSet all = new BitSet();
            all.set(0, layouts.size());
            return best(all, 0, List.of(), budget);
        }
    }

    @Test
    void theFourAndFiveLeadPlansReachTheLeastMeanAnyOrderCan() {
        // 4 leads: 3.00 with at most 4 readings; 5 leads: 5.40, the planner's worst case being 7 readings.
        assertEquals(3.0, new Search(4).optimum(4), 1e-9);
        assertEquals(5.4, new Search(5).optimum(7), 1e-9);
        assertEquals(ProbeSessionTest.readingsOverAllLabelings(4, 2.4).mean(), new Search(4).optimum(4), 1e-9);
        assertEquals(ProbeSessionTest.readingsOverAllLabelings(5, 1.2).mean(), new Search(5).optimum(7), 1e-9);
    }
}
