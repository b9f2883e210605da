package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Objects;

import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.drive.DriveMode;
import org.lodestep.rig.SweepPlan;

/**
 * Records a step-rate sweep through a bench rig and saves it: connects, drives the sweep (the rig's step/direction
 * output into the user's driver) while streaming vibration, current and the step marker, then writes the capture
 * with its provenance ({@link RigCaptureFile}). The axis moves: the front end shows the moving-axis caution before
 * calling {@link #run}.
 */
public final class RigSweepCapture {
    private RigSweepCapture() {
    }

    /**
     * @param address     rig address ({@code serial:}, {@code tcp:}, {@code sim:})
     * @param plan        the sweep to drive
     * @param csv         capture file to write (must not exist; the sidecar goes beside it as .json)
     * @param toolVersion this program's version, for the sidecar
     * @param drive       the rig's own drive, recording both phase currents (constant voltage or chopper), or null
     *                    for the user's driver on the step output (accelerometer, one current, step marker)
     * @param supplyV     the rig drive's supply, V, or 0 for its default
     */
    public record Settings(String address, SweepPlan plan, Path csv, String toolVersion, DriveMode drive,
                           double supplyV) {
        public Settings {
            Objects.requireNonNull(address, "address");
            Objects.requireNonNull(plan, "plan");
            Objects.requireNonNull(csv, "csv");
            if (!(supplyV >= 0) || !Double.isFinite(supplyV)) {
                throw new IllegalArgumentException("supply must be zero (default) or positive, got " + supplyV + " V");
            }
        }

        /** A sweep of the user's driver on the step output. */
        public Settings(String address, SweepPlan plan, Path csv, String toolVersion) {
            this(address, plan, csv, toolVersion, null, 0);
        }
    }

    /** The capture as received and where it was saved. */
    public record Result(RigCapture capture, Path saved) {
    }

    /**
     * @throws IllegalArgumentException a malformed address or a target that cannot be written (checked before the
     *                                  rig is touched)
     */
    public static Result run(Settings s, Progress progress) throws RigException, IOException {
        RigCaptureFile.checkTarget(s.csv());
        RigCapture cap;
        progress.step("sweeping " + s.plan().fromFullStepsPerS() + " to " + s.plan().toFullStepsPerS()
                + " full steps/s on " + s.address());
        try (RigClient c = RigClient.open(s.address())) {
            cap = s.drive() == null ? c.sweep(s.plan(), progress::advanced)
                    : c.sweep(s.plan(), s.drive(), s.supplyV(), progress::advanced);
        }
        String clipped = cap.metadata().getOrDefault("clipped_samples", "");
        if (!clipped.isEmpty()) {
            // at full scale the true value is unknown: peaks there are lower bounds
            progress.note("samples at the rig's full scale (clipped): " + clipped);
        }
        progress.step("saving " + s.csv());
        return new Result(cap, RigCaptureFile.save(cap, s.csv(), s.plan(), s.toolVersion()));
    }
}
