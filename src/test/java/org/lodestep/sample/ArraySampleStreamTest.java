package org.lodestep.sample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

class ArraySampleStreamTest {
    private static final List<Channel> TWO = List.of(new Channel("a", "g"), new Channel("b", "v"));

    @Test
    void servesFramesInBlocksThenEnd() throws Exception {
        double[] a = {1, 2, 3, 4, 5};
        ArraySampleStream s = new ArraySampleStream("mem", TWO, 100, 0.25, Map.of("k", "v"),
                new double[][] {a, {5, 4, 3, 2, 1}});
        a[0] = 99;   // the stream took a copy
        assertEquals(5, s.knownFrameCount());
        double[][] buf = new double[2][3];
        assertEquals(3, s.read(buf, 0, 3));
        assertArrayEquals(new double[] {1, 2, 3}, buf[0]);
        assertEquals(2, s.read(buf, 1, 2));
        assertArrayEquals(new double[] {1, 4, 5}, buf[0]);
        assertArrayEquals(new double[] {5, 2, 1}, buf[1]);
        assertEquals(-1, s.read(buf, 0, 3));
        assertEquals(0.25, s.startTimeS());
        assertEquals("v", s.metadata().get("k"));
    }

    @Test
    void roundTripsThroughSampledSignal() throws Exception {
        ArraySampleStream s = ArraySampleStream.of("mem", new Channel("x", ""), 8, new double[] {0.5, -0.5});
        SampledSignal sig = SampledSignal.readAll(s);
        assertArrayEquals(new double[] {0.5, -0.5}, SampledSignal.readAll(sig.stream()).channel(0));
    }

    @Test
    void rejectsImpossibleInput() {
        assertThrows(IllegalArgumentException.class,
                () -> ArraySampleStream.of("m", new Channel("x", ""), 0, new double[1]));
        assertThrows(IllegalArgumentException.class,
                () -> ArraySampleStream.of("m", new Channel("x", ""), 10, new double[] {Double.NaN}));
        assertThrows(IllegalArgumentException.class,
                () -> new ArraySampleStream("m", TWO, 10, 0, Map.of(), new double[][] {{1}, {1, 2}}));
    }
}
