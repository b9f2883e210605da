package org.lodestep.rig;

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
    private volatile boolean abortStream;
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
    private Frame streamEnd;
    private volatile boolean running = true;

    public VirtualRig(String scenarioName, Scenario scenario, Transport transport, boolean realTime) {
        this.scenarioName = scenarioName;
        this.motor = new BenchMotor(scenario);
        this.transport = transport;
        this.reader = new FrameReader(transport);
        this.realTime = realTime;
        this.tokens = new Random(scenario.seed() ^ 0x5DEECE66DL);
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

    private void watchdogLoop() {
        while (running) {
            try {
                Thread.sleep(50);
            } catch (InterruptedException e) {
                return;
            }
            boolean live = energised || armedToken != null;
            if (live && System.nanoTime() - lastHostFrameNanos > WATCHDOG_MS * 1_000_000L) {
                abortStream = true;
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
        deEnergise("error", true);
        Frame f = Frame.text(Frame.ERROR, tag, code.payload(text));
        remember(tag, f);
        send(f);
    }

    private void remember(int tag, Frame f) {
        if (tag != 0) {
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
        Fields c = Fields.parse(text);
        String verb = c.word(0);
        if (!verb.equals("PING") && !verb.equals("RESEND")) {
            lastTag = tag;
            lastCommand = text;
            lastReply = null;
        }
        if (armedToken != null && !(verb.equals("INS") && c.word(1).equals("FIRE")) && !verb.equals("PING")) {
            deEnergise("disarmed by another command", false);
        }
        try {
            switch (verb) {
                case "HELLO" -> hello(tag, c);
                case "CAPS" -> caps(tag);
                case "PING" -> send(Frame.text(Frame.REPLY, tag, "OK"));
                case "RES" -> resistance(tag, c);
                case "INS" -> insulation(tag, c);
                case "STEP" -> stepResponse(tag, c);
                case "EMF" -> backEmf(tag, c);
                case "SWEEP" -> sweep(tag, c);
                case "RESEND" -> resend(tag, c);
                case "STOP", "SAFE" -> {
                    deEnergise("host", false);
                    reply(tag, "OK safe");
                }
                case "BYE" -> {
                    deEnergise("host", false);
                    reply(tag, "OK bye");
                    running = false;
                }
                default -> error(tag, RigError.UNKNOWN_COMMAND, "'" + verb + "' is not a command");
            }
        } catch (BadArgument e) {
            error(tag, RigError.BAD_ARGUMENT, e.getMessage());
        }
    }

    private static final class BadArgument extends Exception {
        private static final long serialVersionUID = 1L;

        BadArgument(String m) {
            super(m);
        }
    }

    private void hello(int tag, Fields c) throws IOException {
        if (!c.word(1).equals(Integer.toString(PROTOCOL_VERSION))) {
            error(tag, RigError.VERSION, "host speaks version " + c.word(1) + ", rig speaks " + PROTOCOL_VERSION);
            return;
        }
        reply(tag, "OK proto=" + PROTOCOL_VERSION + " rig=lodestep-virtual-rig fw=" + FIRMWARE + " id=VR-"
                + motor.scenario().serial());
    }

    private void caps(int tag) throws IOException {
        reply(tag, "OK leads=" + motor.leadCount() + " labels=" + String.join(",", motor.labels())
                + " measure=res,ins,step,emf,sweep ins_volts=100,250,500 max_rate_hz=" + MAX_RATE_HZ
                + " max_frames=" + MAX_FRAMES + " max_step_a=5 drive_series_ohm=" + BenchMotor.DRIVE_SERIES_OHM
                + " watchdog_ms=" + WATCHDOG_MS + " resend_depth=all"
                + " channels=current:a,voltage:v,emf:v,accel:g,step:v scenario=" + scenarioName + " motor_serial="
                + motor.scenario().serial());
    }

    private int lead(String word) throws BadArgument {
        try {
            int p = Integer.parseInt(word);
            if (p >= 1 && p <= motor.leadCount()) {
                return p;
            }
        } catch (NumberFormatException e) {
            // fall through
        }
        throw new BadArgument("lead '" + word + "' is not 1.." + motor.leadCount());
    }

    private static double number(Fields c, String key, double min, double max) throws BadArgument {
        String v = c.get(key, null);
        if (v == null) {
            throw new BadArgument(key + "= is missing");
        }
        try {
            double d = Double.parseDouble(v);
            if (d >= min && d <= max) {
                return d;
            }
        } catch (NumberFormatException e) {
            // fall through
        }
        throw new BadArgument(key + "=" + v + " is not a number in " + StreamSpec.fmt(min) + ".." + StreamSpec.fmt(max));
    }

    private void resistance(int tag, Fields c) throws IOException, BadArgument {
        int a = lead(c.word(1));
        int b = lead(c.word(2));
        if (a == b) {
            throw new BadArgument("leads must differ");
        }
        double r = motor.readResistanceOhm(a, b);
        reply(tag, "OK ohm=" + (Double.isInfinite(r) ? "over" : String.format(java.util.Locale.ROOT, "%.5g", r)));
    }

    private void insulation(int tag, Fields c) throws IOException, BadArgument {
        switch (c.word(1)) {
            case "ARM" -> {
                int lead = lead(c.get("lead", ""));
                int volts = (int) number(c, "volts", 0, 1000);
                if (volts != 100 && volts != 250 && volts != 500) {
                    throw new BadArgument("volts=" + volts + " is not 100, 250 or 500");
                }
                byte[] t = new byte[2];
                tokens.nextBytes(t);
                armedToken = HexFormat.of().withUpperCase().formatHex(t);
                armedLead = lead;
                armedVolts = volts;
                armedAtNanos = System.nanoTime();
                reply(tag, "OK armed token=" + armedToken + " lead=" + lead + " volts=" + volts + " expires_ms="
                        + ARM_VALID_MS);
            }
            case "FIRE" -> {
                String token = armedToken;
                if (token == null) {
                    error(tag, RigError.NOT_ARMED, "send INS ARM first");
                    return;
                }
                if (System.nanoTime() - armedAtNanos > ARM_VALID_MS * 1_000_000L) {
                    error(tag, RigError.ARM_EXPIRED, "arm older than " + ARM_VALID_MS + " ms; arm again");
                    return;
                }
                if (!token.equals(c.get("token", ""))) {
                    error(tag, RigError.NOT_ARMED, "token does not match the arm");
                    return;
                }
                double seconds = c.has("seconds") ? number(c, "seconds", 1, 600) : 60;
                armedToken = null;
                energised = true; // insulation supply on
                double r = motor.readInsulationOhm(armedLead);
                energised = false; // supply off and winding discharged before answering
                reply(tag, "OK ohm=" + (Double.isInfinite(r) ? "over" : String.format(java.util.Locale.ROOT, "%.4g", r))
                        + " lead=" + armedLead + " volts=" + armedVolts + " seconds=" + StreamSpec.fmt(seconds));
            }
            default -> throw new BadArgument("INS needs ARM or FIRE");
        }
    }

    private void stepResponse(int tag, Fields c) throws IOException, BadArgument {
        int a = lead(c.word(1));
        int b = lead(c.word(2));
        if (a == b) {
            throw new BadArgument("leads must differ");
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

    private void backEmf(int tag, Fields c) throws IOException, BadArgument {
        String pairsText = c.get("pairs", "");
        List<int[]> pairs = new ArrayList<>();
        List<Channel> channels = new ArrayList<>();
        for (String p : pairsText.split(",")) {
            String[] ab = p.split("-");
            if (ab.length != 2) {
                throw new BadArgument("pairs=" + pairsText + " is not a list like 1-2,3-4");
            }
            int a = lead(ab[0]);
            int b = lead(ab[1]);
            pairs.add(new int[] {a, b});
            channels.add(new Channel("emf_" + a + "_" + b, "v"));
        }
        if (pairs.size() > 8) {
            throw new BadArgument("at most 8 pairs");
        }
        double seconds = number(c, "seconds", 0.1, 60);
        double rate = number(c, "rate_hz", 100, MAX_RATE_HZ);
        int frames = frames(seconds, rate);
        double[][] data = motor.handTurnEmf(pairs, seconds, rate, frames);
        double[] lsb = new double[pairs.size()];
        java.util.Arrays.fill(lsb, 0.001);
        stream(tag, new StreamSpec(channels, lsb, rate, frames, blockFrames(pairs.size(), frames)), data, false);
    }

    private void sweep(int tag, Fields c) throws IOException, BadArgument {
        double from = number(c, "from", 1, 20000);
        double to = number(c, "to", 1, 20000);
        double seconds = number(c, "seconds", 0.1, 600);
        int micro = (int) number(c, "microsteps", 1, 256);
        if (Integer.bitCount(micro) != 1) {
            throw new BadArgument("microsteps=" + micro + " is not a power of two");
        }
        double rate = number(c, "rate_hz", 100, MAX_RATE_HZ);
        int frames = frames(seconds, rate);
        String drive = c.get("drive", "ideal");
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
            default -> throw new BadArgument("drive=" + drive + " is not ideal, voltage or chopper");
        };
        if (mode == DriveMode.CONSTANT_VOLTAGE && micro > 2) {
            throw new BadArgument("drive=voltage switches full or half steps only: microsteps=" + micro
                    + " is not 1 or 2");
        }
        double[][] data = motor.sweepDriven(from, to, seconds, micro, rate, motor.driveSettings(mode, supply));
        StreamSpec spec = new StreamSpec(List.of(new Channel("accel", "g"), new Channel("current_a", "a"),
                new Channel("current_b", "a"), new Channel("step", "v")), new double[] {0.001, 0.0005, 0.0005, 0.001},
                rate, frames, blockFrames(4, frames));
        stream(tag, spec, data, true);
    }

    private static int frames(double seconds, double rate) throws BadArgument {
        double f = Math.rint(seconds * rate);
        if (f < 1 || f > MAX_FRAMES) {
            throw new BadArgument("record of " + (long) f + " frames is not 1.." + MAX_FRAMES);
        }
        return (int) f;
    }

    private static int blockFrames(int channels, int frames) {
        return Math.min(frames, Math.max(1, BLOCK_SAMPLE_BYTES / (2 * channels)));
    }

    private void stream(int tag, StreamSpec spec, double[][] data, boolean drives) throws IOException {
        int nc = spec.channels().size();
        List<Frame> blocks = new ArrayList<>(spec.blocks());
        for (int seq = 0; seq < spec.blocks(); seq++) {
            int n = spec.framesIn(seq);
            short[] s = new short[n * nc];
            for (int i = 0; i < n; i++) {
                for (int ch = 0; ch < nc; ch++) {
                    long q = Math.round(data[ch][seq * spec.blockFrames() + i] / spec.lsb()[ch]);
                    s[i * nc + ch] = (short) Math.max(-32767, Math.min(32767, q));
                }
            }
            blocks.add(new Frame(Frame.BLOCK, tag, new SampleBlock(seq, n, nc, s).encode()));
        }
        streamTag = tag;
        streamBlocks = blocks;
        streamEnd = null;
        abortStream = false;
        lastHostFrameNanos = System.nanoTime();
        energised = drives;
        reply(tag, spec.encode());
        long t0 = System.nanoTime();
        String status = "complete";
        for (int seq = 0; seq < blocks.size(); seq++) {
            if (realTime) {
                long due = t0 + (long) ((double) seq * spec.blockFrames() / spec.rateHz() * 1e9);
                while (System.nanoTime() < due && !abortStream) {
                    serviceDuringStream(10);
                }
            }
            serviceDuringStream(0);
            if (abortStream) {
                status = lastSafeReason.equals("watchdog") ? "watchdog" : "stopped";
                break;
            }
            send(blocks.get(seq));
        }
        energised = false;
        streamEnd = Frame.text(Frame.END, tag, "END status=" + status + " blocks=" + blocks.size() + " frames="
                + spec.frames());
        send(streamEnd);
    }

    /** Answers what may arrive while a stream runs: PING, RESEND, STOP; anything else is refused as busy. */
    private void serviceDuringStream(int waitMs) throws IOException {
        Frame f = waitMs > 0 ? reader.next(waitMs) : reader.poll();
        while (f != null) {
            lastHostFrameNanos = System.nanoTime();
            if (f.type() == Frame.COMMAND) {
                Fields c = Fields.parse(f.text());
                switch (c.word(0)) {
                    case "PING" -> send(Frame.text(Frame.REPLY, f.tag(), "OK busy"));
                    case "RESEND" -> resend(f.tag(), c);
                    case "STOP", "SAFE" -> {
                        abortStream = true;
                        deEnergise("host", false);
                        send(Frame.text(Frame.REPLY, f.tag(), "OK safe"));
                    }
                    default -> {
                        if (f.tag() == streamTag && f.text().equals(lastCommand) && lastReply != null) {
                            send(lastReply);
                        } else {
                            send(Frame.text(Frame.ERROR, f.tag(), RigError.BUSY.payload("a stream is running")));
                        }
                    }
                }
            }
            f = reader.poll();
        }
    }

    private void resend(int tag, Fields c) throws IOException {
        int seq;
        try {
            seq = Integer.parseInt(c.get("seq", "-1"));
        } catch (NumberFormatException e) {
            seq = -1;
        }
        if (seq >= 0 && seq < streamBlocks.size()) {
            send(streamBlocks.get(seq));
        } else if (seq == streamBlocks.size() && streamEnd != null) {
            send(streamEnd);
        } else {
            // not an error that should switch anything off: nothing is on between streams
            send(Frame.text(Frame.ERROR, tag, RigError.BLOCK_GONE.payload("no block " + seq + " in the last stream")));
        }
    }
}
