package org.lodestep.capture;

import org.lodestep.sample.Channel;

import java.io.BufferedWriter;
import java.io.Closeable;
import java.io.IOException;
import java.io.OutputStream;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Clock;
import java.time.Instant;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;

/**
 * Writes a capture, block by block as a rig delivers it, as a canonical CSV plus its {@link CaptureSidecar}: whole or
 * not at all.
 *
 * <p>Rows go to a hidden temporary file in the target folder while the SHA-256 is computed on the way. {@link #commit}
 * flushes it to disk, writes the sidecar the same way, and moves both into place atomically (data first, so a sidecar
 * never names a missing or partial file). An interrupted capture ({@link #abandon}, or {@link #close} before commit)
 * is, by the caller's choice, either discarded, leaving nothing behind, or kept and marked {@code complete: false} with
 * the reason; it is never left looking complete.
 *
 * <pre>{@code
 * try (CaptureWriter w = CaptureWriter.create(dir.resolve("sweep-017.csv"), info, Interrupted.KEEP_INCOMPLETE)) {
 *     while (rig.hasBlock()) w.append(block, 0, n);
 *     w.commit();
 * }
 * }</pre>
 */
public final class CaptureWriter implements Closeable {

    /** What happens to a capture that is closed without {@link #commit}. */
    public enum Interrupted {
        /** Keep the rows written so far, marked {@code complete: false}. */
        KEEP_INCOMPLETE,
        /** Delete everything; as if the capture had never started. */
        DISCARD
    }

    private static final java.security.SecureRandom RANDOM = new java.security.SecureRandom();

    private final Path csvPath;
    private final Path sidecarPath;
    private final Path tempCsv;
    private final CaptureInfo info;
    private final Interrupted onInterrupt;
    private final Clock clock;
    private final MessageDigest digest;
    private final FileChannel channel;
    private final Writer out;
    private final int timeDecimals;
    private final char[] number = new char[40];
    private long frames;
    private boolean finished;

