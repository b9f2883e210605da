package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.Channel;

class SampleBlockTest {

    @Test
    void blockRoundTripsWithExtremeCounts() throws Exception {
        short[] s = {0, 1, -1, 32767, -32768, 1234};
        SampleBlock b = new SampleBlock(70000, 2, 3, s);
        SampleBlock d = SampleBlock.decode(b.encode());
        assertEquals(70000, d.seq());
        assertEquals(2, d.frames());
        assertEquals(3, d.channels());
        assertArrayEquals(s, d.samples());
    }

    @Test
    void blockWhoseLengthDisagreesWithItsHeaderIsRejected() {
        byte[] p = new SampleBlock(1, 2, 2, new short[4]).encode();
        byte[] shortened = java.util.Arrays.copyOf(p, p.length - 2);
        RigException e = assertThrows(RigException.class, () -> SampleBlock.decode(shortened));
        assertEquals(true, e.getMessage().contains("does not match"));
    }

    @Test
    void unknownSampleFormatIsRejected() {
        byte[] p = new SampleBlock(1, 1, 1, new short[1]).encode();
        p[7] = 2;
        assertThrows(RigException.class, () -> SampleBlock.decode(p));
    }

    @Test
    void streamHeaderRoundTrips() throws Exception {
        StreamSpec s = new StreamSpec(List.of(new Channel("accel", "g"), new Channel("current", "a")),
                new double[] {0.001, 0.0005}, 5000, 12345, 510);
        StreamSpec d = StreamSpec.decode(s.encode());
        assertEquals(s.channels(), d.channels());
        assertArrayEquals(s.lsb(), d.lsb());
        assertEquals(5000, d.rateHz());
        assertEquals(12345, d.frames());
        assertEquals(25, d.blocks());
        assertEquals(12345 - 24 * 510, d.framesIn(24));
    }

    @Test
    void streamHeaderWithWrongBlockCountIsRejected() {
        assertThrows(RigException.class, () -> StreamSpec.decode(
                "OK stream rate_hz=1000 frames=100 block_frames=10 blocks=9 channels=x:v:0.001"));
        assertThrows(RigException.class, () -> StreamSpec.decode(
                "OK stream rate_hz=1000 frames=100 block_frames=10 blocks=10 channels=x:v"));
        assertThrows(RigException.class, () -> StreamSpec.decode("OK ohm=3"));
    }
}
