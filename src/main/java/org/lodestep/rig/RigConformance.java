package org.lodestep.rig;

import java.io.EOFException;
import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.Predicate;

/**
 * The conformance kit: exercises a rig's implementation of {@code firmware-protocol.md} frame by frame and names the
 * section of the specification each check rests on. It drives the rig as a careful host would, except where a check
 * is about the host misbehaving (a damaged frame, a silent host for the watchdog, a command during a dwell).
 *
 * <p>What it energises: the lowest insulation test voltage the rig offers on lead 1 (several short tests, each at most
 * a few seconds), a slow sweep (10 to 20 full steps/s) for the watchdog check when the rig sweeps, and nothing else:
 * the stream checks use back-EMF recording, which switches nothing on, when the rig offers it.
 *
 * <p>Checks that need a rig streaming or dwelling in real time are skipped, with the reason, on a rig that answers
 * before they can act (the virtual rig without {@code realtime=1}).
 */
public final class RigConformance {

    /** Outcome of one check. */
    public enum Verdict { PASS, FAIL, SKIP }

    /**
     * One row of the table.
     *
     * @param section the section of {@code firmware-protocol.md} the check rests on, e.g. {@code 4.3}
     * @param name    what was checked, as a rule the rig must follow
     * @param verdict pass, fail, or skip (not applicable to this rig or this address)
     * @param detail  what was seen, for a failure or a skip; may be empty
     */
    public record Check(String section, String name, Verdict verdict, String detail) {
    }

    /** All rows, and who answered. */
    public record Report(String address, String rig, List<Check> checks) {
        public Report {
            checks = List.copyOf(checks);
        }

        public long failures() {
            return checks.stream().filter(c -> c.verdict() == Verdict.FAIL).count();
        }

        public boolean passed() {
            return failures() == 0;
        }
    }

    /**
     * @param thorough also run the slow checks: the arm's expiry (about 10 s) and the watchdog during a dwell
     */
    public record Settings(boolean thorough) {
        public static final Settings DEFAULT = new Settings(true);
    }

    /** Opens a fresh line to the rig under test. */
    @FunctionalInterface
    interface Connector {
        Transport open() throws RigException;
    }

    private static final int REPLY_MS = 1000;
    /** Longest the kit waits for a stream header: a simulated rig computes the record before it answers. */
    private static final int HEADER_MS = 5000;

    private final String address;
    private final Connector connector;
    private final boolean networked;
    private final Settings settings;
    private final Consumer<String> step;
    private final List<Check> checks = new ArrayList<>();
    private Transport line;
    private FrameReader reader;
    private int nextTag = 1;
    private long lastSentNanos;
    private Map<String, String> caps = Map.of();
    private String rigName = "?";
    /** The first complete stream, which the re-request and duplicate checks ask about again. */
    private StreamRun lastStream;
    private String lastStreamCommand;
    private int lastStreamTag;
    /** When the last watchdog error arrived. */
    private long dogNanos;

    private RigConformance(String address, Connector connector, boolean networked, Settings settings,
                           Consumer<String> step) {
        this.address = address;
        this.connector = connector;
        this.networked = networked;
        this.settings = settings;
        this.step = step;
    }

    /**
     * Runs every check against the rig at {@code address}.
     *
     * @param step told the name of each check as it starts
     * @throws RigException when the rig cannot be reached at all
     */
    public static Report run(String address, Settings settings, Consumer<String> step) throws RigException {
        return run(address, () -> Transports.open(address), address.startsWith("tcp:"), settings, step);
    }

    static Report run(String address, Connector connector, boolean networked, Settings settings,
                      Consumer<String> step) throws RigException {
        RigConformance k = new RigConformance(address, connector, networked, settings, step);
        k.open();
        try {
            k.all();
        } finally {
            k.closeQuietly();
        }
        return new Report(address, k.rigName, k.checks);
    }

    // ---- the checks, in the order of the specification ----

