package org.lodestep.cli;

import org.lodestep.sample.SweepShape;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.SampledSignal;
import org.lodestep.resonance.BandSettings;
import org.lodestep.motor.NaturalFrequency;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.SweepAnalyzer;
import org.lodestep.resonance.SweepLaw;
import org.lodestep.resonance.SweepResult;
import org.lodestep.resonance.SweepSettings;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.Scenario;
import org.lodestep.rig.Scenarios;
import org.lodestep.rig.SweepPlan;

/** End to end: a sweep recorded from the virtual rig's gantry axis, analysed by the resonance engine. */
class ResonanceVirtualRigTest {

    @Test
    void strongestBandOfAVirtualRigSweepContainsTheModelsNaturalFrequency() throws Exception {
        Scenario sc = Scenarios.get("gantry-axis");
        // Acarnley (2002), ch. 4 / REFERENCE-CHECKS item 11: f_n = (1/2π)·√(N_r·T_h/J) of the scenario's rotor + load.
        double fn = NaturalFrequency.naturalHz(sc.holdingTorqueNm(), sc.rotorTeeth(), sc.totalInertiaKgM2());
        SampledSignal s;
        try (RigClient c = RigClient.open("sim:gantry-axis")) {
            RigCapture cap = c.sweep(new SweepPlan(20, 400, 20, 1, 5000), RigClient.Progress.NONE);
            s = cap.signal();
        }
        SweepAnalyzer a = SweepAnalyzer.programmed(SweepSettings.forSampleRate(s.sampleRateHz()), s.sampleRateHz(),
                new SweepLaw(SweepShape.LINEAR, 20, 400, 20));
        double[] accel = s.channel(s.indexOf("accel"));
        a.feed(accel, null, 0, accel.length);
        SweepResult r = a.finish(BandSettings.defaults(), Double.NaN);
        ResonanceBand strongest = r.strongestBand();
        assertNotNull(strongest, "no band in " + r.response().size() + " points");
        // Low-speed resonance at a full-step rate equal to f_n (Acarnley 2002, section 4.3; REFERENCE-CHECKS item 12):
        // the strongest band must reach within 8 % of the model's f_n.
        assertTrue(strongest.startFullStepsPerS() <= fn * 1.08 && strongest.endFullStepsPerS() >= fn * 0.92,
                strongest + " vs f_n " + fn);
        // The estimate from the band's vibration agrees with the model within 8 % too.
        assertEquals(fn, r.naturalFrequencyHz(), 0.08 * fn);
    }
}
