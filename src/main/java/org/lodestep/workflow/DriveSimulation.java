package org.lodestep.workflow;

import java.util.List;


import org.lodestep.drive.Load;
import org.lodestep.drive.PhaseModel;
import org.lodestep.drive.StepRateTable;
import org.lodestep.drive.TorqueCurve;
import org.lodestep.rig.DriveSettings;
import org.lodestep.rig.ProfileRunner;
import org.lodestep.rig.RotorSettings;

/**
 * Use case: play a planned step-rate table on the virtual rig's driven motor (phase circuits with back-EMF, the same
 * drive and supply, the load's inertia and friction), and beside it a naive constant-acceleration profile to the same
 * peak rate sized on the low-speed torque without margin, and count the steps each loses.
 */
public final class DriveSimulation {
    /**
     * Viscous damping the simulated rotor is given, as a damping ratio of its small oscillation: light (common for a
     * belt axis without a damper), so the check does not lean on damping the real axis may lack.
     */
    public static final double DAMPING_RATIO = 0.01;
    /** Cruise time of the naive profile, s. */
    static final double NAIVE_CRUISE_S = 0.2;

    private DriveSimulation() {
    }

    /**
     * @param planned          the planned profile on the virtual rig
     * @param naive            the naive profile on the virtual rig; null when the load leaves no torque to size it on
     * @param naiveAccelerationFullStepsPerS2 the naive profile's acceleration, full steps/s²
     * @param dampingNmsPerRad viscous damping given to the simulated rotor, N·m·s/rad
     */
    public record Result(ProfileRunner.Run planned, ProfileRunner.Run naive, double naiveAccelerationFullStepsPerS2,
                         double dampingNmsPerRad) {
    }

    /** The virtual rig's drive for this motor and drive. */
    static DriveSettings rigDrive(TorqueCurve curve) {
        PhaseModel m = curve.motor();
        org.lodestep.drive.Driver d = curve.drive();
        return d.mode() == org.lodestep.drive.DriveMode.CHOPPER
                ? DriveSettings.chopper(m.phaseResistanceOhm(), m.phaseInductanceH(), m.ktNmPerA(), d.supplyV(),
                d.phaseCurrentA())
                : DriveSettings.constantVoltage(m.phaseResistanceOhm(), m.phaseInductanceH(), m.ktNmPerA(),
                d.supplyV());
    }

    /** The simulated rotor: rotor plus load inertia, damping ratio {@link #DAMPING_RATIO}, the motor's detent. */
    static RotorSettings rigRotor(TorqueCurve curve, Load load) {
        PhaseModel m = curve.motor();
        double j = m.rotorInertiaKgM2() + load.inertiaKgM2();
        // ζ = c/(2·sqrt(k·J)), k = N_r·T_h (linearised stiffness, Acarnley ch. 4)
        double c = 2 * DAMPING_RATIO * Math.sqrt(m.rotorTeeth() * curve.holdingTorqueNm() * j);
        return new RotorSettings(j, c, m.detentTorqueNm(), m.rotorTeeth());
    }

    public static Result run(TorqueCurve curve, Load load, StepRateTable table, Progress progress) {
        PhaseModel m = curve.motor();
        org.lodestep.drive.Driver d = curve.drive();
        RotorSettings rotor = rigRotor(curve, load);
        double j = rotor.inertiaKgM2();
        double c = rotor.dampingNmsPerRad();
        ProfileRunner runner = new ProfileRunner(rigDrive(curve), rotor, d.microsteps());
        List<StepRateTable.Row> rows = table.rows();
        double[] t = new double[rows.size()];
        double[] v = new double[rows.size()];
        double peak = 0;
        for (int k = 0; k < t.length; k++) {
            t[k] = rows.get(k).timeS();
            v[k] = rows.get(k).rateFullStepsPerS();
            peak = Math.max(peak, v[k]);
        }
        double gravity = load.steadyTorqueNm() - load.frictionTorqueNm();
        progress.step("playing the planned profile on the virtual rig");
        ProfileRunner.Run planned = runner.run(t, v, load.frictionTorqueNm(), gravity);
        double a = (curve.lowSpeedTorqueNm() - load.steadyTorqueNm()) / j / (2 * Math.PI / m.fullStepsPerRev());
        double up = a > 0 ? peak / a : 0;
        double step = t.length > 1 ? t[1] - t[0] : 0.001;
        int n = (int) Math.ceil((2 * up + NAIVE_CRUISE_S) / step) + 1;
        double[] nt = new double[n];
        double[] nv = new double[n];
        for (int k = 0; k < n; k++) {
            nt[k] = Math.min(k * step, 2 * up + NAIVE_CRUISE_S);
            nv[k] = nt[k] < up ? a * nt[k] : nt[k] < up + NAIVE_CRUISE_S ? peak
                    : Math.max(0, peak - a * (nt[k] - up - NAIVE_CRUISE_S));
        }
        if (!(a > 0)) {
            return new Result(planned, null, Double.NaN, c);
        }
        progress.step("playing a naive constant-acceleration profile on the virtual rig");
        ProfileRunner.Run naive = runner.run(nt, nv, load.frictionTorqueNm(), gravity);
        return new Result(planned, naive, a, c);
    }
}
