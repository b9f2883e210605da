package org.lodestep.wiring;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/** Test helper: a layout-independent description of windings, to compare an identification with the truth. */
final class Signatures {
    private Signatures() {
    }

    static Set<String> of(Identification id) {
        Set<String> s = new TreeSet<>();
        for (Winding w : id.windings()) {
            s.add(sig(w.ends(), w.tap()));
        }
        return s;
    }

    /** From the layout: 4/8 leads coils; 5 leads common-to-end coils; 6 leads tapped windings. */
    static Set<String> of(SimulatedMotor m) {
        Set<String> s = new TreeSet<>();
        int n = m.labels.size();
        for (int i = 0; i < n; i++) {
            int ones = 0;
            int twos = 0;
            for (int j = 0; j < n; j++) {
                ones += m.coils[i][j] == 1 ? 1 : 0;
                twos += m.coils[i][j] == 2 ? 1 : 0;
            }
            if (n == 6 && ones == 2) {
                List<String> ends = new java.util.ArrayList<>();
                for (int j = 0; j < n; j++) {
                    if (m.coils[i][j] == 1) {
                        ends.add(m.labels.get(j));
                    }
                }
                s.add(sig(ends, m.labels.get(i)));
            }
            if (n == 5 && ones == 4) {
                for (int j = 0; j < n; j++) {
                    if (j != i) {
                        s.add(sig(List.of(m.labels.get(i), m.labels.get(j)), null));
                    }
                }
            }
            if ((n == 4 || n == 8) && twos == 0) {
                for (int j = i + 1; j < n; j++) {
                    if (m.coils[i][j] == 1) {
                        s.add(sig(List.of(m.labels.get(i), m.labels.get(j)), null));
                    }
                }
            }
        }
        return s;
    }

    private static String sig(List<String> ends, String tap) {
        return new TreeSet<>(ends) + (tap == null ? "" : " tap " + tap);
    }
}
