package org.lodestep.motor;

/**
 * Back-EMF and torque constants of a two-phase machine in SI units.
 *
 * <p>With SI units and the same per-phase peak convention, {@code Ke [V·s/rad] = Kt [N·m/A]} (power balance
 * {@code e·i = T·omega}); with sinusoidal back-EMF and quadrature phase currents of peak {@code I}, {@code T = Kt·I}.
 * Sources: "Motor constants" (unit identity N·m/A = V·s) and the energy-balance derivation cited in
 * REFERENCE-CHECKS item 15; Acarnley, <i>Stepping Motors</i>, 4th ed., hybrid-motor model chapters. The torque is
 * ideal: detent torque, saturation and losses are ignored.
 */
final class MotorConstants {
    private MotorConstants() {
    }

    /** Mechanical speed in rad/s from revolutions per minute. */
    static double radPerSFromRpm(double rpm) {
        return rpm * 2.0 * Math.PI / 60.0;
    }

    /** Back-EMF constant, peak volts per mechanical rad/s, from a peak voltage at a known speed. */
    static double keFromPeak(double peakV, double speedRadPerS) {
        if (!(speedRadPerS > 0)) {
            throw new IllegalArgumentException("speed must be positive, got " + speedRadPerS + " rad/s");
        }
        return peakV / speedRadPerS;
    }

    /** Torque constant in N·m/A, equal to Ke in V·s/rad (same per-phase peak convention). */
    static double ktFromKe(double keVsPerRad) {
        return keVsPerRad;
    }

    /** Peak torque, in N·m, with quadrature sinusoidal currents of peak {@code phaseCurrentA}: {@code T = Kt·I}. */
    static double peakTorqueNm(double ktNmPerA, double phaseCurrentA) {
        return ktNmPerA * phaseCurrentA;
    }

    /** Ke in volts per 1000 rpm: {@code × 1000·2·pi/60}. */
    static double keVPerKrpm(double keVsPerRad) {
        return keVsPerRad * 1000.0 * 2.0 * Math.PI / 60.0;
    }
}
