package org.lodestep.capture;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
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
import org.lodestep.sample.SampledSignal;

/**
 * Property tests of the capture decoders with seeded generators: valid captures of random shape read back exactly,
 * and any damage to them (random byte flips, insertions, deletions, truncations) either still reads or is refused
 * with an {@link InputFormatException} whose message is one line naming the source; no other exception ever escapes.
 */
class DecoderFuzzTest {

    private static final int CASES = 600;

    /** What a decoder does with bytes: the read, or the refusal. */
    @FunctionalInterface
    private interface Decoder {
        void decode(byte[] bytes, String source) throws Exception;
    }

    private static final Decoder CSV = (b, src) -> {
        try (var s = TimeSeriesCsvReader.open(new ByteArrayInputStream(b), src)) {
            SampledSignal sig = SampledSignal.readAll(s);
            assertTrue(InputLimits.plausibleSampleRate(sig.sampleRateHz()), src + ": " + sig.sampleRateHz());
            for (int c = 0; c < sig.channels().size(); c++) {
                for (double v : sig.channel(c)) {
                    assertTrue(InputLimits.plausibleMagnitude(v), src + ": sample " + v);
                }
            }
        }
    };

    private static final Decoder WAV = (b, src) -> {
        try (var s = WavReader.open(new ByteArrayInputStream(b), src)) {
            SampledSignal sig = SampledSignal.readAll(s);
            assertTrue(sig.channels().size() <= InputLimits.MAX_CHANNELS);
            assertTrue(InputLimits.plausibleSampleRate(sig.sampleRateHz()), src + ": " + sig.sampleRateHz());
        }
    };

    private static final Decoder RESISTANCE = (b, src) -> {
        ResistanceReadings r = ResistanceCsvReader.parse(new String(b, StandardCharsets.UTF_8), src);
        for (String lead : r.leads()) {
            assertTrue(lead.length() <= InputLimits.MAX_LABEL_CHARS, src + ": label of " + lead.length());
        }
    };

    @Test
    void randomTimeSeriesCsvReadsBackEveryValueExactly() throws Exception {
        Random rnd = new Random(11);
        for (int k = 0; k < CASES; k++) {
            int channels = 1 + rnd.nextInt(6);
            int rows = 1 + rnd.nextInt(200);
            int rateHz = 1 + rnd.nextInt(100_000);
            double[][] v = new double[channels][rows];
            StringBuilder b = new StringBuilder("# sample_rate_hz=" + rateHz + "\n");
            for (int c = 0; c < channels; c++) {
                b.append(c == 0 ? "" : ",").append("ch").append(c).append("_v");
            }
            b.append(rnd.nextBoolean() ? "\n" : "\r\n");
            for (int r = 0; r < rows; r++) {
                for (int c = 0; c < channels; c++) {
                    // plain decimals of up to 6 fraction digits: exactly representable as text, parsed exactly
                    long units = rnd.nextLong() % 1_000_000_000L;
                    v[c][r] = units / 1e6;
                    b.append(c == 0 ? "" : ",").append(String.format(Locale.ROOT, "%.6f", v[c][r]));
                }
                b.append('\n');
            }
            SampledSignal s = SampledSignal.readAll(TimeSeriesCsvReader.open(
                    new ByteArrayInputStream(b.toString().getBytes(StandardCharsets.UTF_8)), "gen-" + k + ".csv"));
            assertEquals(rateHz, s.sampleRateHz(), 0.0);
            assertEquals(rows, s.length());
            for (int c = 0; c < channels; c++) {
                for (int r = 0; r < rows; r++) {
                    assertEquals(Double.parseDouble(String.format(Locale.ROOT, "%.6f", v[c][r])), s.channel(c)[r],
                            0.0, "case " + k + " row " + r);
                }
            }
        }
    }

    @Test
    void randomPcmWavReadsBackFullScaleFractions() throws Exception {
        // 16-bit PCM: sample s reads s / 2^15 (references §22)
        Random rnd = new Random(12);
        for (int k = 0; k < CASES; k++) {
            int channels = 1 + rnd.nextInt(4);
            int frames = rnd.nextInt(300);
            int rateHz = 1 + rnd.nextInt(192_000);
            short[] samples = new short[channels * frames];
            for (int i = 0; i < samples.length; i++) {
                samples[i] = (short) rnd.nextInt();
            }
            SampledSignal s = SampledSignal.readAll(WavReader.open(new ByteArrayInputStream(
                    pcm16(rateHz, channels, samples)), "gen-" + k + ".wav"));
            assertEquals(rateHz, s.sampleRateHz(), 0.0);
            assertEquals(frames, s.length());
            for (int i = 0; i < samples.length; i++) {
                assertEquals(samples[i] / 32768.0, s.channel(i % channels)[i / channels], 0.0);
            }
        }
    }

