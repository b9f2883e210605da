package org.lodestep.cli;

import java.nio.file.Path;

import org.lodestep.rig.RigCapture;
import org.lodestep.rig.SweepPlan;

/** Saves a rig capture as a canonical CSV with its JSON sidecar, through the capture package's writer. */
final class RigCaptureFiles {
    private RigCaptureFiles() {
    }

    /** Writes the capture whole or not at all; returns the path written. */
    static Path save(RigCapture capture, Path csv, SweepPlan plan) throws java.io.IOException {
        throw new UnsupportedOperationException("capture writer not merged yet");
    }
}
