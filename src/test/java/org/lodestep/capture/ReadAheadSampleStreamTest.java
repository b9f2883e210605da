package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class ReadAheadSampleStreamTest {

    private static String csv(int rows, int badRow) {
        StringBuilder sb = new StringBuilder("time_s,a_g,b_v\n");
        for (int i = 0; i < rows; i++) {
            sb.append(TestStreams.fixed(i / 1000.0, 3)).append(',').append(i == badRow ? "x" : Integer.toString(i))
                    .append(',').append(-i).append('\n');
        }
        return sb.toString();
    }

    @Test
    void deliversTheSameFramesAsTheWrappedStream() throws Exception {
        String text = csv(20_000, -1);
        double[][] direct;
        try (SampleStream s = TimeSeriesCsvReader.open(TestStreams.text(text), "a.csv")) {
            direct = TestStreams.readAll(s, 1000);
        }
        try (SampleStream s = new ReadAheadSampleStream(TimeSeriesCsvReader.open(TestStreams.text(text), "a.csv"),
                777, 3)) {
            assertEquals(1000.0, s.sampleRateHz());
            double[][] ahead = TestStreams.readAll(s, 500);
            assertArrayEquals(direct[0], ahead[0]);
            assertArrayEquals(direct[1], ahead[1]);
        }
    }

    @Test
    void raisesTheReadersErrorAfterTheFramesBeforeIt() throws Exception {
        try (SampleStream s = new ReadAheadSampleStream(
                TimeSeriesCsvReader.open(TestStreams.text(csv(10_000, 6000)), "bad.csv"), 1024, 2)) {
            double[][] buf = new double[2][100];
            int frames = 0;
            InputFormatException e = null;
            try {
                int got;
                while ((got = s.read(buf, 0, 100)) >= 0) {
                    frames += got;
                }
            } catch (InputFormatException caught) {
                e = caught;
            }
            assertTrue(e != null, "error expected");
            assertEquals(6000, frames);
            // Header is line 1, so frame 6000 is on line 6002.
            assertEquals(6002, e.line());
            assertEquals("a_g", e.column());
        }
    }

    @Test
    void closingMidStreamStopsTheBackgroundReader() throws Exception {
        ReadAheadSampleStream s = new ReadAheadSampleStream(
                TimeSeriesCsvReader.open(TestStreams.text(csv(50_000, -1)), "big.csv"), 256, 2);
        assertEquals(10, s.read(new double[2][10], 0, 10));
        s.close();
        assertTrue(s.workerStopped());
        assertThrows(java.io.IOException.class, () -> s.read(new double[2][10], 0, 10));
    }
}
