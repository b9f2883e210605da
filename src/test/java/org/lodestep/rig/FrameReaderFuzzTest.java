package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Property tests of the frame decoder with seeded random input: garbage, stray sync bytes, damaged lengths and CRCs,
 * any chunking. Time is a counter the scripted line advances, so every case ends by construction and nothing here
 * waits for a real clock.
 */
class FrameReaderFuzzTest {

    /** A line that hands out scripted chunks; when it has nothing, the reader's wait "passes" on the fake clock. */
    private static final class ScriptedLine implements Transport {
        final List<byte[]> chunks = new ArrayList<>();
        final List<Long> gapsMs = new ArrayList<>();
        long nowNanos = 1_000_000_000L;
        int next;
        int pos;

        void add(byte[] chunk, long gapBeforeMs) {
            chunks.add(chunk);
            gapsMs.add(gapBeforeMs);
        }

        @Override
        public String address() {
            return "scripted:";
        }

        @Override
        public void write(byte[] bytes, int offset, int length) {
            throw new UnsupportedOperationException();
        }

        @Override
        public int read(byte[] dest, int offset, int length, int timeoutMs) {
            if (next < chunks.size() && pos == 0 && gapsMs.get(next) > 0) {
                long gap = gapsMs.get(next);
                long waited = Math.min(gap, Math.max(1, timeoutMs));
                nowNanos += waited * 1_000_000L;
                gapsMs.set(next, gap - waited);
                if (gapsMs.get(next) > 0) {
                    return 0;
                }
            }
            if (next >= chunks.size()) {
                nowNanos += Math.max(1, timeoutMs) * 1_000_000L;
                return 0;
            }
            byte[] c = chunks.get(next);
            int n = Math.min(length, c.length - pos);
            System.arraycopy(c, pos, dest, offset, n);
            pos += n;
            if (pos == c.length) {
                next++;
                pos = 0;
            }
            return n;
        }

        @Override
        public void close() {
        }
    }

    private static Frame randomFrame(Random r) {
        byte[] types = {Frame.COMMAND, Frame.REPLY, Frame.ERROR, Frame.BLOCK, Frame.END};
        byte[] payload = new byte[r.nextInt(r.nextInt(10) == 0 ? 4097 : 40)];
        r.nextBytes(payload);
        return new Frame(types[r.nextInt(types.length)], r.nextInt(256), payload);
    }

    /** Garbage rich in sync bytes and plausible headers, the worst neighbours a frame can have. */
    private static byte[] garbage(Random r) {
        byte[] g = new byte[r.nextInt(60)];
        r.nextBytes(g);
        for (int i = 0; i + 1 < g.length; i++) {
            if (r.nextInt(6) == 0) {
                g[i] = (byte) 0xA5;
                g[i + 1] = 0x3C;
            }
        }
        return g;
    }

    @Test
    void everyIntactFrameAmongGarbageIsFoundInOrderAndNothingElse() throws Exception {
        Random r = new Random(20261202L);
        for (int c = 0; c < 1500; c++) {
            ScriptedLine line = new ScriptedLine();
            List<Frame> sent = new ArrayList<>();
            ByteArrayOutputStream all = new ByteArrayOutputStream();
            int frames = 1 + r.nextInt(6);
            for (int i = 0; i < frames; i++) {
                all.writeBytes(garbage(r));
                Frame f = randomFrame(r);
                sent.add(f);
                all.writeBytes(FrameCodec.encode(f));
            }
            all.writeBytes(garbage(r));
            byte[] wire = all.toByteArray();
            for (int p = 0; p < wire.length; ) {
                int n = 1 + r.nextInt(Math.min(300, wire.length - p));
                // mostly back to back, sometimes a pause longer than the inter-byte timeout
                line.add(Arrays.copyOfRange(wire, p, p + n), r.nextInt(8) == 0 ? 150 : 0);
                p += n;
            }
            FrameReader reader = new FrameReader(line, () -> line.nowNanos);
            List<Frame> got = new ArrayList<>();
            for (int guard = 0; guard < 10_000; guard++) {
                Frame f = reader.next(50);
                if (f == null && line.next >= line.chunks.size()) {
                    // the line is drained; one more wait lets a pending fake frame time out
                    f = reader.next(FrameCodec.FRAME_TIMEOUT_MS + 10);
                    if (f == null) {
                        break;
                    }
                }
                if (f != null) {
                    got.add(f);
                }
            }
            // a pause inside a frame loses that frame (its bytes stopped coming), never a neighbour, and nothing
            // is decoded that was not sent
            List<Frame> expected = new ArrayList<>(sent);
            assertTrue(got.size() <= expected.size(), "case " + c);
            int j = 0;
            for (Frame g : got) {
                while (j < expected.size() && !same(expected.get(j), g)) {
                    j++;
                }
                assertTrue(j < expected.size(), "case " + c + ": decoded a frame that was never sent: " + g);
                j++;
            }
        }
    }

