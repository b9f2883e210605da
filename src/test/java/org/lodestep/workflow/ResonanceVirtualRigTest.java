package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.motor.NaturalFrequency;
import org.lodestep.resonance.ResonanceBand;
import org.lodestep.resonance.SweepResult;
import org.lodestep.rig.Scenario;
import org.lodestep.rig.Scenarios;
import org.lodestep.rig.SweepPlan;

/**
 * End to end without a front end: a sweep recorded from the virtual rig's gantry axis ({@link RigSweepCapture}),
 * analysed by the resonance engine ({@link ResonanceSweep}) from the capture in memory and from the file it saved.
 */
class ResonanceVirtualRigTest {

    @Test
    void strongestBandOfAVirtualRigSweepContainsTheModelsNaturalFrequency(@TempDir Path dir) throws Exception {
        Scenario sc = Scenarios.get("gantry-axis");
        // Acarnley (2002), ch. 4 / REFERENCE-CHECKS item 11: f_n = (1/2π)·√(N_r·T_h/J) of the scenario's rotor + load.
        double fn = NaturalFrequency.naturalHz(sc.holdingTorqueNm(), sc.rotorTeeth(), sc.totalInertiaKgM2());
        SweepPlan plan = new SweepPlan(20, 400, 20, 1, 5000);
        RigSweepCapture.Result cap = RigSweepCapture.run(new RigSweepCapture.Settings("sim:gantry-axis", plan,
                dir.resolve("gantry.csv"), "test"), Progress.NONE);
        // The in-memory capture has no sweep metadata: the law is the plan's.
        ResonanceSweep.Settings settings = ResonanceSweep.Settings.defaults()
                .withLaw(plan.shape(), 20, 400, 20.0);
        for (ResonanceSweep.Result res : new ResonanceSweep.Result[] {
            ResonanceSweep.analyse(cap.capture().signal(), settings, Progress.NONE),
            // the saved file carries the sweep profile in its sidecar: no law needed
            ResonanceSweep.analyse(cap.saved(), ResonanceSweep.Settings.defaults(), Progress.NONE)}) {
            SweepResult r = res.sweep();
            assertEquals("accel", res.channel());
            ResonanceBand strongest = r.strongestBand();
            assertNotNull(strongest, "no band in " + r.response().size() + " points");
            // Low-speed resonance at a full-step rate equal to f_n (Acarnley 2002, section 4.3; REFERENCE-CHECKS item
            // 12): the strongest band must reach within 8 % of the model's f_n.
            assertTrue(strongest.startFullStepsPerS() <= fn * 1.08 && strongest.endFullStepsPerS() >= fn * 0.92,
                    strongest + " vs f_n " + fn);
            // The estimate from the band's vibration agrees with the model within 8 % too.
            assertEquals(fn, r.naturalFrequencyHz(), 0.08 * fn);
        }
    }
}
