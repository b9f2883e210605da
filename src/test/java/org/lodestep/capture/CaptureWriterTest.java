package org.lodestep.capture;

import org.lodestep.sample.SweepShape;
import org.lodestep.sample.SampleStream;
import org.lodestep.sample.InputFormatException;

import org.lodestep.sample.Channel;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CaptureWriterTest {
    private static final Instant START = Instant.parse("2026-11-30T09:15:00Z");
    private static final Clock END_CLOCK = Clock.fixed(Instant.parse("2026-11-30T09:15:20Z"), ZoneOffset.UTC);
    private static final List<Channel> CHANNELS = List.of(new Channel("accel", "g"), new Channel("current", "a"),
            new Channel("step", "v"));

    @TempDir
    Path dir;

    static CaptureInfo info(double rateHz) {
        return new CaptureInfo("Kestrel bench rig KB-2 #0042", "1.3.0", "gantry-x", "HS-23-00917", "0.1.0", START,
                rateHz, 0.0, CHANNELS, SweepProfile.of(SweepShape.LINEAR, 50, 1500, 20, 16),
                Map.of("axis", "x", "operator", "R. Okafor"));
    }

    /** Deterministic, irregular test values: a tone, a ramp and a pulse train. */
    static double[][] block(int from, int n) {
        double[][] b = new double[3][n];
        for (int i = 0; i < n; i++) {
            int k = from + i;
            b[0][i] = Math.sin(0.01 * k) * 0.731;
            b[1][i] = 1.0 / (k + 3);
            b[2][i] = (k / 7) % 2 == 0 ? 0.0 : 4.98;
        }
        return b;
    }

    private static String sha256(Path p) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p)));
    }

    private List<String> files() throws IOException {
        try (Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void writesBlocksThenCommitsCsvAndSidecarThatReadBackExactly() throws Exception {
        Path csv = dir.resolve("sweep-017.csv");
        int n = 10_000;
        CaptureSidecar sidecar;
        try (CaptureWriter w = CaptureWriter.create(csv, info(51200), CaptureWriter.Interrupted.DISCARD, END_CLOCK)) {
            for (int at = 0; at < n; at += 1000) {
                w.append(block(at, 1000), 0, 1000);
                // Nothing is visible under the final names until commit.
                assertFalse(Files.exists(csv));
            }
            sidecar = w.commit();
        }
        assertEquals(List.of("sweep-017.csv", "sweep-017.json"), files());
        assertEquals(sha256(csv), sidecar.sha256());
        assertEquals(n, sidecar.frames());
        assertTrue(sidecar.complete());
        assertEquals(Instant.parse("2026-11-30T09:15:20Z"), sidecar.endedAt());

        for (Path open : new Path[] {csv, dir.resolve("sweep-017.json")}) {
            try (SampleStream s = Captures.open(open)) {
                assertTrue(s instanceof CaptureReader, open.toString());
                assertEquals(CHANNELS, s.channels());
                assertEquals(51200.0, s.sampleRateHz());
                assertEquals(n, s.knownFrameCount());
                assertEquals("HS-23-00917", s.metadata().get("serial_number"));
                assertEquals("gantry-x", s.metadata().get("scenario"));
                assertEquals("R. Okafor", s.metadata().get("operator"));
                assertEquals("true", s.metadata().get("complete"));
                assertEquals("16", s.metadata().get("microsteps"));
                assertEquals(SweepProfile.of(SweepShape.LINEAR, 50, 1500, 20, 16),
                        SweepProfile.fromMetadata(s.metadata(), s.source()));
                double[][] back = TestStreams.readAll(s, 333);
                double[][] want = block(0, n);
                for (int c = 0; c < 3; c++) {
                    assertArrayEquals(want[c], back[c], "channel " + c);
                }
            }
        }
        assertEquals(sidecar, CaptureReader.verify(csv));
        // Permissions like any other file the user writes (umask applies), not owner-only like a temp file.
        Path plain = Files.writeString(dir.resolve("plain.txt"), "x");
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(csv));
        assertEquals(Files.getPosixFilePermissions(plain), Files.getPosixFilePermissions(dir.resolve("sweep-017.json")));
    }

    @Test
    void refusesCaptureCsvWhoseSidecarIsMissing() throws Exception {
        Path csv = dir.resolve("lost.csv");
        try (CaptureWriter w = CaptureWriter.create(csv, info(1000), CaptureWriter.Interrupted.KEEP_INCOMPLETE)) {
            w.append(block(0, 10), 0, 10);
        }
        Files.delete(dir.resolve("lost.json"));
        InputFormatException e = assertThrows(InputFormatException.class, () -> Captures.open(csv));
        assertTrue(e.expected().contains("lost.json"), e.getMessage());
    }

    @Test
    void refusesSidecarThatBelongsToAnotherDataFile() throws Exception {
        try (CaptureWriter w = CaptureWriter.create(dir.resolve("one.csv"), info(1000),
                CaptureWriter.Interrupted.DISCARD)) {
            w.append(block(0, 10), 0, 10);
            w.commit();
        }
        Files.move(dir.resolve("one.csv"), dir.resolve("two.csv"));
        Files.move(dir.resolve("one.json"), dir.resolve("two.json"));
        InputFormatException e = assertThrows(InputFormatException.class, () -> Captures.open(dir.resolve("two.csv")));
        assertEquals("data_file", e.column());
    }

    @Test
    void sidecarRecordsEveryRequiredField() throws Exception {
        Path csv = dir.resolve("a.csv");
        try (CaptureWriter w = CaptureWriter.create(csv, info(1000), CaptureWriter.Interrupted.DISCARD, END_CLOCK)) {
            w.append(block(0, 5), 0, 5);
            w.commit();
        }
        String json = Files.readString(dir.resolve("a.json"));
        for (String key : new String[] {"\"rig\" : \"Kestrel bench rig KB-2 #0042\"", "\"firmware_version\" : \"1.3.0\"",
            "\"started_at\" : \"2026-11-30T09:15:00Z\"", "\"ended_at\" : \"2026-11-30T09:15:20Z\"",
            "\"sample_rate_hz\" : 1000.0", "\"column\" : \"current_a\"", "\"law\" : \"linear\"",
            "\"scenario\" : \"gantry-x\"", "\"serial_number\" : \"HS-23-00917\"", "\"tool_version\" : \"0.1.0\"",
            "\"complete\" : true", "\"sha256\" : \"" + sha256(csv) + "\""}) {
            assertTrue(json.contains(key), key + " in " + json);
        }
        String text = Files.readString(csv);
        assertTrue(text.contains("# sweep=linear\n# sweep_start_full_steps_per_s=50.0\n"), text);
        assertTrue(text.contains("time_s,accel_g,current_a,step_v\n0.000000,0.0,0.3333333333333333,0.0\n"), text);
    }

    @Test
    void tamperedDataEndsTheReadWithShaMismatch() throws Exception {
        Path csv = dir.resolve("t.csv");
        try (CaptureWriter w = CaptureWriter.create(csv, info(1000), CaptureWriter.Interrupted.DISCARD)) {
            w.append(block(0, 100), 0, 100);
            w.commit();
        }
        String text = Files.readString(csv);
        // Same shape, one value changed: only the checksum can tell.
        Files.writeString(csv, text.replaceFirst("\n0.001000,", "\n0.001000,9"));
        try (SampleStream s = Captures.open(csv)) {
            InputFormatException e = assertThrows(InputFormatException.class, () -> TestStreams.readAll(s, 10));
            assertTrue(e.expected().contains("SHA-256"), e.getMessage());
        }
        assertThrows(InputFormatException.class, () -> CaptureReader.verify(csv));
    }

    @Test
    void interruptedCaptureKeptIsMarkedIncompleteAndRefusedByDefault() throws Exception {
        Path csv = dir.resolve("cut.csv");
        try (CaptureWriter w = CaptureWriter.create(csv, info(1000), CaptureWriter.Interrupted.KEEP_INCOMPLETE)) {
            w.append(block(0, 250), 0, 250);
            // The rig drops out here: the block never comes and the writer is closed without commit.
        }
        CaptureSidecar sc = CaptureSidecar.read(dir.resolve("cut.json"));
        assertFalse(sc.complete());
        assertEquals(250, sc.frames());
        assertEquals("closed before the capture was committed", sc.interruption());

        InputFormatException e = assertThrows(InputFormatException.class, () -> Captures.open(csv));
        assertEquals("complete", e.column());
        try (SampleStream s = Captures.open(csv, CaptureReader.Incomplete.ACCEPT)) {
            assertEquals("false", s.metadata().get("complete"));
            assertArrayEquals(block(0, 250)[0], TestStreams.readAll(s, 100)[0]);
        }
    }

    @Test
    void abandonWithReasonOrDiscardLeavesNothingUnmarked() throws Exception {
        try (CaptureWriter w = CaptureWriter.create(dir.resolve("x.csv"), info(1000),
                CaptureWriter.Interrupted.DISCARD)) {
            w.append(block(0, 10), 0, 10);
            assertNull(w.abandon(CaptureWriter.Interrupted.DISCARD, "operator stop"));
        }
        try (CaptureWriter w = CaptureWriter.create(dir.resolve("y.csv"), info(1000),
                CaptureWriter.Interrupted.DISCARD)) {
            w.append(block(0, 10), 0, 10);
        }
        assertEquals(List.of(), files());
        try (CaptureWriter w = CaptureWriter.create(dir.resolve("z.csv"), info(1000),
                CaptureWriter.Interrupted.DISCARD)) {
            w.append(block(0, 10), 0, 10);
            assertEquals("rig watchdog\ttripped", w.abandon(CaptureWriter.Interrupted.KEEP_INCOMPLETE,
                    "rig watchdog\ttripped").interruption());
            assertThrows(IllegalStateException.class, () -> w.append(block(0, 1), 0, 1));
        }
        assertEquals(List.of("z.csv", "z.json"), files());
    }

    @Test
    void refusesToOverwriteAnExistingCapture() throws Exception {
        Files.writeString(dir.resolve("old.json"), "{}", StandardCharsets.UTF_8);
        assertThrows(FileAlreadyExistsException.class,
                () -> CaptureWriter.create(dir.resolve("old.csv"), info(1000), CaptureWriter.Interrupted.DISCARD));
        assertEquals(List.of("old.json"), files());
    }

    @Test
    void rejectsNonFiniteSampleBeforeWritingAnyOfTheBlock() throws Exception {
        Path csv = dir.resolve("nan.csv");
        try (CaptureWriter w = CaptureWriter.create(csv, info(1000), CaptureWriter.Interrupted.DISCARD)) {
            double[][] b = block(0, 4);
            b[1][2] = Double.NaN;
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> w.append(b, 0, 4));
            assertTrue(e.getMessage().contains("sample 2 of channel current_a"), e.getMessage());
            w.append(block(0, 4), 0, 4);
            assertEquals(4, w.commit().frames());
        }
    }

    @Test
    void rejectsChannelsThatWouldNotReadBack() {
        assertThrows(IllegalArgumentException.class, () -> new CaptureInfo("r", "1", null, null, "0.1.0", START, 1000,
                0, List.of(new Channel("accel_x", "")), null, Map.of()));
        assertThrows(IllegalArgumentException.class, () -> new CaptureInfo("r", "1", null, null, "0.1.0", START, 1000,
                0, List.of(new Channel("current", "A")), null, Map.of()));
        assertThrows(IllegalArgumentException.class, () -> new CaptureInfo("r", "1", null, null, "0.1.0", START, 1000,
                0, List.of(new Channel("a", "g")), null, Map.of("sha256", "x")));
    }
}
