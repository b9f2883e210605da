package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

import java.io.EOFException;
import java.io.IOException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Random;

import org.lodestep.sample.Channel;

/**
 * The firmware side of {@code firmware-protocol.md} running on a {@link BenchMotor}: what {@code sim:} addresses and
 * {@code lodestep rig serve} talk to. One instance serves one host session on one transport.
 *
 * <p>Deviations from a real rig: measurements take no real time (an insulation dwell or a sweep is computed, not
 * waited for) unless {@code realTime} is set, in which case sample blocks leave no faster than they were sampled.
 */
public final class VirtualRig implements Runnable {
    /** Protocol version spoken. */
    static final int PROTOCOL_VERSION = 1;
    /** Minor revision of the protocol implemented (1.1), stated in the HELLO answer. */
    static final int PROTOCOL_MINOR = 1;
    /** A connection that has not completed HELLO this long after it opened is closed, ms (section 3). */
    static final int HELLO_TIMEOUT_MS = 2000;
    /** A session with no intact frame from the host this long is closed, ms (section 3). */
    static final int IDLE_MS = 30_000;
    /** Longest error text after the code and name, characters: an error frame always fits. */
    static final int ERROR_TEXT_CHARS = 200;
    static final String FIRMWARE = "0.1.0";
    /** Silence after which every output is switched off, ms. */
    static final int WATCHDOG_MS = 2000;
    /** How long an insulation arm stays valid, ms. */
    static final int ARM_VALID_MS = 10_000;
    static final int MAX_RATE_HZ = 50_000;
    static final int MAX_FRAMES = 2_000_000;
    /** Sample bytes aimed at per block: large blocks keep framing overhead small. */
    static final int BLOCK_SAMPLE_BYTES = 2040;

    private final String scenarioName;
    private final BenchMotor motor;
    private final Transport transport;
    private final FrameReader reader;
    private final boolean realTime;
    private final Random tokens;
    private final Object writeLock = new Object();

    private volatile long lastHostFrameNanos = System.nanoTime();
    private volatile boolean energised;
    /** STOP, SAFE, an error or the watchdog cut the running stream or insulation dwell short. */
    private volatile boolean abortStream;
    /** How it was cut short: the END status ({@code stopped}, {@code watchdog}, {@code error}). */
    private volatile String abortStatus = "";
    private volatile String lastSafeReason = "";
    private volatile int safeEvents;
    private volatile String armedToken;
    private volatile int armedLead;
    private volatile int armedVolts;
    private volatile long armedAtNanos;

    private int lastTag = -1;
    private String lastCommand = "";
    private Frame lastReply;
    private int streamTag = -1;
    private List<Frame> streamBlocks = List.of();
    private int sentBlocks;
    private Frame streamEnd;
    /** Tag of the stream or insulation test running now, or -1. */
    private int busyTag = -1;
    private String busyWhat = "";
    private volatile boolean running = true;
    private boolean helloDone;
    private boolean closeIdleSessions;
    private final long openedNanos = System.nanoTime();

    public VirtualRig(String scenarioName, Scenario scenario, Transport transport, boolean realTime) {
        this.scenarioName = scenarioName;
        this.motor = new BenchMotor(scenario);
        this.transport = transport;
        this.reader = new FrameReader(transport);
        this.realTime = realTime;
        this.tokens = new Random(scenario.seed() ^ 0x5DEECE66DL);
    }

    /**
     * Closes the session when the host has not completed HELLO within {@value #HELLO_TIMEOUT_MS} ms, or has sent no
     * intact frame for {@value #IDLE_MS} ms, so a silent or half-framed client cannot hold a served rig. For
     * {@code rig serve}; an in-process rig keeps its one session for as long as its host wants.
     */
    public VirtualRig closingIdleSessions() {
        closeIdleSessions = true;
        return this;
    }

    /** Whether any output (coil drive, step output, insulation supply, relays) is on right now. */
    public boolean energised() {
        return energised;
    }

