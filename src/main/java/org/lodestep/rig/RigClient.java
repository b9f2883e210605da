package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

import org.lodestep.sample.Channel;
import org.lodestep.wiring.InsulationReading;

import java.io.Closeable;
import java.io.EOFException;
import java.io.IOException;
import java.time.Instant;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The host side of {@code firmware-protocol.md}: handshake, measurements and streams, with timeouts, retries,
 * re-requests of damaged blocks and keep-alive pings. On any failure it tells the rig to switch everything off
 * before it reports the error; a stream with a block missing is never returned.
 */
public final class RigClient implements Closeable {

    /**
     * Timing and retry policy.
     *
     * @param replyTimeoutMs how long to wait for an answer (or for the next block of a stream) before retrying, ms
     * @param attempts       tries per command, and requests per missing block, before giving up
     * @param keepaliveMs    interval of the host's PING while it waits, ms (well inside the rig's watchdog)
     */
    public record Settings(int replyTimeoutMs, int attempts, int keepaliveMs) {
        public static final Settings DEFAULT = new Settings(1000, 4, 500);

        public Settings {
            if (replyTimeoutMs < 1 || attempts < 1 || keepaliveMs < 1) {
                throw new IllegalArgumentException("timeouts (ms) and attempts must be positive");
            }
        }
    }

    /** Called as stream blocks arrive. */
    @FunctionalInterface
    public interface Progress {
        void frames(long received, long total);

        Progress NONE = (r, t) -> { };
    }

    /**
     * Hears a stream's samples in order while it arrives (a block re-sent after damage holds back the ones after it
     * until it comes), for a live view; the capture returned at the end is still the only complete record.
     */
    public interface Samples {
        /** The stream's channels and sample rate, before the first samples. */
        void started(List<Channel> channels, double sampleRateHz);

        /** The next {@code samples[c].length} frames of every channel, in the channels' units. */
        void frames(double[][] samples);

        Samples NONE = new Samples() {
            @Override
            public void started(List<Channel> channels, double sampleRateHz) {
            }

            @Override
            public void frames(double[][] samples) {
            }
        };
    }

    /** Counters of line trouble seen so far. */
    public record Stats(long damagedFrames, long resendRequests, long commandRetries, long bytesReceived) {
    }

    private final Transport transport;
    private final FrameReader reader;
    private final Settings settings;
    private final RigInfo info;
    private int nextTag = 1;
    private long lastSendNanos;
    private long resendRequests;
    private long commandRetries;
    private int protocolMinor;
    /** Samples at full scale per channel, from the last stream's end frame ({@code clipped=name:count,...}). */
    private String lastClipped = "";
    /** The END frame's {@code revolutions} of the last stream (a rig that knows the shaft angle states it), or "". */
    private String lastRevolutions = "";

    private RigClient(Transport transport, Settings settings) throws RigException {
        this.transport = transport;
        this.reader = new FrameReader(transport);
        this.settings = settings;
        this.info = handshake();
    }

    /** Opens an address (see {@link Transports#open}) and performs the handshake. */
    public static RigClient open(String address) throws RigException {
        return connect(Transports.open(address), Settings.DEFAULT);
    }

    /** Performs the handshake on an open transport; closes it if the handshake fails. */
    public static RigClient connect(Transport transport, Settings settings) throws RigException {
        try {
            return new RigClient(transport, settings);
        } catch (RigException | RuntimeException e) {
            try {
                transport.close();
            } catch (IOException ignored) {
                // reporting the first failure
            }
            throw e;
        }
    }

    public RigInfo info() {
        return info;
    }

    /** The protocol revision both sides speak: 1 for 1.1, 0 for a 1.0 rig. */
    public int protocolMinor() {
        return protocolMinor;
    }

    public Stats stats() {
        return new Stats(reader.damagedFrames(), resendRequests, commandRetries, reader.bytesRead());
    }

