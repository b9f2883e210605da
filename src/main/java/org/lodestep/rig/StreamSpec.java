package org.lodestep.rig;

import java.util.ArrayList;
import java.util.List;

import org.lodestep.sample.Channel;

/**
 * The header of a sample stream, sent as the reply to a streaming command: channels with their units and
 * least-significant-bit sizes, sample rate, and how many frames and blocks follow.
 *
 * <p>On the wire: {@code OK stream rate_hz=5000 frames=100000 block_frames=256 blocks=391
 * channels=accel:g:0.0005,current:a:0.0002,step:v:0.001}.
 */
record StreamSpec(List<Channel> channels, double[] lsb, double rateHz, int frames, int blockFrames) {
    StreamSpec {
        channels = List.copyOf(channels);
        lsb = lsb.clone();
        if (channels.isEmpty() || channels.size() != lsb.length) {
            throw new IllegalArgumentException("need one lsb per channel");
        }
        if (!(rateHz > 0) || !Double.isFinite(rateHz)) {
            throw new IllegalArgumentException("sample rate must be positive, got " + rateHz + " Hz");
        }
        if (frames < 1 || blockFrames < 1) {
            throw new IllegalArgumentException("frames and block_frames must be positive");
        }
        if (8 + 2L * blockFrames * channels.size() > FrameCodec.MAX_PAYLOAD_BYTES) {
            throw new IllegalArgumentException("a block of " + blockFrames + " frames x " + channels.size()
                    + " channels does not fit in one frame");
        }
        for (double l : lsb) {
            if (!(l > 0) || !Double.isFinite(l)) {
                throw new IllegalArgumentException("lsb must be positive, got " + l);
            }
        }
    }

    int blocks() {
        return (frames + blockFrames - 1) / blockFrames;
    }

    /** Frames in block {@code seq} (the last one may be short). */
    int framesIn(int seq) {
        return Math.min(blockFrames, frames - seq * blockFrames);
    }

    String encode() {
        StringBuilder b = new StringBuilder("OK stream rate_hz=").append(fmt(rateHz)).append(" frames=").append(frames)
                .append(" block_frames=").append(blockFrames).append(" blocks=").append(blocks()).append(" channels=");
        for (int c = 0; c < channels.size(); c++) {
            if (c > 0) {
                b.append(',');
            }
            b.append(channels.get(c).name()).append(':').append(channels.get(c).unit()).append(':')
                    .append(fmt(lsb[c]));
        }
        return b.toString();
    }

    static StreamSpec decode(String text) throws RigException {
        Fields f = Fields.parse(text);
        if (!f.word(0).equals("OK") || !f.word(1).equals("stream")) {
            throw new RigException("expected a stream header, got '" + text + "'");
        }
        List<Channel> ch = new ArrayList<>();
        String[] parts = f.get("channels").split(",");
        double[] lsb = new double[parts.length];
        for (int i = 0; i < parts.length; i++) {
            String[] p = parts[i].split(":");
            if (p.length != 3) {
                throw new RigException("stream header channel '" + parts[i] + "' is not name:unit:lsb");
            }
            try {
                ch.add(new Channel(p[0], p[1]));
                lsb[i] = Double.parseDouble(p[2]);
            } catch (IllegalArgumentException e) {
                throw new RigException("stream header channel '" + parts[i] + "': " + e.getMessage());
            }
        }
        try {
            StreamSpec s = new StreamSpec(ch, lsb, f.number("rate_hz"), f.integer("frames"), f.integer("block_frames"));
            if (s.blocks() != f.integer("blocks")) {
                throw new RigException("stream header: blocks=" + f.get("blocks") + " but frames/block_frames give "
                        + s.blocks());
            }
            return s;
        } catch (IllegalArgumentException e) {
            throw new RigException("stream header '" + text + "': " + e.getMessage());
        }
    }

    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