    /** Why the outputs were last switched off ({@code watchdog}, {@code error}, {@code host}, ...), or "". */
    public String lastSafeReason() {
        return lastSafeReason;
    }

    /** How many times the outputs have been switched off because of a fault (watchdog, error, lost line). */
    public int safeEvents() {
        return safeEvents;
    }

    /** Serves until the host says BYE or the line closes; always leaves every output off. */
    @Override
    public void run() {
        Thread watchdog = new Thread(this::watchdogLoop, "virtual-rig-watchdog");
        watchdog.setDaemon(true);
        watchdog.start();
        try {
            while (running) {
                Frame f = reader.next(100);
                if (f != null) {
                    lastHostFrameNanos = System.nanoTime();
                    if (f.type() == Frame.COMMAND) {
                        handle(f);
                    }
                } else if (closeIdleSessions && idle()) {
                    deEnergise("session idle", true);
                    break;
                }
            }
        } catch (EOFException e) {
            deEnergise("line closed", true);
        } catch (IOException e) {
            deEnergise("line failed", true);
        } finally {
            running = false;
            deEnergise("session ended", false);
            watchdog.interrupt();
            try {
                transport.close();
            } catch (IOException ignored) {
                // closing anyway
            }
        }
    }

    private boolean idle() {
        long now = System.nanoTime();
        return helloDone ? now - lastHostFrameNanos > IDLE_MS * 1_000_000L
                : now - openedNanos > HELLO_TIMEOUT_MS * 1_000_000L;
    }

