package org.lodestep.capture;

import org.lodestep.sample.Channel;

import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Collections;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads a rig capture: its CSV, checked against the {@link CaptureSidecar} beside it.
 *
 * <p>Open it by either file. The sidecar's fields are merged into {@link #metadata()} (the sidecar wins where both
 * say something). Checks: the CSV's channels and sample rate match the sidecar's; the SHA-256 of the CSV's bytes and
 * the number of rows match the sidecar's. Those two are computed as the data streams past, so a capture of any
 * length is read once; a mismatch ends the read with an {@link InputFormatException} instead of reporting the end of
 * the signal, so no analysis of changed data completes. {@link #verify(Path)} checks a capture without streaming it.
 *
 * <p>An incomplete capture (interrupted and kept) is refused unless the caller passes {@link Incomplete#ACCEPT}; its
 * metadata then says {@code complete=false}.
 */
public final class CaptureReader implements SampleStream {

    /** Whether a capture marked {@code complete: false} may be read. */
    public enum Incomplete {
        /** Refuse it with an {@link InputFormatException}. */
        REJECT,
        /** Read it; {@code metadata().get("complete")} is {@code "false"}. */
        ACCEPT
    }

    private final CaptureSidecar sidecar;
    private final Path csvPath;
    private final MessageDigest digest;
    private final TimeSeriesCsvReader csv;
    private final Map<String, String> metadata;
    private long frames;
    private boolean verified;

    private CaptureReader(Path sidecarPath, CaptureSidecar sidecar, Incomplete incomplete)
            throws IOException, InputFormatException {
        this.sidecar = sidecar;
        Path dataName = Path.of(sidecar.dataFile());
        if (dataName.getNameCount() != 1 || dataName.isAbsolute()) {
            throw new InputFormatException(sidecarPath.toString(), InputFormatException.NO_LINE, "data_file",
                    sidecar.dataFile(), "expected a plain file name in the sidecar's folder");
        }
        this.csvPath = sidecarPath.toAbsolutePath().resolveSibling(dataName);
        if (!sidecar.complete() && incomplete == Incomplete.REJECT) {
            throw new InputFormatException(sidecarPath.toString(), InputFormatException.NO_LINE, "complete", "false",
                    "marks an incomplete capture (" + sidecar.interruption() + ", " + sidecar.frames()
                            + " frames kept): expected a complete capture, or accept incomplete ones explicitly");
        }
        if (!Files.exists(csvPath)) {
            throw new NoSuchFileException(csvPath.toString(), null, "data file named by " + sidecarPath);
        }
        this.digest = sha256();
        InputStream in = new DigestInputStream(Files.newInputStream(csvPath), digest);
        this.csv = TimeSeriesCsvReader.open(in, csvPath.toString());
        try {
            checkMatches();
        } catch (InputFormatException | RuntimeException e) {
            csv.close();
            throw e;
        }
        Map<String, String> m = new LinkedHashMap<>(csv.metadata());
        m.putAll(sidecar.toMetadata());
        this.metadata = Collections.unmodifiableMap(m);
    }

    private void checkMatches() throws InputFormatException {
        if (!csv.channels().equals(sidecar.channels())) {
            throw new InputFormatException(csvPath.toString(), InputFormatException.NO_LINE, null, null,
                    "has channels " + csv.channels() + " but its sidecar lists " + sidecar.channels()
                            + ": expected the same channels");
        }
        if (Math.abs(csv.sampleRateHz() - sidecar.sampleRateHz()) > 1e-9 * sidecar.sampleRateHz()) {
            throw new InputFormatException(csvPath.toString(), InputFormatException.NO_LINE, "time_s", null,
                    "runs at " + csv.sampleRateHz() + " Hz but its sidecar says " + sidecar.sampleRateHz()
                            + " Hz: expected the same sample rate");
        }
    }

    /** Opens a capture by its sidecar ({@code .json}) or its CSV (the sidecar is looked for beside it). */
    public static CaptureReader open(Path path, Incomplete incomplete) throws IOException, InputFormatException {
        Path sidecarPath = sidecarOf(path);
        if (sidecarPath == null) {
            throw new InputFormatException(path.toString(), InputFormatException.NO_LINE, null, null,
                    "has no capture sidecar beside it: expected " + withExtension(path, ".json"));
        }
        CaptureSidecar sidecar = CaptureSidecar.read(sidecarPath);
        if (!sidecarPath.equals(path) && !path.getFileName().toString().equals(sidecar.dataFile())) {
            throw new InputFormatException(sidecarPath.toString(), InputFormatException.NO_LINE, "data_file",
                    sidecar.dataFile(), "is the data file this sidecar belongs to, not " + path.getFileName()
                            + " (renamed files? rename the pair together and keep data_file in step)");
        }
        return new CaptureReader(sidecarPath, sidecar, incomplete);
    }

    /** The sidecar of a capture given by either file, or null when a CSV has no sidecar beside it. */
    static Path sidecarOf(Path path) {
        String name = path.getFileName().toString();
        if (name.toLowerCase(java.util.Locale.ROOT).endsWith(".json")) {
            return path;
        }
        Path json = withExtension(path, ".json");
        return Files.isRegularFile(json) ? json : null;
    }

    private static Path withExtension(Path path, String ext) {
        String name = path.getFileName().toString();
        int dot = name.lastIndexOf('.');
        return path.resolveSibling((dot > 0 ? name.substring(0, dot) : name) + ext);
    }

    /**
     * Checks a capture's data file against its sidecar (SHA-256 and row count) by reading it through.
     *
     * @return the sidecar, when everything matches
     * @throws InputFormatException naming the file and what differs
     */
    public static CaptureSidecar verify(Path path) throws IOException, InputFormatException {
        try (CaptureReader r = open(path, Incomplete.ACCEPT)) {
            double[][] block = new double[r.channels().size()][8192];
            while (r.read(block, 0, 8192) >= 0) {
                // reading is the check
            }
            return r.sidecar;
        }
    }

    private static MessageDigest sha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime has SHA-256", e);
        }
    }

    /** The row count the sidecar recorded (checked when the read reaches the end). */
    @Override
    public long knownFrameCount() {
        return sidecar.frames();
    }

    /** What the sidecar says. */
    public CaptureSidecar sidecar() {
        return sidecar;
    }

    @Override
    public String source() {
        return csv.source();
    }

    @Override
    public List<Channel> channels() {
        return csv.channels();
    }

    @Override
    public double sampleRateHz() {
        return csv.sampleRateHz();
    }

    @Override
    public double startTimeS() {
        return csv.startTimeS();
    }

    @Override
    public Map<String, String> metadata() {
        return metadata;
    }

    @Override
    public int read(double[][] dest, int offset, int maxFrames) throws IOException, InputFormatException {
        int n = csv.read(dest, offset, maxFrames);
        if (n > 0) {
            frames += n;
            return n;
        }
        if (n < 0 && !verified) {
            String sha = HexFormat.of().formatHex(digest.digest());
            if (!sha.equals(sidecar.sha256())) {
                throw new InputFormatException(csvPath.toString(), InputFormatException.NO_LINE, null, null,
                        "has SHA-256 " + sha + " but its sidecar recorded " + sidecar.sha256()
                                + ": the data file was changed or damaged after the capture");
            }
            if (frames != sidecar.frames()) {
                throw new InputFormatException(csvPath.toString(), InputFormatException.NO_LINE, null, null,
                        "has " + frames + " rows but its sidecar recorded " + sidecar.frames());
            }
            verified = true;
        }
        return n;
    }

    @Override
    public void close() throws IOException {
        csv.close();
    }
}
