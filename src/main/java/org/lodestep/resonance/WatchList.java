package org.lodestep.resonance;

import java.util.ArrayList;
import java.util.List;

/**
 * Near-threshold bumps at f_n/k (k = 1 ... 4): the highest response point within ±{@link #WINDOW} of each f_n/k
 * that lies in no band and stands at least {@link #MIN_EXCESS_DB} over the running baseline. Low-speed resonance
 * is expected exactly there (P. P. Acarnley, Stepping Motors, 4th ed., IEE 2002, section 4.3), so a small rise
 * at such a rate means more than one elsewhere. The window and the 1 dB floor are common practice (no published
 * source).
 */
final class WatchList {
    static final double WINDOW = 0.05;
    static final double MIN_EXCESS_DB = 1.0;

    private WatchList() {
    }

    static List<WatchPoint> find(double[] rates, double[] levelDb, double[] baselineDb, List<ResonanceBand> bands,
                                 double naturalHz, double thresholdDb) {
        List<WatchPoint> out = new ArrayList<>();
        if (!(naturalHz > 0) || rates.length == 0) {
            return out;
        }
        for (int k = 1; k <= BandClassifier.MAX_SUBHARMONIC; k++) {
            double target = naturalHz / k;
            int best = -1;
            for (int i = 0; i < rates.length; i++) {
                if (Math.abs(rates[i] / target - 1) > WINDOW || inBand(rates[i], bands)) {
                    continue;
                }
                if (best < 0 || levelDb[i] - baselineDb[i] > levelDb[best] - baselineDb[best]) {
                    best = i;
                }
            }
            if (best < 0) {
                continue;
            }
            double excess = levelDb[best] - baselineDb[best];
            if (excess >= MIN_EXCESS_DB && excess < thresholdDb && !nearBand(target, bands)) {
                out.add(new WatchPoint(k, rates[best], excess, levelDb[best]));
            }
        }
        return out;
    }

    private static boolean inBand(double rate, List<ResonanceBand> bands) {
        for (ResonanceBand b : bands) {
            if (b.contains(rate)) {
                return true;
            }
        }
        return false;
    }

    /** A band already found within the window of f_n/k makes a watch entry there redundant. */
    private static boolean nearBand(double target, List<ResonanceBand> bands) {
        for (ResonanceBand b : bands) {
            if (b.endFullStepsPerS() >= target * (1 - WINDOW) && b.startFullStepsPerS() <= target * (1 + WINDOW)) {
                return true;
            }
        }
        return false;
    }
}
