package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.List;

/**
 * Every healthy motor layout for a lead count (4, 5, 6 or 8) under every assignment of labels, as the number of coils
 * each pair of leads reads through: 0 (open), 1 (one coil) or 2 (two coils in series).
 *
 * <p>Counts: 4 leads 3 pairings; 5 leads 5 choices of the common lead; 6 leads 10 splits into two triples × 3 × 3
 * taps = 90; 8 leads 105 pairings into four coils. Each layout arises from the same number of the N! labelings.
 *
 * <p>A winding's resistance is read when a reading is that winding alone ({@link #windingReadings}): the pair of a
 * 4-lead phase or an 8-lead coil, the common-to-end pair of a 5-lead coil, and for a 6-lead centre-tapped winding
 * two of its three pairs: the end-to-end pair with one half (the other half is their difference) or both halves
 * (the whole is their series sum). Two are needed there, not one, so that every lead of the winding, the tap
 * included, is joined to it by a reading.
 */
final class MotorHypotheses {
    private MotorHypotheses() {
    }

    /** The layouts for {@code n} leads (indices 0..n-1); empty for other lead counts. */
    static List<int[][]> forLeads(int n) {
        List<int[][]> out = new ArrayList<>();
        switch (n) {
            case 4, 8 -> matchings(new int[n][n], new boolean[n], out);
            case 5 -> {
                for (int com = 0; com < 5; com++) {
                    int[][] k = new int[5][5];
                    for (int i = 0; i < 5; i++) {
                        for (int j = 0; j < 5; j++) {
                            if (i != j) {
                                k[i][j] = i == com || j == com ? 1 : 2;
                            }
                        }
                    }
                    out.add(k);
                }
            }
            case 6 -> {
                for (int x = 1; x < 6; x++) {
                    for (int y = x + 1; y < 6; y++) {
                        int[] first = {0, x, y};
                        int[] second = new int[3];
                        int s = 0;
                        for (int i = 1; i < 6; i++) {
                            if (i != x && i != y) {
                                second[s++] = i;
                            }
                        }
                        for (int ta = 0; ta < 3; ta++) {
                            for (int tb = 0; tb < 3; tb++) {
                                int[][] k = new int[6][6];
                                tapped(k, first, first[ta]);
                                tapped(k, second, second[tb]);
                                out.add(k);
                            }
                        }
                    }
                }
            }
            default -> {
            }
        }
        return out;
    }

    /** The bit of pair (i, j), i != j, in a set of pairs held as a {@code long} (at most 8 leads). */
    static long bit(int i, int j) {
        return 1L << (Math.min(i, j) * 8 + Math.max(i, j));
    }

    /**
     * For each winding of layout {@code k}, the sets of pairs (as {@link #bit} masks) any one of which, read, gives
     * that winding's resistance from its own coils alone.
     */
    static List<long[]> windingReadings(int[][] k) {
        int n = k.length;
        List<long[]> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            for (int j = i + 1; j < n; j++) {
                if (n == 6 && k[i][j] == 2) {
                    int tap = -1;
                    for (int t = 0; t < n; t++) {
                        if (k[t][i] == 1 && k[t][j] == 1) {
                            tap = t;
                        }
                    }
                    long whole = bit(i, j);
                    out.add(new long[] {whole | bit(tap, i), whole | bit(tap, j), bit(tap, i) | bit(tap, j)});
                } else if (n != 6 && k[i][j] == 1) {
                    out.add(new long[] {bit(i, j)});
                }
            }
        }
        return out;
    }

    private static void tapped(int[][] k, int[] group, int tap) {
        for (int i : group) {
            for (int j : group) {
                if (i != j) {
                    k[i][j] = i == tap || j == tap ? 1 : 2;
                }
            }
        }
    }

    private static void matchings(int[][] k, boolean[] used, List<int[][]> out) {
        int first = -1;
        for (int i = 0; i < used.length; i++) {
            if (!used[i]) {
                first = i;
                break;
            }
        }
        if (first < 0) {
            int[][] copy = new int[k.length][];
            for (int i = 0; i < k.length; i++) {
                copy[i] = k[i].clone();
            }
            out.add(copy);
            return;
        }
        used[first] = true;
        for (int j = first + 1; j < used.length; j++) {
            if (!used[j]) {
                used[j] = true;
                k[first][j] = 1;
                k[j][first] = 1;
                matchings(k, used, out);
                k[first][j] = 0;
                k[j][first] = 0;
                used[j] = false;
            }
        }
        used[first] = false;
    }
}
