package org.lodestep.drive;

/**
 * Steady-state pull-out torque of a two-phase hybrid stepper against speed, from the phasor model of the phase
 * circuit with back-EMF, limited by the driver's current setting and by its supply voltage.
 *
 * <p>Model. At constant speed ω (mechanical rad/s) each phase is the circuit {@code V = (R + jX)·I + E} with
 * {@code X = N_r·ω·L} and back-EMF {@code |E| = K_e·ω}; taking {@code E} as the real reference, the mean torque of
 * the two phases is {@code T = Re(E·I*)/ω = K_t·Re(I)} (peak phasors, {@code K_t = K_e} in SI). The driver allows
 * the currents {@code |I| <= I_f} (its current setting) and {@code |(R + jX)·I + E| <= V_f} (its supply); the
 * pull-out torque is the largest {@code K_t·Re(I)} over both discs. Where the current disc binds, {@code T = K_t·I_f};
 * where the voltage disc alone binds, the classic constant-voltage result
 * {@code T = (K_e/|Z|)·(V_f − K_e·ω·R/|Z|)}, {@code |Z| = sqrt(R² + X²)} (the load angle equals the impedance angle);
 * where both bind, the better intersection of the two circles. This is the treatment of the hybrid motor as a
 * synchronous machine under sinusoidal supplies in P. P. Acarnley, <i>Stepping Motors: A Guide to Theory and
 * Practice</i>, 4th ed., IEE 2002, chapter on steady-state characteristics, and T. Kenjo, A. Sugawara, <i>Stepping
 * Motors and Their Microprocessor Controls</i>, 2nd ed., Oxford 1994, chapter on characteristics at speed (both
 * from memory; the disc formulation is the current- and voltage-limit circle diagram of permanent-magnet synchronous
 * drives, derived here).
 *
 * <p>Waveforms. With sine-cosine microstepping the fundamentals are the set current ({@code I_f = I}) and at most the
 * supply ({@code V_f = V}, linear PWM); a chopper driven far past its corner saturates towards a square wave whose
 * fundamental reaches {@code (4/π)·V}, so there the model is conservative (by up to about 23 % against the virtual
 * rig's driven motor at two to three times the corner speed). With full steps (two phases on) currents and, once voltage-limited, phase
 * voltages are square waves whose fundamentals are {@code 4/π} times their amplitude; the harmonics give torque
 * ripple but no mean torque at constant speed. So the running pull-out torque of full stepping at low speed is
 * {@code (4/π)·K_t·I}, 90 % of the static two-phase-on holding torque {@code √2·K_t·I}; the holding torque of
 * sine-cosine microstepping is {@code K_t·I} at every microstep.
 *
 * <p>Ignored: chopper ripple and dead time, saturation (the torque is linear in current), iron (eddy and
 * hysteresis) losses, detent torque (no mean at constant speed), winding temperature, harmonics beyond the
 * fundamental, and rotor oscillation: mid-band instability and low-speed resonance can make the motor lose steps
 * well below this curve. A constant-voltage drive has no current limit ({@code I_f} infinite).
 */
public final class PhasorTorque {
    /** Fundamental of a square wave of unit amplitude, 4/π. */
    static final double SQUARE_FUNDAMENTAL = 4 / Math.PI;

    private PhasorTorque() {
    }

    /** Fundamental current limit per phase, peak A: the set current (×4/π for square-wave full steps). */
    static double currentLimitA(Driver d) {
        if (d.mode() == DriveMode.CONSTANT_VOLTAGE) {
            return Double.POSITIVE_INFINITY;
        }
        return d.phaseCurrentA() * (d.fullStep() ? SQUARE_FUNDAMENTAL : 1.0);
    }

    /** Fundamental voltage limit per phase, peak V: the supply (×4/π for square-wave full steps). */
    static double voltageLimitV(Driver d) {
        return d.supplyV() * (d.fullStep() ? SQUARE_FUNDAMENTAL : 1.0);
    }

