package org.lodestep.resonance;

import java.util.List;
import java.util.Locale;

/**
 * Turns the windows of a {@link SynchronismDetector} into a {@link Stall} verdict. The lock counts as lost where
 * at least {@link #RUN} consecutive windows have a synchronous share below {@link #LOST} and a non-synchronous RMS
 * of at least {@link #VIOLENT} times the strongest window's RMS: slipping poles is violent, while the free ringing a
 * lightly damped rotor carries on after crossing a sharp resonance, or the faint response far from any resonance, is
 * not synchronous either but small or brief. The rotor counts as re-locked from the first window at or above
 * {@link #RELOCKED} after the last lost window. The first window is not judged: it holds the start from rest, a
 * transient that is not periodic in the step count. Thresholds are common practice for synchronous averaging (no
 * published source), set on simulated sweeps: a locked rotor stays above 0.8 away from sharp resonances, slipping
 * poles brings the share under 0.4.
 */
final class SynchronismJudge {
    static final double LOST = 0.5;
    static final double RELOCKED = 0.8;
    static final int RUN = 2;
    static final double VIOLENT = 0.3;

    private SynchronismJudge() {
    }

    static Stall judge(List<SynchronismDetector.Window> windows, String channelWord) {
        if (windows.size() < 3) {
            return Stall.notJudged("not judged: the " + channelWord + " capture holds " + windows.size()
                    + " synchronous-averaging windows, fewer than 3");
        }
        double strongest = 0;
        for (SynchronismDetector.Window w : windows) {
            strongest = Math.max(strongest, w.rms());
        }
        boolean[] lost = new boolean[windows.size()];
        double lowest = 1;
        for (int i = 1; i < windows.size(); i++) {
            SynchronismDetector.Window w = windows.get(i);
            lowest = Math.min(lowest, w.synchronousShare());
            lost[i] = w.synchronousShare() < LOST
                    && w.rms() * Math.sqrt(1 - w.synchronousShare()) >= VIOLENT * strongest;
        }
        int first = -1;
        int lastLost = -1;
        for (int i = 1; i + RUN <= windows.size(); i++) {
            boolean run = true;
            for (int j = i; j < i + RUN; j++) {
                run &= lost[j];
            }
            if (run) {
                if (first < 0) {
                    first = i;
                }
                lastLost = i + RUN - 1;
            }
        }
        if (first < 0) {
            return new Stall(false, Double.NaN, Double.NaN, Double.NaN, lowest, String.format(Locale.ROOT,
                    "%s stayed locked to the step command: no two strong windows in a row lost it (lowest"
                    + " synchronous share %.2f)",
                    channelWord, lowest));
        }
        double relock = Double.NaN;
        for (int i = lastLost + 1; i < windows.size(); i++) {
            if (windows.get(i).synchronousShare() >= RELOCKED) {
                relock = windows.get(i).rateFullStepsPerS();
                break;
            }
        }
        return new Stall(true, windows.get(first).rateFullStepsPerS(), relock, Double.NaN, lowest,
                String.format(Locale.ROOT, "%s lost its lock to the step command: the share of its power that"
                        + " repeats with the step count fell to %.2f (above %.2f while locked); steps lost are not"
                        + " countable from this channel", channelWord, lowest, RELOCKED));
    }
}
