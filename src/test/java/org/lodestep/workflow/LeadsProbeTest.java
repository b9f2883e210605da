package org.lodestep.workflow;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.lodestep.wiring.Topology;

/**
 * Guided sessions driven by scripted answers, without any front end. The answers describe a 4-lead motor with
 * windings 1-2 and 3-4 (2.4 Ω each); the questions follow from the planner, so each script answers in the order asked.
 */
class LeadsProbeTest {

    /** Answers from a list, recording every question and what the session said back. */
    private static final class Script implements LeadsProbe.Meter {
        final Deque<LeadsProbe.Answer> answers;
        final List<String> log = new ArrayList<>();

        Script(LeadsProbe.Answer... answers) {
            this.answers = new ArrayDeque<>(List.of(answers));
        }

        @Override
        public LeadsProbe.Answer ask(LeadsProbe.Question q) {
            log.add(q.number() + ":" + q.first() + "-" + q.second());
            return answers.isEmpty() ? new LeadsProbe.Answer.Stop(LeadsProbe.StopReason.END_OF_ANSWERS)
                    : answers.poll();
        }

        @Override
        public void undone(boolean withdrew) {
            log.add(withdrew ? "withdrew" : "nothing");
        }

        @Override
        public void refused(String reason) {
            log.add("refused");
        }
    }

    private static LeadsProbe.Answer ohm(double v) {
        return new LeadsProbe.Answer.Reading(OptionalDouble.of(v));
    }


    @Test
    void fourLeadSessionIsCertainAfterTwoReadings() throws Exception {
        // Two windings settle a healthy 4-lead motor (the cross pairs are implied open): 2 of N(N-1)/2 = 6 pairs.
        Script s = new Script(ohm(2.41), ohm(2.45));
        LeadsProbe.Result r = LeadsProbe.run(new LeadsProbe.Settings(List.of("1", "2", "3", "4"),
                LeadsSettings.DEFAULT), s, Progress.NONE);
        assertEquals(2, r.readings());
        assertEquals(6, r.allPairs());
        assertNull(r.stopped());
        assertEquals(Topology.FOUR_LEAD, r.identification().topology());
        assertEquals("1:1-2", s.log.get(0));
    }

    @Test
    void undoWithdrawsAndAnUnknownLeadIsRefused() throws Exception {
        Script s = new Script(ohm(9.9), new LeadsProbe.Answer.Undo(), new LeadsProbe.Answer.Undo(),
                new LeadsProbe.Answer.OtherPair("red", "violet", OptionalDouble.of(1.0)), ohm(2.41), ohm(2.45));
        LeadsProbe.Result r = LeadsProbe.run(new LeadsProbe.Settings(List.of("red", "blue", "green", "black"),
                LeadsSettings.DEFAULT), s, Progress.NONE);
        assertTrue(s.log.contains("withdrew") && s.log.contains("nothing") && s.log.contains("refused"), s.log.toString());
        assertEquals(2, r.readings());
        assertEquals(Topology.FOUR_LEAD, r.identification().topology());
        // questions come in the label order given (red before blue), not sorted
        assertEquals("1:red-blue", s.log.get(0));
    }

    @Test
    void runningOutOfAnswersStopsEarly() throws Exception {
        LeadsProbe.Result r = LeadsProbe.run(new LeadsProbe.Settings(List.of("1", "2", "3", "4"),
                LeadsSettings.DEFAULT), new Script(ohm(2.41)), Progress.NONE);
        assertEquals(LeadsProbe.StopReason.END_OF_ANSWERS, r.stopped());
        assertEquals(1, r.readings());
        assertTrue(!r.identification().determined());
    }
}
