package org.lodestep.capture;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;

/**
 * The parallel row parse against the serial one on the same file: the same frames bit for bit, and where the file
 * is bad, the same rows delivered before the same one-line error (line, column, words). Small chunks cross many
 * chunk bounds; lengths sit on and beside them; every dialect the reader takes appears.
 */
class ParallelCsvRowsTest {
    @TempDir
    Path dir;

    /** What a read gave: every frame, and the error that ended it (null when it reached the end). */
    private record Outcome(double[][] frames, long count, String error) {
    }

    private static Outcome read(SampleStream s, int block) throws IOException {
        int nc = s.channels().size();
        List<double[]> blocks = new ArrayList<>();
        long count = 0;
        String error = null;
        double[][] buf = new double[nc][block];
        try (s) {
            int got;
            while ((got = s.read(buf, 0, block)) >= 0) {
                for (int c = 0; c < nc; c++) {
                    double[] copy = new double[got];
                    System.arraycopy(buf[c], 0, copy, 0, got);
                    blocks.add(copy);
                }
                count += got;
            }
        } catch (InputFormatException e) {
            error = e.getMessage();
        }
        double[][] all = new double[nc][(int) count];
        int at = 0;
        for (int b = 0; b < blocks.size(); b += nc) {
            for (int c = 0; c < nc; c++) {
                System.arraycopy(blocks.get(b + c), 0, all[c], at, blocks.get(b + c).length);
            }
            at += blocks.get(b).length;
        }
        return new Outcome(all, count, error);
    }

    private void assertSameAsSerial(Path file, int chunkBytes, int block) throws IOException, InputFormatException {
        Outcome serial;
        try {
            serial = read(TimeSeriesCsvReader.open(file, Long.MAX_VALUE, chunkBytes, 1), block);
        } catch (InputFormatException e) {
            throw new AssertionError("the fixture's header or first rows failed: " + e.getMessage(), e);
        }
        for (int threads : new int[] {2, 3, 4}) {
            Outcome parallel = read(TimeSeriesCsvReader.open(file, 0, chunkBytes, threads), block);
            String where = file.getFileName() + ", chunk " + chunkBytes + " bytes, " + threads + " threads";
            assertEquals(serial.count(), parallel.count(), where + ": frames");
            assertEquals(serial.error(), parallel.error(), where + ": error");
            for (int c = 0; c < serial.frames().length; c++) {
                assertArrayEquals(serial.frames()[c], parallel.frames()[c], where + ": channel " + c);
            }
        }
    }

    /** A CSV of {@code rows} rows at 1 kHz with {@code channels} channels of random plain decimals. */
    private static List<String> rows(Random rnd, int rows, int channels, String delimiter, boolean decimalComma) {
        List<String> out = new ArrayList<>();
        StringBuilder h = new StringBuilder("time_s");
        for (int c = 0; c < channels; c++) {
            h.append(delimiter).append("ch").append(c).append("_g");
        }
        out.add(h.toString());
        for (int i = 0; i < rows; i++) {
            StringBuilder r = new StringBuilder(String.format(Locale.ROOT, "%.3f", i / 1000.0));
            for (int c = 0; c < channels; c++) {
                String v = switch (rnd.nextInt(6)) {
                    case 0 -> Double.toString(rnd.nextGaussian());          // 17 digits: the general parser
                    case 1 -> String.format(Locale.ROOT, "%.3e", rnd.nextGaussian());
                    case 2 -> Integer.toString(rnd.nextInt(2000) - 1000);
                    default -> String.format(Locale.ROOT, "%.6f", rnd.nextGaussian());
                };
                r.append(delimiter).append(decimalComma ? v.replace('.', ',') : v);
            }
            out.add(r.toString());
        }
        if (decimalComma) {
            for (int i = 1; i < out.size(); i++) {
                out.set(i, out.get(i).replaceFirst("^(\\d+)\\.", "$1,"));
            }
        }
        return out;
    }

    private Path write(String name, List<String> lines, String eol, boolean finalNewline) throws IOException {
        Path f = dir.resolve(name);
        String text = String.join(eol, lines) + (finalNewline ? eol : "");
        Files.write(f, text.getBytes(StandardCharsets.UTF_8));
        return f;
    }