    private static boolean same(Frame a, Frame b) {
        return a.type() == b.type() && a.tag() == b.tag() && Arrays.equals(a.payload(), b.payload());
    }

    @Test
    void withoutPausesEveryFrameIsFoundWhateverTheGarbageAndChunking() throws Exception {
        Random r = new Random(7L);
        for (int c = 0; c < 1500; c++) {
            ScriptedLine line = new ScriptedLine();
            List<Frame> sent = new ArrayList<>();
            ByteArrayOutputStream all = new ByteArrayOutputStream();
            for (int i = 0; i < 1 + r.nextInt(5); i++) {
                all.writeBytes(garbage(r));
                Frame f = randomFrame(r);
                sent.add(f);
                all.writeBytes(FrameCodec.encode(f));
            }
            byte[] wire = all.toByteArray();
            for (int p = 0; p < wire.length; ) {
                int n = 1 + r.nextInt(Math.min(64, wire.length - p));
                line.add(Arrays.copyOfRange(wire, p, p + n), 0);
                p += n;
            }
            FrameReader reader = new FrameReader(line, () -> line.nowNanos);
            List<Frame> got = new ArrayList<>();
            for (int guard = 0; guard < 10_000 && got.size() < sent.size(); guard++) {
                Frame f = reader.next(FrameCodec.FRAME_TIMEOUT_MS + 10);
                if (f != null) {
                    got.add(f);
                } else if (line.next >= line.chunks.size()) {
                    Frame last = reader.next(FrameCodec.FRAME_TIMEOUT_MS + 10);
                    if (last == null) {
                        break;
                    }
                    got.add(last);
                }
            }
            assertEquals(sent.size(), got.size(), "case " + c);
            for (int i = 0; i < sent.size(); i++) {
                assertTrue(same(sent.get(i), got.get(i)), "case " + c + " frame " + i);
            }
        }
    }

    @Test
    void aDamagedLengthByteNeverStallsTheNextFrame() throws Exception {
        Random r = new Random(99L);
        for (int c = 0; c < 500; c++) {
            byte[] victim = FrameCodec.encode(Frame.text(Frame.COMMAND, 1 + r.nextInt(255), "RES 1 2"));
            // the length now promises up to 4096 bytes that never come
            victim[4] = (byte) r.nextInt(256);
            victim[5] = (byte) r.nextInt(17);
            byte[] ping = FrameCodec.encode(Frame.text(Frame.COMMAND, 0, "PING"));
            ScriptedLine line = new ScriptedLine();
            line.add(victim, 0);
            // the host retries after its reply timeout, or a keep-alive arrives after 500 ms
            line.add(ping, r.nextBoolean() ? 1000 : 500);
            line.add(ping, 500);
            FrameReader reader = new FrameReader(line, () -> line.nowNanos);
            Frame f = null;
            for (int i = 0; i < 100 && f == null; i++) {
                f = reader.next(100);
                if (f != null && f.tag() != 0) {
                    f = null; // the damaged frame itself may survive when its length was not changed
                }
            }
            assertTrue(f != null && f.text().equals("PING"), "case " + c);
        }
    }

    @Test
    void aHeaderPromisingMoreThanArrivesIsGivenUpEvenWhileBytesKeepComing() throws Exception {
        ScriptedLine line = new ScriptedLine();
        line.add(new byte[] {(byte) 0xA5, 0x3C, 0x43, 0x05, 0x00, 0x10}, 0);
        byte[] ping = FrameCodec.encode(Frame.text(Frame.COMMAND, 0, "PING"));
        for (int i = 0; i < 6; i++) {
            line.add(ping, 200); // keep-alives every 200 ms: never a gap long enough for the inter-byte timeout
        }
        FrameReader reader = new FrameReader(line, () -> line.nowNanos);
        int pings = 0;
        for (int i = 0; i < 200; i++) {
            Frame f = reader.next(100);
            if (f != null) {
                assertEquals("PING", f.text());
                pings++;
            }
        }
        // the pings that arrived within the frame timeout were swallowed by the false frame; the later ones decode
        assertTrue(pings >= 3, "decoded " + pings + " pings");
        assertEquals(1, reader.abandonedFrames());
    }

    @Test
    void aLoneSyncByteAtTheEndIsKeptForTheNextRead() throws Exception {
        byte[] f = FrameCodec.encode(Frame.text(Frame.REPLY, 3, "OK"));
        ScriptedLine line = new ScriptedLine();
        line.add(new byte[] {0x11, (byte) 0xA5}, 0);
        line.add(Arrays.copyOfRange(f, 1, f.length), 0);
        FrameReader reader = new FrameReader(line, () -> line.nowNanos);
        Frame got = reader.next(100);
        assertArrayEquals(f, FrameCodec.encode(got));
        assertNull(reader.next(10));
    }
}
