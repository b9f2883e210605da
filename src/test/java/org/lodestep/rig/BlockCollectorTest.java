package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.Channel;

class BlockCollectorTest {
    // 2 channels, 5 frames in blocks of 2: blocks 0 and 1 hold 2 frames, block 2 holds 1
    private static final StreamSpec SPEC = new StreamSpec(List.of(new Channel("x", "v"), new Channel("y", "a")),
            new double[] {0.5, 0.25}, 100, 5, 2);

    private static SampleBlock block(int seq) {
        int n = SPEC.framesIn(seq);
        short[] s = new short[2 * n];
        for (int i = 0; i < n; i++) {
            s[2 * i] = (short) (seq * 2 + i);
            s[2 * i + 1] = (short) (-(seq * 2 + i));
        }
        return new SampleBlock(seq, n, 2, s);
    }

    @Test
    void blocksInAnyOrderGiveTheSamplesScaledByLsb() throws Exception {
        BlockCollector c = new BlockCollector(SPEC);
        assertTrue(c.accept(block(2)));
        assertEquals(List.of(0, 1), c.unrequestedBefore(2));
        assertTrue(c.accept(block(0)));
        assertFalse(c.accept(block(0)), "a repeat is ignored");
        assertFalse(c.complete());
        assertThrows(IllegalStateException.class, c::samples);
        assertTrue(c.accept(block(1)));
        assertTrue(c.complete());
        double[][] s = c.samples();
        assertArrayEquals(new double[] {0, 0.5, 1.0, 1.5, 2.0}, s[0], 0);
        assertArrayEquals(new double[] {0, -0.25, -0.5, -0.75, -1.0}, s[1], 0);
    }

    @Test
    void requestedBlocksAreNotReportedAsNewGapsButStayMissing() throws Exception {
        BlockCollector c = new BlockCollector(SPEC);
        c.accept(block(2));
        c.noteRequest(0);
        assertEquals(List.of(1), c.unrequestedBefore(2));
        assertEquals(List.of(0, 1), c.missing(10));
        assertEquals(1, c.requests(0));
    }

    @Test
    void blockContradictingTheHeaderIsRefused() {
        BlockCollector c = new BlockCollector(SPEC);
        assertThrows(RigException.class, () -> c.accept(new SampleBlock(3, 1, 2, new short[2])));
        assertThrows(RigException.class, () -> c.accept(new SampleBlock(0, 1, 2, new short[2])));
        assertThrows(RigException.class, () -> c.accept(new SampleBlock(0, 2, 1, new short[2])));
    }
}
