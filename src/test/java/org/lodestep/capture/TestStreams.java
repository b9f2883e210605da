package org.lodestep.capture;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** Helpers shared by the capture tests: fixture paths and whole-stream reads. */
final class TestStreams {
    private TestStreams() {
    }

    static Path fixture(String name) {
        try {
            return Path.of(TestStreams.class.getResource(name).toURI());
        } catch (URISyntaxException | NullPointerException e) {
            throw new IllegalStateException("missing test fixture " + name, e);
        }
    }

    static InputStream text(String s) {
        return new ByteArrayInputStream(s.getBytes(StandardCharsets.UTF_8));
    }

    /** {@code v} with exactly {@code decimals} digits after the point (like {@code %.Nf}, but fast). */
    static String fixed(double v, int decimals) {
        long scale = (long) Math.pow(10, decimals);
        long q = Math.round(Math.abs(v) * scale);
        String frac = Long.toString(q % scale);
        return (v < 0 ? "-" : "") + q / scale + "." + "0".repeat(decimals - frac.length()) + frac;
    }

    /** Reads a stream to its end in blocks of {@code block} frames. */
    static double[][] readAll(SampleStream s, int block) throws IOException, InputFormatException {
        int nc = s.channels().size();
        double[][] all = new double[nc][16];
        double[][] buf = new double[nc][block];
        int n = 0;
        int got;
        while ((got = s.read(buf, 0, block)) >= 0) {
            for (int c = 0; c < nc; c++) {
                if (all[c].length < n + got) {
                    all[c] = java.util.Arrays.copyOf(all[c], Math.max(2 * all[c].length, n + got));
                }
                System.arraycopy(buf[c], 0, all[c], n, got);
            }
            n += got;
        }
        for (int c = 0; c < nc; c++) {
            all[c] = java.util.Arrays.copyOf(all[c], n);
        }
        return all;
    }
}
