package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.Map;

import org.lodestep.capture.CaptureInfo;
import org.lodestep.capture.CaptureWriter;
import org.lodestep.capture.SweepProfile;
import org.lodestep.rig.RigCapture;
import org.lodestep.rig.SweepPlan;
import org.lodestep.sample.SampledSignal;

/**
 * Saves a rig capture as a canonical CSV with its JSON sidecar through {@link CaptureWriter}: the provenance the
 * rig reported (identity, firmware, command, scenario or motor serial, times) and, for a sweep, its profile.
 */
public final class RigCaptureFile {
    /** Frames handed to the writer per call. */
    private static final int CHUNK_FRAMES = 65_536;

    private RigCaptureFile() {
    }

    /**
     * Refuses a target that cannot be written, before anything is measured: the name must end in {@code .csv}
     * (the sidecar takes {@code .json}), neither file may exist (a capture is never overwritten), and its folder
     * must exist.
     *
     * @throws IllegalArgumentException naming the file and what is wrong
     */
    public static void checkTarget(Path csv) {
        String name = csv.getFileName().toString();
        if (!name.endsWith(".csv") || name.length() <= 4) {
            throw new IllegalArgumentException("capture file " + csv + ": the name must end in .csv (the sidecar"
                    + " gets .json)");
        }
        Path sidecar = sidecarOf(csv);
        for (Path p : new Path[] {csv, sidecar}) {
            if (Files.exists(p)) {
                throw new IllegalArgumentException(p + " already exists: a capture is never overwritten");
            }
        }
        Path dir = csv.toAbsolutePath().getParent();
        if (dir != null && !Files.isDirectory(dir)) {
            throw new IllegalArgumentException("capture file " + csv + ": folder " + dir + " does not exist");
        }
    }

    /** The sidecar written beside a capture CSV: the same name ending in {@code .json}. */
    public static Path sidecarOf(Path csv) {
        String name = csv.getFileName().toString();
        return csv.resolveSibling(name.substring(0, name.length() - 4) + ".json");
    }

    /**
     * Writes the capture whole (CSV and sidecar moved into place together) or not at all.
     *
     * @param plan        the sweep it recorded, or null for other captures
     * @param toolVersion this program's version, recorded in the sidecar
     * @return the CSV path
     */
    public static Path save(RigCapture capture, Path csv, SweepPlan plan, String toolVersion) throws IOException {
        return save(capture, csv, plan, toolVersion, Map.of());
    }

    /**
     * As {@link #save(RigCapture, Path, SweepPlan, String)}, with the metadata the capture's analysis needs
     * ({@code leads}, {@code supply_v}, {@code series_ohm} of a step response), so the file analyses as it comes.
     */
    public static Path save(RigCapture capture, Path csv, SweepPlan plan, String toolVersion,
                            Map<String, String> analysis) throws IOException {
        Map<String, String> m = capture.metadata();
        SampledSignal s = capture.signal();
        Map<String, String> extra = new LinkedHashMap<>(analysis);
        extra.put("capture_kind", capture.kind());
        extra.put("rig_address", m.getOrDefault("address", "?"));
        extra.put("rig_command", m.getOrDefault("command", "?"));
        extra.put("rig_protocol", m.getOrDefault("protocol", "?"));
        extra.put("rig_received_at", m.getOrDefault("finished_utc", "?"));
        SweepProfile sweep = plan == null ? null : SweepProfile.of(plan.shape(), plan.fromFullStepsPerS(),
                plan.toFullStepsPerS(), plan.seconds(), plan.microsteps());
        CaptureInfo info = new CaptureInfo(m.getOrDefault("rig", "rig") + " " + m.getOrDefault("rig_id", "?"),
                m.getOrDefault("firmware", "?"), m.get("scenario"), m.get("motor_serial"), toolVersion,
                Instant.parse(m.get("started_utc")), s.sampleRateHz(), 0.0, s.channels(), sweep, extra);
        double[][] all = new double[s.channels().size()][];
        for (int c = 0; c < all.length; c++) {
            all[c] = s.channel(c);
        }
        try (CaptureWriter w = CaptureWriter.create(csv, info, CaptureWriter.Interrupted.DISCARD)) {
            for (int i = 0; i < s.length(); i += CHUNK_FRAMES) {
                w.append(all, i, Math.min(CHUNK_FRAMES, s.length() - i));
            }
            w.commit();
        }
        return csv;
    }
}
