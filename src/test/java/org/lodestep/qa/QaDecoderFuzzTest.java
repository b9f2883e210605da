package org.lodestep.qa;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;

import org.junit.jupiter.api.Test;
import org.lodestep.sample.ByteDamage;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.InputLimits;

/**
 * Property tests of the part-spec (TOML) and meter-log decoders with seeded generators: random valid logs read back
 * exactly, and seeded damage to the sample spec and log either still reads (then every value is plausible) or is
 * refused with a one-line {@link InputFormatException} naming the source; no library exception escapes.
 */
class QaDecoderFuzzTest {

    private static final int CASES = 800;

    @FunctionalInterface
    private interface Decoder {
        void decode(byte[] bytes, String source) throws Exception;
    }

    private static final Decoder SPEC = (b, src) -> {
        PartSpec s = PartSpecReader.parse(src, b);
        assertTrue(s.partNumber().length() <= InputLimits.MAX_NAME_CHARS);
        assertTrue(s.specVersion() >= 1);
    };

    private static final Decoder LOG = (b, src) -> {
        MeterLog log = MeterLog.parse(src, org.lodestep.sample.Utf8Text.decode(b, src, "a CSV meter log"));
        assertTrue(log.source().equals(src));
    };

    @Test
    void randomMeterLogsReadBackEveryValue() throws Exception {
        Random rnd = new Random(31);
        for (int k = 0; k < CASES; k++) {
            int rows = 1 + rnd.nextInt(30);
            StringBuilder b = new StringBuilder("serial,phase_a_ohm,phase_b_ohm,insulation_a_frame_mohm,winding_c\n");
            double[][] v = new double[rows][4];
            for (int r = 0; r < rows; r++) {
                v[r][0] = rnd.nextInt(100_000) / 1000.0;
                v[r][1] = rnd.nextInt(100_000) / 1000.0;
                v[r][2] = rnd.nextInt(10_000);
                v[r][3] = -20 + rnd.nextInt(1200) / 10.0;
                b.append("SN-").append(r).append(',').append(String.format(Locale.ROOT, "%s,%s,%s,%s", v[r][0],
                        v[r][1], v[r][2], v[r][3])).append('\n');
            }
            MeterLog log = MeterLog.parse("gen-" + k + ".csv", b.toString());
            for (int r = 0; r < rows; r++) {
                MeterLog.Row row = log.row("SN-" + r).orElseThrow();
                assertEquals(v[r][0], row.get("phase_a_ohm"), 0.0);
                assertEquals(v[r][1], row.get("phase_b_ohm"), 0.0);
                assertEquals(v[r][2], row.insulationMohm().get("a_frame"), 0.0);
                assertEquals(v[r][3], row.get("winding_c"), 0.0);
            }
        }
    }

    @Test
    void damagedPartSpecIsReadOrRefusedInOneLine() throws IOException {
        damage(Files.readAllBytes(Path.of("sample-captures/qa/kv-4218-m.toml")), SPEC, "spec.toml", 32);
    }

    @Test
    void damagedMeterLogIsReadOrRefusedInOneLine() throws IOException {
        damage(Files.readAllBytes(Path.of("sample-captures/qa/lot-L2607-meter-log.csv")), LOG, "log.csv", 33);
    }

    private static void damage(byte[] base, Decoder d, String name, long seed) {
        Random rnd = new Random(seed);
        byte[] alphabet = "0123456789,\"[]=.-+eE#\n\r _abcnif\0{}'".getBytes(StandardCharsets.ISO_8859_1);
        for (int k = 0; k < CASES; k++) {
            byte[] bytes = ByteDamage.edit(base, rnd, alphabet);
            String source = name + "#" + k;
            try {
                d.decode(bytes, source);
            } catch (InputFormatException ex) {
                assertTrue(ex.getMessage().startsWith(source), source + ": " + ex.getMessage());
                assertEquals(1, ex.getMessage().lines().count(), source + ": " + ex.getMessage());
            } catch (Exception | StackOverflowError ex) {
                fail(source + ": escaped as " + ex, ex);
            }
        }
    }
}