    private RigInfo handshake() throws RigException {
        // minor= tells a 1.1 rig what this host speaks; a 1.0 rig ignores it and answers without minor=
        Fields hello;
        try {
            hello = Fields.parse(command("HELLO " + VirtualRig.PROTOCOL_VERSION + " minor="
                    + VirtualRig.PROTOCOL_MINOR, settings.replyTimeoutMs()).text());
        } catch (RigRefusedException e) {
            if (e.error() != RigError.BAD_ARGUMENT) {
                throw e;
            }
            // a strict 1.0 rig that refuses the unknown key: speak plain 1.0 to it
            hello = Fields.parse(command("HELLO " + VirtualRig.PROTOCOL_VERSION, settings.replyTimeoutMs()).text());
        }
        try {
            protocolMinor = Math.min(VirtualRig.PROTOCOL_MINOR, Integer.parseInt(hello.get("minor", "0")));
        } catch (NumberFormatException e) {
            protocolMinor = 0;
        }
        Fields caps = Fields.parse(command("CAPS", settings.replyTimeoutMs()).text());
        String labels = caps.get("labels", "");
        return new RigInfo(transport.address(), hello.integer("proto"), hello.get("rig", "?"), hello.get("fw", "?"),
                hello.get("id", "?"), caps.integer("leads"), labels.isEmpty() ? List.of() : List.of(labels.split(",")),
                List.of(caps.get("measure", "").split(",")), caps.values());
    }

    /** Four-wire resistance between two relay positions (1-based). */
    public ResistanceReading resistance(int leadA, int leadB) throws RigException {
        Fields f = Fields.parse(command("RES " + leadA + " " + leadB, settings.replyTimeoutMs()).text());
        String ohm = f.get("ohm");
        return new ResistanceReading(leadA, leadB, ohm.equals("over") ? Double.POSITIVE_INFINITY : f.number("ohm"));
    }

    /**
     * Insulation resistance from one lead to the frame: arms the tester, then fires within the arm's validity.
     * The caller must have shown the caution and had it confirmed; this method is the confirmation. The reading is
     * labelled {@code <position>-frame}.
     */
    public InsulationReading insulation(int lead, int testVolts, double seconds) throws RigException {
        Fields arm = Fields.parse(command("INS ARM lead=" + lead + " volts=" + testVolts,
                settings.replyTimeoutMs()).text());
        String token = arm.get("token");
        Fields r = Fields.parse(command("INS FIRE token=" + token + " seconds=" + StreamSpec.fmt(seconds),
                (int) (seconds * 1000) + settings.replyTimeoutMs() * 5).text());
        String ohm = r.get("ohm");
        return new InsulationReading(lead + "-frame", ohm.equals("over") ? Double.POSITIVE_INFINITY : r.number("ohm"),
                testVolts);
    }

    /** A coil current step response between two positions: channels current (A) and voltage (V). */
    public RigCapture stepResponse(int leadA, int leadB, double volts, double ms, double rateHz, Progress p)
            throws RigException {
        return stream("step-response", String.format(java.util.Locale.ROOT, "STEP %d %d volts=%s ms=%s rate_hz=%s",
                leadA, leadB, StreamSpec.fmt(volts), StreamSpec.fmt(ms), StreamSpec.fmt(rateHz)), ms / 1000, p);
    }

    /** Back-EMF of lead pairs ({a, b}: V(a) − V(b)) while the shaft is turned by hand: channels emf_a_b (V). */
    public RigCapture backEmf(List<int[]> pairs, double seconds, double rateHz, Progress p) throws RigException {
        StringBuilder b = new StringBuilder();
        for (int[] pair : pairs) {
            b.append(b.length() == 0 ? "" : ",").append(pair[0]).append('-').append(pair[1]);
        }
        return stream("back-emf", "EMF pairs=" + b + " seconds=" + StreamSpec.fmt(seconds) + " rate_hz="
                + StreamSpec.fmt(rateHz), seconds, p);
    }

    /** A step-rate sweep of the user's driver: channels accel (g), current (A, phase A), step (V). */
    public RigCapture sweep(SweepPlan profile, Progress p) throws RigException {
        return sweep(profile, p, Samples.NONE);
    }

    /** As {@link #sweep(SweepPlan, Progress)}, with the samples heard as they arrive. */
    public RigCapture sweep(SweepPlan profile, Progress p, Samples live) throws RigException {
        return stream("sweep", "SWEEP from=" + StreamSpec.fmt(profile.fromFullStepsPerS()) + " to="
                + StreamSpec.fmt(profile.toFullStepsPerS()) + " seconds=" + StreamSpec.fmt(profile.seconds())
                + " microsteps=" + profile.microsteps() + " rate_hz=" + StreamSpec.fmt(profile.sampleRateHz()),
                profile.seconds(), p, live);
    }

