package org.lodestep.wiring;

import java.util.ArrayList;
import java.util.List;

/**
 * Every healthy motor layout for a lead count (4, 5, 6 or 8) under every assignment of labels, as the number of coils
 * each pair of leads reads through: 0 (open), 1 (one coil) or 2 (two coils in series).
 *
 * <p>Counts: 4 leads 3 pairings; 5 leads 5 choices of the common lead; 6 leads 10 splits into two triples × 3 × 3
 * taps = 90; 8 leads 105 pairings into four coils. Each layout arises from the same number of the N! labelings.
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