    @Test
    void sameFramesAsSerialForEveryChannelCountAndChunkBound() throws Exception {
        Random rnd = new Random(20261202);
        for (int channels = 1; channels <= 8; channels++) {
            // past the 4096 rows the reader takes before the parallel read starts, then a few chunks' worth
            int rows = 4096 + rnd.nextInt(3000);
            List<String> lines = rows(rnd, rows, channels, ",", false);
            Path f = write("c" + channels + ".csv", lines, channels % 2 == 0 ? "\r\n" : "\n", channels != 3);
            long size = Files.size(f);
            long body = size - firstRowsBytes(lines, channels % 2 == 0 ? 2 : 1);
            // one chunk for the rest, the rest plus and less one byte, and small chunks crossing many bounds
            for (long chunk : new long[] {body, body + 1, body - 1, 997, 4096}) {
                assertSameAsSerial(f, (int) Math.max(64, chunk), 1 + rnd.nextInt(9000));
            }
        }
    }

    /** Bytes of the header and the first 4096 rows: where the parallel read starts. */
    private static long firstRowsBytes(List<String> lines, int eolBytes) {
        long n = 0;
        for (int i = 0; i <= 4096 && i < lines.size(); i++) {
            n += lines.get(i).getBytes(StandardCharsets.UTF_8).length + eolBytes;
        }
        return n;
    }

    @Test
    void commentsBlankLinesQuotesAndDecimalCommaMidFile() throws Exception {
        Random rnd = new Random(7);
        List<String> lines = rows(rnd, 9000, 2, ";", true);
        lines.add(5000, "# operator note: belt retensioned");
        lines.add(6000, "");
        lines.set(7000, "\"" + lines.get(7000).replace(";", "\";\"") + "\"");
        Path f = write("dialects.csv", lines, "\n", true);
        for (int chunk : new int[] {128, 1000, 50_000}) {
            assertSameAsSerial(f, chunk, 4096);
        }
    }

    @Test
    void noTimeColumnWithADeclaredRate() throws Exception {
        List<String> lines = new ArrayList<>(List.of("# sample_rate_hz=51200", "accel_g,mic_pa"));
        Random rnd = new Random(3);
        for (int i = 0; i < 12000; i++) {
            lines.add(String.format(Locale.ROOT, "%.6f,%.4f", rnd.nextGaussian(), rnd.nextGaussian()));
        }
        Path f = write("rate.csv", lines, "\n", false);
        assertSameAsSerial(f, 333, 1000);
    }

    @Test
    void aBadCellLateInTheFileGivesTheSameRowsAndTheSameError() throws Exception {
        Random rnd = new Random(11);
        for (String bad : new String[] {"abc", "", "1e400", "0.5,0.6", "NaN"}) {
            List<String> lines = rows(rnd, 10000, 3, ",", false);
            int at = 4097 + rnd.nextInt(5800);
            String[] f = lines.get(at).split(",", -1);
            f[2] = bad;
            lines.set(at, String.join(",", f));
            Path file = write("bad-" + bad.length() + ".csv", lines, "\n", true);
            for (int chunk : new int[] {200, 4096, 65536, 1 << 18}) {
                assertSameAsSerial(file, chunk, 777);
            }
        }
    }

    @Test
    void aBrokenClockLateInTheFileGivesTheSameRowsAndTheSameError() throws Exception {
        Random rnd = new Random(12);
        for (String stamp : new String[] {"9.999", "0.000", "99999"}) {
            List<String> lines = rows(rnd, 10000, 1, ",", false);
            int at = 5000 + rnd.nextInt(4000);
            lines.set(at, stamp + lines.get(at).substring(lines.get(at).indexOf(',')));
            Path file = write("clock.csv", lines, "\n", true);
            assertSameAsSerial(file, 512, 4096);
            // one chunk of more rows than one call of the row loop parses and checks
            assertSameAsSerial(file, 1 << 18, 777);
            assertSameAsSerial(file, 1 << 18, 8192);
        }
    }

    @Test
    void aLineLongerThanAChunkAndLateMetadataAreLeftToTheSerialRead() throws Exception {
        Random rnd = new Random(13);
        List<String> lines = rows(rnd, 9000, 1, ",", false);
        lines.set(6000, lines.get(6000) + " ".repeat(3000));
        assertSameAsSerial(write("long.csv", lines, "\n", true), 1024, 4096);
        lines = rows(rnd, 9000, 1, ",", false);
        lines.add(7000, "# microsteps=8");
        assertSameAsSerial(write("late.csv", lines, "\n", true), 1024, 4096);
    }
}
