package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import org.lodestep.sample.SampledSignal;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CapturesTest {
    @TempDir
    Path dir;

    @Test
    void dispatchesOnContentBeforeExtension() throws Exception {
        Path disguised = dir.resolve("recording.dat");
        Files.copy(TestStreams.fixture("scipy-int16-stereo.wav"), disguised);
        try (SampleStream s = Captures.open(disguised)) {
            assertTrue(s instanceof WavReader);
            assertEquals(8000.0, s.sampleRateHz());
        }
        Path csv = dir.resolve("bench.txt");
        Files.copy(TestStreams.fixture("comma.csv"), csv);
        try (SampleStream s = Captures.open(csv)) {
            assertTrue(s instanceof TimeSeriesCsvReader);
        }
    }

    @Test
    void leavesCsvWithUnrelatedJsonBesideItAsPlainCsv() throws Exception {
        Path csv = dir.resolve("run.csv");
        Files.copy(TestStreams.fixture("comma.csv"), csv);
        Files.writeString(dir.resolve("run.json"), "{\"notes\": \"loud at 400 steps/s\"}");
        try (SampleStream s = Captures.open(csv)) {
            assertTrue(s instanceof TimeSeriesCsvReader);
        }
    }

    @Test
    void reportsBrokenSidecarAsInputError() throws Exception {
        Path csv = dir.resolve("run.csv");
        Files.copy(TestStreams.fixture("comma.csv"), csv);
        Files.writeString(dir.resolve("run.json"), "{\"format\": \"lodestep-capture\", \"format_version\": 1,");
        InputFormatException e = assertThrows(InputFormatException.class, () -> Captures.open(csv));
        assertTrue(e.getMessage().contains("run.json"), e.getMessage());
    }

    @Test
    void readAllLoadsShortCaptureIntoMemory() throws Exception {
        SampledSignal s = Captures.readAll(TestStreams.fixture("comma.csv"));
        assertEquals(6, s.length());
        assertEquals(1, s.indexOf("current"));
        assertArrayEquals(new double[] {0, -0.5, -1.0, -1.5, -2.0, -2.5}, s.channel(1));
    }
}
