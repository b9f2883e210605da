package org.lodestep.rig;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * Property tests of the rig's command parser and of a whole rig session under hostile commands, from seeded
 * generators: a fixed number of cases, so each test ends by construction.
 */
class CommandTextFuzzTest {

    private static final String[] VERBS = {"HELLO", "CAPS", "PING", "RES", "INS", "STEP", "EMF", "SWEEP", "RESEND",
        "STOP", "SAFE", "BYE", "res", "FROB", ""};
    private static final String[] KEYS = {"lead", "volts", "token", "seconds", "ms", "rate_hz", "pairs", "from", "to",
        "microsteps", "seq", "minor", "dir", "x", "Volts", "volts "};
    private static final String[] VALUES = {"1", "2", "500", "1e3", "5.0E-4", "-1", "+1", ".5", "5.", "0x10", "NaN",
        "Infinity", "1-2,3-4", "1-1", "99999999999999999999", "", "=", "fwd", "ABCD"};

    private static byte[] randomBytes(Random r) {
        byte[] b = new byte[r.nextInt(r.nextInt(20) == 0 ? 4096 : 60)];
        r.nextBytes(b);
        return b;
    }

    private static String randomCommand(Random r) {
        StringBuilder b = new StringBuilder(VERBS[r.nextInt(VERBS.length)]);
        int words = r.nextInt(4);
        for (int i = 0; i < words; i++) {
            b.append(r.nextInt(10) == 0 ? "  " : " ").append(r.nextBoolean() ? Integer.toString(r.nextInt(12))
                    : VALUES[r.nextInt(VALUES.length)]);
        }
        int keys = r.nextInt(5);
        for (int i = 0; i < keys; i++) {
            b.append(' ').append(KEYS[r.nextInt(KEYS.length)]).append('=').append(VALUES[r.nextInt(VALUES.length)]);
        }
        return b.toString();
    }

    @Test
    void anyPayloadEitherParsesOrIsRefusedWithAShortReason() {
        Random r = new Random(1202L);
        for (int c = 0; c < 20_000; c++) {
            byte[] payload = c % 2 == 0 ? randomBytes(r) : randomCommand(r).getBytes(StandardCharsets.US_ASCII);
            try {
                CommandText t = CommandText.parse(payload);
                assertTrue(!t.verb().isEmpty() && t.verb().indexOf(' ') < 0, "case " + c);
            } catch (CommandException e) {
                assertEquals(RigError.BAD_ARGUMENT, e.error());
                assertTrue(e.getMessage().length() <= 120, e.getMessage());
            }
        }
    }

    @Test
    void wellFormedCommandsRoundTrip() throws Exception {
        Random r = new Random(42L);
        for (int c = 0; c < 5000; c++) {
            List<String> words = new ArrayList<>(List.of(new String[] {"RES", "INS", "SWEEP"}[r.nextInt(3)]));
            for (int i = 0; i < r.nextInt(3); i++) {
                words.add(Integer.toString(r.nextInt(1000)));
            }
            Map<String, String> kv = new LinkedHashMap<>();
            for (int i = 0; i < r.nextInt(4); i++) {
                kv.put("k" + i, Double.toString(r.nextGaussian() * Math.pow(10, r.nextInt(20) - 10)));
            }
            StringBuilder b = new StringBuilder(String.join(" ", words));
            kv.forEach((k, v) -> b.append(' ').append(k).append('=').append(v));
            CommandText t = CommandText.parse(b.toString().getBytes(StandardCharsets.US_ASCII));
            for (int i = 0; i < words.size(); i++) {
                assertEquals(words.get(i), t.word(i));
            }
            for (Map.Entry<String, String> e : kv.entrySet()) {
                // Java's own number text (5.0E-4, 1.0E10) is inside the protocol's number grammar
                assertEquals(Double.parseDouble(e.getValue()), t.number(e.getKey(), -Double.MAX_VALUE,
                        Double.MAX_VALUE));
            }
        }
    }

    @Test
    void everythingTheNumberGrammarAcceptsIsAFiniteOrHugeDecimal() {
        Random r = new Random(3L);
        String alphabet = "0123456789.eE+-xX";
        for (int c = 0; c < 50_000; c++) {
            StringBuilder b = new StringBuilder();
            for (int i = 0; i < 1 + r.nextInt(8); i++) {
                b.append(alphabet.charAt(r.nextInt(alphabet.length())));
            }
            String s = b.toString();
            if (CommandText.NUMBER.matcher(s).matches()) {
                Double.parseDouble(s); // never throws for a string the grammar accepts
                assertTrue(!s.startsWith("+") && !s.startsWith(".") && !s.endsWith("."), s);
            }
        }
    }

    @Test
    void aRigSessionSurvivesHostileCommandsAndAnswersEachOnce() throws Exception {
        Transports.SimLink link = Transports.openSim("sim:bench-4");
        FrameReader in = new FrameReader(link.host());
        Random r = new Random(77L);
        link.host().write(FrameCodec.encode(Frame.text(Frame.COMMAND, 1, "HELLO 1")));
        assertNotNull(in.next(2000));
        for (int c = 0; c < 400; c++) {
            int tag = 2 + c % 250;
            byte[] payload = c % 3 == 0 ? randomBytes(r) : randomCommand(r).getBytes(StandardCharsets.US_ASCII);
            String text = new String(payload, StandardCharsets.US_ASCII);
            if (text.startsWith("STEP") || text.startsWith("EMF") || text.startsWith("SWEEP")
                    || text.startsWith("BYE") || text.startsWith("HELLO") || text.startsWith("INS FIRE")) {
                continue; // streams and dwells are exercised by the conformance kit; BYE and HELLO end the session
            }
            link.host().write(FrameCodec.encode(new Frame(Frame.COMMAND, tag, payload)));
            Frame f = null;
            while (f == null) {
                Frame g = in.next(5000);
                assertNotNull(g, "no answer to case " + c + ": " + CommandText.echo(text));
                if (g.tag() == tag) {
                    f = g;
                }
            }
            assertTrue(f.type() == Frame.REPLY || f.type() == Frame.ERROR || f.type() == Frame.BLOCK
                    || f.type() == Frame.END, "case " + c);
            if (f.type() == Frame.ERROR) {
                assertTrue(f.payload().length <= 256, "error of " + f.payload().length + " bytes");
            }
        }
        link.host().write(FrameCodec.encode(Frame.text(Frame.COMMAND, 253, "PING")));
        Frame last = in.next(2000);
        while (last != null && last.tag() != 253) {
            last = in.next(2000);
        }
        assertNotNull(last, "the rig still answers");
        assertEquals("OK", last.text());
    }
}
