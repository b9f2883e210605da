package org.lodestep.capture;

import org.lodestep.sample.Channel;
import org.lodestep.sample.InputFormatException;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.List;

import org.junit.jupiter.api.Test;

class TimeSeriesCsvReaderTest {

    private static final double[] RAMP = {0, 0.25, 0.5, 0.75, 1.0, 1.25};

    private static InputFormatException failure(String fixture) {
        return assertThrows(InputFormatException.class, () -> {
            try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture(fixture))) {
                TestStreams.readAll(r, 2);
            }
        });
    }

    private static InputFormatException failureOf(String csv) {
        return assertThrows(InputFormatException.class, () -> {
            try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.text(csv), "inline.csv")) {
                TestStreams.readAll(r, 1000);
            }
        });
    }

    @Test
    void readsCommaFileWithUnitsMetadataAndRate() throws Exception {
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture("comma.csv"))) {
            assertEquals(List.of(new Channel("accel", "g"), new Channel("current", "a")), r.channels());
            assertEquals(-1, r.knownFrameCount());
            // Time stamps 0.000, 0.001, ... s: 1000 Hz by definition of the fixture.
            assertEquals(1000.0, r.sampleRateHz());
            assertEquals(0.0, r.startTimeS());
            assertEquals("linear", r.metadata().get("sweep"));
            assertEquals("50", r.metadata().get("sweep_start_full_steps_per_s"));
            assertEquals("1500", r.metadata().get("sweep_end_full_steps_per_s"));
            double[][] d = TestStreams.readAll(r, 4);
            assertArrayEquals(RAMP, d[0]);
            assertArrayEquals(new double[] {0, -0.5, -1.0, -1.5, -2.0, -2.5}, d[1]);
        }
    }

    @Test
    void readsSemicolonFileWithDecimalCommaAndCrLf() throws Exception {
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture("semicolon-decimal-comma.csv"))) {
            assertEquals(1000.0, r.sampleRateHz());
            double[][] d = TestStreams.readAll(r, 3);
            assertArrayEquals(RAMP, d[0]);
            assertEquals(-2.5, d[1][5]);
        }
    }

    @Test
    void readsTabFileWithMillisecondTimeColumn() throws Exception {
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture("tab.csv"))) {
            // time_ms 0, 1, 2 ... is one sample per millisecond.
            assertEquals(1000.0, r.sampleRateHz());
            assertArrayEquals(RAMP, TestStreams.readAll(r, 100)[0]);
        }
    }

    @Test
    void skipsByteOrderMarkAndReadsQuotedFields() throws Exception {
        for (String name : new String[] {"bom.csv", "quoted.csv"}) {
            try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture(name))) {
                assertEquals(List.of(new Channel("accel", "g")), r.channels(), name);
                assertArrayEquals(RAMP, TestStreams.readAll(r, 5)[0], name);
            }
        }
    }

    @Test
    void takesRateAndStartFromCommentsWhenThereIsNoTimeColumn() throws Exception {
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture("rate-comment.csv"))) {
            assertEquals(2000.0, r.sampleRateHz());
            assertEquals(1.5, r.startTimeS());
            assertEquals(List.of(new Channel("accel_x", "g"), new Channel("accel_y", "g")), r.channels());
            double[][] d = TestStreams.readAll(r, 1);
            assertArrayEquals(RAMP, d[0]);
            assertEquals(-1.25, d[1][5]);
        }
    }

    @Test
    void keepsUnknownUnitsAsWrittenAndNamesWithoutUnit() {
        assertEquals(new Channel("speed", "rpm"), CsvColumns.channelOf("speed_rpm"));
        assertEquals(new Channel("pressure", "pa"), CsvColumns.channelOf("pressure_Pa"));
        assertEquals(new Channel("accel", "mps2"), CsvColumns.channelOf("accel_mps2"));
        assertEquals(new Channel("emf_1_2", ""), CsvColumns.channelOf("emf_1_2"));
        assertEquals(new Channel("ch1", ""), CsvColumns.channelOf("ch1"));
    }

    /** A long file crosses the reader's first-rows window and its 1 MiB buffer; every value must survive. */
    @Test
    void streamsLongFileInSmallBlocksWithoutLosingRows() throws Exception {
        int n = 70_000;
        StringBuilder sb = new StringBuilder("time_s,accel_g\n");
        for (int i = 0; i < n; i++) {
            sb.append(TestStreams.fixed(i / 51200.0, 6)).append(',').append(i % 1000).append(".5\n");
        }
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.text(sb.toString()), "long.csv")) {
            // Stamps rounded to 1 µs still give the integer rate they were written at (51.2 kS/s, a common DAQ rate).
            assertEquals(51200.0, r.sampleRateHz());
            double[] d = TestStreams.readAll(r, 777)[0];
            assertEquals(n, d.length);
            for (int i = 0; i < n; i++) {
                assertEquals(i % 1000 + 0.5, d[i], "row " + i);
            }
        }
    }

    @Test
    void estimatesNonIntegerRateByLeastSquares() throws Exception {
        // 3 samples per second written with 4 decimals: no integer rate fits within a tenth of an interval.
        StringBuilder sb = new StringBuilder("time_s,v_v\n");
        double rate = 1 / 0.3;
        for (int i = 0; i < 50; i++) {
            sb.append(TestStreams.fixed(i / rate, 4)).append(",1\n");
        }
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.text(sb.toString()), "slow.csv")) {
            assertEquals(rate, r.sampleRateHz(), rate * 1e-5);
        }
    }

    @Test
    void rejectsTimeGoingBackwardsAtItsLine() {
        InputFormatException e = failure("unsorted-time.csv");
        assertEquals(5, e.line());
        assertEquals("time_s", e.column());
        assertEquals("0.002", e.text());
    }

    @Test
    void rejectsGapInTimeAtItsLine() {
        InputFormatException e = failure("gap.csv");
        assertEquals(6, e.line());
        assertEquals("time_s", e.column());
        assertTrue(e.expected().contains("gap"), e.getMessage());
    }

    @Test
    void rejectsGapBeyondTheFirstRows() {
        StringBuilder sb = new StringBuilder("time_s,a_g\n");
        for (int i = 0; i < 6000; i++) {
            int k = i < 5000 ? i : i + 1;   // one sample missing after row 5000
            sb.append(TestStreams.fixed(k / 1000.0, 3)).append(",0\n");
        }
        InputFormatException e = failureOf(sb.toString());
        // Header is line 1, frame i is line i + 2; the first frame after the gap is i = 5000.
        assertEquals(5002, e.line());
    }

    @Test
    void rejectsClockThatDriftsAwayFromTheFirstRows() {
        StringBuilder sb = new StringBuilder("time_s,a_g\n");
        double t = 0;
        for (int i = 0; i < 20_000; i++) {
            sb.append(TestStreams.fixed(t, 7)).append(",0\n");
            t += i < 4096 ? 1e-3 : 1.01e-3;   // 1 % slower after the estimate window: within ±50 % per interval
        }
        InputFormatException e = failureOf(sb.toString());
        assertTrue(e.expected().contains("one sample rate"), e.getMessage());
        assertTrue(e.line() > 4096 + 2, "line " + e.line());
    }

    @Test
    void rejectsNaNEmptyAndTextCellsNamingLineAndColumn() {
        InputFormatException nan = failure("nan.csv");
        assertEquals(3, nan.line());
        assertEquals("accel_g", nan.column());
        assertEquals("NaN", nan.text());

        InputFormatException empty = failure("empty-cell.csv");
        assertEquals(4, empty.line());
        assertEquals("accel_g", empty.column());
        assertTrue(empty.expected().contains("empty"), empty.getMessage());

        InputFormatException text = failure("text-in-number.csv");
        assertEquals(5, text.line());
        assertEquals("current_a", text.column());
        assertEquals("two", text.text());
        assertTrue(text.expected().contains("a number in a"), text.getMessage());
    }

    @Test
    void rejectsRowWithMissingField() {
        InputFormatException e = failure("ragged.csv");
        assertEquals(3, e.line());
        assertTrue(e.expected().startsWith("has 2 fields: expected 3"), e.getMessage());
    }

    @Test
    void rejectsFileWithoutTimeOrRateOrRows() {
        assertEquals(1, failure("no-time-no-rate.csv").line());
        assertTrue(failure("header-only.csv").expected().contains("no data rows"));
        assertEquals(InputFormatException.NO_LINE, failureOf("# only a comment\n").line());
    }

    @Test
    void rejectsHeaderProblems() {
        assertEquals("time", failureOf("time,a_g\n0,1\n").column());
        assertEquals("a_g", failureOf("time_s,a_g,a_g\n0,1,1\n").column());
        assertTrue(failureOf("time_s\n0\n1\n").expected().contains("no data column"));
        InputFormatException noHeader = failureOf("0.000,1.5\n0.001,1.5\n");
        assertEquals(1, noHeader.line());
        assertTrue(noHeader.expected().contains("header"), noHeader.getMessage());
    }

    @Test
    void rejectsSingleRowWithoutDeclaredRate() {
        assertTrue(failureOf("time_s,a_g\n0,1\n").expected().contains("two time stamps"));
    }

    @Test
    void rejectsOverflowingNumberAsNotFinite() {
        InputFormatException e = failureOf("# sample_rate_hz=10\na_g\n1\n1e999\n");
        assertEquals(4, e.line());
        assertTrue(e.expected().contains("finite"), e.getMessage());
    }

    @Test
    void rejectsBadSampleRateComment() {
        InputFormatException e = failureOf("# sample_rate_hz=fast\na_g\n1\n");
        assertEquals(1, e.line());
        assertEquals("sample_rate_hz", e.column());
    }

    @Test
    void messageIsOneLineNamingFileLineAndColumn() {
        String m = failure("nan.csv").getMessage();
        assertTrue(m.matches(".*nan\\.csv line 3, column accel_g: 'NaN' is not a number: expected a number in g"), m);
    }

    @Test
    void readAfterCloseFails() throws Exception {
        TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.fixture("comma.csv"));
        r.close();
        assertThrows(IOException.class, () -> r.read(new double[2][4], 0, 4));
    }

    /**
     * Rows of every shape the reader meets, mixed in one file: each must give the same value whichever parser path
     * took it. The expected values are the JDK's Double.parseDouble of the same text.
     */
    @Test
    void everyRowShapeGivesTheSameValuesAsTheJdkParser() throws Exception {
        String[] values = {"0.5", "1.0E-5", "-2.5e3", "0.12345678901234567", "  7.25 ", "\"3.5\"", "+4", "-.5", "6."};
        StringBuilder sb = new StringBuilder("# sample_rate_hz=100\r\nx_v,y_v\r\n");
        int n = 3000;   // many rows, so the fast path runs between the odd ones and across reads
        for (int i = 0; i < n; i++) {
            String a = values[i % values.length];
            String b = values[(i / values.length) % values.length];
            sb.append(a).append(',').append(b).append(i % 2 == 0 ? "\r\n" : "\n");
        }
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.text(sb.toString()), "mixed.csv")) {
            double[][] d = TestStreams.readAll(r, 97);
            assertEquals(n, d[0].length);
            for (int i = 0; i < n; i++) {
                String a = values[i % values.length].replace("\"", "").strip();
                String b = values[(i / values.length) % values.length].replace("\"", "").strip();
                assertEquals(Double.parseDouble(a), d[0][i], "row " + i);
                assertEquals(Double.parseDouble(b), d[1][i], "row " + i);
            }
        }
    }

    @Test
    void reportsBadCellFoundAfterManyPlainRowsAtItsLine() {
        StringBuilder sb = new StringBuilder("time_s;a_g\n");
        for (int i = 0; i < 9000; i++) {
            sb.append(TestStreams.fixed(i / 1000.0, 3).replace('.', ',')).append(';').append(i == 8000 ? "1e" : "0,5")
                    .append('\n');
        }
        InputFormatException e = failureOf(sb.toString());
        assertEquals(8002, e.line());
        assertEquals("a_g", e.column());
        assertEquals("1e", e.text());
    }

    @Test
    void deliversEveryRowBeforeABadOneThenFails() throws Exception {
        StringBuilder sb = new StringBuilder("time_s,a_g\n");
        for (int i = 0; i < 5000; i++) {
            sb.append(TestStreams.fixed(i / 1000.0, 3)).append(',').append(i == 4500 ? "?" : "1").append('\n');
        }
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(TestStreams.text(sb.toString()), "late.csv")) {
            double[][] buf = new double[1][4096];
            assertEquals(4096, r.read(buf, 0, 4096));
            // Rows 4096..4499 are good: they come first, the error with the next read.
            assertEquals(404, r.read(buf, 0, 4096));
            InputFormatException e = assertThrows(InputFormatException.class, () -> r.read(buf, 0, 4096));
            assertEquals(4502, e.line());
        }
    }

    /** RFC 3629 (references §28): a header that is not UTF-8, a binary file's first bytes, is refused as such. */
    @Test
    void aHeaderThatIsNotUtf8TextIsRefusedWithItsLineAndOffset() {
        byte[] binary = {'#', ' ', 'x', '\n', 'P', 'K', 3, 4, (byte) 0xC3, (byte) 0x28, ',', 'a', '\n', '0', '\n'};
        InputFormatException e = assertThrows(InputFormatException.class, () -> {
            try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(new ByteArrayInputStream(binary), "bin.csv")) {
                TestStreams.readAll(r, 10);
            }
        });
        assertEquals("bin.csv line 2: has a byte that is not UTF-8 at offset 8: expected a header such as"
                + " time_s,accel_g in UTF-8 text", e.getMessage());
        byte[] nul = "time_s,ac\0cel_g\n0,1\n".getBytes(StandardCharsets.UTF_8);
        InputFormatException n = assertThrows(InputFormatException.class, () -> {
            try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(new ByteArrayInputStream(nul), "nul.csv")) {
                TestStreams.readAll(r, 10);
            }
        });
        assertEquals("nul.csv line 1: has a NUL character: expected a header such as time_s,accel_g in text, not a"
                + " binary file", n.getMessage());
    }

    /** A comment in another encoding (a logger's Latin-1 degree sign) is only a comment: the capture still reads. */
    @Test
    void aCommentInAnotherEncodingDoesNotStopTheCapture() throws Exception {
        byte[] latin1 = "# bench at 21 \u00B0C\ntime_s,accel_g\n0,1\n0.001,2\n".getBytes(StandardCharsets.ISO_8859_1);
        try (TimeSeriesCsvReader r = TimeSeriesCsvReader.open(new ByteArrayInputStream(latin1), "latin1.csv")) {
            assertArrayEquals(new double[] {1, 2}, TestStreams.readAll(r, 10)[0]);
        }
    }
}
