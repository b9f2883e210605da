package org.lodestep.capture;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * The one way in for time-series input: opens a CSV, a WAV or a rig capture as a {@link SampleStream}.
 *
 * <p>Dispatch looks at the content first and the extension second: bytes {@code RIFF} are a WAV
 * ({@link WavReader}); a {@code .json} file is a capture sidecar ({@link CaptureReader}); a CSV with a capture
 * sidecar beside it ({@code name.json} next to {@code name.csv}) is a rig capture, checked against its sidecar;
 * any other file is read as a time-series CSV ({@link TimeSeriesCsvReader}).
 */
public final class Captures {
    private Captures() {
    }

    /** Opens a file; captures marked incomplete are refused (see {@link #open(Path, CaptureReader.Incomplete)}). */
    public static SampleStream open(Path path) throws IOException, InputFormatException {
        return open(path, CaptureReader.Incomplete.REJECT);
    }

    /** Opens a file, with the caller's choice for a capture whose sidecar says it is incomplete. */
    public static SampleStream open(Path path, CaptureReader.Incomplete incomplete)
            throws IOException, InputFormatException {
        Kind kind = kindOf(path);
        switch (kind) {
            case WAV:
                return WavReader.open(path);
            case CAPTURE:
                return CaptureReader.open(path, incomplete);
            default:
                return TimeSeriesCsvReader.open(path);
        }
    }

    /** Reads a whole file into memory: for short captures (step responses, ring-downs, hand-turned back-EMF). */
    public static SampledSignal readAll(Path path) throws IOException, InputFormatException {
        try (SampleStream s = open(path)) {
            return SampledSignal.readAll(s);
        }
    }

    enum Kind { CSV, WAV, CAPTURE }

    static Kind kindOf(Path path) throws IOException {
        byte[] head = new byte[4];
        int n;
        try (InputStream in = Files.newInputStream(path)) {
            n = in.readNBytes(head, 0, 4);
        }
        String name = path.getFileName().toString().toLowerCase(Locale.ROOT);
        if (n == 4 && head[0] == 'R' && head[1] == 'I' && head[2] == 'F' && head[3] == 'F'
                || name.endsWith(".wav") || name.endsWith(".wave")) {
            return Kind.WAV;
        }
        if (name.endsWith(".json")) {
            return Kind.CAPTURE;
        }
        Path beside = CaptureReader.sidecarOf(path);
        return beside != null && looksLikeSidecar(beside) ? Kind.CAPTURE : Kind.CSV;
    }

    /** A JSON file beside a CSV is its sidecar only if it says so; a user's own notes file is left alone. */
    private static boolean looksLikeSidecar(Path json) throws IOException {
        byte[] head;
        try (InputStream in = Files.newInputStream(json)) {
            head = in.readNBytes(4096);
        }
        String text = new String(head, java.nio.charset.StandardCharsets.UTF_8);
        return text.contains("\"" + CaptureSidecar.FORMAT + "\"");
    }
}
