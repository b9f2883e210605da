package org.lodestep.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.lodestep.capture.AvoidListFile;
import org.lodestep.capture.AvoidListReader;
import org.lodestep.drive.Band;
import org.lodestep.drive.MotionPlanner;
import org.lodestep.drive.Profile;
import org.lodestep.drive.ProfileSettings;
import org.lodestep.drive.ProfileShape;
import org.lodestep.drive.StepRateTable;
import org.lodestep.sample.InputFormatException;

/**
 * Use case: a motion profile from standstill to a target speed and back that respects the torque with margin and
 * crosses the bands of an avoid-list fast enough, with its step-rate table.
 */
public final class DrivePlan {
    private DrivePlan() {
    }

    /**
     * @param curve             the motor, drive, load, target and margin (the target is required)
     * @param avoidList         avoid-list JSON, or null for none
     * @param shape             trapezoidal or S-curve
     * @param maxAccelerationFullStepsPerS2 the user's acceleration limit, or +inf
     * @param jerkFullStepsPerS3 jerk limit, or NaN for the default
     * @param cruiseS           time at the target speed, s
     * @param tableStepS        table time step, s
     * @param simulate          also play the table on the virtual rig ({@link DriveSimulation})
     */
    public record Settings(DriveCurve.Settings curve, Path avoidList, ProfileShape shape,
                           double maxAccelerationFullStepsPerS2, double jerkFullStepsPerS3, double cruiseS,
                           double tableStepS, boolean simulate) {
    }

    /**
     * @param curve       the curve and the answer at the target
     * @param avoidSource the avoid-list's file name, or null
     * @param bands       the bands the profile respects
     * @param profile     the profile
     * @param table       its step-rate table
     * @param notes       what the user should know about the inputs
     * @param simulation  the virtual rig's run of the table, or null when not asked for
     */
    public record Result(DriveCurve.Result curve, String avoidSource, List<Band> bands, Profile profile,
                         StepRateTable table, List<String> notes, DriveSimulation.Result simulation) {
        public Result {
            bands = List.copyOf(bands);
            notes = List.copyOf(notes);
        }
    }

    public static Result run(Settings s, Progress progress) throws IOException, InputFormatException {
        if (Double.isNaN(s.curve().target())) {
            throw new SettingsException("a profile needs a target speed (--target-mm-per-s, --target-rpm,"
                    + " --target-full-steps-per-s or --target-pulses-per-s)");
        }
        DriveCurve.Result c = DriveCurve.run(s.curve(), progress);
        List<String> notes = new ArrayList<>(c.notes());
        List<Band> bands = new ArrayList<>();
        String avoidSource = null;
        if (s.avoidList() != null) {
            progress.step("reading " + s.avoidList().getFileName());
            AvoidListFile a = AvoidListReader.read(s.avoidList());
            avoidSource = a.source();
            if (a.rotorTeeth() != c.units().rotorTeeth()) {
                notes.add("the avoid-list was made for " + a.rotorTeeth() + " rotor teeth, the motor has "
                        + c.units().rotorTeeth() + ": its full-step rates are used as they are");
            }
            for (AvoidListFile.Range r : a.ranges()) {
                double acc = r.minAccelerationFullStepsPerS2();
                if (Double.isNaN(acc)) {
                    notes.add(String.format(java.util.Locale.ROOT, "band %.1f ... %.1f full steps/s (line %d) has no"
                            + " crossing acceleration: only dwelling in it is avoided", r.fromFullStepsPerS(),
                            r.toFullStepsPerS(), r.line()));
                }
                bands.add(new Band(r.fromFullStepsPerS(), r.toFullStepsPerS(), Double.isNaN(acc) ? 0 : acc));
            }
        }
        progress.step("planning the profile");
        ProfileSettings ps = new ProfileSettings(s.shape(), c.answer().target().fullStepsPerS(),
                s.curve().margin(), s.maxAccelerationFullStepsPerS2(), s.jerkFullStepsPerS3(), s.cruiseS(),
                s.tableStepS());
        Profile p = MotionPlanner.plan(c.curve(), c.load(), bands, ps);
        StepRateTable table = p.table(c.units());
        DriveSimulation.Result sim = s.simulate() ? DriveSimulation.run(c.curve(), c.load(), table, progress) : null;
        return new Result(c, avoidSource, bands, p, table, notes, sim);
    }
}