    /**
     * A step-rate sweep through the rig's own drive of the given mode ({@code voltage}: constant-voltage H-bridge,
     * {@code chopper}: current-regulating), with the supply stated or 0 for the rig's default: channels accel (g),
     * current_a and current_b (phase currents, A), step (V).
     */
    public RigCapture sweep(SweepPlan profile, DriveMode drive, double supplyV, Progress p) throws RigException {
        return sweep(profile, drive, supplyV, p, Samples.NONE);
    }

    /** As {@link #sweep(SweepPlan, DriveMode, double, Progress)}, with the samples heard as they arrive. */
    public RigCapture sweep(SweepPlan profile, DriveMode drive, double supplyV, Progress p, Samples live)
            throws RigException {
        String mode = drive == DriveMode.CONSTANT_VOLTAGE ? "voltage" : "chopper";
        return stream("sweep", "SWEEP from=" + StreamSpec.fmt(profile.fromFullStepsPerS()) + " to="
                + StreamSpec.fmt(profile.toFullStepsPerS()) + " seconds=" + StreamSpec.fmt(profile.seconds())
                + " microsteps=" + profile.microsteps() + " rate_hz=" + StreamSpec.fmt(profile.sampleRateHz())
                + " drive=" + mode + (supplyV > 0 ? " supply_v=" + StreamSpec.fmt(supplyV) : ""),
                profile.seconds(), p, live);
    }

    /** Tells the rig to switch every output off. */
    public void safe() throws RigException {
        command("SAFE", settings.replyTimeoutMs());
    }

    /** Ends the session politely (the rig switches everything off) and closes the line. */
    @Override
    public void close() {
        try {
            int t = tag();
            send(Frame.text(Frame.COMMAND, t, "BYE"));
            // wait for the answer to BYE itself: a stream's end frame or a ping reply may still be on the line, and
            // closing a serial port can discard bytes not yet sent
            long deadline = System.nanoTime() + Math.min(1000, settings.replyTimeoutMs()) * 1_000_000L;
            while (System.nanoTime() < deadline) {
                Frame f = reader.next(50);
                if (f != null && f.tag() == t) {
                    break;
                }
            }
        } catch (IOException | RuntimeException ignored) {
            // closing anyway
        }
        try {
            transport.close();
        } catch (IOException ignored) {
            // nothing more to do
        }
    }

    // ---- protocol machinery ----

    private int tag() {
        int t = nextTag;
        nextTag = nextTag == 255 ? 1 : nextTag + 1; // tag 0 is for keep-alive pings
        return t;
    }

    private void send(Frame f) throws IOException {
        transport.write(FrameCodec.encode(f));
        lastSendNanos = System.nanoTime();
    }

    private void keepalive() throws IOException {
        if (System.nanoTime() - lastSendNanos > settings.keepaliveMs() * 1_000_000L) {
            send(Frame.text(Frame.COMMAND, 0, "PING"));
        }
    }

    /** Sends a command and returns its reply, retrying on silence or damage; an error frame throws. */
    private Frame command(String text, int timeoutMs) throws RigException {
        int tag = tag();
        Frame cmd = Frame.text(Frame.COMMAND, tag, text);
        try {
            for (int attempt = 1; attempt <= settings.attempts(); attempt++) {
                if (attempt > 1) {
                    commandRetries++;
                }
                send(cmd);
                long deadline = System.nanoTime() + timeoutMs * 1_000_000L;
                while (true) {
                    long left = (deadline - System.nanoTime()) / 1_000_000L;
                    if (left <= 0) {
                        break;
                    }
                    Frame f = reader.next((int) Math.min(left, settings.keepaliveMs()));
                    keepalive();
                    if (f == null || f.tag() != tag) {
                        if (f != null && f.type() == Frame.ERROR && f.tag() == 0) {
                            throw refused(text, f);
                        }
                        continue;
                    }
                    if (f.type() == Frame.REPLY) {
                        return f;
                    }
                    if (f.type() == Frame.ERROR) {
                        throw refused(text, f);
                    }
                }
            }
        } catch (EOFException e) {
            throw failSafe(transport.address() + ": the line closed while waiting for the answer to '" + text + "'", e);
        } catch (IOException e) {
            throw failSafe(transport.address() + ": " + e.getMessage() + " while sending '" + text + "'", e);
        }
        throw failSafe("no answer from the rig at " + transport.address() + " to '" + text + "' after "
                + settings.attempts() + " attempts of " + timeoutMs + " ms", null);
    }

