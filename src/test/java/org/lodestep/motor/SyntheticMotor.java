package org.lodestep.motor;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Analytic test signals of a two-phase hybrid motor: RL current steps and hand-turned back-EMF, from the formulas of
 * REFERENCE-CHECKS items 10 and 14 (nothing here comes from the code under test).
 */
final class SyntheticMotor {
    private SyntheticMotor() {
    }

    /** Sample times {@code 0, dt, ...}, s. */
    static double[] times(int n, double dtS) {
        double[] t = new double[n];
        for (int i = 0; i < n; i++) {
            t[i] = i * dtS;
        }
        return t;
    }

    /** RL step applied at {@code stepS}, with Gaussian noise of {@code noiseA} and quantisation to {@code lsbA}. */
    static double[] rlStep(double[] t, double supplyV, double loopOhm, double inductanceH, double stepS,
                           double noiseA, double lsbA, long seed) {
        Random rnd = new Random(seed);
        double tau = inductanceH / loopOhm;
        double[] i = new double[t.length];
        for (int k = 0; k < t.length; k++) {
            double v = t[k] <= stepS ? 0 : supplyV / loopOhm * (1 - Math.exp(-(t[k] - stepS) / tau));
            v += noiseA * rnd.nextGaussian();
            i[k] = lsbA > 0 ? Math.round(v / lsbA) * lsbA : v;
        }
        return i;
    }

    /**
     * Current of a coil whose inductance falls with current, {@code L(i) = L0/(1 + (i/iSat)^2)}, integrated with
     * small Euler steps: the rise speeds up near the end.
     */
    static double[] saturatingStep(double[] t, double supplyV, double loopOhm, double l0H, double iSatA) {
        double[] out = new double[t.length];
        double i = 0;
        for (int k = 1; k < t.length; k++) {
            double dt = (t[k] - t[k - 1]) / 50;
            for (int s = 0; s < 50; s++) {
                double l = l0H / (1 + (i / iSatA) * (i / iSatA));
                i += dt * (supplyV - loopOhm * i) / l;
            }
            out[k] = i;
        }
        return out;
    }

    /** Step with an eddy-current component: a fraction {@code fastShare} of the rise follows a 5x shorter tau. */
    static double[] eddyStep(double[] t, double supplyV, double loopOhm, double tauS, double fastShare) {
        double[] out = new double[t.length];
        double fin = supplyV / loopOhm;
        for (int k = 0; k < t.length; k++) {
            out[k] = fin * (1 - (1 - fastShare) * Math.exp(-t[k] / tauS) - fastShare * Math.exp(-t[k] * 5 / tauS));
        }
        return out;
    }

    /** One coil of the synthetic motor: its leads as labelled, its phase, and whether its start is the second lead. */
    record Coil(String lead1, String lead2, boolean phaseA, boolean startIsSecond) {
    }

    /**
     * Mechanical angle of a hand turn that starts and ends at rest: {@code theta = 2·pi·revs·(u - sin(2·pi·u)/(2·pi))}
     * with {@code u = t/T}, so the speed varies from 0 to twice its mean and back.
     */
    static double[] handTurnAngleRad(int n, double sampleRateHz, double revolutions) {
        double[] th = new double[n];
        double total = (n - 1) / sampleRateHz;
        for (int i = 0; i < n; i++) {
            double u = i / sampleRateHz / total;
            th[i] = 2 * Math.PI * revolutions * (u - Math.sin(2 * Math.PI * u) / (2 * Math.PI));
        }
        return th;
    }

    /**
     * Back-EMF of each coil measured lead1 minus lead2, item 14: {@code eA = -Ke·w·sin(Nr·theta)},
     * {@code eB = Ke·w·cos(Nr·theta)}, with Ke in peak V per mechanical rad/s, plus Gaussian noise.
     */
    static List<EmfChannel> backEmf(List<Coil> coils, double[] thetaRad, double sampleRateHz, int rotorTeeth,
                                    double keVsPerRad, double noiseV, long seed) {
        Random rnd = new Random(seed);
        int n = thetaRad.length;
        List<EmfChannel> out = new ArrayList<>();
        for (Coil c : coils) {
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                int a = Math.max(0, i - 1);
                int b = Math.min(n - 1, i + 1);
                double w = (thetaRad[b] - thetaRad[a]) / ((b - a) / sampleRateHz);
                double phi = rotorTeeth * thetaRad[i];
                double e = c.phaseA() ? -keVsPerRad * w * Math.sin(phi) : keVsPerRad * w * Math.cos(phi);
                v[i] = (c.startIsSecond() ? -e : e) + noiseV * rnd.nextGaussian();
            }
            out.add(new EmfChannel(new OrientedLeads(c.lead1(), c.lead2()), v));
        }
        return out;
    }
}