    private void all() {
        check("3", "a command before HELLO is refused with 10 VERSION", () -> {
            expectError(ask("CAPS"), 10);
            return "";
        });
        check("3", "HELLO with a version the rig does not speak is refused with 10 VERSION", () -> {
            expectError(ask("HELLO 99"), 10);
            return "";
        });
        check("3", "HELLO 1 is answered OK proto=1 with rig=, fw= and id=", () -> {
            Fields f = expectReply(ask("HELLO 1 minor=1"));
            expect(f.get("proto", "").equals("1"), "proto=" + f.get("proto", "(none)"));
            for (String k : List.of("rig", "fw", "id")) {
                expect(f.has(k), "no " + k + "=");
            }
            rigName = f.get("rig", "?") + " " + f.get("fw", "?") + " (" + f.get("id", "?") + "), minor "
                    + f.get("minor", "0");
            return rigName;
        });
        if (checks.get(checks.size() - 1).verdict() != Verdict.PASS) {
            // the rest still needs a session: a 1.0 rig may take plain HELLO 1
            try {
                ask("HELLO 1");
            } catch (Exception e) {
                closeQuietly();
            }
        }
        check("3", "CAPS lists every mandatory key in its grammar", this::capsKeys);
        framing();
        grammar();
        duplicates();
        insulation();
        streams();
        watchdog();
        if (settings.thorough()) {
            slow();
        }
        check("3", "a second host is answered 3 BUSY at once while a session runs", this::secondHost);
        check("3", "BYE is answered OK bye", () -> {
            Frame f = ask("BYE");
            expect(f.type() == Frame.REPLY && f.text().equals("OK bye"), describe(f));
            line = null; // the session is over
            return "";
        });
    }

    private String capsKeys() throws Exception {
        Fields f = expectReply(ask("CAPS"));
        caps = f.values();
        List<String> missing = new ArrayList<>();
        for (String k : List.of("leads", "measure", "watchdog_ms")) {
            if (!f.has(k)) {
                missing.add(k);
            }
        }
        List<String> measures = measures();
        if (measures.contains("ins") && !f.has("ins_volts")) {
            missing.add("ins_volts");
        }
        if (measures.contains("step")) {
            for (String k : List.of("max_step_a", "drive_series_ohm")) {
                if (!f.has(k)) {
                    missing.add(k);
                }
            }
        }
        if (measures.stream().anyMatch(m -> List.of("step", "emf", "sweep").contains(m))) {
            for (String k : List.of("max_rate_hz", "max_frames", "channels", "resend_depth")) {
                if (!f.has(k)) {
                    missing.add(k);
                }
            }
        }
        expect(missing.isEmpty(), "missing " + String.join(", ", missing));
        expect(CommandText.INTEGER.matcher(f.get("leads", "")).matches()
                && Integer.parseInt(f.get("leads", "0")) >= 2, "leads=" + f.get("leads", "") + " is not 2 or more");
        expect(CommandText.INTEGER.matcher(f.get("watchdog_ms", "")).matches(), "watchdog_ms is not an integer");
        for (String v : f.get("ins_volts", "100").split(",")) {
            expect(CommandText.INTEGER.matcher(v).matches(), "ins_volts value '" + v + "' is not an integer");
        }
        for (String ch : f.get("channels", "x:v").split(",")) {
            expect(ch.matches("[a-z][a-z0-9_]*:[a-z]+"), "channels entry '" + ch + "' is not kind:unit");
        }
        return "";
    }

    private void framing() {
        check("2", "a frame with a bad CRC is neither acted on nor answered", () -> {
            int bad = tag();
            byte[] b = FrameCodec.encode(Frame.text(Frame.COMMAND, bad, "PING"));
            b[b.length - 1] ^= 0x01;
            raw(b);
            Frame f = ask("PING");
            expect(f.type() == Frame.REPLY, describe(f));
            List<Frame> late = gather(200, x -> false, false);
            expect(late.stream().noneMatch(x -> x.tag() == bad), "answered the damaged frame");
            return "";
        });
        check("2", "a frame behind garbage and a stray sync byte is still found", () -> {
            raw(new byte[] {0x00, (byte) 0xA5, 0x11, (byte) 0xA5, (byte) 0xA5, 0x3C, 0x47});
            Frame f = ask("PING");
            expect(f.type() == Frame.REPLY, describe(f));
            return "";
        });
        check("2", "a length above 4096 makes the header damaged at once", () -> {
            raw(new byte[] {(byte) 0xA5, 0x3C, 0x43, 0x05, 0x01, 0x10});
            Frame f = ask("PING");
            expect(f.type() == Frame.REPLY, describe(f));
            return "";
        });
        check("2", "a damaged length does not make the rig wait for bytes that never come (frame timeout)", () -> {
            // a header that promises 4096 bytes, then only four: the rig must give the frame up and hear the next
            raw(new byte[] {(byte) 0xA5, 0x3C, 0x43, 0x05, 0x00, 0x10, 'P', 'I', 'N', 'G'});
            pause(FrameCodec.FRAME_TIMEOUT_MS + FrameCodec.INTER_BYTE_TIMEOUT_MS + 200);
            int t = tag();
            send(t, "PING");
            Frame f = await(t, REPLY_MS);
            if (f == null) {
                raw(new byte[FrameCodec.MAX_PAYLOAD_BYTES + FrameCodec.OVERHEAD_BYTES]); // fill the wait, resync
                fail("no answer to a PING sent " + (FrameCodec.FRAME_TIMEOUT_MS + 300)
                        + " ms after a header whose length promised 4096 bytes");
            }
            return "";
        });
    }