    private RigRefusedException refused(String command, Frame f) {
        String t = f.text();
        int sp = t.indexOf(' ');
        RigError e = RigError.HARDWARE;
        try {
            e = RigError.of(Integer.parseInt(sp < 0 ? t : t.substring(0, sp)));
        } catch (NumberFormatException ignored) {
            // keep HARDWARE
        }
        RigRefusedException ex = new RigRefusedException("rig refused '" + command + "': " + t, e);
        safeQuietly();
        return ex;
    }

    /** Best effort: ask the rig to switch off, then build the exception to throw. */
    private RigException failSafe(String message, Throwable cause) {
        safeQuietly();
        return cause == null ? new RigException(message + "; outputs switched off")
                : new RigException(message + "; outputs switched off", cause);
    }

    private void safeQuietly() {
        try {
            int t = tag();
            send(Frame.text(Frame.COMMAND, t, "SAFE"));
            long deadline = System.nanoTime() + 300_000_000L;
            while (System.nanoTime() < deadline) {
                Frame f = reader.next(50);
                if (f != null && f.tag() == t) {
                    return;
                }
            }
        } catch (IOException | RuntimeException ignored) {
            // the line is gone: the rig's watchdog switches it off
        }
    }

    private RigCapture stream(String kind, String text, double seconds, Progress progress) throws RigException {
        return stream(kind, text, seconds, progress, Samples.NONE);
    }

    private RigCapture stream(String kind, String text, double seconds, Progress progress, Samples live)
            throws RigException {
        String started = Instant.now().toString();
        long bytes0 = reader.bytesRead();
        // the virtual rig computes a record before it answers; a real one answers at once and streams in real time
        Frame header = command(text, (int) Math.min(Integer.MAX_VALUE / 2, seconds * 1000 * 2
                + settings.replyTimeoutMs()));
        StreamSpec spec = StreamSpec.decode(header.text());
        lastClipped = "";
        lastRevolutions = "";
        BlockCollector blocks = new BlockCollector(spec);
        live.started(spec.channels(), spec.rateHz());
        try {
            receive(kind, text, header.tag(), blocks, progress, live);
        } catch (EOFException e) {
            throw failSafe(transport.address() + ": the line closed during the " + kind + " stream after "
                    + blocks.have() + " of " + blocks.blocks() + " blocks; capture discarded", e);
        } catch (IOException e) {
            throw failSafe(transport.address() + ": " + e.getMessage() + " during the " + kind + " stream; capture "
                    + "discarded", e);
        } catch (RigRefusedException e) {
            throw e;
        } catch (RigException e) {
            throw failSafe(e.getMessage() + "; capture discarded", null);
        }
        return new RigCapture(kind, transport.address(), spec.channels(), spec.rateHz(), blocks.samples(),
                provenance(kind, text, started), reader.bytesRead() - bytes0,
                2L * spec.channels().size() * spec.frames());
    }

