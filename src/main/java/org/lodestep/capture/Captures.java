package org.lodestep.capture;

import org.lodestep.sample.ArraySampleStream;
import org.lodestep.sample.InputFiles;
import org.lodestep.sample.InputFormatException;
import org.lodestep.sample.SampleStream;
import org.lodestep.sample.SampledSignal;
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
        InputFiles.requireFile(path, "a capture file (CSV, WAV or a rig capture)");
        Kind kind = kindOf(path);
        switch (kind) {
            case WAV:
                return WavReader.open(path);
            case CAPTURE:
                return CaptureReader.open(path, incomplete);
            default:
                return plainCsv(path);
        }
    }

    /**
     * A CSV without a sidecar; refused when its own header says it is a rig capture, because then nothing can tell
     * whether it is complete and unchanged.
     */
    private static SampleStream plainCsv(Path path) throws IOException, InputFormatException {
        TimeSeriesCsvReader csv = TimeSeriesCsvReader.open(path);
        if (csv.metadata().containsKey("lodestep_capture")) {
            csv.close();
            String name = path.getFileName().toString();
            int dot = name.lastIndexOf('.');
            throw new InputFormatException(path.toString(), InputFormatException.NO_LINE, null, null,
                    "is a rig capture whose sidecar is missing: expected " + (dot > 0 ? name.substring(0, dot) : name)
                            + ".json beside it, to check that the data are complete and unchanged");
        }
        return csv;
    }

    /**
     * Wraps a stream so a background thread reads (parses, decodes) ahead while the caller computes: on a machine
     * with a second core the analysis of a large CSV then costs about the larger of parsing and computing instead of
     * their sum. Same frames, same errors at the same place. With one core the stream is returned as it is.
     * Closing the returned stream stops the thread and closes {@code in}.
     *
     * @param blockFrames frames per block handed over (e.g. 65536); three blocks are in flight at most
     */
    public static SampleStream readAhead(SampleStream in, int blockFrames) {
        if (blockFrames < 1) {
            throw new IllegalArgumentException("block must hold at least one frame, got " + blockFrames);
        }
        if (Runtime.getRuntime().availableProcessors() < 2 || in instanceof ArraySampleStream) {
            return in;
        }
        return new ReadAheadSampleStream(in, blockFrames, 3);
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
