package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.capture.CaptureReader;
import org.lodestep.capture.CaptureSidecar;
import org.lodestep.capture.Captures;
import org.lodestep.rig.SweepPlan;
import org.lodestep.sample.SampledSignal;
import org.lodestep.sample.SweepShape;

/** The rig use cases on the virtual rig, without a front end. */
class RigMeasureTest {

    private static RigMeasure.Settings settings(String address, RigMeasure.Kind kind, List<RigMeasure.LeadPair> pairs,
                                                Path out) {
        return new RigMeasure.Settings(address, kind, pairs, List.of(), null, null, 20, null, out, "test");
    }

    @Test
    void resistanceOfEveryPairOfASixLeadMotorFindsThreeConductingPairsPerPhase() throws Exception {
        RigMeasure.Result r = RigMeasure.run(settings("sim:salvage-6", RigMeasure.Kind.RESISTANCE, List.of(), null),
                Progress.NONE);
        // 6 leads: C(6,2) = 15 pairs; each centre-tapped phase's 3 leads join in 3 pairs (two phases: 6)
        assertEquals(15, r.resistances().size());
        assertEquals(6, r.resistances().stream().filter(x -> !x.open()).count());
        assertEquals(6, r.rig().labels().size());
        assertNull(r.capture());
    }

    @Test
    void stepResponseIsSavedWholeAndSettlesAtOhmsLawCurrent(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("step.csv");
        RigMeasure.Result r = RigMeasure.run(settings("sim:bench-4", RigMeasure.Kind.STEP_RESPONSE,
                List.of(new RigMeasure.LeadPair(1, 2)), csv), Progress.NONE);
        assertEquals(csv, r.saved());
        SampledSignal s = Captures.readAll(csv);
        assertEquals(List.of("current", "voltage"), s.channelNames());
        // 2 V into a 1.5 Ω winding + 0.1 Ω drive (scenarios.toml): settles at 2 / 1.6 = 1.25 A (Ohm's law)
        double[] i = s.channel(0);
        assertEquals(1.25, i[i.length - 1], 0.01);
        assertTrue(r.resistances().isEmpty() && r.insulation().isEmpty());
    }

    @Test
    void settingsThatCannotWorkAreRefusedBeforeTheRigIsTouched(@TempDir Path dir) throws Exception {
        Path existing = Files.writeString(dir.resolve("old.csv"), "keep me");
        assertThrows(IllegalArgumentException.class, () -> RigMeasure.run(settings("sim:bench-4",
                RigMeasure.Kind.STEP_RESPONSE, List.of(new RigMeasure.LeadPair(1, 2)), existing), Progress.NONE));
        assertEquals("keep me", Files.readString(existing));
        assertThrows(IllegalArgumentException.class, () -> settings("sim:bench-4", RigMeasure.Kind.STEP_RESPONSE,
                List.of(), null));
        assertThrows(IllegalArgumentException.class, () -> settings("sim:bench-4", RigMeasure.Kind.RESISTANCE,
                List.of(), dir.resolve("r.csv")));
        assertThrows(IllegalArgumentException.class, () -> new RigMeasure.LeadPair(2, 2));
        assertThrows(IllegalArgumentException.class, () -> RigMeasure.run(settings("nowhere:1",
                RigMeasure.Kind.RESISTANCE, List.of(), null), Progress.NONE));
    }

    @Test
    void sweepCaptureRecordsItsProfileInTheSidecar(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("gantry.csv");
        RigSweepCapture.Result r = RigSweepCapture.run(new RigSweepCapture.Settings("sim:gantry-axis",
                new SweepPlan(40, 160, 2, 4, 5000), csv, "test"), Progress.NONE);
        CaptureSidecar side = CaptureReader.verify(csv);
        assertTrue(side.complete());
        assertEquals("gantry-axis", side.scenario());
        assertEquals(SweepShape.LINEAR, side.sweep().shape());
        assertEquals(4, side.sweep().microsteps().getAsInt());
        // 2 s at 5000 Hz
        assertEquals(10000, r.capture().signal().length());
        try (var files = Files.list(dir)) {
            assertEquals(2, files.count(), "the CSV and its sidecar, no temporary file");
        }
    }
}
