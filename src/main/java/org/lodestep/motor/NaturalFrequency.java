package org.lodestep.motor;

/**
 * Small-oscillation natural frequency of a hybrid stepper's rotor and load about a detent of the energised phases,
 * and its inverse (the inertia implied by a measured frequency).
 *
 * <p>Source: P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and Practice</i>, 4th ed., IEE 2002, ch. 4
 * (rotor dynamics): static torque T = -T_h·sin(N_r·θ) linearises to a stiffness k = N_r·T_h N·m/rad, so
 * f_n = (1/2π)·√(N_r·T_h/J) with J the rotor plus coupled load inertia. The form f = √(k/J)/2π also appears in
 * D. W. Jones, <i>Stepping Motors</i> tutorial, part 2 "Resonance", University of Iowa. Friction and the
 * detent torque are ignored; T_h is the holding torque at the current used.
 */
public final class NaturalFrequency {
    private NaturalFrequency() {
    }

    /** Linearised stiffness N_r·T_h in N·m/rad. */
    public static double stiffnessNmPerRad(double holdingTorqueNm, int rotorTeeth) {
        requirePositive(holdingTorqueNm, "holding torque", "N·m");
        StepGeometry.requireTeeth(rotorTeeth);
        return rotorTeeth * holdingTorqueNm;
    }

    /** f_n in Hz from holding torque (N·m), rotor teeth and total inertia (kg·m²). */
    public static double naturalHz(double holdingTorqueNm, int rotorTeeth, double totalInertiaKgm2) {
        requirePositive(totalInertiaKgm2, "inertia", "kg·m²");
        return Math.sqrt(stiffnessNmPerRad(holdingTorqueNm, rotorTeeth) / totalInertiaKgm2) / (2 * Math.PI);
    }

    /** Total inertia J = N_r·T_h/(2π·f_n)² in kg·m² implied by a measured natural frequency. */
    public static double totalInertiaKgm2(double naturalHz, double holdingTorqueNm, int rotorTeeth) {
        requirePositive(naturalHz, "natural frequency", "Hz");
        double w = 2 * Math.PI * naturalHz;
        return stiffnessNmPerRad(holdingTorqueNm, rotorTeeth) / (w * w);
    }

    private static void requirePositive(double v, String what, String unit) {
        if (!(v > 0) || !Double.isFinite(v)) {
            throw new IllegalArgumentException(what + " must be positive and finite, got " + v + " " + unit);
        }
    }
}