    @Test
    void damagedTimeSeriesCsvIsReadOrRefusedInOneLine() throws IOException {
        byte[] base = Files.readAllBytes(Path.of("sample-captures/motor/step-1-7.csv"));
        damage(base, CSV, "step.csv", 21);
        damage(Files.readAllBytes(Path.of("sample-captures/motor/back-emf.csv")), CSV, "emf.csv", 22);
    }

    @Test
    void damagedWavIsReadOrRefusedInOneLine() throws IOException {
        byte[] base = Files.readAllBytes(Path.of("sample-captures/resonance/belt-axis-phone.wav"));
        damage(java.util.Arrays.copyOf(base, 4096), WAV, "sweep.wav", 23);
        Random rnd = new Random(24);
        short[] few = new short[64];
        damage(pcm16(8000, 2, few), WAV, "gen.wav", 25);
        // any header of random words after a well-formed start
        for (int k = 0; k < CASES; k++) {
            byte[] h = pcm16(8000, 1, few);
            for (int i = 20; i < 44; i++) {
                if (rnd.nextInt(4) == 0) {
                    h[i] = (byte) rnd.nextInt();
                }
            }
            decodeOrRefuse(h, WAV, "header-" + k + ".wav");
        }
    }

    @Test
    void damagedResistanceCsvIsReadOrRefusedInOneLine() throws IOException {
        damage(Files.readAllBytes(Path.of("sample-captures/leads/kl-04-autosampler-8lead.csv")), RESISTANCE,
                "leads.csv", 26);
        damage(Files.readAllBytes(Path.of("sample-captures/leads/kl-03-microscope-stage-6lead.tsv")), RESISTANCE,
                "leads.tsv", 27);
    }

    /** Flips, inserts, deletes and truncates at seeded places; each damaged copy must read or be refused cleanly. */
    static void damage(byte[] base, Decoder d, String name, long seed) {
        Random rnd = new Random(seed);
        byte[] alphabet = "0123456789,;\t\".-+eE#=\n\r NaIfy\0".getBytes(StandardCharsets.ISO_8859_1);
        for (int k = 0; k < CASES; k++) {
            byte[] bytes = ByteDamage.edit(base, rnd, alphabet);
            decodeOrRefuse(bytes, d, name + "#" + k);
        }
    }

    static void decodeOrRefuse(byte[] bytes, Decoder d, String source) {
        try {
            d.decode(bytes, source);
        } catch (InputFormatException e) {
            assertTrue(e.getMessage().startsWith(source), source + ": " + e.getMessage());
            assertEquals(1, e.getMessage().lines().count(), source + ": " + e.getMessage());
        } catch (Exception | StackOverflowError | OutOfMemoryError e) {
            fail(source + ": escaped as " + e, e);
        }
    }

    /** A plain 16-bit PCM WAV (references §22): RIFF, a 16-byte fmt chunk, a data chunk. */
    static byte[] pcm16(int rateHz, int channels, short[] interleaved) {
        int dataBytes = interleaved.length * 2;
        java.nio.ByteBuffer b = java.nio.ByteBuffer.allocate(44 + dataBytes).order(java.nio.ByteOrder.LITTLE_ENDIAN);
        b.put("RIFF".getBytes(StandardCharsets.US_ASCII)).putInt(36 + dataBytes).put("WAVE".getBytes(
                StandardCharsets.US_ASCII));
        b.put("fmt ".getBytes(StandardCharsets.US_ASCII)).putInt(16).putShort((short) 1).putShort((short) channels)
                .putInt(rateHz).putInt(rateHz * channels * 2).putShort((short) (channels * 2)).putShort((short) 16);
        b.put("data".getBytes(StandardCharsets.US_ASCII)).putInt(dataBytes);
        for (short s : interleaved) {
            b.putShort(s);
        }
        return b.array();
    }
}
