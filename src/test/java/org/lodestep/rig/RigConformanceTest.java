package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

/**
 * The conformance kit against the virtual rig, which implements firmware-protocol.md 1.1, and against rigs with one
 * deliberate fault each, which it must catch in exactly the rows about that fault.
 */
class RigConformanceTest {

    private static String table(RigConformance.Report r) {
        return r.checks().stream().map(c -> c.verdict() + " " + c.section() + " " + c.name() + " " + c.detail())
                .collect(Collectors.joining("\n"));
    }

    private static Set<String> failed(RigConformance.Report r) {
        return r.checks().stream().filter(c -> c.verdict() == RigConformance.Verdict.FAIL)
                .map(c -> c.section() + " " + c.name()).collect(Collectors.toCollection(TreeSet::new));
    }

    @Test
    void virtualRigInRealTimePassesEveryCheck() throws Exception {
        RigConformance.Report r = RigConformance.run("sim:bench-4?realtime=1", RigConformance.Settings.DEFAULT,
                s -> { });
        assertTrue(r.passed(), table(r));
        // only the two-host check needs a network address; every other check ran
        List<RigConformance.Check> skipped = r.checks().stream()
                .filter(c -> c.verdict() == RigConformance.Verdict.SKIP).toList();
        assertEquals(1, skipped.size(), table(r));
        assertTrue(skipped.get(0).name().contains("second host"), table(r));
    }

    @Test
    void virtualRigWithoutRealTimePassesAndSkipsWhatNeedsTime() throws Exception {
        RigConformance.Report r = RigConformance.run("sim:bench-4", new RigConformance.Settings(false), s -> { });
        assertTrue(r.passed(), table(r));
        assertTrue(r.checks().stream().anyMatch(c -> c.verdict() == RigConformance.Verdict.SKIP
                && c.name().contains("dwell")), table(r));
    }

    private static Set<String> brokenFailures(BrokenRig.Fault fault) throws Exception {
        RigConformance.Report r = RigConformance.run("broken:", () -> BrokenRig.open(fault), false,
                new RigConformance.Settings(false), s -> { });
        assertFalse(r.passed(), table(r));
        return failed(r);
    }

    @Test
    void aRigThatMeasuresRetriesAgainFailsTheDuplicateRowsOnly() throws Exception {
        assertEquals(Set.of(
                "2 a retried command (same tag, same text) gets the same answer and is not done again",
                "4.2 ARM then FIRE is answered ohm=, lead=, volts=, seconds=; a retry is answered again",
                "6 a retried stream command is answered with its header again and not streamed again"),
                brokenFailures(BrokenRig.Fault.REMEASURES_RETRIES));
    }

    @Test
    void aRigThatServesCommandsBeforeHelloFailsThatRowOnly() throws Exception {
        assertEquals(Set.of("3 a command before HELLO is refused with 10 VERSION"),
                brokenFailures(BrokenRig.Fault.NO_HELLO_FIRST));
    }

    @Test
    void aRigThatDamagesABlockFailsTheStreamRows() throws Exception {
        assertEquals(Set.of(
                "6 a stream has a header, blocks 0..B-1 with the stream's tag and an END complete",
                "6 RESEND seq=n sends block n again, RESEND seq=B the END frame"),
                brokenFailures(BrokenRig.Fault.DAMAGES_FIRST_BLOCK));
    }
}
