package org.lodestep.rig;

import java.io.IOException;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import java.util.function.UnaryOperator;

/**
 * A virtual rig with one deliberate protocol fault, for showing that the conformance kit notices: the rig's outgoing
 * frames pass through a fault that rewrites (or drops, by returning null) what a faulty firmware would have sent.
 * The virtual rig writes one whole frame per write, which is what lets the fault see frames.
 */
public final class BrokenRig implements Transport {

    /** The faults, each a firmware bug a newcomer could write. */
    public enum Fault {
        /** Measures a retried command again instead of repeating its answer. */
        REMEASURES_RETRIES,
        /** Answers commands before HELLO instead of refusing them. */
        NO_HELLO_FIRST,
        /** Sends block 0 of every stream with a broken CRC, and so can never deliver it. */
        DAMAGES_FIRST_BLOCK
    }

    private final Transport inner;
    private final Fault fault;
    private final Map<Integer, byte[]> lastReplyByTag = new HashMap<>();

    private BrokenRig(Transport inner, Fault fault) {
        this.inner = inner;
        this.fault = fault;
    }

    /** Starts a faulty rig on bench-4 and returns the host's end of the line. */
    static Transport open(Fault fault) {
        PipeTransport[] ends = PipeTransport.pair("broken:" + fault, 1 << 16);
        VirtualRig rig = new VirtualRig("bench-4", Scenarios.all().get("bench-4"), new BrokenRig(ends[1], fault),
                false);
        Thread t = new Thread(rig, "broken rig " + fault);
        t.setDaemon(true);
        t.start();
        return ends[0];
    }

    /** Serves one faulty session on the next connection to {@code server}, in a daemon thread. */
    public static void serveOnce(java.net.ServerSocket server, Fault fault) {
        Thread t = new Thread(() -> {
            try {
                java.net.Socket s = server.accept();
                Transport rigSide = Transports.acceptedTcp("tcp:broken", s);
                new VirtualRig("bench-4", Scenarios.all().get("bench-4"), new BrokenRig(rigSide, fault), false).run();
            } catch (IOException e) {
                // the test fails on what the kit reports
            }
        }, "broken rig on tcp");
        t.setDaemon(true);
        t.start();
    }

    @Override
    public String address() {
        return inner.address();
    }

    @Override
    public void write(byte[] bytes, int offset, int length) throws IOException {
        byte[] frame = Arrays.copyOfRange(bytes, offset, offset + length);
        byte type = frame[2];
        int tag = frame[3] & 0xFF;
        byte[] payload = Arrays.copyOfRange(frame, FrameCodec.HEADER_BYTES, frame.length - FrameCodec.CRC_BYTES);
        byte[] out = rewrite(new Frame(type, tag, payload));
        if (out != null) {
            inner.write(out, 0, out.length);
        }
    }

    private byte[] rewrite(Frame f) {
        switch (fault) {
            case REMEASURES_RETRIES -> {
                if (f.type() == Frame.REPLY && f.tag() != 0) {
                    byte[] before = lastReplyByTag.put(f.tag(), f.payload());
                    if (Arrays.equals(before, f.payload())) {
                        return FrameCodec.encode(Frame.text(Frame.REPLY, f.tag(), f.text() + " again=1"));
                    }
                }
            }
            case NO_HELLO_FIRST -> {
                if (f.type() == Frame.ERROR && f.text().startsWith("10 VERSION no session")) {
                    return FrameCodec.encode(Frame.text(Frame.REPLY, f.tag(), "OK leads=4"));
                }
            }
            case DAMAGES_FIRST_BLOCK -> {
                if (f.type() == Frame.BLOCK && f.payload()[0] == 0 && f.payload()[1] == 0 && f.payload()[2] == 0
                        && f.payload()[3] == 0) {
                    byte[] b = FrameCodec.encode(f);
                    b[b.length - 1] ^= 0x40;
                    return b;
                }
            }
            default -> throw new IllegalStateException(fault.name());
        }
        return FrameCodec.encode(f);
    }

    @Override
    public int read(byte[] dest, int offset, int length, int timeoutMs) throws IOException {
        return inner.read(dest, offset, length, timeoutMs);
    }

    @Override
    public void close() throws IOException {
        inner.close();
    }
}