    private void watchdogLoop() {
        while (running) {
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                return;
            }
            boolean live = energised || armedToken != null;
            if (live && System.nanoTime() - lastHostFrameNanos > WATCHDOG_MS * 1_000_000L) {
                // under the write lock, so the error goes out before the end frame of the stream it cuts short
                synchronized (writeLock) {
                    abort("watchdog");
                    deEnergise("watchdog", true);
                    try {
                        send(Frame.text(Frame.ERROR, 0, RigError.WATCHDOG.payload("host silent for "
                                + WATCHDOG_MS + " ms; all outputs off")));
                    } catch (IOException ignored) {
                        // the line is gone as well; outputs are off, which is what matters
                    }
                }
            }
        }
    }

    private void abort(String status) {
        if (busyTag >= 0 && !abortStream) {
            abortStatus = status;
            abortStream = true;
        }
    }

    private void deEnergise(String reason, boolean fault) {
        boolean wasLive = energised || armedToken != null;
        energised = false;
        armedToken = null;
        if (wasLive || fault) {
            lastSafeReason = reason;
        }
        if (fault && wasLive) {
            safeEvents++;
        }
    }

    private void send(Frame f) throws IOException {
        byte[] b = FrameCodec.encode(f);
        synchronized (writeLock) {
            transport.write(b);
        }
    }

    private void reply(int tag, String text) throws IOException {
        Frame f = Frame.text(Frame.REPLY, tag, text);
        remember(tag, f);
        send(f);
    }

    private void error(int tag, RigError code, String text) throws IOException {
        if (code != RigError.BUSY && code != RigError.BLOCK_GONE) {
            abort("error");
            deEnergise("error", true);
        }
        Frame f = errorFrame(tag, code, text);
        remember(tag, f);
        send(f);
    }

    /** An error frame whose text is cut to {@value #ERROR_TEXT_CHARS} characters, so it always fits a frame. */
    static Frame errorFrame(int tag, RigError code, String text) {
        String t = text.length() <= ERROR_TEXT_CHARS ? text : text.substring(0, ERROR_TEXT_CHARS - 3) + "...";
        return Frame.text(Frame.ERROR, tag, code.payload(t.replaceAll("[^\\x20-\\x7E]", "?")));
    }

    private void remember(int tag, Frame f) {
        if (tag != 0 && tag == lastTag) {
            lastReply = f;
        }
    }

    private void handle(Frame f) throws IOException {
        String text = f.text();
        int tag = f.tag();
        if (tag != 0 && tag == lastTag && text.equals(lastCommand) && lastReply != null) {
            send(lastReply); // a retry of a command already done: answer again, do not act again
            return;
        }
        CommandText c;
        try {
            c = CommandText.parse(f.payload());
        } catch (CommandException e) {
            lastTag = tag;
            lastCommand = text;
            lastReply = null;
            error(tag, e.error(), e.getMessage());
            return;
        }
        String verb = c.verb();
        if (!verb.equals("PING") && !verb.equals("RESEND")) {
            lastTag = tag;
            lastCommand = text;
            lastReply = null;
        }
        if (armedToken != null && !(verb.equals("INS") && c.word(1).equals("FIRE")) && !verb.equals("PING")) {
            deEnergise("disarmed by another command", false);
        }
        try {
            if (!helloDone && !SESSIONLESS.contains(verb)) {
                throw new CommandException(RigError.VERSION, "no session: send HELLO " + PROTOCOL_VERSION + " first");
            }
            switch (verb) {
                case "HELLO" -> hello(tag, c);
                case "CAPS" -> {
                    c.expect("CAPS", 1);
                    caps(tag);
                }
                case "PING" -> {
                    c.expect("PING", 1);
                    send(Frame.text(Frame.REPLY, tag, "OK"));
                }
                case "RES" -> resistance(tag, c);
                case "INS" -> insulation(tag, c);
                case "STEP" -> stepResponse(tag, c);
                case "EMF" -> backEmf(tag, c);
                case "SWEEP" -> sweep(tag, c);
                case "RESEND" -> resend(tag, c);
                case "STOP", "SAFE" -> {
                    deEnergise("host", false); // off first, whatever else the command says
                    c.expect(verb, 1);
                    reply(tag, "OK safe");
                }
                case "BYE" -> {
                    deEnergise("host", false);
                    c.expect("BYE", 1);
                    reply(tag, "OK bye");
                    running = false;
                }
                default -> error(tag, RigError.UNKNOWN_COMMAND, "'" + CommandText.echo(verb) + "' is not a command");
            }
        } catch (CommandException e) {
            error(tag, e.error(), e.getMessage());
        }
    }

    /** Commands answered before HELLO: the handshake itself, the keep-alive, and every way to switch off. */
    private static final List<String> SESSIONLESS = List.of("HELLO", "PING", "STOP", "SAFE", "BYE");

    private void hello(int tag, CommandText c) throws IOException, CommandException {
        c.expect("HELLO", 2, "?minor");
        if (!c.word(1).equals(Integer.toString(PROTOCOL_VERSION))) {
            helloDone = false;
            error(tag, RigError.VERSION, "host speaks version " + CommandText.echo(c.word(1)) + ", rig speaks "
                    + PROTOCOL_VERSION);
            return;
        }
        if (c.has("minor")) {
            c.integer("minor", 0, 255);
        }
        deEnergise("new session", false);
        helloDone = true;
        reply(tag, "OK proto=" + PROTOCOL_VERSION + " minor=" + PROTOCOL_MINOR + " rig=lodestep-virtual-rig fw="
                + FIRMWARE + " id=VR-" + motor.scenario().serial());
    }

    private void caps(int tag) throws IOException {
        reply(tag, "OK leads=" + motor.leadCount() + " labels=" + String.join(",", motor.labels())
                + " measure=res,ins,step,emf,sweep ins_volts=100,250,500 max_rate_hz=" + MAX_RATE_HZ
                + " max_frames=" + MAX_FRAMES + " max_step_a=5 drive_series_ohm=" + BenchMotor.DRIVE_SERIES_OHM
                + " watchdog_ms=" + WATCHDOG_MS + " resend_depth=all"
                + " channels=current:a,voltage:v,emf:v,accel:g,step:v scenario=" + scenarioName + " motor_serial="
                + motor.scenario().serial());
    }

    private int lead(String word) throws CommandException {
        if (word != null && CommandText.INTEGER.matcher(word).matches() && word.length() <= 3) {
            int p = Integer.parseInt(word);
            if (p >= 1 && p <= motor.leadCount()) {
                return p;
            }
        }
        throw CommandException.badArgument("lead '" + CommandText.echo(String.valueOf(word)) + "' is not 1.."
                + motor.leadCount());
    }

    private static double number(CommandText c, String key, double min, double max) throws CommandException {
        return c.number(key, min, max);
    }

    private void resistance(int tag, CommandText c) throws IOException, CommandException {
        c.expect("RES", 3);
        int a = lead(c.word(1));
        int b = lead(c.word(2));
        if (a == b) {
            throw CommandException.badArgument("leads must differ");
        }
        double r = motor.readResistanceOhm(a, b);
        reply(tag, "OK ohm=" + (Double.isInfinite(r) ? "over" : String.format(java.util.Locale.ROOT, "%.5g", r)));
    }

    private void insulation(int tag, CommandText c) throws IOException, CommandException {
        switch (c.word(1)) {
            case "ARM" -> {
                c.expect("INS ARM", 2, "lead", "volts");
                int lead = lead(c.get("lead"));
                long volts = c.integer("volts", 0, 100_000);
                if (volts != 100 && volts != 250 && volts != 500) {
                    throw CommandException.badArgument("volts=" + volts + " is not 100, 250 or 500");
                }
                byte[] t = new byte[2];
                tokens.nextBytes(t);
                armedToken = HexFormat.of().withUpperCase().formatHex(t);
                armedLead = lead;
                armedVolts = (int) volts;
                armedAtNanos = System.nanoTime();
                reply(tag, "OK armed token=" + armedToken + " lead=" + lead + " volts=" + volts + " expires_ms="
                        + ARM_VALID_MS);
            }
            case "FIRE" -> {
                // a missing token is a wrong token: NOT_ARMED, and like every error it cancels the arm
                c.expect("INS FIRE", 2, "?token", "?seconds");
                String token = armedToken;
                if (token == null) {
                    error(tag, RigError.NOT_ARMED, "send INS ARM first");
                    return;
                }
                if (System.nanoTime() - armedAtNanos > ARM_VALID_MS * 1_000_000L) {
                    error(tag, RigError.ARM_EXPIRED, "arm older than " + ARM_VALID_MS + " ms; arm again");
                    return;
                }
                if (!token.equals(c.get("token"))) {
                    error(tag, RigError.NOT_ARMED, "token does not match the arm; arm again");
                    return;
                }
                double seconds = c.has("seconds") ? number(c, "seconds", 1, 600) : 60;
                armedToken = null;
                int lead = armedLead;
                int volts = armedVolts;
                busyTag = tag;
                busyWhat = "an insulation test is running";
                abortStream = false;
                boolean cut;
                try {
                    energised = true; // insulation supply on
                    double r = motor.readInsulationOhm(lead);
                    dwell(seconds);
                    energised = false; // supply off and winding discharged before answering
                    cut = abortStream;
                    if (!cut) {
                        reply(tag, "OK ohm=" + (Double.isInfinite(r) ? "over"
                                : String.format(java.util.Locale.ROOT, "%.4g", r)) + " lead=" + lead + " volts="
                                + volts + " seconds=" + StreamSpec.fmt(seconds));
                    }
                } finally {
                    energised = false;
                    busyTag = -1;
                }
                if (cut) {
                    Frame e = errorFrame(tag, RigError.STOPPED, "insulation test cut short (" + abortStatus
                            + "); supply off, winding discharged; no reading");
                    remember(tag, e);
                    send(e);
                }
            }
            default -> throw CommandException.badArgument("INS needs ARM or FIRE");
        }
    }

    /** The insulation dwell: the supply stays on for {@code seconds} (real time only), while the rig stays busy. */
    private void dwell(double seconds) throws IOException {
        if (!realTime) {
            serviceWhileBusy(0);
            return;
        }
        long due = System.nanoTime() + (long) (seconds * 1e9);
        while (!abortStream) {
            long leftMs = (due - System.nanoTime()) / 1_000_000L;
            if (leftMs <= 0) {
                break;
            }
            serviceWhileBusy((int) Math.min(10, leftMs));
        }
    }

    private void stepResponse(int tag, CommandText c) throws IOException, CommandException {
        c.expect("STEP", 3, "volts", "ms", "rate_hz");
        int a = lead(c.word(1));
        int b = lead(c.word(2));
        if (a == b) {
            throw CommandException.badArgument("leads must differ");
        }
        double volts = number(c, "volts", 0.1, 24);
        double ms = number(c, "ms", 0.1, 1000);
        double rate = number(c, "rate_hz", 100, MAX_RATE_HZ);
        int frames = frames(ms / 1000, rate);
        double amps = motor.stepCurrentA(a, b, volts);
        if (amps > 5) {
            error(tag, RigError.OVER_LIMIT, String.format(java.util.Locale.ROOT,
                    "%.3g V would drive %.3g A, above the 5 A limit; lower volts=", volts, amps));
            return;
        }
        double lsbA = Math.max(1e-5, Math.ceil(amps * 1.3 / 30000 * 1e5) / 1e5);
        double[][] data = motor.stepResponse(a, b, volts, rate, frames, lsbA);
        StreamSpec spec = new StreamSpec(List.of(new Channel("current", "a"), new Channel("voltage", "v")),
                new double[] {lsbA, 0.001}, rate, frames, blockFrames(2, frames));
        stream(tag, spec, data, true);
    }

    private void backEmf(int tag, CommandText c) throws IOException, CommandException {
        c.expect("EMF", 1, "pairs", "seconds", "rate_hz");
        String pairsText = c.get("pairs");
        List<int[]> pairs = new ArrayList<>();
        List<Channel> channels = new ArrayList<>();
        for (String p : pairsText.split(",")) {
            String[] ab = p.split("-");
            if (ab.length != 2) {
                throw CommandException.badArgument("pairs=" + CommandText.echo(pairsText)
                        + " is not a list like 1-2,3-4");
            }
            int a = lead(ab[0]);
            int b = lead(ab[1]);
            if (a == b) {
                throw CommandException.badArgument("pair " + a + "-" + b + " joins a lead to itself");
            }
            pairs.add(new int[] {a, b});
            channels.add(new Channel("emf_" + a + "_" + b, "v"));
        }
        if (pairs.size() > 8) {
            throw CommandException.badArgument("at most 8 pairs");
        }
        double seconds = number(c, "seconds", 0.1, 60);
        double rate = number(c, "rate_hz", 100, MAX_RATE_HZ);
        int frames = frames(seconds, rate);
        double[][] data = motor.handTurnEmf(pairs, seconds, rate, frames);
        double[] lsb = new double[pairs.size()];
        java.util.Arrays.fill(lsb, 0.001);
        // the simulated hand's turns are known exactly, as an encoder on a real rig would know them
        stream(tag, new StreamSpec(channels, lsb, rate, frames, blockFrames(pairs.size(), frames)), data, false,
                String.format(java.util.Locale.ROOT, " revolutions=%.4f", motor.handTurnRevolutions()));
    }

    private void sweep(int tag, CommandText c) throws IOException, CommandException {
        c.expect("SWEEP", 1, "from", "to", "seconds", "microsteps", "rate_hz", "?dir", "?drive", "?supply_v");
        double from = number(c, "from", 1, 20000);
        double to = number(c, "to", 1, 20000);
        double seconds = number(c, "seconds", 0.1, 600);
        int micro = (int) c.integer("microsteps", 1, 256);
        if (c.has("dir") && !c.get("dir").equals("fwd") && !c.get("dir").equals("rev")) {
            // the simulated motor and load are symmetric, so the direction changes nothing measured
            throw CommandException.badArgument("dir=" + CommandText.echo(c.get("dir")) + " is not fwd or rev");
        }
        if (Integer.bitCount(micro) != 1) {
            throw CommandException.badArgument("microsteps=" + micro + " is not a power of two");
        }
        double rate = number(c, "rate_hz", 100, MAX_RATE_HZ);
        int frames = frames(seconds, rate);
        String drive = c.has("drive") ? c.get("drive") : "ideal";
        double supply = c.has("supply_v") ? number(c, "supply_v", 1, 400) : 0;
        if (drive.equals("ideal")) {
            double[][] data = motor.sweep(from, to, seconds, micro, rate);
            StreamSpec spec = new StreamSpec(List.of(new Channel("accel", "g"), new Channel("current", "a"),
                    new Channel("step", "v")), new double[] {0.001, 0.0005, 0.001}, rate, frames,
                    blockFrames(3, frames));
            stream(tag, spec, data, true);
            return;
        }
        DriveMode mode = switch (drive) {
            case "voltage" -> DriveMode.CONSTANT_VOLTAGE;
            case "chopper" -> DriveMode.CHOPPER;
            default -> throw CommandException.badArgument("drive=" + CommandText.echo(drive)
                    + " is not ideal, voltage or chopper");
        };
        if (mode == DriveMode.CONSTANT_VOLTAGE && micro > 2) {
            throw CommandException.badArgument("drive=voltage switches full or half steps only: microsteps=" + micro
                    + " is not 1 or 2");
        }
        double[][] data = motor.sweepDriven(from, to, seconds, micro, rate, motor.driveSettings(mode, supply));
        StreamSpec spec = new StreamSpec(List.of(new Channel("accel", "g"), new Channel("current_a", "a"),
                new Channel("current_b", "a"), new Channel("step", "v")), new double[] {0.001, 0.0005, 0.0005, 0.001},
                rate, frames, blockFrames(4, frames));
        stream(tag, spec, data, true);
    }

    private static int frames(double seconds, double rate) throws CommandException {
        double f = Math.rint(seconds * rate);
        if (f < 1 || f > MAX_FRAMES) {
            throw CommandException.badArgument("record of " + (long) f + " frames is not 1.." + MAX_FRAMES);
        }
        return (int) f;
    }

    private static int blockFrames(int channels, int frames) {
        return Math.min(frames, Math.max(1, BLOCK_SAMPLE_BYTES / (2 * channels)));
    }

    private void stream(int tag, StreamSpec spec, double[][] data, boolean drives) throws IOException {
        stream(tag, spec, data, drives, "");
    }

    /** Streams a record; {@code endKeys} (" key=value ...") are added to the END frame of a complete stream. */
    private void stream(int tag, StreamSpec spec, double[][] data, boolean drives, String endKeys)
            throws IOException {
        int nc = spec.channels().size();
        long[] clipped = new long[nc];
        List<Frame> blocks = new ArrayList<>(spec.blocks());
        for (int seq = 0; seq < spec.blocks(); seq++) {
            int n = spec.framesIn(seq);
            short[] s = new short[n * nc];
            for (int i = 0; i < n; i++) {
                for (int ch = 0; ch < nc; ch++) {
                    long q = Math.round(data[ch][seq * spec.blockFrames() + i] / spec.lsb()[ch]);
                    if (q >= 32767 || q <= -32767) {
                        clipped[ch]++; // at or beyond full scale: the true value is unknown
                    }
                    s[i * nc + ch] = (short) Math.max(-32767, Math.min(32767, q));
                }
            }
            blocks.add(new Frame(Frame.BLOCK, tag, new SampleBlock(seq, n, nc, s).encode()));
        }
        streamTag = tag;
        streamBlocks = blocks;
        streamEnd = null;
        sentBlocks = 0;
        busyTag = tag;
        busyWhat = "a stream is running";
        abortStream = false;
        try {
            // frames that came while the record was computed count for the watchdog, which times the host's last
            // frame, not the start of the stream
            serviceWhileBusy(0);
            energised = drives && !abortStream;
            reply(tag, spec.encode());
            long t0 = System.nanoTime();
            for (int seq = 0; seq < blocks.size(); seq++) {
                if (realTime) {
                    long due = t0 + (long) ((double) seq * spec.blockFrames() / spec.rateHz() * 1e9);
                    while (System.nanoTime() < due && !abortStream) {
                        serviceWhileBusy(10);
                    }
                }
                serviceWhileBusy(0);
                synchronized (writeLock) {
                    if (abortStream) {
                        break;
                    }
                    send(blocks.get(seq));
                    sentBlocks = seq + 1;
                }
            }
        } finally {
            energised = false;
            busyTag = -1;
        }
        String status = abortStream ? abortStatus : "complete";
        StringBuilder end = new StringBuilder("END status=").append(status).append(" blocks=").append(blocks.size())
                .append(" frames=").append(spec.frames()).append(" sent=").append(sentBlocks);
        String sep = " clipped=";
        for (int ch = 0; ch < nc; ch++) {
            if (clipped[ch] > 0) {
                end.append(sep).append(spec.channels().get(ch).name()).append(':').append(clipped[ch]);
                sep = ",";
            }
        }
        if (!abortStream) {
            end.append(endKeys);
        }
        streamEnd = Frame.text(Frame.END, tag, end.toString());
        send(streamEnd);
    }

    /**
     * Answers what may arrive while a stream or an insulation dwell runs: PING ({@code OK busy}), RESEND, STOP and
     * SAFE (which cut it short), a retry of the running command; anything else is refused as busy.
     */
    private void serviceWhileBusy(int waitMs) throws IOException {
        Frame f = waitMs > 0 ? reader.next(waitMs) : reader.poll();
        while (f != null) {
            lastHostFrameNanos = System.nanoTime();
            if (f.type() == Frame.COMMAND) {
                busyCommand(f);
            }
            f = reader.poll();
        }
    }

    private void busyCommand(Frame f) throws IOException {
        int tag = f.tag();
        if (tag == busyTag && f.text().equals(lastCommand)) {
            if (lastReply != null) {
                send(lastReply); // the stream header again; the stream itself is not started again
            }
            return; // a retried FIRE during its dwell: its answer comes when the dwell ends
        }
        String verb = "";
        try {
            CommandText c = CommandText.parse(f.payload());
            verb = c.verb();
            switch (verb) {
                case "PING" -> {
                    c.expect("PING", 1);
                    send(Frame.text(Frame.REPLY, tag, "OK busy"));
                }
                case "RESEND" -> resend(tag, c);
                case "STOP", "SAFE" -> {
                    synchronized (writeLock) {
                        abort("stopped");
                        deEnergise("host", false);
                        send(Frame.text(Frame.REPLY, tag, "OK safe"));
                    }
                }
                default -> send(errorFrame(tag, RigError.BUSY, busyWhat + "; only PING, RESEND, STOP and SAFE"));
            }
        } catch (CommandException e) {
            if (verb.equals("RESEND") || verb.equals("STOP") || verb.equals("SAFE")) {
                error(tag, e.error(), e.getMessage()); // a malformed RESEND is a host fault: it ends the stream
            } else {
                send(errorFrame(tag, RigError.BUSY, busyWhat + "; only PING, RESEND, STOP and SAFE"));
            }
        }
    }

    private void resend(int tag, CommandText c) throws IOException, CommandException {
        c.expect("RESEND", 1, "seq");
        long seq = c.integer("seq", 0, 0xFFFF_FFFFL);
        if (streamTag < 0) {
            error(tag, RigError.BLOCK_GONE, "no stream has run in this session");
        } else if (seq > streamBlocks.size()) {
            throw CommandException.badArgument("seq=" + seq + " is beyond the last stream's " + streamBlocks.size()
                    + " blocks");
        } else if (seq < sentBlocks) {
            send(streamBlocks.get((int) seq));
        } else if (seq == streamBlocks.size() && streamEnd != null) {
            send(streamEnd);
        } else {
            error(tag, RigError.BLOCK_GONE, (seq == streamBlocks.size() ? "the end frame" : "block " + seq)
                    + " has not been sent");
        }
    }
}
