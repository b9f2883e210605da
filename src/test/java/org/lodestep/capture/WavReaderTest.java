package org.lodestep.capture;

import org.lodestep.sample.Channel;
import org.lodestep.sample.InputFormatException;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HexFormat;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class WavReaderTest {

    // IBM/Microsoft RIFF specification, 1991, references §22: IBM/Microsoft Multimedia Programming Interface and Data
    // Specifications 1.0 (1991),
    // as summarised on the Stanford CCRMA "WAVE PCM soundfile format" page: the 44-byte header of 48 kHz mono
    // 16-bit PCM with 96000 data bytes (RIFF size 96036).
    private static final String HEADER_48K_MONO_16 = "52494646247701005741564566 6d7420100000000100010080bb0000"
            + "0077010002001000646174610077 0100";

    @TempDir
    Path dir;

    private static byte[] hex(String s) {
        return HexFormat.of().parseHex(s.replace(" ", ""));
    }

    private static WavReader read(byte[] bytes) throws Exception {
        return WavReader.open(new ByteArrayInputStream(bytes), "test.wav");
    }

    @Test
    void decodesPublishedHeaderAndFullScaleSixteenBitSamples() throws Exception {
        byte[] file = new byte[44 + 96000];
        System.arraycopy(hex(HEADER_48K_MONO_16), 0, file, 0, 44);
        // Item 22 decode checks: 00 80 -> -32768 -> -1.0; FF 7F -> 32767 -> 0.999969 (32767 / 32768).
        file[44] = 0x00;
        file[45] = (byte) 0x80;
        file[46] = (byte) 0xFF;
        file[47] = 0x7F;
        Path p = dir.resolve("ref.wav");
        Files.write(p, file);
        try (WavReader r = WavReader.open(p)) {
            assertEquals(48000.0, r.sampleRateHz());
            assertEquals(List.of(new Channel("ch1", "")), r.channels());
            assertEquals(44, r.dataStart());
            assertEquals(48000, r.knownFrameCount());
            double[] d = TestStreams.readAll(r, 10_000)[0];
            assertEquals(48000, d.length);
            assertEquals(-1.0, d[0]);
            assertEquals(0.999969, d[1], 5e-7);
            assertEquals(32767.0 / 32768.0, d[1]);
            assertEquals(0.0, d[2]);
        }
    }

    @Test
    void decodesStereoSixteenBitWrittenByScipy() throws Exception {
        // Written by scipy.io.wavfile.write (SciPy 1.17.1) from int16 frames (-32768, 32767), (0, 16384), (1, -1),
        // (12345, -12345) at 8000 Hz; see the fixture README. Scaling by 2^15 as item 22 prescribes.
        try (WavReader r = WavReader.open(TestStreams.fixture("scipy-int16-stereo.wav"))) {
            assertEquals(8000.0, r.sampleRateHz());
            assertEquals(List.of(new Channel("ch1", ""), new Channel("ch2", "")), r.channels());
            double[][] d = TestStreams.readAll(r, 3);
            assertArrayEquals(new double[] {-1.0, 0.0, 1 / 32768.0, 12345 / 32768.0}, d[0]);
            assertArrayEquals(new double[] {32767 / 32768.0, 0.5, -1 / 32768.0, -12345 / 32768.0}, d[1]);
        }
    }

    @Test
    void decodesFloatIntAndUnsignedByteFilesWrittenByScipy() throws Exception {
        // Float WAV carries values as they are; scipy writes an 18-byte fmt chunk and a 'fact' chunk to skip.
        try (WavReader r = WavReader.open(TestStreams.fixture("scipy-float32-mono.wav"))) {
            assertEquals(22050.0, r.sampleRateHz());
            assertEquals("float", r.metadata().get("wav_format"));
            assertArrayEquals(new double[] {0.0, 0.5, -0.25, 1.0, -1.0, 0.125}, TestStreams.readAll(r, 4)[0]);
        }
        try (WavReader r = WavReader.open(TestStreams.fixture("scipy-float64-mono.wav"))) {
            assertArrayEquals(new double[] {0.1, -0.2, 0.3}, TestStreams.readAll(r, 4)[0]);
        }
        try (WavReader r = WavReader.open(TestStreams.fixture("scipy-int32-mono.wav"))) {
            // 32-bit integer PCM scaled by 2^31.
            assertArrayEquals(new double[] {-1.0, (Math.pow(2, 31) - 1) / Math.pow(2, 31), 0.5},
                    TestStreams.readAll(r, 4)[0]);
        }
        try (WavReader r = WavReader.open(TestStreams.fixture("scipy-uint8-mono.wav"))) {
            // Item 22: 8-bit samples are unsigned, 0x80 is zero; scaled by 2^7.
            assertArrayEquals(new double[] {-1.0, 0.0, 127 / 128.0, -0.5}, TestStreams.readAll(r, 4)[0]);
        }
    }

    @Test
    void decodesTwentyFourBitWrittenByPythonWaveModule() throws Exception {
        try (WavReader r = WavReader.open(TestStreams.fixture("wave-int24-mono.wav"))) {
            assertEquals(96000.0, r.sampleRateHz());
            // Item 22: 24-bit 00 00 80 -> -8388608 -> -1.0 (scale by 2^23); FF FF 7F -> 8388607; 00 00 40 -> 0.5.
            assertArrayEquals(new double[] {-1.0, 8388607 / 8388608.0, 0.5, -1 / 8388608.0},
                    TestStreams.readAll(r, 4)[0]);
        }
    }

    /**
     * Every 16-bit code, and the extreme and middle codes of 8-, 24- and 32-bit PCM, decode to the code over the
     * full scale (2^15, 2^7 after the offset of unsigned bytes, 2^23, 2^31) bit for bit, as the JDK's own
     * integer-to-double conversion gives it: the decoder builds the double from bits, not by that conversion.
     */
    @Test
    void decodesEveryCodeExactlyAsCodeOverFullScale() throws Exception {
        ByteBuffer all16 = ByteBuffer.allocate(2 * 65536).order(ByteOrder.LITTLE_ENDIAN);
        for (int v = Short.MIN_VALUE; v <= Short.MAX_VALUE; v++) {
            all16.putShort((short) v);
        }
        try (WavReader r = read(wav(fmt(1, 1, 8000, 16), all16.array()))) {
            double[] d = TestStreams.readAll(r, 5000)[0];
            for (int v = Short.MIN_VALUE; v <= Short.MAX_VALUE; v++) {
                assertEquals(Double.doubleToRawLongBits((double) v / 32768), Double.doubleToRawLongBits(
                        d[v - Short.MIN_VALUE]), "16-bit code " + v);
            }
        }
        int[] codes32 = {Integer.MIN_VALUE, Integer.MIN_VALUE + 1, -65536, -1, 0, 1, 12345678, Integer.MAX_VALUE};
        ByteBuffer b32 = ByteBuffer.allocate(4 * codes32.length).order(ByteOrder.LITTLE_ENDIAN);
        ByteBuffer b24 = ByteBuffer.allocate(3 * codes32.length).order(ByteOrder.LITTLE_ENDIAN);
        for (int v : codes32) {
            b32.putInt(v);
            int v24 = v >> 8;
            b24.put((byte) v24).put((byte) (v24 >> 8)).put((byte) (v24 >> 16));
        }
        try (WavReader r32 = read(wav(fmt(1, 1, 8000, 32), b32.array()));
             WavReader r24 = read(wav(fmt(1, 1, 8000, 24), b24.array()))) {
            double[] d32 = TestStreams.readAll(r32, 3)[0];
            double[] d24 = TestStreams.readAll(r24, 3)[0];
            for (int k = 0; k < codes32.length; k++) {
                assertEquals(Double.doubleToRawLongBits((double) codes32[k] / 0x1p31),
                        Double.doubleToRawLongBits(d32[k]), "32-bit code " + codes32[k]);
                assertEquals(Double.doubleToRawLongBits((double) (codes32[k] >> 8) / 0x1p23),
                        Double.doubleToRawLongBits(d24[k]), "24-bit code " + (codes32[k] >> 8));
            }
        }
        byte[] b8 = {0, 1, 127, (byte) 128, (byte) 129, (byte) 255};
        try (WavReader r8 = read(wav(fmt(1, 1, 8000, 8), b8))) {
            double[] d8 = TestStreams.readAll(r8, 4)[0];
            for (int k = 0; k < b8.length; k++) {
                assertEquals(Double.doubleToRawLongBits(((b8[k] & 0xFF) - 128) / 128.0),
                        Double.doubleToRawLongBits(d8[k]), "8-bit code " + (b8[k] & 0xFF));
            }
        }
    }

    /** Builds a WAV from a fmt body and a list of (id, body) chunks placed before the data chunk. */
    private static byte[] wav(byte[] fmt, byte[] data, Object... chunks) {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        body.writeBytes("WAVE".getBytes(StandardCharsets.US_ASCII));
        chunk(body, "fmt ", fmt);
        for (int i = 0; i < chunks.length; i += 2) {
            chunk(body, (String) chunks[i], (byte[]) chunks[i + 1]);
        }
        chunk(body, "data", data);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        out.writeBytes("RIFF".getBytes(StandardCharsets.US_ASCII));
        out.writeBytes(le32(body.size()));
        out.writeBytes(body.toByteArray());
        return out.toByteArray();
    }

    private static void chunk(ByteArrayOutputStream out, String id, byte[] body) {
        out.writeBytes(id.getBytes(StandardCharsets.US_ASCII));
        out.writeBytes(le32(body.length));
        out.writeBytes(body);
        if (body.length % 2 == 1) {
            out.write(0);
        }
    }

    private static byte[] le32(int v) {
        return ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putInt(v).array();
    }

    private static byte[] fmt(int format, int channels, int rate, int bits) {
        int align = channels * bits / 8;
        return ByteBuffer.allocate(16).order(ByteOrder.LITTLE_ENDIAN).putShort((short) format)
                .putShort((short) channels).putInt(rate).putInt(rate * align).putShort((short) align)
                .putShort((short) bits).array();
    }

    @Test
    void skipsUnknownChunksHonouringOddSizePadBytesAndReadsInfoComment() throws Exception {
        byte[] list = hex("494e464f" + "49434d54" + "05000000" + "783d310a00");   // "INFO" "ICMT" 5 "x=1\n\0"
        byte[] data = hex("0000 0040 00c0");                                   // 0, 0.5, -0.5 in 16-bit
        byte[] file = wav(fmt(1, 1, 1000, 16), data, "junk", new byte[] {1, 2, 3}, "LIST", list);
        try (WavReader r = read(file)) {
            assertEquals("1", r.metadata().get("x"));
            assertArrayEquals(new double[] {0, 0.5, -0.5}, TestStreams.readAll(r, 8)[0]);
        }
    }

    @Test
    void readsExtensibleFormatWithValidBitsBelowContainer() throws Exception {
        // Microsoft Learn, "WAVEFORMATEXTENSIBLE structure": cbSize 22, wValidBitsPerSample, dwChannelMask, then
        // the SubFormat GUID KSDATAFORMAT_SUBTYPE_PCM 00000001-0000-0010-8000-00aa00389b71 (mixed-endian bytes).
        ByteBuffer f = ByteBuffer.allocate(40).order(ByteOrder.LITTLE_ENDIAN);
        f.put(fmt(0xFFFE, 2, 44100, 24));
        f.putShort((short) 22).putShort((short) 20).putInt(3);
        f.put(hex("01000000 0000 1000 800000aa00389b71"));
        // Two frames: 20 valid bits left-justified in 24-bit containers; 0x7FFFF0 and 0x800000.
        byte[] data = hex("f0ff7f 000080 000040 0000c0");
        try (WavReader r = read(wav(f.array(), data))) {
            assertEquals("20", r.metadata().get("wav_valid_bits"));
            double[][] d = TestStreams.readAll(r, 8);
            assertArrayEquals(new double[] {0x7FFFF0 / 8388608.0, 0.5}, d[0]);
            assertArrayEquals(new double[] {-1.0, -0.5}, d[1]);
        }
    }

    @Test
    void acceptsPublishedByteRateAndBlockAlignOfCdStereo() throws Exception {
        // Item 22 check: 44.1 kHz stereo 16-bit -> ByteRate 176400, BlockAlign 4.
        byte[] f = fmt(1, 2, 44100, 16);
        assertEquals(176400, ByteBuffer.wrap(f).order(ByteOrder.LITTLE_ENDIAN).getInt(8));
        assertEquals(4, ByteBuffer.wrap(f).order(ByteOrder.LITTLE_ENDIAN).getShort(12));
        try (WavReader r = read(wav(f, new byte[8]))) {
            assertEquals(2, TestStreams.readAll(r, 8)[1].length);
        }
        f[12] = 3;
        InputFormatException e = assertThrows(InputFormatException.class, () -> read(wav(f, new byte[8])));
        assertTrue(e.expected().contains("block align"), e.getMessage());
    }

    @Test
    void rejectsTruncatedFileAtOpenNamingWholeFramesPresent() {
        InputFormatException e = assertThrows(InputFormatException.class,
                () -> WavReader.open(TestStreams.fixture("truncated.wav")));
        assertTrue(e.expected().contains("truncated"), e.getMessage());
        assertTrue(e.expected().contains("3 whole frames"), e.getMessage());
    }

    @Test
    void rejectsTruncatedStreamWhenDataEndsEarly() throws Exception {
        byte[] whole = Files.readAllBytes(TestStreams.fixture("scipy-int16-stereo.wav"));
        byte[] cut = java.util.Arrays.copyOf(whole, whole.length - 3);
        try (WavReader r = read(cut)) {
            InputFormatException e = assertThrows(InputFormatException.class, () -> TestStreams.readAll(r, 100));
            assertTrue(e.expected().contains("truncated"), e.getMessage());
        }
    }

    @Test
    void readsToEndWhenDataSizeIsUnknown() throws Exception {
        byte[] file = wav(fmt(1, 1, 1000, 16), hex("0040 00c0"));
        file[file.length - 8] = (byte) 0xFF;   // data size field: 0xFFFFFFFF
        file[file.length - 7] = (byte) 0xFF;
        file[file.length - 6] = (byte) 0xFF;
        file[file.length - 5] = (byte) 0xFF;
        try (WavReader r = read(file)) {
            assertEquals(-1, r.knownFrameCount());
            assertArrayEquals(new double[] {0.5, -0.5}, TestStreams.readAll(r, 8)[0]);
        }
    }

    @Test
    void rejectsWrongMagicUnsupportedFormatsAndMissingChunks() {
        InputFormatException riff = assertThrows(InputFormatException.class,
                () -> WavReader.open(TestStreams.fixture("wrong-riff.wav")));
        assertEquals("byte 0", riff.column());
        assertEquals("RIFX", riff.text());
        assertTrue(riff.getMessage().endsWith("wrong-riff.wav, byte 0: 'RIFX' expected 'RIFF' (a WAVE file)"),
                riff.getMessage());

        InputFormatException alaw = assertThrows(InputFormatException.class,
                () -> read(wav(fmt(6, 1, 8000, 8), new byte[2])));
        assertEquals("6", alaw.text());

        InputFormatException bits = assertThrows(InputFormatException.class,
                () -> read(wav(fmt(1, 1, 8000, 12), new byte[2])));
        assertTrue(bits.expected().contains("8, 16, 24 or 32"), bits.getMessage());

        byte[] noData = java.util.Arrays.copyOf(wav(fmt(1, 1, 8000, 16), new byte[0]), 12 + 8 + 16);
        assertTrue(assertThrows(InputFormatException.class, () -> read(noData)).expected().contains("'data'"));
    }

    @Test
    void rejectsNonFiniteFloatSample() throws Exception {
        byte[] data = ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN).putFloat(0.5f).putFloat(Float.NaN).array();
        try (WavReader r = read(wav(fmt(3, 1, 1000, 32), data))) {
            double[][] buf = new double[1][8];
            // The good frame comes first, the error with the next read.
            assertEquals(1, r.read(buf, 0, 8));
            assertEquals(0.5, buf[0][0]);
            InputFormatException e = assertThrows(InputFormatException.class, () -> r.read(buf, 0, 8));
            assertTrue(e.expected().contains("non-finite or absurd sample in frame 1"), e.getMessage());
            assertEquals("byte " + (44 + 4), e.column());
        }
    }

    @Test
    void rejectsAFloatSampleBeyondThePlausibleMagnitude() throws Exception {
        // 1e38 is a finite float, but its square overflows a power spectrum: refused like a non-finite one
        byte[] data = ByteBuffer.allocate(8).order(ByteOrder.LITTLE_ENDIAN).putFloat(0.5f).putFloat(1e38f).array();
        try (WavReader r = read(wav(fmt(3, 1, 1000, 32), data))) {
            double[][] buf = new double[1][8];
            assertEquals(1, r.read(buf, 0, 8));
            InputFormatException e = assertThrows(InputFormatException.class, () -> r.read(buf, 0, 8));
            assertTrue(e.expected().contains("absurd sample in frame 1"), e.getMessage());
        }
    }
}
