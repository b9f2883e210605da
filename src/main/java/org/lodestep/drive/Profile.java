package org.lodestep.drive;

import java.util.ArrayList;
import java.util.List;

/**
 * A planned move from standstill to the cruise rate, a cruise, and back to standstill, held as stretches of constant
 * jerk (full steps, seconds).
 */
public final class Profile {
    private final ProfileSettings settings;
    private final double baseAccelerationFullStepsPerS2;
    private final double jerkFullStepsPerS3;
    private final double accelerationS;
    private final List<BandCrossing> crossings;
    private final List<Segment> segments;

    Profile(ProfileSettings settings, double baseAccelerationFullStepsPerS2, double jerkFullStepsPerS3,
            double accelerationS, List<BandCrossing> crossings, List<Segment> segments) {
        this.settings = settings;
        this.baseAccelerationFullStepsPerS2 = baseAccelerationFullStepsPerS2;
        this.jerkFullStepsPerS3 = jerkFullStepsPerS3;
        this.accelerationS = accelerationS;
        this.crossings = List.copyOf(crossings);
        this.segments = List.copyOf(segments);
    }

    /** What was planned. */
    public ProfileSettings settings() {
        return settings;
    }

    /** Acceleration outside the bands, full steps/s². */
    public double baseAccelerationFullStepsPerS2() {
        return baseAccelerationFullStepsPerS2;
    }

    /** Jerk limit used, full steps/s³ (+inf for trapezoidal). */
    public double jerkFullStepsPerS3() {
        return jerkFullStepsPerS3;
    }

    /** Time from standstill to the cruise rate, s. */
    public double accelerationS() {
        return accelerationS;
    }

    /** How each band below the cruise rate is crossed, by rising rate. */
    public List<BandCrossing> crossings() {
        return crossings;
    }

    /** Whole duration, s. */
    public double durationS() {
        return segments.get(segments.size() - 1).endS();
    }

    /** Distance travelled, full steps. */
    public double distanceFullSteps() {
        Segment s = segments.get(segments.size() - 1);
        return s.positionAt(s.endS());
    }

    /** Rate at a time, full steps/s. */
    public double rateAt(double t) {
        return Math.max(0, find(t).rateAt(t));
    }

    /** Acceleration at a time, full steps/s². */
    public double accelerationAt(double t) {
        return find(t).accelAt(t);
    }

    /** Position at a time, full steps from the start. */
    public double positionAt(double t) {
        return find(t).positionAt(t);
    }

    /** Highest acceleration magnitude of the profile, full steps/s². */
    public double peakAccelerationFullStepsPerS2() {
        double peak = 0;
        for (Segment s : segments) {
            peak = Math.max(peak, Math.max(Math.abs(s.accel()), Math.abs(s.accelAt(s.endS()))));
        }
        return peak;
    }

    /** The step-rate table at the settings' table step (the last row at the end of the move). */
    public StepRateTable table(org.lodestep.resonance.RateUnits units) {
        double dt = settings.tableStepS();
        double end = durationS();
        int n = (int) Math.floor(end / dt + 1e-9);
        List<StepRateTable.Row> rows = new ArrayList<>(n + 2);
        for (int k = 0; k <= n; k++) {
            double t = k * dt;
            rows.add(row(t, units));
        }
        if (end - n * dt > 1e-9) {
            rows.add(row(end, units));
        }
        return new StepRateTable(units, settings.shape(), rows);
    }

    private StepRateTable.Row row(double t, org.lodestep.resonance.RateUnits units) {
        double v = rateAt(t);
        return new StepRateTable.Row(t, v, units.pulsesPerS(v), positionAt(t));
    }

    private Segment find(double t) {
        int lo = 0;
        int hi = segments.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi + 1) >>> 1;
            if (segments.get(mid).startS() <= t) {
                lo = mid;
            } else {
                hi = mid - 1;
            }
        }
        return segments.get(lo);
    }
}
