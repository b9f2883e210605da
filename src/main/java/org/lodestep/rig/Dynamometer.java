package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

import java.util.ArrayList;
import java.util.List;

/**
 * The virtual dynamometer: runs the motor of a {@link DrivenMotor} up to a constant step rate, lets it settle, then
 * ramps an opposing load torque until the rotor slips, and reports that load as the pull-out torque at the rate.
 *
 * <p>Procedure at each rate: run-up from standstill, briskly (the inertia takes a quarter of the reference torque)
 * through the low-speed resonances below 4·f_n, then gently (at least {@link #RUN_UP_S} for the whole run-up), a settling time of {@link #SETTLE_S}, then the load rises linearly from zero to 1.5 times the reference
 * torque ({@code K·I_set}, or {@code K·V/R} for a constant-voltage drive) over {@link #RAMP_S}. Slip is declared when the
 * rotor lags the command by more than {@link #SLIP_LAG_FULL_STEPS} full steps (more than a tooth pitch: the rotor has
 * left the stable region of the torque curve). The reading is the load at that moment; the rotor needs a few tens of
 * milliseconds to fall that far, so it reads a little high (about 1-2 % at these ramp rates). A run-up that already
 * slips is reported as lost at no load (resonance or mid-band instability at that rate, or on the way to it).
 */
public final class Dynamometer {
    /** Shortest run-up to the rate, s: gentle enough that the torque the inertia takes stays small at speed. */
    static final double RUN_UP_S = 1.0;
    /** Time at the rate before the load is applied, s. */
    static final double SETTLE_S = 0.15;
    /** Time over which the load rises to 1.5 × the reference torque, s. */
    static final double RAMP_S = 4.0;
    /** Lag beyond which the rotor has slipped, full steps. */
    static final double SLIP_LAG_FULL_STEPS = 5.0;

    private final DriveSettings drive;
    private final RotorSettings rotor;
    private final int microsteps;

    public Dynamometer(DriveSettings drive, RotorSettings rotor, int microsteps) {
        this.drive = java.util.Objects.requireNonNull(drive, "drive");
        this.rotor = java.util.Objects.requireNonNull(rotor, "rotor");
        new StepCommand(microsteps, rotor.rotorTeeth());
        this.microsteps = microsteps;
    }

    /**
     * One reading.
     *
     * @param rateFullStepsPerS the rate, full steps/s
     * @param pullOutTorqueNm   load at which the rotor slipped, N·m; 0 when it was lost before any load
     * @param lostOnRunUp       true when the rotor slipped during the run-up or settling, with no load
     * @param maxLagFullSteps   largest lag before the load ramp, full steps (a sign of instability when large)
     */
    public record Reading(double rateFullStepsPerS, double pullOutTorqueNm, boolean lostOnRunUp,
                          double maxLagFullSteps) {
    }

    /** Readings at each rate, in the order given. */
    public List<Reading> measure(double... ratesFullStepsPerS) {
        List<Reading> out = new ArrayList<>();
        for (double r : ratesFullStepsPerS) {
            out.add(measure(r));
        }
        return out;
    }

    /** Reference torque of the drive, N·m: K·I_set for a chopper, K·V/R for a constant-voltage drive. */
    double referenceTorqueNm() {
        double i = drive.mode() == DriveMode.CHOPPER ? drive.currentSettingA()
                : drive.supplyV() / drive.phaseResistanceOhm();
        return drive.keVsPerRad() * i;
    }

    /** One reading at a rate, full steps/s. */
    public Reading measure(double rateFullStepsPerS) {
        if (!(rateFullStepsPerS > 0) || !Double.isFinite(rateFullStepsPerS)) {
            throw new IllegalArgumentException("rate must be positive, got " + rateFullStepsPerS + " full steps/s");
        }
        StepCommand cmd = new StepCommand(microsteps, rotor.rotorTeeth());
        DrivenMotor m = new DrivenMotor(drive, rotor, cmd.startAngleRad());
        double[] u0 = cmd.phases(0);
        m.holdCurrents(u0[0], u0[1]);
        double tRef = referenceTorqueNm();
        double radPerFullStep = 2 * Math.PI / (4.0 * rotor.rotorTeeth());
        // run-up: briskly through the low-speed resonances (below 4·f_n), gently above, where torque falls
        double brisk = 0.25 * tRef / rotor.inertiaKgM2() / radPerFullStep;
        double gentle = Math.min(brisk, rateFullStepsPerS / RUN_UP_S);
        double fn = Math.sqrt(rotor.rotorTeeth() * tRef / rotor.inertiaKgM2()) / (2 * Math.PI);
        double briskUntil = 4 * fn;
        double dt = Math.min(Math.min(m.maxStepS(), 1 / fn / 200), 1 / (rateFullStepsPerS * microsteps * 20));
        double t = 0;
        double pos = 0;
        double rate = 0;
        double maxLag = 0;
        double loadStart = Double.NaN;
        double end = Double.POSITIVE_INFINITY;
        while (t < end) {
            double load = Double.isNaN(loadStart) ? 0 : 1.5 * tRef * (t - loadStart) / RAMP_S;
            double[] u = cmd.phases(pos);
            m.step(dt, u[0], u[1], -load);
            double next = Math.min(rateFullStepsPerS, rate + (rate < briskUntil ? brisk : gentle) * dt);
            pos += 0.5 * (rate + next) * dt;
            if (rate < rateFullStepsPerS && next >= rateFullStepsPerS) {
                loadStart = t + dt + SETTLE_S;
                end = loadStart + RAMP_S;
            }
            rate = next;
            t += dt;
            double lag = cmd.lagFullSteps(pos, m.angleRad());
            boolean noLoad = Double.isNaN(loadStart) || t < loadStart;
            if (Math.abs(lag) > SLIP_LAG_FULL_STEPS) {
                return new Reading(rateFullStepsPerS, noLoad ? 0 : load, noLoad, maxLag);
            }
            if (noLoad) {
                maxLag = Math.max(maxLag, Math.abs(lag));
            }
        }
        // never slipped below 1.5 × the reference: report the highest load tried
        return new Reading(rateFullStepsPerS, 1.5 * tRef, false, maxLag);
    }
}