    private CaptureWriter(Path csvPath, CaptureInfo info, Interrupted onInterrupt, Clock clock) throws IOException {
        this.csvPath = csvPath.toAbsolutePath();
        String name = this.csvPath.getFileName().toString();
        if (!name.endsWith(".csv") || name.length() <= 4) {
            throw new IllegalArgumentException("capture file name must end in .csv, got " + name);
        }
        this.sidecarPath = this.csvPath.resolveSibling(name.substring(0, name.length() - 4) + ".json");
        for (Path p : new Path[] {this.csvPath, sidecarPath}) {
            if (Files.exists(p)) {
                throw new FileAlreadyExistsException(p.toString(), null, "a capture is never overwritten");
            }
        }
        this.info = info;
        this.onInterrupt = Objects.requireNonNull(onInterrupt, "onInterrupt");
        this.clock = clock;
        try {
            this.digest = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
        this.tempCsv = tempSibling(this.csvPath);
        try {
            this.channel = FileChannel.open(tempCsv, StandardOpenOption.WRITE, StandardOpenOption.CREATE_NEW);
        } catch (java.nio.file.NoSuchFileException e) {
            // named as the user gave it, never by the hidden temporary file's name
            throw new java.nio.file.NoSuchFileException(csvPath.toString());
        } catch (java.nio.file.AccessDeniedException e) {
            throw new java.nio.file.AccessDeniedException(csvPath.toString());
        } catch (java.nio.file.FileSystemException e) {
            throw new java.nio.file.FileSystemException(csvPath.toString(), null, e.getReason());
        }
        OutputStream os = new DigestOutputStream(Channels.newOutputStream(channel), digest);
        this.out = new BufferedWriter(new OutputStreamWriter(os, StandardCharsets.UTF_8), 1 << 16);
        // Enough decimals that consecutive time stamps differ by a hundred or more in the last digit.
        this.timeDecimals = Math.max(6, (int) Math.ceil(Math.log10(info.sampleRateHz())) + 2);
        try {
            writeHeader();
        } catch (IOException | RuntimeException e) {
            discardQuietly();
            throw e;
        }
    }

    /**
     * Starts a capture at {@code csvPath} (must end in {@code .csv}; the sidecar goes beside it as {@code .json}).
     *
     * @param onInterrupt what {@link #close} does when {@link #commit} was never called
     * @throws FileAlreadyExistsException when the CSV or its sidecar already exists
     */
    public static CaptureWriter create(Path csvPath, CaptureInfo info, Interrupted onInterrupt) throws IOException {
        return new CaptureWriter(csvPath, info, onInterrupt, Clock.systemUTC());
    }

    /** As {@link #create(Path, CaptureInfo, Interrupted)}, with the clock that stamps the end time (for tests). */
    public static CaptureWriter create(Path csvPath, CaptureInfo info, Interrupted onInterrupt, Clock clock)
            throws IOException {
        return new CaptureWriter(csvPath, info, onInterrupt, clock);
    }

    private void writeHeader() throws IOException {
        Map<String, String> m = new LinkedHashMap<>();
        m.put("lodestep_capture", Integer.toString(CaptureSidecar.FORMAT_VERSION));
        m.put("rig", info.rig());
        m.put("firmware_version", info.firmwareVersion());
        if (info.scenario() != null) {
            m.put("scenario", info.scenario());
        }
        if (info.serialNumber() != null) {
            m.put("serial_number", info.serialNumber());
        }
        m.put("tool_version", info.toolVersion());
        m.put("started_at", info.startedAt().toString());
        m.put("sample_rate_hz", Double.toString(info.sampleRateHz()));
        if (info.sweep() != null) {
            m.putAll(info.sweep().toMetadata());
        }
        info.metadata().entrySet().stream().sorted(Map.Entry.comparingByKey())
                .forEach(e -> m.put(e.getKey(), e.getValue()));
        for (Map.Entry<String, String> e : m.entrySet()) {
            out.write("# " + e.getKey() + "=" + e.getValue() + "\n");
        }
        StringBuilder h = new StringBuilder("time_s");
        for (Channel c : info.channels()) {
            h.append(',').append(c.header());
        }
        out.write(h.append('\n').toString());
    }

    /**
     * Appends {@code frames} frames from {@code block[channel][offset ...]}.
     *
     * @throws IllegalArgumentException on a non-finite sample (named by channel and frame); nothing of the block is
     *                                  written then
     * @throws IllegalStateException    after commit or abandon
     */
    public void append(double[][] block, int offset, int frames) throws IOException {
        if (finished) {
            throw new IllegalStateException("capture " + csvPath.getFileName() + " is already committed or abandoned");
        }
        int nc = info.channels().size();
        if (block.length != nc) {
            throw new IllegalArgumentException("block has " + block.length + " channels, capture has " + nc);
        }
        for (int c = 0; c < nc; c++) {
            for (int i = 0; i < frames; i++) {
                double v = block[c][offset + i];
                if (!Double.isFinite(v)) {
                    throw new IllegalArgumentException("sample " + (this.frames + i) + " of channel "
                            + info.channels().get(c).header() + " is " + v + ": expected a finite value");
                }
            }
        }
        double rate = info.sampleRateHz();
        for (int i = 0; i < frames; i++) {
            long index = this.frames + i;
            writeFixed(info.startTimeS() + index / rate, timeDecimals);
            for (int c = 0; c < nc; c++) {
                out.write(',');
                out.write(Double.toString(block[c][offset + i]));
            }
            out.write('\n');
        }
        this.frames += frames;
    }

    /** Writes {@code v} with exactly {@code decimals} digits after the point, without scientific notation. */
    private void writeFixed(double v, int decimals) throws IOException {
        long scale = 1;
        for (int i = 0; i < decimals; i++) {
            scale *= 10;
        }
        long q = Math.round(Math.abs(v) * scale);
        int p = number.length;
        for (int i = 0; i < decimals; i++) {
            number[--p] = (char) ('0' + q % 10);
            q /= 10;
        }
        number[--p] = '.';
        do {
            number[--p] = (char) ('0' + q % 10);
            q /= 10;
        } while (q > 0);
        if (v < 0) {
            number[--p] = '-';
        }
        out.write(number, p, number.length - p);
    }

    /** Frames appended so far. */
    public long frames() {
        return frames;
    }

    /** Finishes the capture and moves it into place; returns what the sidecar says. */
    public CaptureSidecar commit() throws IOException {
        return finish(true, null);
    }

    /**
     * Stops the capture early: with {@link Interrupted#KEEP_INCOMPLETE} the rows so far are kept and the sidecar says
     * {@code complete: false} and gives {@code reason}; with {@link Interrupted#DISCARD} nothing is left.
     *
     * @return the sidecar written, or null when discarded
     */
    public CaptureSidecar abandon(Interrupted policy, String reason) throws IOException {
        if (finished) {
            throw new IllegalStateException("capture " + csvPath.getFileName() + " is already committed or abandoned");
        }
        if (policy == Interrupted.DISCARD) {
            finished = true;
            discardQuietly();
            return null;
        }
        return finish(false, reason == null || reason.isBlank() ? "interrupted" : reason.replaceAll("[\\r\\n]+", " "));
    }

    private CaptureSidecar finish(boolean complete, String reason) throws IOException {
        if (finished) {
            throw new IllegalStateException("capture " + csvPath.getFileName() + " is already committed or abandoned");
        }
        finished = true;
        Path tempJson = null;
        boolean csvMoved = false;
        try {
            out.flush();
            channel.force(true);
            out.close();
            String sha = HexFormat.of().formatHex(digest.digest());
            CaptureSidecar sidecar = new CaptureSidecar(csvPath.getFileName().toString(), complete, reason,
                    info.rig(), info.firmwareVersion(), info.scenario(), info.serialNumber(), info.toolVersion(),
                    info.startedAt(), Instant.now(clock), info.sampleRateHz(), info.startTimeS(), frames,
                    info.channels(), info.sweep(), info.metadata(), sha);
            tempJson = tempSibling(sidecarPath);
            try (FileChannel jc = FileChannel.open(tempJson, StandardOpenOption.WRITE, StandardOpenOption.CREATE_NEW)) {
                jc.write(StandardCharsets.UTF_8.encode(sidecar.toJson()));
                jc.force(true);
            }
            Files.move(tempCsv, csvPath, StandardCopyOption.ATOMIC_MOVE);
            csvMoved = true;
            Files.move(tempJson, sidecarPath, StandardCopyOption.ATOMIC_MOVE);
            syncFolder();
            return sidecar;
        } catch (IOException | RuntimeException e) {
            discardQuietly();
            if (tempJson != null) {
                Files.deleteIfExists(tempJson);
            }
            if (csvMoved) {
                // Whole or not at all: data without its sidecar would look like an unverified plain CSV.
                Files.deleteIfExists(csvPath);
            }
            throw e;
        }
    }

    /**
     * A hidden name beside {@code target} for its temporary file. Opened with CREATE_NEW rather than made by
     * {@code Files.createTempFile}, whose owner-only permissions would stay on the capture after the move.
     */
    private static Path tempSibling(Path target) {
        return target.resolveSibling("." + target.getFileName() + "." + Long.toHexString(RANDOM.nextLong()) + ".part");
    }

    private void syncFolder() {
        // Makes the two renames durable on Linux; not every platform can open a folder, and that is not an error.
        try (FileChannel dir = FileChannel.open(csvPath.getParent(), StandardOpenOption.READ)) {
            dir.force(true);
        } catch (IOException e) {
            // best effort
        }
    }

    private void discardQuietly() {
        try {
            out.close();
        } catch (IOException e) {
            // the file is deleted next
        }
        try {
            Files.deleteIfExists(tempCsv);
        } catch (IOException e) {
            // a leftover hidden .part file is harmless and never read as a capture
        }
    }

    /** Applies the interrupt policy chosen at {@link #create} unless the capture was committed or abandoned. */
    @Override
    public void close() throws IOException {
        if (!finished) {
            abandon(onInterrupt, "closed before the capture was committed");
        }
    }
}
