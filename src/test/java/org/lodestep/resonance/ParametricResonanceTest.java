package org.lodestep.resonance;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.SweepShape;

/**
 * Parametric resonance: a lightly damped microstep sweep with detent, integrated by {@link StepperSweepSimulator}
 * (RK4 at 1/(8·5000 Hz) = 25 µs). Between full steps the detent T_d·sin(4N_r·θ) modulates the stiffness at the
 * full-step rate; the Mathieu equation x'' + ω_0²(1 + ε·cos Ωt)x = 0 has its first instability tongue at Ω = 2ω_0,
 * answered at ω_0 (Nayfeh & Mook, Nonlinear Oscillations, Wiley 1979, ch. 5; from memory).
 */
class ParametricResonanceTest {

    @Test
    void aBandNearTwiceTheNaturalFrequencyVibratingAtItIsNamedParametric() {
        StepperSweepSimulator sim = new StepperSweepSimulator();
        sim.detentTorqueNm = 0.02;
        sim.dampingRatio(0.01);
        sim.microsteps = 8;
        sim.substeps = 8;
        sim.accelNoiseG = 0.02;
        StepperSweepSimulator.Run run = sim.linearSweep(40, 400, 30, 5000);
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(5000), 5000,
                new SweepLaw(SweepShape.LINEAR, 40, 400, 30));
        a.feed(run.accelG(), null, 0, run.accelG().length);
        // f_n of the winding alone, √(N_r·T_h/J)/2π = 100.26 Hz (Acarnley ch. 4): between microsteps the detent's
        // stiffness averages out
        double fn = 100.26;
        SweepResult r = a.finish(BandSettings.defaults(), fn);
        ResonanceBand parametric = null;
        for (ResonanceBand b : r.bands()) {
            if (b.contains(2 * fn) || Math.abs(b.peakFullStepsPerS() / (2 * fn) - 1) < 0.05) {
                parametric = b;
            }
        }
        assertTrue(parametric != null, "a band near 2·f_n in " + r.bands());
        assertEquals(BandClass.PARAMETRIC_RESONANCE, parametric.bandClass(), parametric.toString());
        assertEquals(1, parametric.subharmonic());
        assertEquals(fn, parametric.mechanicalFrequencyHz(), 0.05 * fn);
        AvoidRange advice = Recommendations.avoidList(List.of(parametric), RateUnits.defaults(), fn, 0.01, 5, 0.05)
                .ranges().get(0);
        assertTrue(advice.advice().contains("damping helps"), advice.advice());
        assertTrue(advice.advice().contains("microstepping does not"), advice.advice());
    }

    @Test
    void classifierRules() {
        double fn = 100;
        // vibration at f_n, rate 2·f_n: parametric, first tongue (rule 1)
        assertEquals(BandClass.PARAMETRIC_RESONANCE, BandClassifier.classify(band(204, 101), fn).bandClass());
        // rate 2·f_n/3 with vibration at 3/2 of it = f_n: third tongue
        ResonanceBand third = BandClassifier.classify(band(67, 100.5), fn);
        assertEquals(BandClass.PARAMETRIC_RESONANCE, third.bandClass());
        assertEquals(3, third.subharmonic());
        // rate at f_n vibrating at f_n stays low-speed resonance (rule 2)
        assertEquals(BandClass.LOW_SPEED_RESONANCE, BandClassifier.classify(band(100, 100), fn).bandClass());
        // well above f_n, vibration at neither f_n nor a half multiple of the rate: mid-band (rule 3)
        assertEquals(BandClass.MID_BAND_INSTABILITY, BandClassifier.classify(band(400, 260), fn).bandClass());
        // well above f_n but ringing at f_n without the half-order relation: not mid-band
        assertEquals(BandClass.UNCLASSIFIED, BandClassifier.classify(band(400, 100), fn).bandClass());
    }

    private static ResonanceBand band(double peak, double vibHz) {
        return new ResonanceBand(peak * 0.97, peak * 1.03, peak, 1, 0, 6, vibHz, BandClass.UNCLASSIFIED, 0);
    }
}
