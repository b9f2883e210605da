package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Objects;

import org.lodestep.rig.RigCapture;
import org.lodestep.rig.RigClient;
import org.lodestep.rig.RigException;
import org.lodestep.drive.DriveMode;
import org.lodestep.rig.SweepPlan;
import org.lodestep.resonance.ResponsePoint;
import org.lodestep.resonance.SweepAnalyzer;
import org.lodestep.resonance.SweepLaw;
import org.lodestep.sample.Channel;

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

    /** Hears the response curve of the vibration while the sweep streams, for a live view. */
    @FunctionalInterface
    public interface Listener {
        /**
         * @param soFar     the response curve of the samples received so far, by rising step rate (the last points
         *                  may still change)
         * @param capturedS seconds of the sweep received
         * @param sweepS    the sweep's duration, s
         */
        void curve(List<ResponsePoint> soFar, double capturedS, double sweepS);

        Listener NONE = (soFar, capturedS, sweepS) -> { };
    }

    /** Seconds of samples between two live curves: a few updates a second read as live. */
    static final double LIVE_EVERY_S = 0.25;

    /**
     * @throws IllegalArgumentException a malformed address or a target that cannot be written (checked before the
     *                                  rig is touched)
     */
    public static Result run(Settings s, Progress progress) throws RigException, IOException {
        return run(s, progress, Listener.NONE);
    }

    /** As {@link #run(Settings, Progress)}, with the response curve heard as the sweep streams. */
    public static Result run(Settings s, Progress progress, Listener listener) throws RigException, IOException {
        RigCaptureFile.checkTarget(s.csv());
        RigCapture cap;
        progress.step("sweeping " + s.plan().fromFullStepsPerS() + " to " + s.plan().toFullStepsPerS()
                + " full steps/s on " + s.address());
        RigClient.Samples live = listener == Listener.NONE ? RigClient.Samples.NONE
                : new LiveCurve(s.plan(), listener, progress);
        try (RigClient c = RigClient.open(s.address())) {
            cap = s.drive() == null ? c.sweep(s.plan(), progress::advanced, live)
                    : c.sweep(s.plan(), s.drive(), s.supplyV(), progress::advanced, live);
        }
        String clipped = cap.metadata().getOrDefault("clipped_samples", "");
        if (!clipped.isEmpty()) {
            // at full scale the true value is unknown: peaks there are lower bounds
            progress.note("samples at the rig's full scale (clipped): " + clipped);
        }
        progress.step("saving " + s.csv());
        return new Result(cap, RigCaptureFile.save(cap, s.csv(), s.plan(), s.toolVersion()));
    }

    /**
     * Feeds the first channel (the one {@code resonance sweep} analyses by default) to a sweep analyzer as it
     * arrives and hands its response curve on every {@link #LIVE_EVERY_S} of samples.
     */
    private static final class LiveCurve implements RigClient.Samples {
        private final SweepPlan plan;
        private final Listener listener;
        private final Progress progress;
        private SweepAnalyzer analyzer;
        private double sampleRateHz;
        private long frames;
        private long nextAt;

        LiveCurve(SweepPlan plan, Listener listener, Progress progress) {
            this.plan = plan;
            this.listener = listener;
            this.progress = progress;
        }

        @Override
        public void started(List<Channel> channels, double sampleRateHz) {
            this.sampleRateHz = sampleRateHz;
            analyzer = channels.isEmpty() ? null : ResonanceSweep.live(channels.get(0), sampleRateHz,
                    new SweepLaw(plan.shape(), plan.fromFullStepsPerS(), plan.toFullStepsPerS(), plan.seconds()));
            nextAt = Math.max(1, Math.round(LIVE_EVERY_S * sampleRateHz));
        }

        @Override
        public void frames(double[][] samples) {
            if (analyzer == null || samples.length == 0) {
                return;
            }
            int n = samples[0].length;
            try {
                analyzer.feed(samples[0], null, 0, n);
            } catch (IllegalArgumentException e) {
                // the live view only: the saved capture is analysed whole, and says what is wrong with it
                progress.note("live curve stopped: " + e.getMessage());
                analyzer = null;
                return;
            }
            frames += n;
            if (frames >= nextAt) {
                nextAt = frames + Math.max(1, Math.round(LIVE_EVERY_S * sampleRateHz));
                List<ResponsePoint> soFar = analyzer.responseSoFar();
                if (!soFar.isEmpty()) {
                    listener.curve(soFar, frames / sampleRateHz, plan.seconds());
                }
            }
        }
    }
}