    private void grammar() {
        check("4.1", "an unknown command is refused with 1 UNKNOWN_COMMAND", () -> {
            expectError(ask("FROB 1"), 1);
            return "";
        });
        check("4.1", "command words are case-sensitive: 'ping' is 1 UNKNOWN_COMMAND", () -> {
            expectError(ask("ping"), 1);
            return "";
        });
        check("4.1", "an extra argument is refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("RES 1 2 3"), 2);
            return "";
        });
        check("4.1", "an unknown key is refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("RES 1 2 speed=1"), 2);
            return "";
        });
        check("4.1", "two spaces between words are refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("RES 1  2"), 2);
            return "";
        });
        check("4.1", "an integer argument written as a decimal ('2.0') is refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("RES 1 2.0"), 2);
            return "";
        });
        check("4.1", "a 4000-byte unknown command gets a short error that fits a frame", () -> {
            Frame f = ask("X".repeat(4000));
            expectError(f, 1);
            expect(f.payload().length <= 256, "error payload of " + f.payload().length + " bytes");
            expectReply(ask("PING"));
            return f.payload().length + " bytes";
        });
        check("4", "PING is answered OK", () -> {
            Frame f = ask("PING");
            expect(f.type() == Frame.REPLY && f.text().equals("OK"), describe(f));
            return "";
        });
        check("4", "RES is answered ohm=<number> or ohm=over", () -> {
            Fields f = expectReply(ask("RES 1 2"));
            String ohm = f.get("ohm", "");
            expect(ohm.equals("over") || CommandText.NUMBER.matcher(ohm).matches(), "ohm=" + ohm);
            return "ohm=" + ohm;
        });
        check("4", "RES to a position beyond the leads is refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("RES 1 " + (leads() + 1)), 2);
            return "";
        });
        check("4", "RES between a lead and itself is refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("RES 1 1"), 2);
            return "";
        });
    }

    private void duplicates() {
        check("2", "a retried command (same tag, same text) gets the same answer and is not done again", () -> {
            int t = tag();
            send(t, "RES 1 2");
            Frame a = await(t, REPLY_MS);
            expect(a != null, "no answer");
            send(t, "RES 1 2");
            Frame b = await(t, REPLY_MS);
            expect(b != null, "no answer to the retry");
            expect(Arrays.equals(a.payload(), b.payload()), "'" + a.text() + "' then '" + b.text() + "'");
            return "";
        });
    }

    private void insulation() {
        if (!measures().contains("ins")) {
            skip("4.2", "insulation arm, fire and dwell", "the rig does not list ins in measure=");
            return;
        }
        check("4.2", "INS FIRE without an arm is refused with 4 NOT_ARMED", () -> {
            expectError(ask("INS FIRE token=0000 seconds=1"), 4);
            return "";
        });
        check("4.2", "INS ARM at a voltage the rig does not offer is refused with 2 BAD_ARGUMENT", () -> {
            expectError(ask("INS ARM lead=1 volts=123"), 2);
            return "";
        });
        check("4.2", "a wrong token is refused with 4 NOT_ARMED and uses the arm up", () -> {
            String token = arm();
            expectError(ask("INS FIRE token=" + otherToken(token) + " seconds=1"), 4);
            expectError(ask("INS FIRE token=" + token + " seconds=1"), 4);
            return "";
        });
        check("4.2", "any other command between ARM and FIRE cancels the arm", () -> {
            String token = arm();
            ask("RES 1 2");
            expectError(ask("INS FIRE token=" + token + " seconds=1"), 4);
            return "";
        });
        check("4.2", "ARM then FIRE is answered ohm=, lead=, volts=, seconds=; a retry is answered again", () -> {
            String token = arm();
            int t = tag();
            String fire = "INS FIRE token=" + token + " seconds=1";
            send(t, fire);
            Frame f = await(t, 1000 + 5000);
            Fields r = expectReply(f);
            String ohm = r.get("ohm", "");
            expect(ohm.equals("over") || CommandText.NUMBER.matcher(ohm).matches(), "ohm=" + ohm);
            expect(r.get("lead", "").equals("1") && r.get("volts", "").equals(Integer.toString(testVolts()))
                    && r.has("seconds"), describe(f));
            send(t, fire);
            Frame again = await(t, REPLY_MS);
            expect(again != null && Arrays.equals(again.payload(), f.payload()), "the retry got "
                    + (again == null ? "no answer" : describe(again)));
            return "ohm=" + ohm;
        });
        dwellChecks("STOP");
        dwellChecks("SAFE");
    }

    /** Starts a dwell of a few seconds; null when the rig answered at once (it does not dwell in real time). */
    private int[] startDwell(int seconds) throws Exception {
        String token = arm();
        int t = tag();
        send(t, "INS FIRE token=" + token + " seconds=" + seconds);
        List<Frame> early = gather(300, x -> false, false);
        if (early.stream().anyMatch(x -> x.tag() == t)) {
            throw new Skip("the rig answered FIRE at once: it does not dwell in real time (sim: needs realtime=1)");
        }
        return new int[] {t};
    }

    private void dwellChecks(String how) {
        if (how.equals("STOP")) {
            check("4.3", "during the insulation dwell PING is answered OK busy", () -> {
                startDwell(3);
                int p = tag();
                send(p, "PING");
                Frame f = await(p, REPLY_MS);
                expect(f != null && f.type() == Frame.REPLY && f.text().equals("OK busy"), describe(f));
                return "";
            });
            check("4.3", "during the insulation dwell another command is refused with 3 BUSY", () -> {
                startDwell(3);
                expectError(ask("RES 1 2"), 3);
                return "";
            });
        }
        check("4.3", "STOP and SAFE end the dwell: " + how + " is answered OK safe, then FIRE 11 STOPPED", () -> {
            int fire = startDwell(3)[0];
            int s = tag();
            send(s, how);
            List<Frame> got = gather(2000, fs -> fs.stream().anyMatch(x -> x.tag() == fire), true);
            int iSafe = indexOf(got, x -> x.tag() == s);
            int iFire = indexOf(got, x -> x.tag() == fire);
            expect(iSafe >= 0 && got.get(iSafe).text().equals("OK safe"), "no OK safe to " + how);
            expect(iFire >= 0, "FIRE was not answered within 2 s of " + how);
            expectError(got.get(iFire), 11);
            expect(iSafe < iFire, "FIRE's answer came before the answer to " + how);
            return "";
        });
    }

    private void streams() {
        String cmd = streamCommand();
        if (cmd == null) {
            skip("6", "streams", "the rig lists none of emf, step, sweep in measure=");
            return;
        }
        check("6", "a stream has a header, blocks 0..B-1 with the stream's tag and an END complete", () -> {
            int t = tag();
            send(t, cmd);
            StreamRun run = runStream(t, HEADER_MS + 10_000);
            // the re-request and retry checks ask about this stream, even when it came out wrong
            lastStream = run;
            lastStreamCommand = cmd;
            lastStreamTag = t;
            run.verify(true);
            return run.blocks.size() + " blocks";
        }, false);
        check("6", "RESEND seq=n sends block n again, RESEND seq=B the END frame", () -> {
            need(lastStream != null, "no stream to ask again");
            Frame b0 = askFor("RESEND seq=0", lastStreamTag, REPLY_MS);
            expect(b0 != null && b0.type() == Frame.BLOCK && SampleBlock.decode(b0.payload()).seq() == 0,
                    "block 0 asked for again: " + describe(b0));
            Frame first = lastStream.block(0);
            expect(first == null || Arrays.equals(b0.payload(), first.payload()), "block 0 differs the second time");
            Frame end = askFor("RESEND seq=" + lastStream.spec.blocks(), lastStreamTag, REPLY_MS);
            expect(end != null && end.type() == Frame.END && (lastStream.end == null
                    || end.text().equals(lastStream.end.text())), "END: " + describe(end));
            return "";
        }, false);
        check("6", "a retried stream command is answered with its header again and not streamed again", () -> {
            need(lastStream != null && lastStream.header != null, "no stream to retry");
            send(lastStreamTag, lastStreamCommand);
            List<Frame> got = gather(600, x -> false, true);
            List<Frame> mine = got.stream().filter(x -> x.tag() == lastStreamTag).toList();
            expect(!mine.isEmpty() && mine.get(0).type() == Frame.REPLY
                    && mine.get(0).text().equals(lastStream.header.text()), "got " + describe(mine));
            expect(mine.stream().noneMatch(x -> x.type() == Frame.BLOCK || x.type() == Frame.END),
                    "the stream ran again");
            return "";
        });
        check("6", "a malformed RESEND or one beyond the stream is refused with 2 BAD_ARGUMENT", () -> {
            need(lastStream != null, "no stream to ask again");
            expectError(ask("RESEND seq=abc"), 2);
            expectError(ask("RESEND"), 2);
            expectError(ask("RESEND seq=" + (lastStream.spec.blocks() + 1)), 2);
            return "";
        });
        check("6", "during a stream PING is answered OK busy and other commands 3 BUSY", () -> {
            int t = tag();
            send(t, cmd);
            Frame header = await(t, HEADER_MS);
            expectReply(header);
            int p = tag();
            int r = tag();
            send(p, "PING");
            send(r, "RES 1 2");
            List<Frame> got = gather(HEADER_MS + 10_000, fs -> fs.stream().anyMatch(x -> x.type() == Frame.END
                    && x.tag() == t), true);
            got.addAll(gather(300, x -> false, true));
            int iEnd = indexOf(got, x -> x.type() == Frame.END && x.tag() == t);
            int iPing = indexOf(got, x -> x.tag() == p);
            int iRes = indexOf(got, x -> x.tag() == r);
            if (iEnd >= 0 && (iPing > iEnd || iRes > iEnd)) {
                throw new Skip("the stream ended before the rig read the PING: it does not stream in real time");
            }
            expect(iPing >= 0 && got.get(iPing).text().equals("OK busy"), "PING got " + at(got, iPing));
            expect(iRes >= 0 && isError(got.get(iRes), 3), "RES got " + at(got, iRes));
            expect(iEnd >= 0 && got.get(iEnd).text().contains("status=complete"), "the stream did not complete: "
                    + at(got, iEnd));
            return "";
        });
        check("6", "STOP during a stream: OK safe, then END status=stopped, then no more blocks", () ->
                stopMidStream(cmd, "STOP"));
        check("6", "SAFE during a stream: OK safe, then END status=stopped, then no more blocks", () ->
                stopMidStream(cmd, "SAFE"));
    }

    private String stopMidStream(String cmd, String how) throws Exception {
        int t = tag();
        send(t, cmd);
        Frame header = await(t, HEADER_MS);
        expectReply(header);
        StreamSpec spec = StreamSpec.decode(header.text());
        List<Frame> first = gather(3000, fs -> fs.stream().anyMatch(x -> x.tag() == t), true);
        if (first.stream().anyMatch(x -> x.type() == Frame.END && x.tag() == t)) {
            throw new Skip("the whole stream arrived before " + how + " could be sent: it does not stream in real "
                    + "time");
        }
        int s = tag();
        send(s, how);
        List<Frame> got = gather(3000, fs -> fs.stream().anyMatch(x -> x.type() == Frame.END && x.tag() == t),
                true);
        got.addAll(gather(300, x -> false, true));
        int iSafe = indexOf(got, x -> x.tag() == s);
        int iEnd = indexOf(got, x -> x.type() == Frame.END && x.tag() == t);
        expect(iSafe >= 0 && got.get(iSafe).text().equals("OK safe"), how + " got " + at(got, iSafe));
        expect(iEnd >= 0, "no END frame within 3 s of " + how);
        Fields end = Fields.parse(got.get(iEnd).text());
        if (end.get("status", "").equals("complete") && (iSafe < 0 || iSafe > iEnd)) {
            throw new Skip("the stream was over before the rig read " + how + ": it does not stream in real time");
        }
        expect(end.get("status", "").equals("stopped"), got.get(iEnd).text());
        expect(iSafe < iEnd, "END came before the answer to " + how);
        expect(end.get("blocks", "").equals(Integer.toString(spec.blocks()))
                && end.get("frames", "").equals(Integer.toString(spec.frames())), "END counts differ from the "
                + "header: " + got.get(iEnd).text());
        for (int i = iEnd + 1; i < got.size(); i++) {
            expect(!(got.get(i).type() == Frame.BLOCK && got.get(i).tag() == t), "a block after END");
        }
        return "sent=" + end.get("sent", "?") + " of " + spec.blocks();
    }

    private void watchdog() {
        int watchdogMs = integerCap("watchdog_ms", 2000);
        if (!measures().contains("sweep")) {
            skip("7", "the watchdog ends a stream when the host goes silent", "the rig does not sweep");
            return;
        }
        check("7", "a silent host trips the watchdog: E 8 WATCHDOG tag 0, then END status=watchdog", () -> {
            int t = tag();
            double seconds = Math.ceil(watchdogMs / 1000.0) + 3;
            send(t, "SWEEP from=10 to=20 seconds=" + StreamSpec.fmt(seconds) + " microsteps=1 rate_hz=500");
            // the rig may compute before it answers: keep it company until the header, then fall silent
            Frame header = await(t, HEADER_MS);
            expectReply(header);
            long silentFrom = lastSentNanos;
            List<Frame> got = gather(watchdogMs + 3000, fs -> fs.stream().anyMatch(x -> x.type() == Frame.END
                    && x.tag() == t), false);
            int iDog = indexOf(got, x -> x.tag() == 0 && isError(x, 8));
            int iEnd = indexOf(got, x -> x.type() == Frame.END && x.tag() == t);
            if (iEnd >= 0 && iDog < 0 && got.get(iEnd).text().contains("status=complete")) {
                throw new Skip("the sweep completed before the watchdog could trip: the rig does not stream in "
                        + "real time");
            }
            expect(iDog >= 0, "no watchdog error within " + (watchdogMs + 3000) + " ms of silence");
            expect(iEnd >= 0 && got.get(iEnd).text().contains("status=watchdog"), "END: " + at(got, iEnd));
            expect(iDog < iEnd, "END came before the watchdog error");
            long ms = (dogNanos - silentFrom) / 1_000_000L;
            expect(ms >= watchdogMs * 9L / 10, "tripped " + ms + " ms after the host's last frame, before "
                    + watchdogMs + " ms");
            return "tripped after " + ms + " ms of silence";
        });
    }

    private void slow() {
        if (!measures().contains("ins")) {
            return;
        }
        check("4.2", "FIRE after the arm's expires_ms is refused with 5 ARM_EXPIRED", () -> {
            int t = tag();
            send(t, "INS ARM lead=1 volts=" + testVolts());
            Fields a = expectReply(await(t, REPLY_MS));
            long expires = Long.parseLong(a.get("expires_ms", "10000"));
            pinging(expires + 500);
            expectError(ask("INS FIRE token=" + a.get("token", "") + " seconds=1"), 5);
            return "";
        });
        check("7", "a silent host during the dwell trips the watchdog: E 8 tag 0, then FIRE 11 STOPPED", () -> {
            int watchdogMs = integerCap("watchdog_ms", 2000);
            int fire = startDwell((int) Math.ceil(watchdogMs / 1000.0) + 3)[0];
            List<Frame> got = gather(watchdogMs + 3000, fs -> fs.stream().anyMatch(x -> x.tag() == fire), false);
            int iDog = indexOf(got, x -> x.tag() == 0 && isError(x, 8));
            int iFire = indexOf(got, x -> x.tag() == fire);
            expect(iDog >= 0, "no watchdog error");
            expect(iFire >= 0 && isError(got.get(iFire), 11), "FIRE got " + at(got, iFire));
            expect(iDog < iFire, "FIRE's answer came before the watchdog error");
            return "";
        });
    }

    private String secondHost() throws Exception {
        if (!networked) {
            throw new Skip("only a rig on the network (tcp:) can be reached by two hosts at once");
        }
        try (Transport other = connector.open()) {
            FrameReader r = new FrameReader(other);
            other.write(FrameCodec.encode(Frame.text(Frame.COMMAND, 1, "HELLO 1")));
            Frame f = r.next(REPLY_MS);
            expect(f != null, "no answer within " + REPLY_MS + " ms");
            expect(f.tag() == 0 && isError(f, 3), describe(f));
        } catch (EOFException e) {
            fail("the rig hung up without saying BUSY");
        }
        expectReply(ask("PING")); // the first session still stands
        return "";
    }

    // ---- a stream, received whole ----

    private final class StreamRun {
        Frame header;
        StreamSpec spec;
        final List<Frame> blocks = new ArrayList<>();
        Frame end;
        final List<String> problems = new ArrayList<>();

        /** The block with sequence number {@code seq} as first received, or null. */
        Frame block(int seq) throws RigException {
            for (Frame f : blocks) {
                if (SampleBlock.decode(f.payload()).seq() == seq) {
                    return f;
                }
            }
            return null;
        }

        void verify(boolean complete) throws Failure {
            expect(problems.isEmpty(), String.join("; ", problems));
            expect(end != null, "no END frame");
            Fields e = Fields.parse(end.text());
            expect(e.word(0).equals("END"), "end frame '" + end.text() + "'");
            if (complete) {
                expect(e.get("status", "").equals("complete"), end.text());
                expect(blocks.size() == spec.blocks(), blocks.size() + " of " + spec.blocks() + " blocks");
            }
            expect(e.get("blocks", "").equals(Integer.toString(spec.blocks()))
                    && e.get("frames", "").equals(Integer.toString(spec.frames())), "END counts: " + end.text());
        }
    }

    private StreamRun runStream(int t, int ms) throws Exception {
        StreamRun run = new StreamRun();
        run.header = await(t, HEADER_MS);
        expectReply(run.header);
        try {
            run.spec = StreamSpec.decode(run.header.text());
        } catch (RigException e) {
            fail("stream header: " + e.getMessage());
        }
        List<Frame> got = gather(ms, fs -> fs.stream().anyMatch(x -> x.type() == Frame.END && x.tag() == t), true);
        for (Frame f : got) {
            if (f.type() == Frame.BLOCK) {
                if (f.tag() != t) {
                    run.problems.add("a block with tag " + f.tag() + " instead of " + t);
                    continue;
                }
                try {
                    SampleBlock b = SampleBlock.decode(f.payload());
                    if (b.seq() != run.blocks.size()) {
                        run.problems.add("block " + b.seq() + " where " + run.blocks.size() + " was due");
                    }
                    if (b.frames() != run.spec.framesIn(Math.min(b.seq(), run.spec.blocks() - 1))
                            || b.channels() != run.spec.channels().size()) {
                        run.problems.add("block " + b.seq() + " holds " + b.frames() + " x " + b.channels());
                    }
                } catch (RuntimeException | RigException e) {
                    run.problems.add("block payload: " + e.getMessage());
                }
                run.blocks.add(f);
            } else if (f.type() == Frame.END && f.tag() == t) {
                run.end = f;
            }
        }
        return run;
    }

    // ---- line machinery ----

    /** Runs one check and records its row; a check that breaks the line gets a fresh session for the next. */
    private void check(String section, String name, Body body) {
        check(section, name, body, true);
    }

    /**
     * @param settleAfter false where the next check needs the rig exactly as this one left it (a retry must follow
     *                    its command with nothing but PING or RESEND between)
     */
    private void check(String section, String name, Body body, boolean settleAfter) {
        step.accept(name);
        try {
            if (line == null) {
                open();
                hello();
            }
            String detail = body.run();
            checks.add(new Check(section, name, Verdict.PASS, detail == null ? "" : detail));
        } catch (Skip s) {
            checks.add(new Check(section, name, Verdict.SKIP, s.getMessage()));
        } catch (Failure f) {
            checks.add(new Check(section, name, Verdict.FAIL, f.getMessage()));
        } catch (Exception e) {
            checks.add(new Check(section, name, Verdict.FAIL, "line: " + e.getMessage()));
            closeQuietly();
        }
        if (settleAfter) {
            settle();
        }
    }

    private void skip(String section, String name, String why) {
        checks.add(new Check(section, name, Verdict.SKIP, why));
    }

    /** Between checks: everything off, and the line quiet. */
    private void settle() {
        if (line == null) {
            return;
        }
        try {
            int t = tag();
            send(t, "SAFE");
            await(t, REPLY_MS);
            gather(100, x -> false, false);
        } catch (Exception e) {
            closeQuietly();
        }
    }

    private void open() throws RigException {
        line = connector.open();
        reader = new FrameReader(line);
    }

    private void hello() throws Exception {
        Frame f = ask("HELLO 1 minor=1");
        if (f.type() != Frame.REPLY) {
            throw new Failure("could not start a session: " + describe(f));
        }
    }

    private void closeQuietly() {
        if (line != null) {
            try {
                int t = tag();
                send(t, "BYE");
                await(t, 300);
            } catch (Exception ignored) {
                // closing anyway
            }
            try {
                line.close();
            } catch (IOException ignored) {
                // closing anyway
            }
        }
        line = null;
    }

    private int tag() {
        int t = nextTag;
        nextTag = nextTag == 255 ? 1 : nextTag + 1;
        return t;
    }

    private void send(int tag, String text) throws IOException {
        raw(FrameCodec.encode(Frame.text(Frame.COMMAND, tag, text)));
    }

    private void raw(byte[] b) throws IOException {
        line.write(b);
        lastSentNanos = System.nanoTime();
    }

    /** Sends a command with a fresh tag and returns the frame answering it; fails after the reply timeout. */
    private Frame ask(String text) throws Exception {
        int t = tag();
        send(t, text);
        Frame f = await(t, REPLY_MS);
        if (f == null) {
            throw new Failure("no answer to '" + CommandText.echo(text) + "' within " + REPLY_MS + " ms");
        }
        return f;
    }

    /** Sends a command and returns the first frame with {@code tag} (a RESEND is answered with the stream's tag). */
    private Frame askFor(String text, int tag, int ms) throws Exception {
        send(tag(), text);
        List<Frame> got = gather(ms, fs -> fs.stream().anyMatch(x -> x.tag() == tag), true);
        int i = indexOf(got, x -> x.tag() == tag);
        return i < 0 ? null : got.get(i);
    }

    /** The first frame tagged {@code tag} within {@code ms}, keeping the rig's watchdog fed; null if none. */
    private Frame await(int tag, int ms) throws IOException {
        List<Frame> got = gather(ms, fs -> fs.stream().anyMatch(x -> x.tag() == tag), true);
        int i = indexOf(got, x -> x.tag() == tag);
        return i < 0 ? null : got.get(i);
    }

    /** Frames until {@code done} holds or {@code ms} pass; with {@code ping}, a PING (tag 0) every 400 ms. */
    private List<Frame> gather(int ms, Predicate<List<Frame>> done, boolean ping) throws IOException {
        List<Frame> got = new ArrayList<>();
        long deadline = System.nanoTime() + ms * 1_000_000L;
        while (true) {
            long left = (deadline - System.nanoTime()) / 1_000_000L;
            if (left <= 0) {
                return got;
            }
            if (ping && System.nanoTime() - lastSentNanos > 400_000_000L) {
                send(0, "PING");
            }
            Frame f = reader.next((int) Math.min(left, 50));
            if (f == null) {
                continue;
            }
            if (f.tag() == 0 && f.type() == Frame.REPLY && ping) {
                continue; // answers to the kit's own keep-alive
            }
            if (f.tag() == 0 && isError(f, 8)) {
                dogNanos = System.nanoTime();
            }
            got.add(f);
            if (done.test(got)) {
                return got;
            }
        }
    }

    private void pinging(long ms) throws IOException {
        gather((int) ms, x -> false, true);
    }

    private static void pause(long ms) throws InterruptedException {
        Thread.sleep(ms);
    }

    private String arm() throws Exception {
        Fields a = expectReply(ask("INS ARM lead=1 volts=" + testVolts()));
        String token = a.get("token", "");
        expect(token.matches("[0-9A-F]{4}"), "token=" + token + " is not 4 upper-case hex digits");
        return token;
    }

    private static String otherToken(String token) {
        return token.equals("0000") ? "0001" : "0000";
    }

    private int testVolts() {
        int lowest = Integer.MAX_VALUE;
        for (String v : caps.getOrDefault("ins_volts", "100").split(",")) {
            try {
                lowest = Math.min(lowest, Integer.parseInt(v));
            } catch (NumberFormatException ignored) {
                // reported by the CAPS check
            }
        }
        return lowest == Integer.MAX_VALUE ? 100 : lowest;
    }

    private List<String> measures() {
        return List.of(caps.getOrDefault("measure", "").split(","));
    }

    private int leads() {
        return integerCap("leads", 2);
    }

    private int integerCap(String key, int fallback) {
        try {
            return Integer.parseInt(caps.getOrDefault(key, ""));
        } catch (NumberFormatException e) {
            return fallback;
        }
    }

    /** A short stream that switches nothing on if the rig can: back-EMF, else a small step, else a slow sweep. */
    private String streamCommand() {
        List<String> m = measures();
        if (m.contains("emf")) {
            return "EMF pairs=1-2 seconds=1.5 rate_hz=2000";
        }
        if (m.contains("step")) {
            return "STEP 1 2 volts=0.5 ms=500 rate_hz=4000";
        }
        if (m.contains("sweep")) {
            return "SWEEP from=10 to=20 seconds=1.5 microsteps=1 rate_hz=2000";
        }
        return null;
    }

    // ---- verdict helpers ----

    @FunctionalInterface
    private interface Body {
        String run() throws Exception;
    }

    private static final class Failure extends Exception {
        private static final long serialVersionUID = 1L;

        Failure(String m) {
            super(m);
        }
    }

    private static final class Skip extends Exception {
        private static final long serialVersionUID = 1L;

        Skip(String m) {
            super(m);
        }
    }

    private static void expect(boolean ok, String otherwise) throws Failure {
        if (!ok) {
            throw new Failure(otherwise);
        }
    }

    private static void need(boolean ok, String otherwise) throws Skip {
        if (!ok) {
            throw new Skip(otherwise);
        }
    }

    private static void fail(String m) throws Failure {
        throw new Failure(m);
    }

    private static boolean isError(Frame f, int code) {
        return f != null && f.type() == Frame.ERROR && f.text().startsWith(code + " ");
    }

    private static void expectError(Frame f, int code) throws Failure {
        expect(isError(f, code), "expected E " + code + " " + RigError.of(code).name() + ", got " + describe(f));
    }

    private static Fields expectReply(Frame f) throws Failure {
        expect(f != null && f.type() == Frame.REPLY && f.text().startsWith("OK"), "expected R OK..., got "
                + describe(f));
        return Fields.parse(f.text());
    }

    private static String describe(Frame f) {
        if (f == null) {
            return "nothing";
        }
        String s = f.toString();
        return s.length() <= 80 ? s : s.substring(0, 77) + "...";
    }

    private static String describe(List<Frame> fs) {
        return fs.isEmpty() ? "nothing" : describe(fs.get(0)) + (fs.size() > 1 ? " and " + (fs.size() - 1) + " more"
                : "");
    }

    private static String at(List<Frame> fs, int i) {
        return i < 0 ? "nothing" : describe(fs.get(i));
    }

    private static int indexOf(List<Frame> fs, Predicate<Frame> p) {
        for (int i = 0; i < fs.size(); i++) {
            if (p.test(fs.get(i))) {
                return i;
            }
        }
        return -1;
    }
}
