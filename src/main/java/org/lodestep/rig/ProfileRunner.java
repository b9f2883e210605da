package org.lodestep.rig;

import org.lodestep.drive.DriveMode;

/**
 * Plays a step-rate table on the virtual rig's driven motor and counts the full steps the rotor lost.
 *
 * <p>The rate between rows is interpolated linearly, as a controller playing the table does, and the commanded
 * position is its integral. The load is a Coulomb friction torque (opposing the motion, smoothed over ±0.5 rad/s so
 * the integrator sees no jump) plus a constant torque (gravity; positive opposes forward motion). After the last row
 * the command is held for {@link #SETTLE_S} so the rotor settles; the steps lost are then the rotor's lag rounded to
 * whole full steps (a rotor that slipped comes to rest a whole number of tooth pitches, four full steps each, behind).
 */
public final class ProfileRunner {
    /** Hold time after the profile before the position is compared, s. */
    static final double SETTLE_S = 0.3;

    private final DriveSettings drive;
    private final RotorSettings rotor;
    private final int microsteps;

    public ProfileRunner(DriveSettings drive, RotorSettings rotor, int microsteps) {
        this.drive = java.util.Objects.requireNonNull(drive, "drive");
        this.rotor = java.util.Objects.requireNonNull(rotor, "rotor");
        new StepCommand(microsteps, rotor.rotorTeeth());
        this.microsteps = microsteps;
    }

    /**
     * What the rotor did.
     *
     * @param commandedFullSteps position commanded at the end, full steps
     * @param lostFullSteps      full steps the rotor ended behind the command (0 when it followed)
     * @param maxLagFullSteps    largest lag during the run, full steps
     * @param maxLagTimeS        when it lagged most, s
     */
    public record Run(double commandedFullSteps, long lostFullSteps, double maxLagFullSteps, double maxLagTimeS) {
    }

    /**
     * @param timeS             row times, s, rising from 0
     * @param rateFullStepsPerS the rate at each row, full steps/s
     * @param frictionNm        Coulomb friction at the shaft, N·m
     * @param constantLoadNm    constant opposing torque (gravity), N·m
     */
    public Run run(double[] timeS, double[] rateFullStepsPerS, double frictionNm, double constantLoadNm) {
        if (timeS.length != rateFullStepsPerS.length || timeS.length < 2) {
            throw new IllegalArgumentException("a profile needs at least two rows of time and rate");
        }
        StepCommand cmd = new StepCommand(microsteps, rotor.rotorTeeth());
        DrivenMotor m = new DrivenMotor(drive, rotor, cmd.startAngleRad());
        double[] u0 = cmd.phases(0);
        m.holdCurrents(u0[0], u0[1]);
        double maxRate = 0;
        for (double v : rateFullStepsPerS) {
            maxRate = Math.max(maxRate, v);
        }
        double tRef = drive.keVsPerRad() * (drive.mode() == DriveMode.CHOPPER ? drive.currentSettingA()
                : drive.supplyV() / drive.phaseResistanceOhm());
        double fn = Math.sqrt(rotor.rotorTeeth() * tRef / rotor.inertiaKgM2()) / (2 * Math.PI);
        double dt = Math.min(Math.min(m.maxStepS(), 1 / fn / 200), 1 / (Math.max(1, maxRate) * microsteps * 20));
        double pos = 0;
        double maxLag = 0;
        double maxLagT = 0;
        int row = 0;
        double end = timeS[timeS.length - 1];
        double t = timeS[0];
        while (t < end + SETTLE_S) {
            double h = dt;
            double rate0 = rateAt(timeS, rateFullStepsPerS, t, row);
            while (row + 1 < timeS.length - 1 && timeS[row + 1] <= t) {
                row++;
            }
            double rate1 = rateAt(timeS, rateFullStepsPerS, t + h, row);
            double[] u = cmd.phases(pos);
            double w = m.speedRadPerS();
            double load = -frictionNm * Math.tanh(w / 0.5) - constantLoadNm;
            m.step(h, u[0], u[1], load);
            pos += 0.5 * (rate0 + rate1) * h;
            t += h;
            double lag = cmd.lagFullSteps(pos, m.angleRad());
            if (Math.abs(lag) > Math.abs(maxLag)) {
                maxLag = lag;
                maxLagT = t;
            }
        }
        double lag = cmd.lagFullSteps(pos, m.angleRad());
        return new Run(pos, Math.round(lag), maxLag, maxLagT);
    }

    private static double rateAt(double[] t, double[] v, double time, int from) {
        if (time >= t[t.length - 1]) {
            return v[v.length - 1];
        }
        int k = from;
        while (k + 1 < t.length && t[k + 1] <= time) {
            k++;
        }
        if (k + 1 >= t.length) {
            return v[v.length - 1];
        }
        double f = (time - t[k]) / (t[k + 1] - t[k]);
        return v[k] + f * (v[k + 1] - v[k]);
    }
}