    /** Static holding torque with the set current at standstill, N·m: √2·K_t·I full step, K_t·I microstepping. */
    public static double holdingTorqueNm(PhaseModel m, Driver d) {
        double i = d.mode() == DriveMode.CHOPPER ? d.phaseCurrentA() : d.supplyV() / m.phaseResistanceOhm();
        if (d.mode() == DriveMode.CHOPPER) {
            i = Math.min(i, d.supplyV() / m.phaseResistanceOhm());
        }
        return m.ktNmPerA() * i * (d.fullStep() ? Math.sqrt(2) : 1.0);
    }

    /**
     * Pull-out torque at a mechanical speed, N·m; 0 where the drive can hold no load at that speed.
     *
     * @param speedRadPerS mechanical speed, rad/s, zero or more
     */
    public static double pullOutTorqueNm(PhaseModel m, Driver d, double speedRadPerS) {
        Require.nonNegative(speedRadPerS, "speed", "rad/s");
        double r = m.phaseResistanceOhm();
        double x = m.rotorTeeth() * speedRadPerS * m.phaseInductanceH();
        double e = m.ktNmPerA() * speedRadPerS;
        double z2 = r * r + x * x;
        // voltage disc |I - c| <= rv, centre c = -E/Z, radius V_f/|Z|
        double cRe = -e * r / z2;
        double cIm = e * x / z2;
        double rv = voltageLimitV(d) / Math.sqrt(z2);
        double ri = currentLimitA(d);
        double best;
        if (Math.hypot(ri - cRe, cIm) <= rv) {
            best = ri;                                  // current-limited: the set current, in phase with E
        } else if (Math.hypot(cRe + rv, cIm) <= ri) {
            best = cRe + rv;                            // voltage-limited: load angle = impedance angle
        } else {
            best = circleIntersectionMaxRe(cRe, cIm, rv, ri);
        }
        return Math.max(0.0, m.ktNmPerA() * best);
    }

    /** Largest real part of the two intersection points of |I| = ri and |I − c| = rv; -inf when they miss. */
    private static double circleIntersectionMaxRe(double cRe, double cIm, double rv, double ri) {
        double dist = Math.hypot(cRe, cIm);
        if (dist > ri + rv || dist < Math.abs(ri - rv) || dist == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        double a = (ri * ri - rv * rv + dist * dist) / (2 * dist);
        double h = Math.sqrt(Math.max(0, ri * ri - a * a));
        double ux = cRe / dist;
        double uy = cIm / dist;
        double px = a * ux;
        return Math.max(px + h * uy, px - h * uy);
    }

    /**
     * Speed up to which the drive still forces its set current in, rad/s: the root of
     * {@code (I_f·R + K_e·ω)² + (I_f·N_r·L·ω)² = V_f²}; 0 when the supply cannot drive the set current through the
     * resistance at all, +inf for a constant-voltage drive (no current setting).
     */
    public static double fullCurrentSpeedRadPerS(PhaseModel m, Driver d) {
        double i = currentLimitA(d);
        if (Double.isInfinite(i)) {
            return Double.POSITIVE_INFINITY;
        }
        double v = voltageLimitV(d);
        double r = m.phaseResistanceOhm();
        double k = m.ktNmPerA();
        double nl = m.rotorTeeth() * m.phaseInductanceH();
        double qa = k * k + i * i * nl * nl;
        double qb = 2 * i * r * k;
        double qc = i * i * r * r - v * v;
        if (qc >= 0) {
            return 0.0;
        }
        return (-qb + Math.sqrt(qb * qb - 4 * qa * qc)) / (2 * qa);
    }

    /**
     * Speed at which the pull-out torque falls to zero, rad/s, or +inf when the model's torque stays positive at
     * every speed (then it falls as about 1/ω): finite only when {@code K_e·R > V_f·N_r·L}, at
     * {@code ω0 = V_f·R/sqrt(K_e²R² − V_f²N_r²L²)}.
     */
    public static double zeroTorqueSpeedRadPerS(PhaseModel m, Driver d) {
        double v = voltageLimitV(d);
        double r = m.phaseResistanceOhm();
        double k = m.ktNmPerA();
        double nl = m.rotorTeeth() * m.phaseInductanceH();
        double disc = k * k * r * r - v * v * nl * nl;
        return disc > 0 ? v * r / Math.sqrt(disc) : Double.POSITIVE_INFINITY;
    }
}