    /** Receives blocks until every one is present, asking again for damaged or lost ones. */
    private void receive(String kind, String text, int tag, BlockCollector blocks, Progress progress, Samples live)
            throws IOException, RigException {
        int heard = 0;
        Map<Integer, Integer> resendTags = new HashMap<>();
        int waitMs = Math.min(settings.replyTimeoutMs(), settings.keepaliveMs());
        int idleMs = 0;
        int highest = -1;
        boolean ended = false;
        progress.frames(0, blocks.totalFrames());
        while (!blocks.complete()) {
            Frame f = reader.next(waitMs);
            keepalive();
            if (f == null) {
                idleMs += waitMs;
                if (idleMs >= settings.replyTimeoutMs()) {
                    idleMs = 0;
                    // silence: ask again for what is missing, oldest first; before the end, only up to the next
                    // block due, since a rig streaming in real time may simply not have sampled the rest yet
                    for (int s : blocks.missing(32)) {
                        if (ended || s <= highest + 1) {
                            request(s, blocks, kind, resendTags);
                        }
                    }
                }
                continue;
            }
            if (f.type() == Frame.ERROR && resendTags.containsKey(f.tag()) && f.text().startsWith(
                    RigError.BLOCK_GONE.code() + " ") && !ended && resendTags.get(f.tag()) > highest) {
                // not sent yet (section 6): not a lost block; it will come, or be asked for again
                blocks.forgetRequest(resendTags.remove(f.tag()));
                continue;
            }
            if (f.type() == Frame.ERROR && (f.tag() == 0 || f.tag() == tag || resendTags.containsKey(f.tag()))) {
                throw refused(text, f);
            }
            if (f.tag() != tag) {
                continue; // ping replies; a re-sent block carries the stream's tag, not the request's
            }
            if (f.type() == Frame.END) {
                ended = true;
                lastClipped = Fields.parse(f.text()).get("clipped", "");
                lastRevolutions = Fields.parse(f.text()).get("revolutions", "");
                if (!Fields.parse(f.text()).get("status", "").equals("complete")) {
                    throw new RigException("the rig ended the " + kind + " stream early (" + f.text() + ") after "
                            + blocks.have() + " of " + blocks.blocks() + " blocks");
                }
                for (int s : blocks.unrequestedBefore(blocks.blocks())) {
                    request(s, blocks, kind, resendTags);
                }
            } else if (f.type() == Frame.BLOCK) {
                SampleBlock b = SampleBlock.decode(f.payload());
                idleMs = 0;
                highest = Math.max(highest, b.seq());
                if (blocks.accept(b)) {
                    progress.frames(blocks.framesReceived(), blocks.totalFrames());
                    for (; heard < blocks.contiguous(); heard++) {
                        live.frames(blocks.block(heard));
                    }
                }
                // a gap before this block means damaged or lost blocks: ask for each once now
                for (int s : blocks.unrequestedBefore(b.seq())) {
                    request(s, blocks, kind, resendTags);
                }
            }
        }
        // The END frame follows the last block (section 6) and carries what the rig knows only at the end (clipped
        // samples, the revolutions of a back-EMF record): wait for it briefly; the samples are complete either way.
        long deadline = System.nanoTime() + settings.replyTimeoutMs() * 1_000_000L;
        while (!ended && System.nanoTime() < deadline) {
            Frame f = reader.next(waitMs);
            if (f != null && f.tag() == tag && f.type() == Frame.END) {
                ended = true;
                lastClipped = Fields.parse(f.text()).get("clipped", "");
                lastRevolutions = Fields.parse(f.text()).get("revolutions", "");
            }
        }
    }

    private Map<String, String> provenance(String kind, String command, String started) {
        Map<String, String> meta = new LinkedHashMap<>();
        meta.put("kind", kind);
        meta.put("rig", info.rig());
        meta.put("rig_id", info.id());
        meta.put("firmware", info.firmware());
        meta.put("protocol", Integer.toString(info.protocolVersion()));
        meta.put("address", transport.address());
        meta.put("command", command);
        String scenario = info.capability("scenario", "");
        if (!scenario.isEmpty()) {
            meta.put("scenario", scenario);
        }
        String serial = info.capability("motor_serial", "");
        if (!serial.isEmpty()) {
            meta.put("motor_serial", serial);
        }
        if (!lastClipped.isEmpty()) {
            // samples at full scale: the true value is beyond the range, so peaks there are lower bounds
            meta.put("clipped_samples", lastClipped);
        }
        if (!lastRevolutions.isEmpty()) {
            // mechanical revolutions during a back-EMF record, from a rig that knows the shaft angle
            meta.put("revolutions", lastRevolutions);
        }
        meta.put("started_utc", started);
        meta.put("finished_utc", Instant.now().toString());
        return meta;
    }

    private void request(int seq, BlockCollector blocks, String kind, Map<Integer, Integer> resendTags)
            throws IOException {
        if (blocks.requests(seq) >= settings.attempts()) {
            throw new IOException("block " + seq + " of the " + kind + " stream still damaged or missing after "
                    + settings.attempts() + " requests (" + blocks.have() + " of " + blocks.blocks()
                    + " blocks intact)");
        }
        blocks.noteRequest(seq);
        resendRequests++;
        int t = tag();
        resendTags.put(t, seq);
        send(Frame.text(Frame.COMMAND, t, "RESEND seq=" + seq));
    }
}
