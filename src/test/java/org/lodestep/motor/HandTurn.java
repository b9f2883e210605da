package org.lodestep.motor;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Hand-turned back-EMF captures from rest to rest, generated from the physics stated here (nothing comes from the
 * code under test).
 *
 * <p>Motion: the shaft rests for an idle stretch, is turned by hand with a speed that rises smoothly from rest,
 * wanders between about 0.6 and 2.8 rev/s (a sum of slow random sinusoids, as a hand does), may pause (speed falls
 * to zero and rises again) or briefly turn back, and comes to rest again, then rests once more. The speed profile is
 * scaled so the net travel is exactly {@code revolutions} plus a mark error (the technician lines the shaft up with
 * the mark by eye).
 *
 * <p>EMF (Acarnley, <i>Stepping Motors</i>, 4th ed., hybrid-motor chapters, from memory): {@code eA = -Ke·w·(sin φ
 * + h·sin 3φ)}, {@code eB = Ke·w·(cos φ - h·cos 3φ)} with {@code φ = Nr·θ}, i.e. phase B is phase A displaced by a
 * quarter electrical period, both with a third-harmonic share {@code h}. Every channel adds Gaussian noise and mains
 * hum at 50 Hz of its own phase, and is quantised by a 12-bit converter spanning ±1.25 × the peak EMF.
 */
final class HandTurn {
    /** One generated capture: its channels, the true mechanical travel and the stated revolutions. */
    record Capture(List<EmfChannel> channels, double trueRevolutions, double statedRevolutions, int rotorTeeth,
                   String description) {
    }

    /** What a hand-turned capture contains. */
    record Profile(double revolutions, int rotorTeeth, double idleS, boolean pause, boolean reversal,
                   double markErrorDeg, double noiseFraction, double humFraction, double thirdHarmonic,
                   boolean quantise12Bit) {
    }

    private HandTurn() {
    }

    /** A random profile of 1.5 to 5 turns, 50 or 100 teeth, with noise, hum, harmonic and quantisation. */
    static Profile randomProfile(Random rnd) {
        double revs = 1.5 + 0.5 * rnd.nextInt(8); // 1.5, 2, ... 5 turns against the mark
        int teeth = rnd.nextBoolean() ? 50 : 100;
        return new Profile(revs, teeth, 0.3 + 0.5 * rnd.nextDouble(), rnd.nextInt(4) == 0, rnd.nextInt(5) == 0,
                (rnd.nextDouble() * 2 - 1) * 1.0, 0.002 + 0.008 * rnd.nextDouble(), 0.02 * rnd.nextDouble(),
                0.05 * rnd.nextDouble(), rnd.nextBoolean());
    }

    static Capture generate(Profile p, List<SyntheticMotor.Coil> coils, double sampleRateHz, long seed) {
        Random rnd = new Random(seed);
        double meanRevPerS = 1.0 + 0.8 * rnd.nextDouble();
        double turnS = p.revolutions() / meanRevPerS;
        double totalS = 2 * p.idleS() + turnS;
        int n = (int) Math.round(totalS * sampleRateHz);
        double[] speed = new double[n];
        // slow hand wander: three sinusoids of 0.3 to 1.5 Hz
        double[] fw = new double[3];
        double[] ph = new double[3];
        for (int k = 0; k < 3; k++) {
            fw[k] = 0.3 + 1.2 * rnd.nextDouble();
            ph[k] = 2 * Math.PI * rnd.nextDouble();
        }
        double pauseAt = 0.3 + 0.4 * rnd.nextDouble();
        double reverseAt = 0.3 + 0.4 * rnd.nextDouble();
        for (int i = 0; i < n; i++) {
            double t = i / sampleRateHz - p.idleS();
            if (t <= 0 || t >= turnS) {
                continue;
            }
            double u = t / turnS;
            // rest-to-rest envelope: rises from zero over the first 15 % and falls over the last 15 %
            double env = Math.min(1, Math.min(u, 1 - u) / 0.15);
            env = 0.5 - 0.5 * Math.cos(Math.PI * env);
            double wander = 1;
            for (int k = 0; k < 3; k++) {
                wander += 0.22 * Math.sin(2 * Math.PI * fw[k] * t + ph[k]);
            }
            double v = env * wander;
            if (p.pause()) {
                // the speed falls to zero for about 0.2 s and rises again
                double d = (u - pauseAt) * turnS / 0.2;
                v *= Math.min(1, Math.abs(d) < 1 ? Math.abs(d) * Math.abs(d) : 1);
            }
            if (p.reversal()) {
                // a short turn back of about 0.15 s
                double d = (u - reverseAt) * turnS / 0.15;
                if (Math.abs(d) < 1) {
                    v -= 0.6 * (0.5 + 0.5 * Math.cos(Math.PI * d)) * 2;
                }
            }
            speed[i] = v;
        }
        double net = 0;
        for (double v : speed) {
            net += v / sampleRateHz;
        }
        double trueRevs = p.revolutions() + p.markErrorDeg() / 360.0;
        double scale = trueRevs * 2 * Math.PI / net;
        double[] theta = new double[n];
        double[] omega = new double[n];
        double th = 0;
        for (int i = 0; i < n; i++) {
            omega[i] = speed[i] * scale;
            th += omega[i] / sampleRateHz;
            theta[i] = th;
        }
        double ke = 0.05;
        double peak = 0;
        for (double w : omega) {
            peak = Math.max(peak, Math.abs(w) * ke);
        }
        double lsb = 2.5 * peak * (1 + p.thirdHarmonic()) / 4096;
        List<EmfChannel> out = new ArrayList<>();
        for (SyntheticMotor.Coil c : coils) {
            double humPhase = 2 * Math.PI * rnd.nextDouble();
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                double phi = p.rotorTeeth() * theta[i];
                double h = p.thirdHarmonic();
                double e = c.phaseA() ? -ke * omega[i] * (Math.sin(phi) + h * Math.sin(3 * phi))
                        : ke * omega[i] * (Math.cos(phi) - h * Math.cos(3 * phi));
                double s = (c.startIsSecond() ? -e : e)
                        + p.noiseFraction() * peak * rnd.nextGaussian()
                        + p.humFraction() * peak * Math.sin(2 * Math.PI * 50 * i / sampleRateHz + humPhase);
                v[i] = p.quantise12Bit() ? Math.round(s / lsb) * lsb : s;
            }
            out.add(new EmfChannel(new OrientedLeads(c.lead1(), c.lead2()), v));
        }
        return new Capture(out, trueRevs, p.revolutions(), p.rotorTeeth(), p.toString());
    }
}
