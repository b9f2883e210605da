package org.lodestep.rig;

import java.util.ArrayList;
import java.util.List;

/**
 * Gathers the sample blocks of one stream in any order, checks each against the stream header, and knows which are
 * still missing and how often each was asked for again. Hands out samples only when every block is present.
 */
final class BlockCollector {
    private final StreamSpec spec;
    private final short[][] got;
    private final int[] requests;
    private int have;
    private int lowestMissing;
    private long framesReceived;

    BlockCollector(StreamSpec spec) {
        this.spec = spec;
        this.got = new short[spec.blocks()][];
        this.requests = new int[spec.blocks()];
    }

    int blocks() {
        return got.length;
    }

    int have() {
        return have;
    }

    boolean complete() {
        return have == got.length;
    }

    /** Frames the whole stream holds. */
    long totalFrames() {
        return spec.frames();
    }

    long framesReceived() {
        return framesReceived;
    }

    /**
     * Takes a block; a repeat of a block already held is ignored.
     *
     * @return whether the block was new
     * @throws RigException when the block contradicts the header (sequence, frame or channel count)
     */
    boolean accept(SampleBlock b) throws RigException {
        int nc = spec.channels().size();
        if (b.seq() >= got.length || b.channels() != nc || b.frames() != spec.framesIn(b.seq())) {
            throw new RigException("block " + b.seq() + " (" + b.frames() + " frames x " + b.channels()
                    + " channels) does not match the stream header (" + got.length + " blocks of "
                    + spec.blockFrames() + " x " + nc + ")");
        }
        if (got[b.seq()] != null) {
            return false;
        }
        got[b.seq()] = b.samples();
        have++;
        framesReceived += b.frames();
        while (lowestMissing < got.length && got[lowestMissing] != null) {
            lowestMissing++;
        }
        return true;
    }

    /** Missing blocks before {@code seq} never asked for yet: a gap the line just revealed. */
    List<Integer> unrequestedBefore(int seq) {
        List<Integer> out = new ArrayList<>();
        for (int s = lowestMissing; s < Math.min(seq, got.length); s++) {
            if (got[s] == null && requests[s] == 0) {
                out.add(s);
            }
        }
        return out;
    }

    /** Up to {@code max} missing blocks, oldest first. */
    List<Integer> missing(int max) {
        List<Integer> out = new ArrayList<>();
        for (int s = lowestMissing; s < got.length && out.size() < max; s++) {
            if (got[s] == null) {
                out.add(s);
            }
        }
        return out;
    }

    /** How many times block {@code seq} has been asked for again. */
    int requests(int seq) {
        return requests[seq];
    }

    void noteRequest(int seq) {
        requests[seq]++;
    }

    /** Takes back a request the rig could not serve yet (the block was not sent), so it does not count. */
    void forgetRequest(int seq) {
        if (seq >= 0 && seq < requests.length && requests[seq] > 0) {
            requests[seq]--;
        }
    }

    /** Blocks held without a gap from the first: those a listener may hear in order. */
    int contiguous() {
        return lowestMissing;
    }

    /** One held block's samples in the channels' units, [channel][frame]. */
    double[][] block(int seq) {
        short[] v = got[seq];
        int nc = spec.channels().size();
        int n = v.length / nc;
        double[][] out = new double[nc][n];
        for (int i = 0; i < n; i++) {
            for (int c = 0; c < nc; c++) {
                out[c][i] = v[i * nc + c] * spec.lsb()[c];
            }
        }
        return out;
    }

    /** The samples in the channels' units, [channel][frame]; only when {@link #complete()}. */
    double[][] samples() {
        if (!complete()) {
            throw new IllegalStateException(have + " of " + got.length + " blocks: the stream is not complete");
        }
        int nc = spec.channels().size();
        double[][] samples = new double[nc][spec.frames()];
        for (int s = 0; s < got.length; s++) {
            short[] v = got[s];
            int base = s * spec.blockFrames();
            int n = v.length / nc;
            for (int i = 0; i < n; i++) {
                for (int c = 0; c < nc; c++) {
                    samples[c][base + i] = v[i * nc + c] * spec.lsb()[c];
                }
            }
        }
        return samples;
    }
}
